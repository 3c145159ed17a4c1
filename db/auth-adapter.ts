import "server-only";
import type { Kysely } from "kysely";
import type { Adapter, AdapterUser } from "next-auth/adapters";
import type { Database, User } from "./schema";
import { findUserByEmail, findUserById, normaliseEmail } from "./users";

/**
 * The part of next-auth's adapter contract that e-mail sign-in needs (sessions live in signed JWT cookies),
 * written over Branchline's own tables: verification tokens and the users they sign in or sign up.
 */
export function branchlineAuthAdapter(db: Kysely<Database>): Adapter {
  const toAdapterUser = (u: User): AdapterUser => ({ id: u.id, email: u.email, name: u.name, emailVerified: u.emailVerifiedAt });
  return {
    async createUser(user: Omit<AdapterUser, "id">) {
      const email = normaliseEmail(user.email);
      const row = await db
        .insertInto("users")
        .values({ email, name: user.name ?? email.split("@")[0], emailVerifiedAt: user.emailVerified ?? null })
        .returningAll()
        .executeTakeFirstOrThrow();
      return toAdapterUser(row);
    },
    async getUser(id) {
      const u = await findUserById(db, id);
      return u ? toAdapterUser(u) : null;
    },
    async getUserByEmail(email) {
      const u = await findUserByEmail(db, email);
      return u ? toAdapterUser(u) : null;
    },
    async getUserByAccount() {
      return null; // no third-party accounts
    },
    async updateUser(user) {
      const row = await db
        .updateTable("users")
        .set({
          ...(user.name ? { name: user.name } : {}),
          ...(user.emailVerified !== undefined ? { emailVerifiedAt: user.emailVerified } : {}),
          updatedAt: new Date(),
        })
        .where("id", "=", user.id)
        .returningAll()
        .executeTakeFirstOrThrow();
      return toAdapterUser(row);
    },
    async createVerificationToken(token) {
      await db.insertInto("verificationTokens").values({ identifier: token.identifier, token: token.token, expiresAt: token.expires }).execute();
      return token;
    },
    async useVerificationToken({ identifier, token }) {
      const row = await db
        .deleteFrom("verificationTokens")
        .where("identifier", "=", identifier)
        .where("token", "=", token)
        .returningAll()
        .executeTakeFirst();
      return row ? { identifier: row.identifier, token: row.token, expires: row.expiresAt } : null;
    },
  };
}
