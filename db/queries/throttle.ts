import { eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { signInThrottle } from "@/db/schema";
import { writeTransaction } from "./serial-write";

/**
 * Counters in fixed windows, one row per key in `sign_in_throttle` (kept in the database, so a
 * restart forgets nothing). Keys carry a prefix naming what they count (see lib/auth/limits.ts and
 * passwords.ts). Reads answer from the row alone; every count goes through the write queue
 * (serial-write.ts), so it never waits on the SQLite lock while a transaction is open.
 */
export type Window = { count: number; startedAt: number };

/** The key's count in its current window; a window that has ended counts as empty. */
export async function readCount(key: string, windowMs: number, now = Date.now()): Promise<Window> {
  const row = await db.query.signInThrottle.findFirst({ where: eq(signInThrottle.key, key) });
  if (!row || now - row.windowStartedAt.getTime() >= windowMs) return { count: 0, startedAt: now };
  return { count: row.failures, startedAt: row.windowStartedAt.getTime() };
}

/** Adds one to the key's count (starting a new window if the last one ended) and returns the new count. */
export async function addToCount(key: string, windowMs: number, now = Date.now()): Promise<Window> {
  const cutoff = now - windowMs;
  const expired = sql`${signInThrottle.windowStartedAt} <= ${cutoff}`;
  // One statement, so two hits arriving together both count.
  const [row] = await writeTransaction((tx) =>
    tx
      .insert(signInThrottle)
      .values({ key, failures: 1, windowStartedAt: new Date(now) })
      .onConflictDoUpdate({
        target: signInThrottle.key,
        set: {
          failures: sql`CASE WHEN ${expired} THEN 1 ELSE ${signInThrottle.failures} + 1 END`,
          windowStartedAt: sql`CASE WHEN ${expired} THEN ${now} ELSE ${signInThrottle.windowStartedAt} END`,
        },
      })
      .returning(),
  );
  return row ? { count: row.failures, startedAt: row.windowStartedAt.getTime() } : { count: 1, startedAt: now };
}

/** Takes one back (an attempt that turned out not to count); never below zero. */
export async function takeFromCount(key: string) {
  await writeTransaction((tx) =>
    tx
      .update(signInThrottle)
      .set({ failures: sql`MAX(${signInThrottle.failures} - 1, 0)` })
      .where(eq(signInThrottle.key, key)),
  );
}

export async function clearCount(key: string) {
  await writeTransaction((tx) => tx.delete(signInThrottle).where(eq(signInThrottle.key, key)));
}

/** Whole seconds until a window that started at `startedAt` ends (at least 1), for Retry-After. */
export function secondsLeft(window: Window, windowMs: number, now = Date.now()): number {
  return Math.max(1, Math.ceil((window.startedAt + windowMs - now) / 1000));
}
