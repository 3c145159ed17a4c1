"use client";

import type { UseQueryResult } from "@tanstack/react-query";
import Link from "next/link";
import { usePathname } from "next/navigation";
import type { ReactNode } from "react";
import { ApiError, messageOf } from "@/components/api/client";
import { signInPath } from "@/components/auth/callbackUrl";
import { Notice } from "./Notice";
import { buttonStyles, linkStyles } from "./styles";

/** Grey bars in the shape of the content that is on its way. */
export function Skeleton({ lines = 3, label = "Loading" }: { lines?: number; label?: string }) {
  return (
    <div role="status" aria-live="polite" className="space-y-3 py-2">
      <span className="sr-only">{label}…</span>
      {Array.from({ length: lines }, (_, i) => (
        <div key={i} aria-hidden="true" className="h-4 animate-pulse rounded-sm bg-paper-deep" style={{ width: `${92 - ((i * 17) % 40)}%` }} />
      ))}
    </div>
  );
}

/** A failed load, its reason in words, and a way to try again (or to sign in again when the session ended). */
export function LoadError({ error, onRetry, what = "this" }: { error: unknown; onRetry: () => void; what?: string }) {
  const pathname = usePathname();
  if (error instanceof ApiError && error.status === 401) {
    return (
      <Notice tone="caution">
        You are signed out.{" "}
        <Link href={signInPath(pathname)} className={linkStyles}>
          Sign in again
        </Link>{" "}
        to see {what}.
      </Notice>
    );
  }
  return (
    <Notice
      tone="invalid"
      action={
        <button type="button" onClick={onRetry} className={`${buttonStyles.secondary} -my-1 py-1`}>
          Try again
        </button>
      }
    >
      Could not load {what}: {messageOf(error)}
    </Notice>
  );
}

/**
 * One query's three states: a skeleton while it loads, the error with a retry (or `notFound` for a 404, when
 * given), and the data.
 */
export function QueryView<T>({
  query,
  what,
  lines = 4,
  notFound,
  children,
}: {
  query: UseQueryResult<T>;
  what: string;
  lines?: number;
  notFound?: ReactNode;
  children: (data: T) => ReactNode;
}) {
  if (query.isPending) return <Skeleton lines={lines} label={`Loading ${what}`} />;
  if (query.isError) {
    if (notFound && query.error instanceof ApiError && query.error.isNotFound) return <>{notFound}</>;
    return <LoadError error={query.error} onRetry={() => query.refetch()} what={what} />;
  }
  return <>{children(query.data)}</>;
}
