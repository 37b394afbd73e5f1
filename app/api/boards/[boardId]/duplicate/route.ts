import { NextResponse } from "next/server";
import { duplicateBoard } from "@/db/queries/board-duplicate";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { duplicateBoardSchema } from "@/lib/validation/board";
import type { BoardParams } from "../board-response";
import { openBoard } from "@/db/queries/board-access";

/** A copy of the board to try an alternative: `{ version, name? }` → `201 { id, name }`. */
export const POST = route(async (request: Request, { params }: BoardParams) => {
  const actor = await requireApiUser("designer");
  const { boardId } = await params;
  await openBoard(actor, boardId, "edit");
  const input = duplicateBoardSchema.parse(await readJson(request));
  const copy = await duplicateBoard(actor, boardId, input);
  return NextResponse.json({ id: copy.id, name: copy.name, projectId: copy.projectId }, { status: 201 });
});
