"use client";

import Link from "next/link";
import { useEffect } from "react";
import { buttonStyles } from "./styles";

/**
 * What a route shows when rendering it failed. The server never sends details, so this says what happened in
 * plain words, offers another try, and keeps the digest for a bug report.
 */
export function RouteError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  useEffect(() => {
    console.error(error);
  }, [error]);
  return (
    <section className="mx-auto max-w-xl py-16" aria-labelledby="route-error-title">
      <p className="text-sm text-ink-faint" aria-hidden="true">
        ⚠ Something went wrong
      </p>
      <h1 id="route-error-title" className="mt-2 font-serif text-3xl font-semibold tracking-tight">
        This page could not be shown
      </h1>
      <p className="mt-4 leading-relaxed text-ink-soft">
        Branchline hit a problem while preparing it. Your saved work is not affected. Try again, or go back to your
        projects.
      </p>
      {error.digest && (
        <p className="mt-2 text-sm text-ink-faint">
          Reference for a bug report: <span className="tabular">{error.digest}</span>
        </p>
      )}
      <div className="mt-8 flex gap-3">
        <button type="button" onClick={reset} className={buttonStyles.primary}>
          Try again
        </button>
        <Link href="/projects" className={buttonStyles.secondary}>
          Your projects
        </Link>
      </div>
    </section>
  );
}
