import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import EmailProvider from "next-auth/providers/email";
import { z } from "zod";
import { branchlineAuthAdapter } from "../db/auth-adapter";
import { getDb } from "../db";
import { recordSignInAttempt, signInBlocked, SIGN_IN_WINDOW_MINUTES } from "../db/sign-in-limits";
import { findUserByEmail, passwordMatches } from "../db/users";
import { mailFrom, sendMail, smtpUrl } from "./mailer";

const credentialsSchema = z.object({ email: z.string().email(), password: z.string().min(1).max(200) });

export const RATE_LIMITED_MESSAGE = `too many failed sign-ins; wait ${SIGN_IN_WINDOW_MINUTES} minutes or reset your password`;

/** The client's address as the proxy in front of us reports it; "unknown" when there is none. */
export function clientAddress(headers: Headers | Record<string, string | string[] | undefined> | undefined): string {
  const get = (name: string) =>
    headers instanceof Headers ? headers.get(name) : [headers?.[name]].flat()[0] ?? null;
  return get("x-forwarded-for")?.split(",")[0].trim() || get("x-real-ip") || "unknown";
}

export const authOptions: NextAuthOptions = {
  adapter: branchlineAuthAdapter(getDb()),
  session: { strategy: "jwt", maxAge: 30 * 24 * 3600 },
  pages: { signIn: "/sign-in", verifyRequest: "/sign-in/check-email", error: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(credentials, req) {
        const parsed = credentialsSchema.safeParse(credentials);
        if (!parsed.success) return null;
        const db = getDb();
        const { email, password } = parsed.data;
        const address = clientAddress(req?.headers);
        if (await signInBlocked(db, email, address)) throw new Error(RATE_LIMITED_MESSAGE);
        const user = await findUserByEmail(db, email);
        const ok = user !== undefined && (await passwordMatches(user, password));
        await recordSignInAttempt(db, email, address, ok);
        return ok ? { id: user.id, email: user.email, name: user.name } : null;
      },
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
    async jwt({ token, user }) {
      if (user) token.sub = user.id;
      return token;
    },
    async session({ session, token }) {
      if (session.user && token.sub) (session.user as { id?: string }).id = token.sub;
      return session;
    },
  },
};
