import { renderEmail, type EmailContent } from "@/lib/mail/layout";

/**
 * The two e-mails a sign-up sends. Nothing the person typed (studio or name) goes into them: the
 * address is a stranger's say-so, and Mottle must not carry a stranger's words to it.
 */
export function finishSignUpMessage({ url, host }: { url: string; host: string }): EmailContent {
  return renderEmail({
    subject: "Finish starting your studio on Mottle",
    heading: "One step left",
    paragraphs: [
      `A studio was started on Mottle at ${host} with this e-mail address. Use the button below to sign in and finish. The link works once, for 24 hours.`,
    ],
    action: { label: "Sign in and finish", url },
    footnote: "If this wasn’t you, you can ignore this e-mail.",
  });
}

export function alreadySignedUpMessage({ url, host }: { url: string; host: string }): EmailContent {
  return renderEmail({
    subject: "Someone tried to start a studio with your e-mail address",
    heading: "You already have a Mottle account",
    paragraphs: [
      `Someone tried to start a new studio on Mottle at ${host} with this e-mail address. It already has an account, so nothing was changed.`,
      "If it was you, use the button below to sign in. The link works once, for 24 hours.",
    ],
    action: { label: "Sign in", url },
    footnote: "If this wasn’t you, you can ignore this e-mail. Nobody can sign in without the link or your password.",
  });
}
