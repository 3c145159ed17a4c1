import "server-only";
import type { InvitationLetter } from "../db/invitations";
import { AppError } from "../db/errors";
import { invitationUrl } from "./links";
import { sendMail } from "./mailer";

const dateFormat = new Intl.DateTimeFormat("en-GB", { dateStyle: "long", timeStyle: "short", timeZone: "UTC" });

/** Sends an invitation e-mail; a mail server that refuses is a 503, and the caller's transaction stores nothing. */
export async function sendInvitationMail(letter: InvitationLetter): Promise<void> {
  const link = invitationUrl(letter.token);
  try {
    await sendMail({
      to: letter.to,
      subject: `${letter.inviterName} invited you to “${letter.projectName}” on Branchline`,
      text:
        `Hello,\n\n${letter.inviterName} invited you to join the project “${letter.projectName}” on Branchline as ${letter.role === "editor" ? "an editor" : "a viewer"}.\n\n` +
        `Follow this link to accept (you can create an account with this address on the way):\n\n${link}\n\n` +
        `It works once and expires on ${dateFormat.format(letter.expiresAt)} UTC. If you did not expect it, ignore this message.`,
    });
  } catch (error) {
    console.error("[mail] invitation not sent", error);
    throw new AppError("service_unavailable", "the invitation e-mail could not be sent just now; nothing was saved, try again in a moment");
  }
}
