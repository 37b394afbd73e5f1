import { asc, eq, inArray } from "drizzle-orm";
import { db } from "@/db";
import { adjacencies, boardItems, finishes } from "@/db/schema";
import { imageUrl } from "@/lib/uploads/urls";
import type { ItemRow } from "@/lib/boards/view";
import type { BoardPairView } from "@/lib/boards/types";

/** Items of these boards with their finishes, in stacking order. */
export async function readItemRows(boardIds: string[]): Promise<(ItemRow & { boardId: string })[]> {
  if (boardIds.length === 0) return [];
  const rows = await db
    .select({
      boardId: boardItems.boardId,
      id: boardItems.id,
      label: boardItems.label,
      x: boardItems.x,
      y: boardItems.y,
      width: boardItems.width,
      height: boardItems.height,
      sortOrder: boardItems.sortOrder,
      finishId: finishes.id,
      finishName: finishes.name,
      category: finishes.category,
      productCode: finishes.productCode,
      surface: finishes.surface,
      labL: finishes.labL,
      labA: finishes.labA,
      labB: finishes.labB,
      lrv: finishes.lrv,
      lrvSource: finishes.lrvSource,
      imageId: finishes.imageId,
      cautions: finishes.cautions,
      archivedAt: finishes.archivedAt,
    })
    .from(boardItems)
    .innerJoin(finishes, eq(finishes.id, boardItems.finishId))
    .where(inArray(boardItems.boardId, boardIds))
    .orderBy(asc(boardItems.sortOrder), asc(boardItems.id));
  return rows.map(({ imageId, archivedAt, ...row }) => ({
    ...row,
    // The library's authenticated photo route; clients may see photos of finishes on their boards.
    imageUrl: imageId ? imageUrl(imageId, "400") : null,
    archived: archivedAt !== null,
  }));
}

export async function readPairRows(boardIds: string[]): Promise<(BoardPairView & { boardId: string })[]> {
  if (boardIds.length === 0) return [];
  return db
    .select({
      boardId: adjacencies.boardId,
      id: adjacencies.id,
      itemAId: adjacencies.itemAId,
      itemBId: adjacencies.itemBId,
      intent: adjacencies.intent,
      accessRelevant: adjacencies.accessRelevant,
    })
    .from(adjacencies)
    .where(inArray(adjacencies.boardId, boardIds))
    .orderBy(asc(adjacencies.createdAt), asc(adjacencies.id));
}
