import "server-only";
import type { Kysely } from "kysely";
import { AppError } from "./errors";
import { hashToken, newToken } from "./tokens";
import { clearAccountLimits } from "./sign-in-limits";
import { endAllSessions, findUserByEmail, setPassword } from "./users";
import type { Database } from "./schema";

const RESET_TOKEN_HOURS = 1;

/**
 * Issues a one-time reset token (256 random bits; only its hash is stored) for the account with this e-mail,
 * or null when there is none. Callers answer the same either way, so the endpoint does not reveal accounts.
 */
export async function issuePasswordReset(db: Kysely<Database>, email: string): Promise<{ token: string; name: string; email: string } | null> {
  const user = await findUserByEmail(db, email);
  if (!user) return null;
  const token = newToken();
  await db
    .insertInto("passwordResetTokens")
    .values({ tokenHash: hashToken(token), userId: user.id, expiresAt: new Date(Date.now() + RESET_TOKEN_HOURS * 3600_000) })
    .execute();
  return { token, name: user.name, email: user.email };
}

/** Sets a new password with a reset token; the token works once and expires. */
export async function completePasswordReset(db: Kysely<Database>, token: string, password: string): Promise<void> {
  await db.transaction().execute(async (trx) => {
    const row = await trx
      .updateTable("passwordResetTokens")
      .set({ usedAt: new Date() })
      .where("tokenHash", "=", hashToken(token))
      .where("usedAt", "is", null)
      .where("expiresAt", ">", new Date())
      .returning("userId")
      .executeTakeFirst();
    if (!row) {
      throw new AppError("unprocessable", "this reset link is invalid, used or expired; ask for a new one", [
        { path: "token", message: "invalid or expired" },
      ]);
    }
    await setPassword(trx, row.userId, password);
    // Every session signed in with the old password ends (whoever knew it is out); other outstanding links die
    // with this one; the failures against the account are forgiven, or its owner would still be held back.
    await endAllSessions(trx, row.userId);
    await trx.deleteFrom("passwordResetTokens").where("userId", "=", row.userId).where("usedAt", "is", null).execute();
    const user = await trx.selectFrom("users").select("email").where("id", "=", row.userId).executeTakeFirstOrThrow();
    await clearAccountLimits(trx, user.email);
  });
}
