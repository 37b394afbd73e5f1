import { db } from "@/db";
import { markWritten } from "./read-cache";

export type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0];

const globalQueue = globalThis as unknown as { mottleWriteQueue?: Promise<unknown> };

/**
 * A write transaction that waits for this process's earlier ones to finish first.
 *
 * Why: on an embedded SQLite file each libSQL transaction holds its own connection, and SQLite
 * allows one writer. A second BEGIN IMMEDIATE while the first is still awaiting would wait for the
 * lock *synchronously* (blocking the event loop the first one needs to finish) and then fail with
 * SQLITE_BUSY. Queuing in-process turns fifty concurrent approvals into fifty quick turns, each
 * seeing the state the previous one left — exactly one wins, the rest answer 409.
 * Every transaction, committed or not, makes cached reads stale (read-cache.ts) before its caller
 * hears the outcome. The queue lives on globalThis so route handlers and pages bundled apart share it.
 */
export function writeTransaction<T>(work: (tx: Tx) => Promise<T>): Promise<T> {
  const previous = globalQueue.mottleWriteQueue ?? Promise.resolve();
  const transaction = () => db.transaction(work).finally(markWritten);
  const run = previous.then(transaction, transaction);
  // The next writer waits for this one to settle, whatever its outcome.
  globalQueue.mottleWriteQueue = run.catch(() => undefined);
  return run;
}
