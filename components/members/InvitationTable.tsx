"use client";

import { useState } from "react";
import { messageOf } from "@/components/api/client";
import { useInvitations, useResendInvitation, useRevokeInvitation, type InvitationDto } from "@/components/api/invitations";
import { sentence } from "@/components/format/text";
import { roleNames } from "@/components/format/words";
import { EmptyState } from "@/components/ui/EmptyState";
import { Notice } from "@/components/ui/Notice";
import { QueryView } from "@/components/ui/QueryStates";
import { TableHead } from "@/components/ui/TableHead";
import { TimeStamp } from "@/components/ui/TimeStamp";
import { RevokeButton, RevokeDialog, useRevokeConfirmation } from "@/components/sharing/RevokeRowAction";
import { buttonStyles, tableStyles } from "@/components/ui/styles";

const columns = [{ label: "E-mail" }, { label: "Role" }, { label: "Invited by" }, { label: "Sent" }, { label: "Link" }, { label: "Actions", hiddenLabel: true }];

/** The invitations nobody has accepted yet (owners only), with a way to send each again or revoke it. */
export function InvitationTable({ projectId }: { projectId: string }) {
  const invitations = useInvitations(projectId);
  const resend = useResendInvitation(projectId);
  const revoke = useRevokeInvitation(projectId);
  const revoking = useRevokeConfirmation();
  const [message, setMessage] = useState<{ tone: "success" | "caution"; text: string } | null>(null);

  const onResend = (invitation: InvitationDto) => {
    setMessage(null);
    resend.mutate(invitation.id, {
      onSuccess: () => setMessage({ tone: "success", text: `Sent again to ${invitation.email}, with a new link for 7 days; the old link no longer works.` }),
      onError: (error) => setMessage({ tone: "caution", text: sentence(messageOf(error)) }),
    });
  };

  return (
    <section aria-labelledby="invitations-title" className="space-y-4">
      <h2 id="invitations-title" className="font-serif text-xl font-semibold">
        Pending invitations
      </h2>
      {message && (
        <Notice tone={message.tone} onDismiss={() => setMessage(null)}>
          {message.text}
        </Notice>
      )}
      <QueryView query={invitations} what="the invitations" lines={2}>
        {(list) =>
          list.length === 0 ? (
            <EmptyState title="No pending invitations" />
          ) : (
            <table className={tableStyles.table}>
              <caption className="sr-only">Invitations not yet accepted</caption>
              <TableHead columns={columns} />
              <tbody>
                {list.map((invitation) => (
                  <tr key={invitation.id} className={tableStyles.row}>
                    <td className={`${tableStyles.cell} font-semibold`}>{invitation.email}</td>
                    <td className={tableStyles.cell}>{roleNames[invitation.role]}</td>
                    <td className={`${tableStyles.cell} text-ink-soft`}>{invitation.invitedBy?.name ?? "—"}</td>
                    <td className={tableStyles.cell}>
                      <TimeStamp iso={invitation.sentAt} />
                    </td>
                    <td className={tableStyles.cell}>
                      {invitation.status === "expired" ? (
                        <span className="text-caution">
                          <span aria-hidden="true">⚠ </span>expired
                        </span>
                      ) : (
                        <span className="text-ink-soft">
                          expires <TimeStamp iso={invitation.expiresAt} layout="inline" />
                        </span>
                      )}
                    </td>
                    <td className={`${tableStyles.cell} whitespace-nowrap text-right`}>
                      <button
                        type="button"
                        onClick={() => onResend(invitation)}
                        disabled={resend.isPending && resend.variables === invitation.id}
                        className={buttonStyles.row}
                        aria-label={`Send the invitation to ${invitation.email} again`}
                      >
                        Send again
                      </button>
                      <RevokeButton target={{ id: invitation.id, name: `the invitation to ${invitation.email}` }} onAsk={revoking.ask} />
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          )
        }
      </QueryView>
      <RevokeDialog target={revoking.target} onClose={revoking.close} revoke={revoke} confirmLabel="Revoke invitation">
        The link in their e-mail stops working at once. You can invite the address again later.
      </RevokeDialog>
    </section>
  );
}
