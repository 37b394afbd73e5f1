import "server-only";
import { env } from "@/lib/env";
import { createMailer } from "./transport";

/** Sends through SMTP_URL: the local catcher in development and tests, a real server in production. */
export async function sendMail(message: { to: string | string[]; subject: string; text: string; html?: string }) {
  await createMailer({ smtpUrl: env.SMTP_URL, from: env.MAIL_FROM }).send(message);
}

/** Absolute links in e-mails: APP_URL when set, else the address the request came in on. */
export function appUrl(path: string, origin?: string) {
  const base = env.APP_URL ?? origin ?? "http://localhost:3000";
  return new URL(path, base).toString();
}
