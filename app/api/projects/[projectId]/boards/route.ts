import { NextResponse } from "next/server";
import { createBoard, listBoards } from "@/db/queries/boards";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { createBoardSchema } from "@/lib/validation/board";
import { openProjectForBoards } from "@/db/queries/board-access";

type Params = { params: Promise<{ projectId: string }> };

/** The project's rooms, each with its boards and their verdict counts in daylight. */
export const GET = route(async (_request: Request, { params }: Params) => {
  const actor = await requireApiUser();
  const { projectId } = await params;
  return NextResponse.json(await listBoards(actor, projectId));
});

/** A new, empty board: `{ roomId, name }` → `201 { id, name, roomId, version }`. */
export const POST = route(async (request: Request, { params }: Params) => {
  const actor = await requireApiUser("designer");
  const { projectId } = await params;
  await openProjectForBoards(actor, projectId, "edit");
  const input = createBoardSchema.parse(await readJson(request));
  const board = await createBoard(actor, projectId, input);
  return NextResponse.json({ id: board.id, name: board.name, roomId: board.roomId, version: board.version }, { status: 201 });
});
