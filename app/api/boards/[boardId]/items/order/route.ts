import { reorderBoardItems } from "@/db/queries/board-items";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { reorderItemsSchema } from "@/lib/validation/board";
import { respondWithBoard, type BoardParams } from "../../board-response";
import { openBoard } from "@/db/queries/board-access";

/** New stacking order, bottom first: `{ version, itemIds }` naming every swatch once. */
export const POST = route(async (request: Request, { params }: BoardParams) => {
  const actor = await requireApiUser("designer");
  const { boardId } = await params;
  await openBoard(actor, boardId, "edit");
  const input = reorderItemsSchema.parse(await readJson(request));
  await reorderBoardItems(actor, boardId, input);
  return respondWithBoard(actor, boardId, request);
});
