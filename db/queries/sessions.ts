import { and, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { users } from "@/db/schema";
import { writeTransaction, type Tx } from "./serial-write";

/**
 * Every session cookie carries the person's session version from when they signed in; each
 * request compares it with `users.session_version` (lib/auth/session.ts). Raising the number
 * ends every session sealed with an older one, on every device, at the next request.
 */

/**
 * Ends all of a person's sessions now: sign-out, removal from a studio or project, a change of
 * role. Pass `tx` to do it inside your own `writeTransaction`, so it lands (or not) with the
 * change it belongs to; the cached sign-in checks go stale when that transaction ends. Without
 * `tx` it runs a write transaction of its own.
 */
export async function endSessions(userId: string, tx?: Tx): Promise<void> {
  const bump = (t: Tx) => t.update(users).set({ sessionVersion: sql`${users.sessionVersion} + 1` }).where(eq(users.id, userId));
  if (tx) await bump(tx);
  else await writeTransaction(bump);
}

/**
 * Ends the person's sessions only if `version` is still current: signing out through Auth.js's own
 * endpoint with a cookie that is already over changes nothing.
 */
export async function endSessionsSealedWith(userId: string, version: number): Promise<void> {
  await writeTransaction((tx) =>
    tx
      .update(users)
      .set({ sessionVersion: sql`${users.sessionVersion} + 1` })
      .where(and(eq(users.id, userId), eq(users.sessionVersion, version))),
  );
}

/** The version a new session is sealed with; null for nobody. */
export async function currentSessionVersion(userId: string): Promise<number | null> {
  const row = await db.query.users.findFirst({ where: eq(users.id, userId), columns: { sessionVersion: true } });
  return row ? row.sessionVersion : null;
}
