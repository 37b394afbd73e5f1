import "server-only";
import { env, publicOrigin } from "@/lib/env";
import { createMailer } from "./transport";

/** Sends through SMTP_URL: the local catcher in development and tests, a real server in production. */
export async function sendMail(message: { to: string | string[]; subject: string; text: string; html?: string }) {
  await createMailer({ smtpUrl: env.SMTP_URL, from: env.MAIL_FROM }).send(message);
}

/** Absolute links in e-mails, always on the configured public origin (lib/env.ts), whatever the request said. */
export function appUrl(path: string) {
  return new URL(path, publicOrigin).toString();
}

/** A link someone else built (Auth.js's sign-in link), moved onto the public origin: only its path and query are kept. */
export function onPublicOrigin(url: string) {
  const { pathname, search } = new URL(url);
  return appUrl(pathname + search);
}
