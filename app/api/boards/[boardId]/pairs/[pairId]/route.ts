import { changeBoardPair, removeBoardPair } from "@/db/queries/board-pairs";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { changePairSchema } from "@/lib/validation/board";
import { readDeleteVersion, respondWithBoard } from "../../board-response";
import { openBoard } from "@/db/queries/board-access";

type Params = { params: Promise<{ boardId: string; pairId: string }> };

/** Changes what a meeting is meant to be: `{ version, intent?, accessRelevant? }`. */
export const PATCH = route(async (request: Request, { params }: Params) => {
  const actor = await requireApiUser("designer");
  const { boardId, pairId } = await params;
  await openBoard(actor, boardId, "edit");
  const input = changePairSchema.parse(await readJson(request));
  await changeBoardPair(actor, boardId, pairId, input);
  return respondWithBoard(actor, boardId, request);
});

export const DELETE = route(async (request: Request, { params }: Params) => {
  const actor = await requireApiUser("designer");
  const { boardId, pairId } = await params;
  await openBoard(actor, boardId, "edit");
  await removeBoardPair(actor, boardId, pairId, await readDeleteVersion(request));
  return respondWithBoard(actor, boardId, request);
});
