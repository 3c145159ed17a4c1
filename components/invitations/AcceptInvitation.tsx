"use client";

import { signOut } from "next-auth/react";
import { useRouter } from "next/navigation";
import { messageOf } from "@/components/api/client";
import { useAcceptInvitation } from "@/components/api/invitations";
import { sentence } from "@/components/format/text";
import { Notice } from "@/components/ui/Notice";
import { buttonStyles } from "@/components/ui/styles";

/** Joins the project and opens it; the server checks the token and the address again. */
export function AcceptInvitation({ token }: { token: string }) {
  const router = useRouter();
  const accept = useAcceptInvitation(token);
  return (
    <div className="space-y-4">
      {accept.isError && <Notice tone="invalid">{sentence(messageOf(accept.error))}</Notice>}
      <button
        type="button"
        disabled={accept.isPending || accept.isSuccess}
        onClick={() => accept.mutate(undefined, { onSuccess: ({ projectId }) => router.push(`/projects/${projectId}`) })}
        className={`${buttonStyles.primary} w-full`}
      >
        {accept.isPending || accept.isSuccess ? "Joining…" : "Accept"}
      </button>
    </div>
  );
}

/** For a visitor signed in with another address: sign out and come back to the invitation. */
export function SignOutToSwitch({ returnTo }: { returnTo: string }) {
  return (
    <button type="button" onClick={() => signOut({ callbackUrl: returnTo })} className={`${buttonStyles.secondary} w-full`}>
      Sign out and use the invited address
    </button>
  );
}
