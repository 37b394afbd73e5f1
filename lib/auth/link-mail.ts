import "server-only";
import { AsyncLocalStorage } from "node:async_hooks";
import { getUserByEmail } from "@/db/queries/users";
import { publicOrigin } from "@/lib/env";
import { afterResponse } from "@/lib/mail/after-response";
import { signInLinkMessage } from "@/lib/mail/messages";
import { onPublicOrigin, sendMail } from "@/lib/mail/send";
import { alreadySignedUpMessage, finishSignUpMessage } from "./sign-up-mail";

/** Why Auth.js is being asked for a sign-in link: a plain request, or the end of a sign-up. */
type Purpose = { kind: "sign-in" } | { kind: "sign-up"; created: boolean };
const purposes = new AsyncLocalStorage<Purpose>();

/** Runs `work` (which asks Auth.js for a link) so the e-mail says what the sign-up did. Only server code can set this. */
export function forSignUp<T>(created: boolean, work: () => Promise<T>): Promise<T> {
  return purposes.run({ kind: "sign-up", created }, work);
}

/**
 * Auth.js's sendVerificationRequest. It answers at once and sends after the response
 * (afterResponse): who gets an e-mail depends on whether the address has an account, and the
 * answer must not. A failed send is logged; the person sees the same page either way and can
 * ask again.
 */
export async function sendLinkAfterAnswer({ identifier, url }: { identifier: string; url: string }): Promise<void> {
  const purpose = purposes.getStore() ?? { kind: "sign-in" };
  const link = onPublicOrigin(url);
  const host = new URL(publicOrigin).host;
  await afterResponse(async () => {
    try {
      if (purpose.kind === "sign-up") {
        const message = purpose.created ? finishSignUpMessage({ url: link, host }) : alreadySignedUpMessage({ url: link, host });
        await sendMail({ to: identifier, ...message });
        return;
      }
      // Only people who have been invited or signed up get a link.
      if (!(await getUserByEmail(identifier))) return;
      await sendMail({ to: identifier, ...signInLinkMessage({ url: link, host }) });
    } catch (error) {
      console.error(`sign-in e-mail not sent: ${error instanceof Error ? error.message : String(error)}`);
    }
  });
}
