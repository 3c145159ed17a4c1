import type { ReactNode } from "react";

/** A page's serif title, an optional line under it, and room for actions on the right. */
export function PageHeader({ title, kicker, children, actions }: { title: ReactNode; kicker?: ReactNode; children?: ReactNode; actions?: ReactNode }) {
  return (
    <header className="mb-8 flex flex-wrap items-end gap-x-6 gap-y-3 border-b border-rule pb-5">
      <div className="min-w-0 flex-1">
        {kicker && <div className="mb-1 text-sm text-ink-faint">{kicker}</div>}
        <h1 className="font-serif text-3xl font-semibold tracking-tight break-words">{title}</h1>
        {children && <div className="mt-2 text-ink-soft">{children}</div>}
      </div>
      {actions && <div className="flex items-center gap-3">{actions}</div>}
    </header>
  );
}
