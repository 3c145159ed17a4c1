import Link from "next/link";
import { buttonStyles } from "./styles";

/**
 * The page for anything that does not exist or that the visitor may not see. The two cases read the same on
 * purpose: a project you are not a member of is "not found", never "forbidden".
 */
export function NotFoundNotice({ what = "page", children }: { what?: string; children?: React.ReactNode }) {
  return (
    <section className="mx-auto max-w-xl py-16" aria-labelledby="not-found-title">
      <p className="tabular text-sm text-ink-faint">404</p>
      <h1 id="not-found-title" className="mt-2 font-serif text-3xl font-semibold tracking-tight">
        {what.charAt(0).toUpperCase() + what.slice(1)} not found
      </h1>
      <p className="mt-4 leading-relaxed text-ink-soft">
        {children ?? `There is no ${what} at this address, or it has not been shared with you.`}
      </p>
      <div className="mt-8 flex gap-3">
        <Link href="/projects" className={buttonStyles.primary}>
          Your projects
        </Link>
        <Link href="/" className={buttonStyles.secondary}>
          Home
        </Link>
      </div>
    </section>
  );
}
