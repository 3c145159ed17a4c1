import type { ReactNode } from "react";

export function AuthHeading({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <header className="mb-8">
      <h1 className="font-serif text-3xl font-semibold tracking-tight">{title}</h1>
      {children && <p className="mt-3 leading-relaxed text-ink-soft">{children}</p>}
    </header>
  );
}
