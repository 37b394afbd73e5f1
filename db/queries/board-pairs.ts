import { and, eq, inArray } from "drizzle-orm";
import { adjacencies, boardItems } from "@/db/schema";
import { pairKey } from "@/lib/boards/proposed-pairs";
import { conflict, HttpError } from "@/lib/http";
import type { AddPairInput, ChangePairInput } from "@/lib/validation/board";
import { openBoard } from "./board-access";
import { auditBoardEdit } from "./board-audit";
import { claimBoardVersion, runBoardWrite, type Tx } from "./board-version";
import type { Actor } from "./users";

export const MAX_PAIRS = 300;

async function findPair(tx: Tx, boardId: string, pairId: string) {
  const [pair] = await tx.select().from(adjacencies).where(and(eq(adjacencies.id, pairId), eq(adjacencies.boardId, boardId))).limit(1);
  if (!pair) throw new HttpError(404, "That pair is no longer on this board.");
  return pair;
}

/** Two swatches of this board that meet. Both must be on this board: a pair never spans two. */
export async function addBoardPair(actor: Actor, boardId: string, input: AddPairInput) {
  const { board, project } = await openBoard(actor, boardId, "edit");
  return runBoardWrite(async (tx) => {
    await claimBoardVersion(tx, board.id, input.version);
    const found = await tx
      .select({ id: boardItems.id })
      .from(boardItems)
      .where(and(eq(boardItems.boardId, board.id), inArray(boardItems.id, [input.itemAId, input.itemBId])));
    const here = new Set(found.map((f) => f.id));
    const fieldErrors: Record<string, string[]> = {};
    if (!here.has(input.itemAId)) fieldErrors.itemAId = ["Choose a swatch on this board."];
    if (!here.has(input.itemBId)) fieldErrors.itemBId = ["Choose a swatch on this board."];
    if (Object.keys(fieldErrors).length) throw new HttpError(400, "A pair joins two swatches on the same board.", fieldErrors);
    const existing = await tx.select().from(adjacencies).where(eq(adjacencies.boardId, board.id));
    const key = pairKey(input.itemAId, input.itemBId);
    if (existing.some((p) => pairKey(p.itemAId, p.itemBId) === key)) throw conflict("Those two swatches are already paired.");
    if (existing.length >= MAX_PAIRS) throw new HttpError(400, `A board holds at most ${MAX_PAIRS} pairs.`);
    const [pair] = await tx
      .insert(adjacencies)
      .values({ boardId: board.id, itemAId: input.itemAId, itemBId: input.itemBId, intent: input.intent, accessRelevant: input.accessRelevant })
      .returning({ id: adjacencies.id });
    if (!pair) throw new Error("pair insert returned nothing");
    await auditBoardEdit(tx, actor, board, project, "board.pair-added", { pairId: pair.id, intent: input.intent });
    return pair.id;
  });
}

export async function changeBoardPair(actor: Actor, boardId: string, pairId: string, input: ChangePairInput) {
  const { board, project } = await openBoard(actor, boardId, "edit");
  await runBoardWrite(async (tx) => {
    await claimBoardVersion(tx, board.id, input.version);
    const pair = await findPair(tx, board.id, pairId);
    await tx
      .update(adjacencies)
      .set({ intent: input.intent ?? pair.intent, accessRelevant: input.accessRelevant ?? pair.accessRelevant })
      .where(eq(adjacencies.id, pair.id));
    await auditBoardEdit(tx, actor, board, project, "board.pair-changed", { pairId: pair.id, intent: input.intent ?? pair.intent });
  });
}

export async function removeBoardPair(actor: Actor, boardId: string, pairId: string, version: number) {
  const { board, project } = await openBoard(actor, boardId, "edit");
  await runBoardWrite(async (tx) => {
    await claimBoardVersion(tx, board.id, version);
    const pair = await findPair(tx, board.id, pairId);
    await tx.delete(adjacencies).where(eq(adjacencies.id, pair.id));
    await auditBoardEdit(tx, actor, board, project, "board.pair-removed", { pairId: pair.id });
  });
}

