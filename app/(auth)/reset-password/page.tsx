import type { Metadata } from "next";
import Link from "next/link";
import { AuthHeading } from "@/components/auth/AuthHeading";
import { ResetConfirmForm } from "@/components/auth/ResetConfirmForm";
import { ResetRequestForm } from "@/components/auth/ResetRequestForm";
import { linkStyles } from "@/components/ui/styles";

export const metadata: Metadata = { title: "Reset password" };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string; email?: string }> }) {
  const { token, email } = await searchParams;
  if (token) {
    return (
      <>
        <AuthHeading title="Choose a new password">Pick a password of at least 10 characters.</AuthHeading>
        <ResetConfirmForm token={token} />
      </>
    );
  }
  return (
    <>
      <AuthHeading title="Reset your password">
        Give the e-mail address of your account and we will send you a link to choose a new password.
      </AuthHeading>
      <ResetRequestForm defaultEmail={email} />
      <p className="mt-10 border-t border-rule pt-6 text-sm text-ink-soft">
        Remembered it?{" "}
        <Link href="/sign-in" className={linkStyles}>
          Sign in
        </Link>
      </p>
    </>
  );
}
