import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { AccountPanel } from "@/components/account/AccountPanel";
import { signInPath } from "@/components/auth/callbackUrl";
import { PageHeader } from "@/components/ui/PageHeader";
import { currentUser } from "@/lib/session";

export const metadata: Metadata = { title: "Account" };

export default async function AccountPage() {
  if (!(await currentUser())) redirect(signInPath("/account"));
  return (
    <>
      <PageHeader title="Your account" />
      <AccountPanel />
    </>
  );
}
