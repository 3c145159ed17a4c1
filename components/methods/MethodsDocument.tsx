import Link from "next/link";
import type { ReactNode } from "react";
import { MathMarkdown } from "./MathMarkdown";

/**
 * A derivation page under /methods: a link back to its group on the Methods page, the document's first line as the
 * title, anything the page shows before the prose (a figure), and the rest of the markdown with its formulas.
 */
export function MethodsDocument({ source, backTo, children }: { source: string; backTo: string; children?: ReactNode }) {
  const [title, ...rest] = source.split("\n");
  return (
    <div className="mx-auto max-w-3xl">
      <p className="text-sm">
        <Link href={backTo} className="text-branchB hover:underline">
          ← Methods
        </Link>
      </p>
      <h1 className="mt-2 font-serif text-4xl font-semibold tracking-tight">{title.replace(/^#\s*/, "")}</h1>
      {children}
      <MathMarkdown source={rest.join("\n")} />
    </div>
  );
}
