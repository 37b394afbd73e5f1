import "server-only";
import { DrizzleAdapter } from "@auth/drizzle-adapter";
import NextAuth, { CredentialsSignin } from "next-auth";
import { cookies } from "next/headers";
import Credentials from "next-auth/providers/credentials";
import Nodemailer from "next-auth/providers/nodemailer";
import { db } from "@/db";
import { accounts, sessions, users, verificationTokens } from "@/db/schema";
import { checkPassword } from "@/db/queries/passwords";
import { currentSessionVersion, endSessionsSealedWith } from "@/db/queries/sessions";
import { getActor } from "@/db/queries/users";
import { env } from "@/lib/env";
import { safeCallback } from "@/lib/auth/callback";
import { callerOf } from "@/lib/auth/caller";
import { sendLinkAfterAnswer } from "@/lib/auth/link-mail";
import { createSessionMemo, sessionToken, type SessionClaims } from "@/lib/auth/session-memo";
import { signInSchema } from "@/lib/validation/auth";

/** Too many failed attempts: the same answer whatever the e-mail, so it says nothing about accounts. */
class SignInThrottled extends CredentialsSignin {
  code = "throttled";
  constructor(readonly retryAfterSeconds: number) {
    super();
  }
}

declare module "next-auth" {
  interface Session {
    /** The session version this cookie was sealed with (db/queries/sessions.ts). */
    sessionVersion?: number;
  }
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
        const outcome = await checkPassword(parsed.data.email, parsed.data.password, callerOf(request.headers, parsed.data.email));
        if (outcome.kind === "throttled") throw new SignInThrottled(outcome.retryAfterSeconds);
        return outcome.kind === "signed-in" ? outcome.user : null;
      },
    }),
    Nodemailer({
      server: env.SMTP_URL,
      from: env.MAIL_FROM,
      maxAge: 24 * 60 * 60,
      // Only people who have been invited or signed up get a link, sent after the answer so known
      // and unknown addresses answer alike; the link is moved onto the public origin (lib/env.ts).
      sendVerificationRequest: sendLinkAfterAnswer,
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
    // Seals the person's session version into the cookie at sign-in; afterwards a cookie whose
    // version is no longer the person's (or that has none) is over, and Auth.js clears it.
    async jwt({ token, user }) {
      if (user?.id) {
        const version = await currentSessionVersion(user.id);
        return version === null ? null : { ...token, sessionVersion: version };
      }
      const actor = token.sub ? await getActor(token.sub) : null;
      return actor && token.sessionVersion === actor.sessionVersion ? token : null;
    },
    async session({ session, token }) {
      if (token.sub) session.user.id = token.sub;
      if (typeof token.sessionVersion === "number") session.sessionVersion = token.sessionVersion;
      return session;
    },
  },
  events: {
    // Auth.js's own sign-out endpoint: ends the person's sessions everywhere, as the sign-out action does.
    async signOut(message) {
      const token = "token" in message ? message.token : null;
      if (token?.sub && typeof token.sessionVersion === "number") await endSessionsSealedWith(token.sub, token.sessionVersion);
    },
  },
});

async function readClaims(): Promise<SessionClaims | null> {
  const session = await auth();
  const userId = session?.user?.id;
  const sessionVersion = session?.sessionVersion;
  return userId && typeof sessionVersion === "number" ? { userId, sessionVersion } : null;
}

const globalMemo = globalThis as unknown as { mottleSessionMemo?: ReturnType<typeof createSessionMemo> };
const sessionMemo = (globalMemo.mottleSessionMemo ??= createSessionMemo(readClaims));

/**
 * Who the session cookie says is signed in, and the session version it was sealed with; null
 * without a valid cookie. Not the verdict: currentActor (session.ts) also checks the version is
 * still the person's. See session-memo.ts.
 */
export async function sessionClaims(): Promise<SessionClaims | null> {
  return sessionMemo(sessionToken((await cookies()).getAll()));
}
