import { and, asc, eq, isNull } from "drizzle-orm";
import { db } from "@/db";
import { finishes, fixedItems, rooms, suppliers, type Project } from "@/db/schema";
import { HttpError, notFound } from "@/lib/http";
import type { FixedItemInput } from "@/lib/validation/spec";
import { writeAudit } from "./audit";
import { getProjectForStaff } from "./projects";
import { writeTransaction } from "./serial-write";
import type { Actor } from "./users";

export async function listFixedItems(actor: Actor, projectId: string) {
  const project = await getProjectForStaff(actor, projectId);
  return db
    .select({
      id: fixedItems.id,
      item: fixedItems.item,
      location: fixedItems.location,
      quantity: fixedItems.quantity,
      unit: fixedItems.unit,
      notes: fixedItems.notes,
      roomId: fixedItems.roomId,
      roomName: rooms.name,
      finishId: fixedItems.finishId,
      finishName: finishes.name,
      productCode: finishes.productCode,
      supplierName: suppliers.name,
    })
    .from(fixedItems)
    .innerJoin(rooms, eq(rooms.id, fixedItems.roomId))
    .innerJoin(finishes, eq(finishes.id, fixedItems.finishId))
    .leftJoin(suppliers, eq(suppliers.id, finishes.supplierId))
    .where(eq(fixedItems.projectId, project.id))
    .orderBy(asc(rooms.sortOrder), asc(fixedItems.item));
}

export async function getFixedItem(actor: Actor, projectId: string, fixedItemId: string) {
  const project = await getProjectForStaff(actor, projectId);
  const item = await db.query.fixedItems.findFirst({ where: and(eq(fixedItems.id, fixedItemId), eq(fixedItems.projectId, project.id)) });
  if (!item) throw notFound("That fixed item");
  return { project, item };
}

/** What the fixed-item form offers: the project's rooms and the studio's current finishes. */
export async function listFixedItemChoices(actor: Actor, projectId: string) {
  const project = await getProjectForStaff(actor, projectId);
  const [roomRows, finishRows] = await Promise.all([
    db.select({ id: rooms.id, name: rooms.name }).from(rooms).where(eq(rooms.projectId, project.id)).orderBy(asc(rooms.sortOrder), asc(rooms.name)),
    db
      .select({ id: finishes.id, name: finishes.name, category: finishes.category, productCode: finishes.productCode, unit: finishes.unit, supplierName: suppliers.name })
      .from(finishes)
      .leftJoin(suppliers, eq(suppliers.id, finishes.supplierId))
      .where(and(eq(finishes.studioId, project.studioId), isNull(finishes.archivedAt)))
      .orderBy(asc(finishes.category), asc(finishes.name)),
  ]);
  return { project, rooms: roomRows, finishes: finishRows };
}

async function checkReferences(project: Project, input: FixedItemInput) {
  const [room, finish] = await Promise.all([
    db.query.rooms.findFirst({ where: and(eq(rooms.id, input.roomId), eq(rooms.projectId, project.id)) }),
    db.query.finishes.findFirst({ where: and(eq(finishes.id, input.finishId), eq(finishes.studioId, project.studioId), isNull(finishes.archivedAt)) }),
  ]);
  const errors: Record<string, string[]> = {};
  if (!room) errors.roomId = ["Choose one of this project's rooms."];
  if (!finish) errors.finishId = ["Choose a finish from your studio's library."];
  if (Object.keys(errors).length) throw new HttpError(400, "Some fields need attention.", errors);
}

const fields = (input: FixedItemInput) => ({
  roomId: input.roomId,
  finishId: input.finishId,
  item: input.item,
  location: input.location,
  quantity: input.quantity,
  unit: input.unit,
  notes: input.notes,
});

/** Fixed items change the current specification only; issued revisions keep what they froze. */
export async function createFixedItem(actor: Actor, projectId: string, input: FixedItemInput) {
  const project = await getProjectForStaff(actor, projectId);
  await checkReferences(project, input);
  return writeTransaction(async (tx) => {
    const [item] = await tx.insert(fixedItems).values({ projectId: project.id, ...fields(input) }).returning();
    if (!item) throw new Error("fixed item insert returned nothing");
    await writeAudit({ studioId: project.studioId, projectId: project.id, actorId: actor.userId, action: "fixed-item.added", entityType: "fixed_item", entityId: item.id, detail: { item: item.item } }, tx);
    return item;
  });
}

export async function updateFixedItem(actor: Actor, projectId: string, fixedItemId: string, input: FixedItemInput) {
  const { project, item: before } = await getFixedItem(actor, projectId, fixedItemId);
  await checkReferences(project, input);
  return writeTransaction(async (tx) => {
    const [item] = await tx.update(fixedItems).set(fields(input)).where(eq(fixedItems.id, before.id)).returning();
    if (!item) throw notFound("That fixed item");
    await writeAudit({ studioId: project.studioId, projectId: project.id, actorId: actor.userId, action: "fixed-item.changed", entityType: "fixed_item", entityId: item.id, detail: { before: fields(before), after: fields(input) } }, tx);
    return item;
  });
}

export async function deleteFixedItem(actor: Actor, projectId: string, fixedItemId: string) {
  const { project, item } = await getFixedItem(actor, projectId, fixedItemId);
  await writeTransaction(async (tx) => {
    await tx.delete(fixedItems).where(eq(fixedItems.id, item.id));
    await writeAudit({ studioId: project.studioId, projectId: project.id, actorId: actor.userId, action: "fixed-item.removed", entityType: "fixed_item", entityId: item.id, detail: { item: item.item } }, tx);
  });
}
