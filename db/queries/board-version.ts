import { and, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { boards } from "@/db/schema";
import { conflict } from "@/lib/http";

export type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0];

export const STALE_BOARD =
  "This board was changed in another tab or by someone else since you opened it. We have loaded the latest version; make your change again.";

/**
 * The first statement of every board write: bump the version only if it is still the one the
 * writer saw. Taking the write lock first means two writers based on the same version can never
 * both succeed; the loser gets 409 and nothing of theirs is saved.
 */
export async function claimBoardVersion(tx: Tx, boardId: string, version: number): Promise<number> {
  const [row] = await tx
    .update(boards)
    .set({ version: sql`${boards.version} + 1`, updatedAt: new Date() })
    .where(and(eq(boards.id, boardId), eq(boards.version, version)))
    .returning({ version: boards.version });
  if (!row) throw conflict(STALE_BOARD);
  return row.version;
}

/** For writes that copy a board without changing it: the version must match, but is not bumped. */
export async function assertBoardVersion(tx: Tx, boardId: string, version: number): Promise<void> {
  const [row] = await tx.select({ version: boards.version }).from(boards).where(eq(boards.id, boardId)).limit(1);
  if (!row || row.version !== version) throw conflict(STALE_BOARD);
}

// libSQL's embedded driver is synchronous: a second write transaction in this process waits for
// the lock on the event loop's own thread, so the first can never finish and both stall until the
// busy timeout (then SQLITE_BUSY, a 500). Board writes therefore queue here, one at a time per
// process; between processes SQLite's own lock and busy timeout do the job.
const globalQueue = globalThis as unknown as { mottleBoardWrites?: Promise<unknown> };

/** One board write transaction, after any other board write of this process has finished. */
export function runBoardWrite<T>(work: (tx: Tx) => Promise<T>): Promise<T> {
  const previous = globalQueue.mottleBoardWrites ?? Promise.resolve();
  const next = previous.catch(() => undefined).then(() => db.transaction(work));
  globalQueue.mottleBoardWrites = next.catch(() => undefined);
  return next;
}
