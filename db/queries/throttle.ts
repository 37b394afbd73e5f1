import { eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { signInThrottle } from "@/db/schema";

/** Five failures per key in fifteen minutes, then wait: slows guessing without locking anyone out for long. */
export const THROTTLE_LIMIT = 5;
export const THROTTLE_WINDOW_MS = 15 * 60 * 1000;

export async function isThrottled(key: string, now = Date.now()): Promise<boolean> {
  const row = await db.query.signInThrottle.findFirst({ where: eq(signInThrottle.key, key) });
  if (!row) return false;
  if (now - row.windowStartedAt.getTime() > THROTTLE_WINDOW_MS) return false;
  return row.failures >= THROTTLE_LIMIT;
}

export async function recordFailure(key: string, now = Date.now()) {
  const windowStart = new Date(now);
  const cutoff = now - THROTTLE_WINDOW_MS;
  // One statement, so two failures arriving together both count.
  await db
    .insert(signInThrottle)
    .values({ key, failures: 1, windowStartedAt: windowStart })
    .onConflictDoUpdate({
      target: signInThrottle.key,
      set: {
        failures: sql`CASE WHEN ${signInThrottle.windowStartedAt} < ${cutoff} THEN 1 ELSE ${signInThrottle.failures} + 1 END`,
        windowStartedAt: sql`CASE WHEN ${signInThrottle.windowStartedAt} < ${cutoff} THEN ${now} ELSE ${signInThrottle.windowStartedAt} END`,
      },
    });
}

export async function clearFailures(key: string) {
  await db.delete(signInThrottle).where(eq(signInThrottle.key, key));
}
