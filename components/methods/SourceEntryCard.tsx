import type { SourceEntry } from "@/physics";
import Link from "next/link";
import { Formula } from "./Formula";
import { LinkedText } from "./LinkedText";

/** One formula of the methods page: what it computes, the formula as evaluated, what it assumes, where it fails, its source. */
export function SourceEntryCard({ id, entry }: { id: string; entry: SourceEntry }) {
  // A title that names its derivation's page says so in words, and the page is a link under it.
  const derivation = /\/methods\/[a-z0-9-]+/.exec(entry.title)?.[0] ?? null;
  const title = derivation ? entry.title.replace(/;? \(?derivation at \/methods\/[a-z0-9-]+\)?/, "") : entry.title;
  return (
    <article id={id} className="scroll-mt-20 border-t border-rule py-6 target:bg-branchB-tint/30">
      <h3 className="font-serif text-xl font-semibold">
        <a href={`#${id}`} className="hover:underline">
          {title}
        </a>
      </h3>
      {derivation && (
        <p className="mt-1 text-sm">
          Derivation:{" "}
          <Link href={derivation} className="underline decoration-rule-strong underline-offset-2 hover:decoration-ink">
            {derivation}
          </Link>
        </p>
      )}
      <p className="mt-1 font-mono text-xs text-ink-faint">{id}</p>
      <Formula tex={entry.formula} display />
      {entry.assumptions.length > 0 && (
        <div className="mt-2">
          <h4 className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Assumes</h4>
          <ul className="mt-1 list-disc space-y-1 pl-6 text-sm">
            {entry.assumptions.map((a) => (
              <li key={a}>
                <LinkedText text={a} />
              </li>
            ))}
          </ul>
        </div>
      )}
      {entry.failureModes.length > 0 && (
        <div className="mt-3">
          <h4 className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Fails or stretches when</h4>
          <ul className="mt-1 list-disc space-y-1 pl-6 text-sm">
            {entry.failureModes.map((f) => (
              <li key={f}>
                <LinkedText text={f} />
              </li>
            ))}
          </ul>
        </div>
      )}
      <p className="mt-3 text-sm text-ink-soft">
        <span className="font-semibold">Source: </span>
        <LinkedText text={entry.citation} />
      </p>
    </article>
  );
}
