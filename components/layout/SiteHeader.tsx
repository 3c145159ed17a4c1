"use client";

import Link from "next/link";
import { signOut } from "next-auth/react";

export interface HeaderUser {
  name: string;
  email: string;
  siteRole: "admin" | "member";
}

export function SiteHeader({ user }: { user: HeaderUser | null }) {
  return (
    <header className="border-b border-rule bg-paper">
      <nav className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-4 gap-y-1 px-4 py-3 text-sm sm:gap-x-6 sm:px-6" aria-label="Main">
        <Link href="/" className="flex items-center gap-2 font-serif text-lg font-semibold tracking-tight">
          <BranchMark />
          Branchline
        </Link>
        {user && (
          <Link href="/projects" className="text-ink-soft hover:text-ink">
            Projects
          </Link>
        )}
        <Link href="/methods" className="text-ink-soft hover:text-ink">
          Methods
        </Link>
        <Link href="/api-reference" className="text-ink-soft hover:text-ink">
          API
        </Link>
        {user?.siteRole === "admin" && (
          <Link href="/admin/users" className="text-ink-soft hover:text-ink">
            Users
          </Link>
        )}
        <span className="flex-1" />
        {user ? (
          <>
            <Link href="/account" className="max-w-40 truncate text-ink-soft hover:text-ink" title={user.email}>
              {user.name}
            </Link>
            <button type="button" onClick={() => signOut({ callbackUrl: "/" })} className="text-ink-soft hover:text-ink">
              Sign out
            </button>
          </>
        ) : (
          <>
            <Link href="/sign-in" className="text-ink-soft hover:text-ink">
              Sign in
            </Link>
            <Link href="/sign-up" className="rounded border border-ink px-3 py-1 hover:bg-ink hover:text-paper">
              Sign up
            </Link>
          </>
        )}
      </nav>
    </header>
  );
}

/** Two worldlines that part and rejoin: orange solid, blue dashed. */
function BranchMark() {
  return (
    <svg width="22" height="22" viewBox="0 0 22 22" aria-hidden="true">
      <path d="M11 2 C 4 7, 4 15, 11 20" fill="none" stroke="#E69F00" strokeWidth="2" />
      <path d="M11 2 C 18 7, 18 15, 11 20" fill="none" stroke="#0072B2" strokeWidth="2" strokeDasharray="3 2" />
    </svg>
  );
}
