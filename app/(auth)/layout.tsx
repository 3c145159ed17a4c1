import type { ReactNode } from "react";

/** Sign-in, sign-up and password pages: one narrow column, nothing else to look at. */
export default function AuthLayout({ children }: { children: ReactNode }) {
  return <div className="mx-auto w-full max-w-sm py-10">{children}</div>;
}
