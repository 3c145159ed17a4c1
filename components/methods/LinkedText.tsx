import Link from "next/link";
import { Fragment } from "react";

const METHODS_PATH = /(\/methods(?:\/[a-z0-9-]+)?(?:#[a-z0-9-]+)?)/g;

/** Text in which every Methods path ("/methods/schwarzschild-exact") is a link to that page. */
export function LinkedText({ text }: { text: string }) {
  const parts = text.split(METHODS_PATH);
  return (
    <>
      {parts.map((part, i) =>
        i % 2 === 1 ? (
          <Link key={i} href={part} className="underline decoration-rule-strong underline-offset-2 hover:decoration-ink">
            {part}
          </Link>
        ) : (
          <Fragment key={i}>{part}</Fragment>
        ),
      )}
    </>
  );
}
