import { addToCount, readCount, secondsLeft } from "@/db/queries/throttle";
import { TooManyRequests, waitWords } from "./too-many";

/**
 * How many e-mails Mottle sends on a stranger's say-so. Each rule is a counter in a fixed window
 * (db/queries/throttle.ts); a request is refused before it counts, so waiting always helps.
 *
 * - Any one e-mail address gets at most 5 messages (sign-in links and sign-up notices together)
 *   in 15 minutes: enough for someone who keeps missing the e-mail, too few to flood an inbox.
 * - Any one network address may ask for 20 sign-in links in 15 minutes: an office behind one
 *   address still signs in, a script walking a list of e-mails does not get far.
 * - Any one network address may start 5 studios in an hour.
 *
 * The answer is the same whether or not the e-mail has an account, so a limit says nothing about
 * accounts. The catch, accepted: someone who floods one person's address can hold back that
 * person's links for up to 15 minutes (a password, if they have one, still works).
 */
export const MAIL_TO = { prefix: "mail-to:", limit: 5, windowMs: 15 * 60_000 } as const;
export const LINK_FROM = { prefix: "link-from:", limit: 20, windowMs: 15 * 60_000 } as const;
export const SIGN_UP_FROM = { prefix: "sign-up-from:", limit: 5, windowMs: 60 * 60_000 } as const;

type Rule = { prefix: string; limit: number; windowMs: number };

/** Counts one request against every rule, or throws TooManyRequests (counting nothing) if any is used up. */
async function takeOne(rules: [Rule, string][], message: (wait: string) => string, now = Date.now()) {
  let wait = 0;
  for (const [rule, subject] of rules) {
    const window = await readCount(rule.prefix + subject, rule.windowMs, now);
    if (window.count >= rule.limit) wait = Math.max(wait, secondsLeft(window, rule.windowMs, now));
  }
  if (wait > 0) throw new TooManyRequests(message(waitWords(wait)), wait);
  await Promise.all(rules.map(([rule, subject]) => addToCount(rule.prefix + subject, rule.windowMs, now)));
}

/** Before sending a sign-in link to `email` for a caller at `address`. */
export function allowSignInLink(email: string, address: string, now?: number) {
  return takeOne(
    [
      [MAIL_TO, email],
      [LINK_FROM, address],
    ],
    (wait) => `Too many sign-in links were asked for. Wait ${wait} and try again, or sign in with your password.`,
    now,
  );
}

/** Before a sign-up for `email` from a caller at `address` (it sends that address an e-mail). */
export function allowSignUp(email: string, address: string, now?: number) {
  return takeOne(
    [
      [MAIL_TO, email],
      [SIGN_UP_FROM, address],
    ],
    (wait) => `Too many attempts to start a studio. Wait ${wait} and try again.`,
    now,
  );
}
