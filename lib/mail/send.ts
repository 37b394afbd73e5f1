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
