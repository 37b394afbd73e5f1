import { NextResponse } from "next/server";
import { getProjectForStaff } from "@/db/queries/projects";
import { addRoom } from "@/db/queries/rooms";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { addRoomSchema } from "@/lib/validation/room";

type Context = { params: Promise<{ projectId: string }> };

/** Adds a room at the end of the project's list: `{ name }`. */
export const POST = route(async (request: Request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { projectId } = await params;
  await getProjectForStaff(actor, projectId);
  const input = addRoomSchema.parse(await readJson(request));
  const room = await addRoom(actor, projectId, input.name);
  return NextResponse.json({ id: room.id, name: room.name, sortOrder: room.sortOrder }, { status: 201 });
});
