import { getDb } from "@/db";
import { issuePasswordReset } from "@/db/password-reset";
import { passwordResetRequestSchema } from "@/contracts/requests";
import { json, readJson, route } from "@/lib/http";
import { appUrl, sendMailInBackground } from "@/lib/mailer";

/**
 * Asks for a reset link. Answers 202 whether or not the account exists, so accounts cannot be probed; the mail
 * goes out in the background, so the answer takes no longer when there is one to send.
 */
export const POST = route(async (req) => {
  const { email } = await readJson(req, passwordResetRequestSchema);
  const issued = await issuePasswordReset(getDb(), email);
  if (issued) {
    const link = `${appUrl()}/reset-password?token=${encodeURIComponent(issued.token)}`;
    sendMailInBackground({
      to: issued.email,
      subject: "Reset your Branchline password",
      text: `Hello ${issued.name},\n\nFollow this link to choose a new password:\n\n${link}\n\nIt works once and expires in one hour. If you did not ask for it, ignore this message.`,
    });
  }
  return json({ message: "if an account has this address, a reset link is on its way" }, 202);
});
