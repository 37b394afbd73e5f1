import { addBoardPair } from "@/db/queries/board-pairs";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { addPairSchema } from "@/lib/validation/board";
import { respondWithBoard, type BoardParams } from "../board-response";
import { openBoard } from "@/db/queries/board-access";

/** Marks two swatches that meet: `{ version, itemAId, itemBId, intent, accessRelevant }`. */
export const POST = route(async (request: Request, { params }: BoardParams) => {
  const actor = await requireApiUser("designer");
  const { boardId } = await params;
  await openBoard(actor, boardId, "edit");
  const input = addPairSchema.parse(await readJson(request));
  const pairId = await addBoardPair(actor, boardId, input);
  return respondWithBoard(actor, boardId, request, 201, pairId);
});
