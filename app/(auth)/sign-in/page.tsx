import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { AuthHeading } from "@/components/auth/AuthHeading";
import { safeCallbackUrl, signInErrorMessage } from "@/components/auth/callbackUrl";
import { MagicLinkForm } from "@/components/auth/MagicLinkForm";
import { SignInForm } from "@/components/auth/SignInForm";
import { sentence } from "@/components/format/text";
import { Notice } from "@/components/ui/Notice";
import { linkStyles } from "@/components/ui/styles";
import { currentUser } from "@/lib/session";

export const metadata: Metadata = { title: "Sign in" };

type SearchParams = Promise<{ callbackUrl?: string; error?: string }>;

export default async function SignInPage({ searchParams }: { searchParams: SearchParams }) {
  const { callbackUrl: rawCallback, error } = await searchParams;
  const callbackUrl = safeCallbackUrl(rawCallback);
  if (await currentUser()) redirect(callbackUrl);
  const problem = signInErrorMessage(error);
  const withCallback = rawCallback ? `?callbackUrl=${encodeURIComponent(callbackUrl)}` : "";

  return (
    <>
      <AuthHeading title="Sign in">
        {rawCallback ? "Sign in to open that page." : "Welcome back to your projects."}
      </AuthHeading>
      {problem && (
        <div className="mb-6">
          <Notice tone="invalid">{sentence(problem)}</Notice>
        </div>
      )}
      <SignInForm callbackUrl={callbackUrl} />
      <p className="mt-4 text-sm">
        <Link href="/reset-password" className={linkStyles}>
          Forgot your password?
        </Link>
      </p>

      <details className="group mt-10 border-t border-rule pt-6">
        <summary className="cursor-pointer text-sm font-semibold text-ink-soft hover:text-ink">No password? Sign in with a link by e-mail</summary>
        <div className="mt-4">
          <MagicLinkForm callbackUrl={callbackUrl} />
        </div>
      </details>

      <p className="mt-10 border-t border-rule pt-6 text-sm text-ink-soft">
        New to Branchline?{" "}
        <Link href={`/sign-up${withCallback}`} className={linkStyles}>
          Create an account
        </Link>
      </p>
    </>
  );
}
