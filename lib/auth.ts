import "server-only";
import type { NextAuthOptions } from "next-auth";
import type { JWT } from "next-auth/jwt";
import CredentialsProvider from "next-auth/providers/credentials";
import EmailProvider from "next-auth/providers/email";
import { z } from "zod";
import { branchlineAuthAdapter } from "../db/auth-adapter";
import { getDb } from "../db";
import { consumeSignInSlot, describeWait, settleSignInSlot } from "../db/sign-in-limits";
import { checkPassword, endAllSessions, findUserByEmail, sessionVersionOf } from "../db/users";
import { clientAddressFrom } from "./client-address";
import { appUrl, mailFrom, sendMail, smtpUrl } from "./mailer";

const credentialsSchema = z.object({ email: z.string().email(), password: z.string().min(1).max(200) });

/** The start of the message a sign-in gets while its back-off lasts (the rest says how long). */
export const RATE_LIMITED_MESSAGE = "too many failed sign-ins";

/** Session cookies are Secure (and __Secure- prefixed) whenever the public URL is https. */
export const useSecureCookies = () => appUrl().startsWith("https://");

/** Thrown by the jwt callback for a token issued under an older session version: next-auth then clears the cookie. */
class SessionEnded extends Error {
  constructor() {
    super("session ended");
  }
}

/** The session version a token carries; tokens from before versions existed count as version 0. */
export const tokenSessionVersion = (token: JWT) => (typeof token.sv === "number" ? token.sv : 0);

/** True while the token's account exists and has not ended its sessions since the token was issued. */
export async function sessionIsCurrent(token: JWT): Promise<boolean> {
  if (!token.sub) return false;
  const version = await sessionVersionOf(getDb(), token.sub);
  return version !== undefined && version === tokenSessionVersion(token);
}

/**
 * The password check, in this order: the attempt's slot is taken on every limiter key (atomically, in
 * PostgreSQL) before any hash is compared; then exactly one bcrypt comparison, against a dummy hash when there
 * is no such account, so known and unknown addresses take the same time.
 */
async function authorizePassword(credentials: Record<string, string> | undefined, headers: Record<string, unknown> | undefined) {
  const parsed = credentialsSchema.safeParse(credentials);
  if (!parsed.success) return null;
  const db = getDb();
  const { email, password } = parsed.data;
  const forwarded = headers?.["x-forwarded-for"];
  const address = clientAddressFrom(typeof forwarded === "string" ? forwarded : null);
  const slot = await consumeSignInSlot(db, email, address);
  if (!slot.allowed) {
    throw new Error(`${RATE_LIMITED_MESSAGE}; try again in ${describeWait(slot.retryAfterSeconds)} or reset your password`);
  }
  const user = await findUserByEmail(db, email);
  const ok = await checkPassword(user, password);
  await settleSignInSlot(db, slot, email, address, ok);
  return ok && user ? { id: user.id, email: user.email, name: user.name } : null;
}

export const authOptions: NextAuthOptions = {
  adapter: branchlineAuthAdapter(getDb()),
  session: { strategy: "jwt", maxAge: 30 * 24 * 3600 },
  get useSecureCookies() {
    return useSecureCookies();
  },
  pages: { signIn: "/sign-in", verifyRequest: "/sign-in/check-email", error: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      authorize: (credentials, req) => authorizePassword(credentials, req?.headers),
    }),
    EmailProvider({
      server: smtpUrl(),
      from: mailFrom(),
      maxAge: 24 * 3600,
      async sendVerificationRequest({ identifier, url }) {
        await sendMail({
          to: identifier,
          subject: "Your Branchline sign-in link",
          text: `Follow this link to sign in to Branchline:\n\n${url}\n\nIt works once and expires in 24 hours. If you did not ask for it, ignore this message.`,
        });
      },
    }),
  ],
  callbacks: {
    // Runs whenever a session is read (the session endpoint, getServerSession): a token from before the account's
    // latest sign-out, password reset or "sign out everywhere" ends here, and next-auth clears its cookie.
    async jwt({ token, user }) {
      if (user) {
        token.sub = user.id;
        token.sv = (await sessionVersionOf(getDb(), user.id)) ?? 0;
        return token;
      }
      if (!(await sessionIsCurrent(token))) throw new SessionEnded();
      return token;
    },
    async session({ session, token }) {
      if (session.user && token.sub) (session.user as { id?: string }).id = token.sub;
      return session;
    },
  },
  events: {
    // Signing out ends every session of the account, this one included (the cookie alone would live on elsewhere).
    async signOut({ token }) {
      if (token?.sub && (await sessionIsCurrent(token))) await endAllSessions(getDb(), token.sub);
    },
  },
  logger: {
    error(code, metadata) {
      const error = metadata instanceof Error ? metadata : (metadata as { error?: unknown } | undefined)?.error;
      if (error instanceof SessionEnded) return; // an old cookie, answered as signed out: nothing to report
      console.error(`[next-auth][error][${code}]`, metadata);
    },
    warn(code) {
      console.warn(`[next-auth][warn][${code}]`);
    },
    debug() {},
  },
};
