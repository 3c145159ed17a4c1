import { getDb } from "@/db";
import { createUserIfNew, findUserByEmail } from "@/db/users";
import { signUpSchema } from "@/contracts/requests";
import { json, readJson, route } from "@/lib/http";
import { appUrl, sendMailInBackground } from "@/lib/mailer";

/** The one answer to every valid sign-up, so that it does not tell whether the address already has an account. */
const SIGN_UP_ANSWER = { message: "signed up: sign in with this address and password" };

/**
 * Sign-up with e-mail and password. An address that already has an account gets the same answer, its account is
 * left as it was, and its owner gets a message saying someone tried (the sign-in that follows is held to the
 * sign-in limits like any other).
 */
export const POST = route(async (req) => {
  const input = await readJson(req, signUpSchema);
  const db = getDb();
  const created = await createUserIfNew(db, input);
  if (!created) {
    const existing = await findUserByEmail(db, input.email);
    if (existing) {
      sendMailInBackground({
        to: existing.email,
        subject: "Someone tried to sign up with your address",
        text:
          `Hello ${existing.name},\n\nSomeone — perhaps you — tried to make a new Branchline account with this address, which already has one. ` +
          `Nothing was changed.\n\nSign in: ${appUrl()}/sign-in\nForgot your password? Choose a new one: ${appUrl()}/reset-password\n\n` +
          `If it was not you, you can ignore this message.`,
      });
    }
  }
  return json(SIGN_UP_ANSWER, 201);
});
