import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { AuthHeading } from "@/components/auth/AuthHeading";
import { safeCallbackUrl } from "@/components/auth/callbackUrl";
import { SignUpForm } from "@/components/auth/SignUpForm";
import { linkStyles } from "@/components/ui/styles";
import { currentUser } from "@/lib/session";

export const metadata: Metadata = { title: "Sign up" };

export default async function SignUpPage({ searchParams }: { searchParams: Promise<{ callbackUrl?: string; email?: string }> }) {
  const { callbackUrl: rawCallback, email } = await searchParams;
  const callbackUrl = safeCallbackUrl(rawCallback);
  if (await currentUser()) redirect(callbackUrl);
  return (
    <>
      <AuthHeading title="Create an account">Projects are private until you share them.</AuthHeading>
      <SignUpForm callbackUrl={callbackUrl} email={typeof email === "string" ? email.slice(0, 320) : ""} />
      <p className="mt-10 border-t border-rule pt-6 text-sm text-ink-soft">
        Already have an account?{" "}
        <Link href={rawCallback ? `/sign-in?callbackUrl=${encodeURIComponent(callbackUrl)}` : "/sign-in"} className={linkStyles}>
          Sign in
        </Link>
      </p>
    </>
  );
}
