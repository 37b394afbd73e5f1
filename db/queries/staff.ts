import { and, count, eq, isNotNull, or } from "drizzle-orm";
import { db } from "@/db";
import { studioMembers, users, type StudioRole } from "@/db/schema";
import { conflict, forbidden, notFound } from "@/lib/http";
import { writeAudit } from "./audit";
import { endSessions } from "./sessions";
import { writeTransaction, type Tx } from "./serial-write";
import type { Actor } from "./users";

export const LAST_OWNER = "A studio needs at least one owner.";

/** The owner's studio; anyone else is refused (403) before a person is looked up. */
function ownersStudio(actor: Actor): string {
  if (actor.studio?.role !== "owner") throw forbidden();
  return actor.studio.id;
}

/**
 * A person who has joined the studio's staff. Someone added who has never signed in is "invited,
 * not joined yet", like an account holder who hasn't accepted a studio invitation: both are 404
 * here (withdraw them instead), so these calls can't tell the two apart.
 */
async function findStaff(tx: Tx | typeof db, studioId: string, userId: string) {
  const [row] = await tx
    .select({ role: studioMembers.role, name: users.name, email: users.email })
    .from(studioMembers)
    .innerJoin(users, eq(users.id, studioMembers.userId))
    .where(and(eq(studioMembers.studioId, studioId), eq(studioMembers.userId, userId), or(isNotNull(users.emailVerified), isNotNull(users.passwordHash))));
  if (!row) throw notFound("That person on your studio's staff");
  return row;
}

/** Access before the body: owners only (403), and a person on their own studio's staff (404 otherwise). */
export async function assertStaffOfMyStudio(actor: Actor, userId: string): Promise<void> {
  await findStaff(db, ownersStudio(actor), userId);
}

async function ownerCount(tx: Tx, studioId: string) {
  const [row] = await tx.select({ n: count() }).from(studioMembers).where(and(eq(studioMembers.studioId, studioId), eq(studioMembers.role, "owner")));
  return row?.n ?? 0;
}

/**
 * Makes a designer an owner or an owner a designer; never the studio's last owner. Their
 * sessions end with the change, so what they may do follows from their very next request.
 */
export async function changeStaffRole(actor: Actor, userId: string, role: StudioRole): Promise<{ userId: string; role: StudioRole }> {
  const studioId = ownersStudio(actor);
  return writeTransaction(async (tx) => {
    const staff = await findStaff(tx, studioId, userId);
    if (staff.role === role) return { userId, role };
    if (staff.role === "owner" && (await ownerCount(tx, studioId)) <= 1) throw conflict(LAST_OWNER);
    await tx.update(studioMembers).set({ role }).where(and(eq(studioMembers.studioId, studioId), eq(studioMembers.userId, userId)));
    await endSessions(userId, tx);
    await writeAudit(
      { studioId, actorId: actor.userId, action: "staff.role_changed", entityType: "user", entityId: userId, detail: { name: staff.name ?? staff.email, email: staff.email, from: staff.role, to: role } },
      tx,
    );
    return { userId, role };
  });
}

/**
 * Takes a person off the studio's staff (never the last owner). Their account stays, with
 * everything they did recorded under it; their sessions end at once.
 */
export async function removeStaff(actor: Actor, userId: string): Promise<void> {
  const studioId = ownersStudio(actor);
  await writeTransaction(async (tx) => {
    const staff = await findStaff(tx, studioId, userId);
    if (staff.role === "owner" && (await ownerCount(tx, studioId)) <= 1) throw conflict(LAST_OWNER);
    await tx.delete(studioMembers).where(and(eq(studioMembers.studioId, studioId), eq(studioMembers.userId, userId)));
    await endSessions(userId, tx);
    await writeAudit(
      { studioId, actorId: actor.userId, action: "staff.removed", entityType: "user", entityId: userId, detail: { name: staff.name ?? staff.email, email: staff.email, role: staff.role } },
      tx,
    );
  });
}
