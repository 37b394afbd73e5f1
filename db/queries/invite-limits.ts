import { eq, inArray } from "drizzle-orm";
import { signInThrottle } from "@/db/schema";
import { HttpError } from "@/lib/http";
import type { Tx } from "./serial-write";

/**
 * How many project invitations may go out in a day: per studio (a busy studio invites a handful of
 * clients and suppliers a week), and per invited address across every studio (so Mottle's own
 * invitation e-mail, with a project name of the sender's choosing, can't be used to flood anyone).
 * Counted in `sign_in_throttle` rows under their own key prefix, in fixed one-day windows.
 */
export const INVITE_LIMITS = { perStudio: 50, perAddress: 5, windowMs: 24 * 60 * 60 * 1000 } as const;

export const TOO_MANY_INVITATIONS = "Too many invitations today; try again tomorrow.";

export const studioInviteKey = (studioId: string) => `invite:studio:${studioId}`;
export const addressInviteKey = (email: string) => `invite:address:${email.toLowerCase()}`;

/** Refused with 429 (and how long until the window ends) when either count is used up. */
export class InviteLimitError extends HttpError {
  constructor(readonly retryAfterSeconds: number) {
    super(429, TOO_MANY_INVITATIONS);
  }
}

/**
 * Takes one invitation from the studio's and the address's allowance, inside the caller's write
 * transaction: if the invitation is then refused (already on the project), the count rolls back
 * with it. The write queue runs one transaction at a time, so read-then-write cannot race.
 */
export async function takeInviteAllowance(tx: Tx, studioId: string, email: string, now = Date.now()) {
  const limits = [
    { key: studioInviteKey(studioId), max: INVITE_LIMITS.perStudio },
    { key: addressInviteKey(email), max: INVITE_LIMITS.perAddress },
  ];
  const rows = await tx.select().from(signInThrottle).where(inArray(signInThrottle.key, limits.map((l) => l.key)));
  const current = limits.map((limit) => {
    const row = rows.find((r) => r.key === limit.key);
    const live = row && now - row.windowStartedAt.getTime() < INVITE_LIMITS.windowMs;
    return { ...limit, count: live ? row.failures : 0, startedAt: live ? row.windowStartedAt.getTime() : now, exists: Boolean(row) };
  });
  const full = current.filter((c) => c.count >= c.max);
  if (full.length) {
    const endsAt = Math.max(...full.map((c) => c.startedAt + INVITE_LIMITS.windowMs));
    throw new InviteLimitError(Math.max(1, Math.ceil((endsAt - now) / 1000)));
  }
  for (const c of current) {
    const values = { failures: c.count + 1, windowStartedAt: new Date(c.startedAt) };
    if (c.exists) await tx.update(signInThrottle).set(values).where(eq(signInThrottle.key, c.key));
    else await tx.insert(signInThrottle).values({ key: c.key, ...values });
  }
}
