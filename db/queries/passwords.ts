import bcrypt from "bcryptjs";
import { addToCount, clearCount, readCount, secondsLeft, takeFromCount } from "./throttle";
import { getUserByEmail } from "./users";

// A real hash of a random string: comparing against it costs what a real check costs,
// so an unknown e-mail takes as long to refuse as a wrong password.
const DECOY_HASH = bcrypt.hashSync(`decoy-${crypto.randomUUID()}`, 11);

/**
 * Password sign-in limits.
 *
 * Per account, a soft delay and never a lock-out: after 3 failed tries in 15 minutes each further
 * try waits 0.5 s, then 1 s, 2 s, 4 s (the most). Anyone can type someone else's e-mail, so a
 * lock-out would let anyone keep a person out; a delay only slows guessing, and the right
 * password still signs in. A right password clears the account's count.
 *
 * Per network address, a hard limit: 10 failed tries in 15 minutes, then every try from that
 * address is refused (429) until the window ends, without checking the password. That is what
 * stops guessing (one address gets 40 guesses an hour, whichever accounts it spreads them over).
 * So that a stranger on the same address (an office, a café) cannot lock out the people there,
 * the limit does not apply to an account on a browser that has signed in to that very account
 * before (a signed "known device" cookie, lib/auth/known-device.ts; OWASP's "device cookies"
 * idea, from its Authentication Cheat Sheet). Those tries still count, and still get the delay.
 *
 * Every try counts before its password is checked, so tries sent together see each other.
 */
export const ACCOUNT_DELAY = { prefix: "pw-account:", freeTries: 3, firstMs: 500, maxMs: 4000, windowMs: 15 * 60_000 } as const;
export const ADDRESS_LIMIT = { prefix: "pw-address:", limit: 10, windowMs: 15 * 60_000 } as const;

/** How long a try waits after `failures` earlier failures on the same account. */
export function accountDelayMs(failures: number): number {
  const over = failures - ACCOUNT_DELAY.freeTries;
  if (over < 0) return 0;
  return Math.min(ACCOUNT_DELAY.maxMs, ACCOUNT_DELAY.firstMs * 2 ** over);
}

export type PasswordOutcome =
  | { kind: "signed-in"; user: { id: string; email: string; name: string | null } }
  | { kind: "refused" }
  | { kind: "throttled"; retryAfterSeconds: number };

type Caller = { address: string; knownDevice: boolean };
const pause = (ms: number) => new Promise<void>((resolve) => setTimeout(resolve, ms));

/** Seconds until the address may try again, or 0 when it may try now (a known device always may). */
export async function addressWait(caller: Caller, now = Date.now()): Promise<number> {
  if (caller.knownDevice) return 0;
  const window = await readCount(ADDRESS_LIMIT.prefix + caller.address, ADDRESS_LIMIT.windowMs, now);
  return window.count >= ADDRESS_LIMIT.limit ? secondsLeft(window, ADDRESS_LIMIT.windowMs, now) : 0;
}

/** Checks a password under the limits above. Unknown e-mails and wrong passwords get the same answer after the same work. */
export async function checkPassword(email: string, password: string, caller: Caller, wait = pause): Promise<PasswordOutcome> {
  const accountKey = ACCOUNT_DELAY.prefix + email;
  const addressKey = ADDRESS_LIMIT.prefix + caller.address;
  const refusedFor = await addressWait(caller);
  if (refusedFor > 0) return { kind: "throttled", retryAfterSeconds: refusedFor };
  const [account, address] = await Promise.all([
    addToCount(accountKey, ACCOUNT_DELAY.windowMs),
    addToCount(addressKey, ADDRESS_LIMIT.windowMs),
  ]);
  if (!caller.knownDevice && address.count > ADDRESS_LIMIT.limit) {
    // Tries that raced past the check above.
    return { kind: "throttled", retryAfterSeconds: secondsLeft(address, ADDRESS_LIMIT.windowMs) };
  }
  await wait(accountDelayMs(account.count - 1));
  const user = await getUserByEmail(email);
  const ok = await bcrypt.compare(password, user?.passwordHash ?? DECOY_HASH);
  if (!user || !user.passwordHash || !ok) return { kind: "refused" };
  await Promise.all([clearCount(accountKey), takeFromCount(addressKey)]);
  return { kind: "signed-in", user: { id: user.id, email: user.email, name: user.name } };
}
