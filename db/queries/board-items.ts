import { and, count, eq, max } from "drizzle-orm";
import { adjacencies, boardItems, finishes } from "@/db/schema";
import { HttpError } from "@/lib/http";
import type { AddItemInput, ChangeItemInput, ReorderItemsInput } from "@/lib/validation/board";
import { itemRectSchema } from "@/lib/validation/board";
import { openBoard } from "./board-access";
import { auditBoardEdit } from "./board-audit";
import { claimBoardVersion, runBoardWrite, type Tx } from "./board-version";
import type { Actor } from "./users";

/** Past this a board is a library, not a sample board; the bench measures 60. */
export const MAX_ITEMS = 120;

const FINISH_REFUSED = "Choose a finish from your studio's library.";

async function findItem(tx: Tx, boardId: string, itemId: string) {
  const [item] = await tx.select().from(boardItems).where(and(eq(boardItems.id, itemId), eq(boardItems.boardId, boardId))).limit(1);
  if (!item) throw new HttpError(404, "That swatch is no longer on this board.");
  return item;
}

/**
 * Places a finish on the board. A finish of another studio answers exactly as a missing one
 * does (400), so nobody can probe another studio's library by id.
 */
export async function addBoardItem(actor: Actor, boardId: string, input: AddItemInput) {
  const { board, project } = await openBoard(actor, boardId, "edit");
  return runBoardWrite(async (tx) => {
    await claimBoardVersion(tx, board.id, input.version);
    const [finish] = await tx
      .select({ id: finishes.id, archivedAt: finishes.archivedAt, name: finishes.name })
      .from(finishes)
      .where(and(eq(finishes.id, input.finishId), eq(finishes.studioId, project.studioId)))
      .limit(1);
    if (!finish) throw new HttpError(400, FINISH_REFUSED, { finishId: [FINISH_REFUSED] });
    if (finish.archivedAt) {
      throw new HttpError(400, "That finish is archived; choose a current one.", { finishId: ["That finish is archived; choose a current one."] });
    }
    const [stats] = await tx
      .select({ n: count(), top: max(boardItems.sortOrder) })
      .from(boardItems)
      .where(eq(boardItems.boardId, board.id));
    if ((stats?.n ?? 0) >= MAX_ITEMS) throw new HttpError(400, `A board holds at most ${MAX_ITEMS} swatches. Start another board for the rest.`);
    const [item] = await tx
      .insert(boardItems)
      .values({
        boardId: board.id,
        finishId: finish.id,
        label: input.label,
        x: input.x,
        y: input.y,
        width: input.width,
        height: input.height,
        sortOrder: (stats?.top ?? -1) + 1,
      })
      .returning({ id: boardItems.id });
    if (!item) throw new Error("item insert returned nothing");
    await auditBoardEdit(tx, actor, board, project, "board.item-added", { itemId: item.id, label: input.label, finish: finish.name });
    return item.id;
  });
}

/** Move, resize or relabel one swatch; the resulting rectangle must still be wholly on the canvas. */
export async function changeBoardItem(actor: Actor, boardId: string, itemId: string, input: ChangeItemInput) {
  const { board, project } = await openBoard(actor, boardId, "edit");
  await runBoardWrite(async (tx) => {
    await claimBoardVersion(tx, board.id, input.version);
    const item = await findItem(tx, board.id, itemId);
    const next = itemRectSchema.safeParse({
      x: input.x ?? item.x,
      y: input.y ?? item.y,
      width: input.width ?? item.width,
      height: input.height ?? item.height,
    });
    if (!next.success) {
      const fieldErrors: Record<string, string[]> = {};
      for (const issue of next.error.issues) (fieldErrors[issue.path.join(".") || "_"] ??= []).push(issue.message);
      throw new HttpError(400, "The swatch must sit wholly on the board (1200 × 800).", fieldErrors);
    }
    await tx
      .update(boardItems)
      .set({ ...next.data, label: input.label ?? item.label })
      .where(eq(boardItems.id, item.id));
    const changes = [
      ...(next.data.x !== item.x || next.data.y !== item.y ? ["moved"] : []),
      ...(next.data.width !== item.width || next.data.height !== item.height ? ["resized"] : []),
      ...((input.label ?? item.label) !== item.label ? ["renamed"] : []),
    ];
    await auditBoardEdit(tx, actor, board, project, "board.item-changed", { itemId: item.id, label: input.label ?? item.label, changes });
  });
}

export async function removeBoardItem(actor: Actor, boardId: string, itemId: string, version: number) {
  const { board, project } = await openBoard(actor, boardId, "edit");
  await runBoardWrite(async (tx) => {
    await claimBoardVersion(tx, board.id, version);
    const item = await findItem(tx, board.id, itemId);
    // The foreign key cascades too; saying it here keeps the intent visible and the order safe.
    await tx.delete(adjacencies).where(and(eq(adjacencies.boardId, board.id), eq(adjacencies.itemAId, item.id)));
    await tx.delete(adjacencies).where(and(eq(adjacencies.boardId, board.id), eq(adjacencies.itemBId, item.id)));
    await tx.delete(boardItems).where(eq(boardItems.id, item.id));
    await auditBoardEdit(tx, actor, board, project, "board.item-removed", { itemId: item.id, label: item.label });
  });
}

/** New stacking order, bottom first. The list must name every swatch on the board exactly once. */
export async function reorderBoardItems(actor: Actor, boardId: string, input: ReorderItemsInput) {
  const { board, project } = await openBoard(actor, boardId, "edit");
  await runBoardWrite(async (tx) => {
    await claimBoardVersion(tx, board.id, input.version);
    const current = await tx.select({ id: boardItems.id }).from(boardItems).where(eq(boardItems.boardId, board.id));
    const wanted = new Set(input.itemIds);
    if (wanted.size !== input.itemIds.length || wanted.size !== current.length || current.some((c) => !wanted.has(c.id))) {
      const message = "List every swatch on this board exactly once.";
      throw new HttpError(400, message, { itemIds: [message] });
    }
    for (const [i, id] of input.itemIds.entries()) {
      await tx.update(boardItems).set({ sortOrder: i }).where(eq(boardItems.id, id));
    }
    await auditBoardEdit(tx, actor, board, project, "board.items-reordered", { count: input.itemIds.length });
  });
}
