import { and, asc, count, eq } from "drizzle-orm";
import { db } from "@/db";
import { boards, decisions, fixedItems, rooms, type Room } from "@/db/schema";
import { conflict, HttpError, notFound } from "@/lib/http";
import type { EditRoomInput } from "@/lib/validation/room";
import { writeAudit } from "./audit";
import { getProjectForStaff } from "./projects";
import { writeTransaction, type Tx } from "./serial-write";
import type { Actor } from "./users";

export const MAX_ROOMS = 50;

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function listIn(tx: Tx, projectId: string) {
  return tx.select().from(rooms).where(eq(rooms.projectId, projectId)).orderBy(asc(rooms.sortOrder), asc(rooms.name), asc(rooms.id));
}

function refuseDuplicate(list: Room[], name: string, except?: string) {
  const taken = list.some((r) => r.id !== except && r.name.toLocaleLowerCase() === name.toLocaleLowerCase());
  if (taken) throw new HttpError(400, `There is already a room called ${name} on this project.`, { name: ["Choose a name no other room on this project has."] });
}

/** Access before the body: the project as its staff see it, and the room on it (404 otherwise). */
export async function getRoomForStaff(actor: Actor, projectId: string, roomId: string): Promise<Room> {
  const project = await getProjectForStaff(actor, projectId);
  const room = await db.query.rooms.findFirst({ where: and(eq(rooms.id, roomId), eq(rooms.projectId, project.id)) });
  if (!room) throw notFound("That room");
  return room;
}

/** A new room at the end of the project's list. */
export async function addRoom(actor: Actor, projectId: string, name: string): Promise<Room> {
  const project = await getProjectForStaff(actor, projectId);
  return writeTransaction(async (tx) => {
    const list = await listIn(tx, project.id);
    if (list.length >= MAX_ROOMS) throw conflict(`A project can have at most ${MAX_ROOMS} rooms.`);
    refuseDuplicate(list, name);
    const sortOrder = list.reduce((max, r) => Math.max(max, r.sortOrder + 1), 0);
    const [room] = await tx.insert(rooms).values({ projectId: project.id, name, sortOrder }).returning();
    if (!room) throw new Error("room insert returned nothing");
    await writeAudit({ studioId: project.studioId, projectId: project.id, actorId: actor.userId, action: "room.added", entityType: "room", entityId: room.id, detail: { title: name } }, tx);
    return room;
  });
}

/**
 * Renames a room and/or moves it to `position` in the list (0 first); the others keep their order
 * and every room is numbered 0…n−1 again. Issued revisions keep the room names they were issued with.
 */
export async function updateRoom(actor: Actor, projectId: string, roomId: string, input: EditRoomInput): Promise<Room[]> {
  const project = await getProjectForStaff(actor, projectId);
  return writeTransaction(async (tx) => {
    const list = await listIn(tx, project.id);
    const room = list.find((r) => r.id === roomId);
    if (!room) throw notFound("That room");
    const audit = (action: string, detail: Record<string, unknown>) =>
      writeAudit({ studioId: project.studioId, projectId: project.id, actorId: actor.userId, action, entityType: "room", entityId: room.id, detail }, tx);
    if (input.name !== undefined && input.name !== room.name) {
      refuseDuplicate(list, input.name, room.id);
      await tx.update(rooms).set({ name: input.name }).where(eq(rooms.id, room.id));
      await audit("room.renamed", { title: input.name, from: room.name });
    }
    const from = list.indexOf(room);
    if (input.position !== undefined && input.position !== from) {
      if (input.position >= list.length) {
        const message = `That position is past the end of the list; the last is ${list.length - 1}.`;
        throw new HttpError(400, message, { position: [message] });
      }
      const order = list.filter((r) => r.id !== room.id);
      order.splice(input.position, 0, room);
      for (const [i, r] of order.entries()) {
        if (r.sortOrder !== i) await tx.update(rooms).set({ sortOrder: i }).where(eq(rooms.id, r.id));
      }
      await audit("room.moved", { title: input.name ?? room.name, from, to: input.position });
    }
    return listIn(tx, project.id);
  });
}

/** What still sits in a room, in plain words, or null when it is empty. */
async function roomContents(tx: Tx, projectId: string, roomId: string): Promise<string | null> {
  const counted = async (table: typeof boards | typeof decisions | typeof fixedItems) =>
    (await tx.select({ n: count() }).from(table).where(and(eq(table.projectId, projectId), eq(table.roomId, roomId))))[0]?.n ?? 0;
  const [b, d, f] = [await counted(boards), await counted(decisions), await counted(fixedItems)];
  const parts = [
    b ? plural(b, "board", "boards") : null,
    d ? plural(d, "decision", "decisions") : null,
    f ? plural(f, "fixed item", "fixed items") : null,
  ].filter((p): p is string => p !== null);
  if (parts.length === 0) return null;
  return parts.length === 1 ? (parts[0] ?? null) : `${parts.slice(0, -1).join(", ")} and ${parts.at(-1) ?? ""}`;
}

/** Removes an empty room; one with boards, decisions or fixed items is refused (409) with what is in it. */
export async function removeRoom(actor: Actor, projectId: string, roomId: string): Promise<void> {
  const project = await getProjectForStaff(actor, projectId);
  await writeTransaction(async (tx) => {
    const room = await tx.query.rooms.findFirst({ where: and(eq(rooms.id, roomId), eq(rooms.projectId, project.id)) });
    if (!room) throw notFound("That room");
    const contents = await roomContents(tx, project.id, room.id);
    if (contents) throw conflict(`${room.name} has ${contents}; move or remove them first.`);
    await tx.delete(rooms).where(eq(rooms.id, room.id));
    const rest = await listIn(tx, project.id);
    for (const [i, r] of rest.entries()) {
      if (r.sortOrder !== i) await tx.update(rooms).set({ sortOrder: i }).where(eq(rooms.id, r.id));
    }
    await writeAudit({ studioId: project.studioId, projectId: project.id, actorId: actor.userId, action: "room.removed", entityType: "room", entityId: room.id, detail: { title: room.name } }, tx);
  });
}
