import { NextResponse } from "next/server";
import { getRoomForStaff, removeRoom, updateRoom } from "@/db/queries/rooms";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { editRoomSchema } from "@/lib/validation/room";

type Context = { params: Promise<{ projectId: string; roomId: string }> };

/**
 * Renames and/or moves a room: `{ name?, position? }`, position 0 first. Answers the project's
 * rooms in their new order.
 */
export const PATCH = route(async (request: Request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { projectId, roomId } = await params;
  await getRoomForStaff(actor, projectId, roomId);
  const input = editRoomSchema.parse(await readJson(request));
  const rooms = await updateRoom(actor, projectId, roomId, input);
  return NextResponse.json({ rooms: rooms.map((r) => ({ id: r.id, name: r.name, sortOrder: r.sortOrder })) });
});

/** Removes an empty room; 409 (with what is in it) while it holds boards, decisions or fixed items. */
export const DELETE = route(async (_request: Request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { projectId, roomId } = await params;
  await removeRoom(actor, projectId, roomId);
  return new Response(null, { status: 204 });
});
