import { and, eq, sql } from "drizzle-orm";
import { boards } from "@/db/schema";
import { conflict } from "@/lib/http";
import { writeTransaction, type Tx } from "./serial-write";

export type { Tx };

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

/**
 * Board writes queue with every other write of this process (serial-write.ts): a second write
 * transaction started while one is still awaiting would block the event loop on SQLite's lock
 * and both would stall until SQLITE_BUSY. One queue for all writes, so a board write and a
 * decision write can't collide either.
 */
export const runBoardWrite = writeTransaction;
