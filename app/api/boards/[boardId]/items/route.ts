import { addBoardItem } from "@/db/queries/board-items";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { addItemSchema } from "@/lib/validation/board";
import { respondWithBoard, type BoardParams } from "../board-response";
import { openBoard } from "@/db/queries/board-access";

/** Places a finish on the board: `{ version, finishId, label, x, y, width, height }`. */
export const POST = route(async (request: Request, { params }: BoardParams) => {
  const actor = await requireApiUser("designer");
  const { boardId } = await params;
  await openBoard(actor, boardId, "edit");
  const input = addItemSchema.parse(await readJson(request));
  const itemId = await addBoardItem(actor, boardId, input);
  return respondWithBoard(actor, boardId, request, 201, itemId);
});
