import { eq } from "drizzle-orm";
import { adjacencies, boardItems, boards } from "@/db/schema";
import type { DuplicateBoardInput } from "@/lib/validation/board";
import { writeAudit } from "./audit";
import { openBoard } from "./board-access";
import { assertBoardVersion, runBoardWrite } from "./board-version";
import type { Actor } from "./users";

/**
 * A copy of a board to try an alternative: same room, every swatch and pair, new ids. The copy is
 * of the version the designer was looking at (a stale version gets 409); the original is
 * left exactly as it was, version included, so another tab on it carries on undisturbed.
 */
export async function duplicateBoard(actor: Actor, boardId: string, input: DuplicateBoardInput) {
  const { board, project } = await openBoard(actor, boardId, "edit");
  return runBoardWrite(async (tx) => {
    await assertBoardVersion(tx, board.id, input.version);
    const [copy] = await tx
      .insert(boards)
      .values({ projectId: board.projectId, roomId: board.roomId, name: input.name ?? `${board.name} (copy)`.slice(0, 80) })
      .returning();
    if (!copy) throw new Error("board insert returned nothing");
    const items = await tx.select().from(boardItems).where(eq(boardItems.boardId, board.id));
    const newIds = new Map(items.map((item) => [item.id, crypto.randomUUID()]));
    if (items.length) {
      await tx.insert(boardItems).values(
        items.map(({ id, createdAt: _c, ...item }) => ({ ...item, id: newIds.get(id) as string, boardId: copy.id })),
      );
    }
    const pairs = await tx.select().from(adjacencies).where(eq(adjacencies.boardId, board.id));
    if (pairs.length) {
      await tx.insert(adjacencies).values(
        pairs.map((pair) => ({
          boardId: copy.id,
          itemAId: newIds.get(pair.itemAId) as string,
          itemBId: newIds.get(pair.itemBId) as string,
          intent: pair.intent,
          accessRelevant: pair.accessRelevant,
        })),
      );
    }
    await writeAudit(
      {
        studioId: project.studioId,
        projectId: project.id,
        actorId: actor.userId,
        action: "board.duplicated",
        entityType: "board",
        entityId: copy.id,
        detail: { from: board.id, name: copy.name },
      },
      tx,
    );
    return copy;
  });
}
