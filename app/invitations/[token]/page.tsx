import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { signInPath } from "@/components/auth/callbackUrl";
import { roleNames } from "@/components/format/words";
import { AcceptInvitation, SignOutToSwitch } from "@/components/invitations/AcceptInvitation";
import { Notice } from "@/components/ui/Notice";
import { TimeStamp } from "@/components/ui/TimeStamp";
import { buttonStyles } from "@/components/ui/styles";
import { getDb } from "@/db";
import { previewInvitation } from "@/db/invitations";
import { currentUser } from "@/lib/session";

export const metadata: Metadata = { title: "Invitation", robots: { index: false, follow: false } };

/** Where an invitation e-mail leads: accept it signed in, or sign up / sign in first and come back here. */
export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = await previewInvitation(getDb(), token);
  if (!invitation) notFound();
  const user = await currentUser();
  const here = `/invitations/${encodeURIComponent(token)}`;
  const sameAddress = user !== null && user.email.toLowerCase() === invitation.email.toLowerCase();

  return (
    <section aria-labelledby="invitation-title" className="mx-auto w-full max-w-md space-y-6 py-10">
      <div>
        <p className="text-sm text-ink-faint">Invitation</p>
        <h1 id="invitation-title" className="mt-1 font-serif text-3xl font-semibold tracking-tight break-words">
          Join “{invitation.projectName}”
        </h1>
        <p className="mt-3 leading-relaxed text-ink-soft">
          {invitation.invitedBy ?? "An owner"} invited <span className="font-semibold text-ink">{invitation.email}</span> to this Branchline
          project as {roleNames[invitation.role].toLowerCase()}
          {invitation.role === "viewer" ? ": to look at its scenarios, not change them." : ": to look at and change its scenarios."}
        </p>
        <p className="mt-2 text-sm text-ink-faint">
          The link works once and expires <TimeStamp iso={invitation.expiresAt} layout="inline" />.
        </p>
      </div>

      {!user && (
        <div className="space-y-3">
          <p className="text-sm text-ink-soft">Create an account with {invitation.email}, or sign in with it, to accept.</p>
          <Link href={`/sign-up?callbackUrl=${encodeURIComponent(here)}&email=${encodeURIComponent(invitation.email)}`} className={`${buttonStyles.primary} w-full`}>
            Create an account
          </Link>
          <Link href={signInPath(here)} className={`${buttonStyles.secondary} w-full`}>
            Sign in
          </Link>
        </div>
      )}

      {user && sameAddress && <AcceptInvitation token={token} />}

      {user && !sameAddress && (
        <div className="space-y-4">
          <Notice tone="caution">
            This invitation was sent to {invitation.email}, but you are signed in as {user.email}. Only the account with the invited address can
            accept it.
          </Notice>
          <SignOutToSwitch returnTo={here} />
        </div>
      )}
    </section>
  );
}
