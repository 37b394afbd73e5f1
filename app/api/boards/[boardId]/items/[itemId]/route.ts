import { changeBoardItem, removeBoardItem } from "@/db/queries/board-items";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { changeItemSchema } from "@/lib/validation/board";
import { readDeleteVersion, respondWithBoard } from "../../board-response";
import { openBoard } from "@/db/queries/board-access";

type Params = { params: Promise<{ boardId: string; itemId: string }> };

/** Move, resize or relabel: `{ version, x?, y?, width?, height?, label? }`. */
export const PATCH = route(async (request: Request, { params }: Params) => {
  const actor = await requireApiUser("designer");
  const { boardId, itemId } = await params;
  await openBoard(actor, boardId, "edit");
  const input = changeItemSchema.parse(await readJson(request));
  await changeBoardItem(actor, boardId, itemId, input);
  return respondWithBoard(actor, boardId, request);
});

/** Takes the swatch off the board, with any pairs it was in: `{ version }`. */
export const DELETE = route(async (request: Request, { params }: Params) => {
  const actor = await requireApiUser("designer");
  const { boardId, itemId } = await params;
  await openBoard(actor, boardId, "edit");
  await removeBoardItem(actor, boardId, itemId, await readDeleteVersion(request));
  return respondWithBoard(actor, boardId, request);
});
