import { getBoardJson } from "@/db/queries/boards";
import { requireApiUser } from "@/lib/auth/session";
import { jsonBytesResponse, route } from "@/lib/http";
import { readCct } from "@/lib/validation/board";
import type { BoardParams } from "./board-response";

/** The board with items, pairs and checks, in daylight or under `?cct=2700|3000|4000|6504`. */
export const GET = route(async (request: Request, { params }: BoardParams) => {
  const actor = await requireApiUser();
  const { boardId } = await params;
  const cct = readCct(request);
  return jsonBytesResponse(await getBoardJson(actor, boardId, cct));
});
