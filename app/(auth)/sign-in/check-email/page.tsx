import type { Metadata } from "next";
import Link from "next/link";
import { AuthHeading } from "@/components/auth/AuthHeading";
import { linkStyles } from "@/components/ui/styles";

export const metadata: Metadata = { title: "Check your e-mail" };

export default function CheckEmailPage() {
  return (
    <>
      <AuthHeading title="A link is on its way">
        Check your inbox for a message from Branchline and follow the link in it to sign in. The link works once and
        expires in 24 hours.
      </AuthHeading>
      <p className="text-sm text-ink-soft">
        Nothing after a few minutes? Look in your spam folder, or{" "}
        <Link href="/sign-in" className={linkStyles}>
          go back and try again
        </Link>
        .
      </p>
    </>
  );
}
