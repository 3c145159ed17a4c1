import type { ReactNode } from "react";

/** What a list shows when it has nothing in it: a serif line and a word on what to do. */
export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="border-y border-rule py-10 text-center text-ink-soft">
      <p className="font-serif text-lg text-ink">{title}</p>
      {children && <p className="mt-2 text-sm">{children}</p>}
    </div>
  );
}
