import "server-only";
import { DrizzleAdapter } from "@auth/drizzle-adapter";
import NextAuth, { CredentialsSignin } from "next-auth";
import { cookies } from "next/headers";
import Credentials from "next-auth/providers/credentials";
import Nodemailer from "next-auth/providers/nodemailer";
import { db } from "@/db";
import { accounts, sessions, users, verificationTokens } from "@/db/schema";
import { checkPassword } from "@/db/queries/passwords";
import { getUserByEmail } from "@/db/queries/users";
import { env } from "@/lib/env";
import { safeCallback } from "@/lib/auth/callback";
import { createSessionMemo, sessionToken } from "@/lib/auth/session-memo";
import { sendMail } from "@/lib/mail/send";
import { signInLinkMessage } from "@/lib/mail/messages";
import { signInSchema } from "@/lib/validation/auth";

/** Too many failed attempts: the same answer whatever the e-mail, so it says nothing about accounts. */
class SignInThrottled extends CredentialsSignin {
  code = "throttled";
}

export const { handlers, auth, signIn, signOut } = NextAuth({
  adapter: DrizzleAdapter(db, {
    usersTable: users,
    accountsTable: accounts,
    sessionsTable: sessions,
    verificationTokensTable: verificationTokens,
  }),
  // Credentials sign-in only works with JWT sessions; roles are read fresh from the database per request.
  session: { strategy: "jwt", maxAge: 30 * 24 * 60 * 60 },
  secret: env.AUTH_SECRET,
  trustHost: true,
  // __Secure- cookies in production (behind HTTPS); plain cookies for the local demo on http.
  useSecureCookies: env.MOTTLE_MODE === "production",
  // A wrong password is an everyday event, not a server error: keep it out of the error log.
  logger: {
    error(error) {
      if (error.name === "CredentialsSignin" || error.name === "SignInThrottled") return;
      console.error(error);
    },
  },
  pages: { signIn: "/sign-in", verifyRequest: "/sign-in/check-email", error: "/sign-in" },
  providers: [
    Credentials({
      credentials: { email: { type: "email" }, password: { type: "password" } },
      async authorize(raw, request) {
        const parsed = signInSchema.safeParse(raw);
        if (!parsed.success) return null;
        const address = request.headers.get("x-forwarded-for")?.split(",")[0]?.trim() ?? "local";
        const outcome = await checkPassword(parsed.data.email, parsed.data.password, address);
        if (outcome === "throttled") throw new SignInThrottled();
        return outcome === null ? null : { id: outcome.id, email: outcome.email, name: outcome.name };
      },
    }),
    Nodemailer({
      server: env.SMTP_URL,
      from: env.MAIL_FROM,
      maxAge: 24 * 60 * 60,
      async sendVerificationRequest({ identifier, url }) {
        // Only people who have been invited or signed up get a link; everyone sees the same page.
        const user = await getUserByEmail(identifier);
        if (!user) return;
        await sendMail({ to: identifier, ...signInLinkMessage({ url, host: new URL(url).host }) });
      },
    }),
  ],
  callbacks: {
    // Only ever a path on this site: no open redirects, and no switch between localhost and
    // 127.0.0.1 (which would leave the new session cookie behind on the other host name).
    redirect({ url }) {
      if (url.startsWith("/")) return safeCallback(url);
      try {
        const { pathname, search } = new URL(url);
        return safeCallback(pathname + search);
      } catch {
        return "/home";
      }
    },
    async session({ session, token }) {
      if (token.sub) session.user.id = token.sub;
      return session;
    },
  },
});

const globalMemo = globalThis as unknown as { mottleSessionMemo?: ReturnType<typeof createSessionMemo> };
const sessionMemo = (globalMemo.mottleSessionMemo ??= createSessionMemo(async () => (await auth())?.user?.id ?? null));

/** The signed-in person's id from the session cookie, or null. See session-memo.ts. */
export async function sessionUserId(): Promise<string | null> {
  return sessionMemo(sessionToken((await cookies()).getAll()));
}
