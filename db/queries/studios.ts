import bcrypt from "bcryptjs";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { writeTransaction } from "./serial-write";
import { studioMembers, studios, suppliers, users } from "@/db/schema";
import { conflict } from "@/lib/http";
import type { SignUpInput } from "@/lib/validation/auth";
import { writeAudit } from "./audit";

export const PASSWORD_COST = 11;

export type SignUpOutcome = { created: true; studioId: string; userId: string } | { created: false };

/**
 * Sign-up: a new studio with its owner (and the password they chose), in one transaction. An
 * address that already has an account changes nothing and says so only to the caller
 * (`created: false`), never in its timing: the password is hashed either way, and both paths run
 * one transaction in the write queue. What the person sees must not differ (sign-up/actions.ts).
 */
export async function createStudioWithOwner(input: SignUpInput): Promise<SignUpOutcome> {
  const passwordHash = await bcrypt.hash(input.password, PASSWORD_COST);
  return writeTransaction(async (tx): Promise<SignUpOutcome> => {
    const existing = await tx.query.users.findFirst({ where: eq(users.email, input.email), columns: { id: true } });
    if (existing) return { created: false };
    const [studio] = await tx.insert(studios).values({ name: input.studioName }).returning();
    const [user] = await tx.insert(users).values({ email: input.email, name: input.name, passwordHash }).returning();
    if (!studio || !user) throw new Error("sign-up insert returned nothing");
    await tx.insert(studioMembers).values({ studioId: studio.id, userId: user.id, role: "owner" });
    await writeAudit(
      { studioId: studio.id, actorId: user.id, action: "studio.created", entityType: "studio", entityId: studio.id },
      tx,
    );
    return { created: true, studioId: studio.id, userId: user.id };
  });
}

/** Adds a designer to the studio; the person signs in with an e-mailed link. */
export async function addDesigner(studioId: string, invitedBy: string, input: { email: string; name: string }) {
  return writeTransaction(async (tx) => {
    let user = await tx.query.users.findFirst({ where: eq(users.email, input.email) });
    if (user) {
      const staff = await tx.query.studioMembers.findFirst({ where: eq(studioMembers.userId, user.id) });
      if (staff) {
        throw conflict(
          staff.studioId === studioId
            ? "That person is already on your studio's staff."
            : "That e-mail address belongs to another studio's staff.",
        );
      }
    } else {
      [user] = await tx.insert(users).values({ email: input.email, name: input.name }).returning();
    }
    if (!user) throw new Error("designer insert returned nothing");
    await tx.insert(studioMembers).values({ studioId, userId: user.id, role: "designer" });
    await writeAudit(
      { studioId, actorId: invitedBy, action: "designer.invited", entityType: "user", entityId: user.id, detail: { email: input.email } },
      tx,
    );
    return user;
  });
}

export async function listStaff(studioId: string) {
  return db
    .select({ userId: users.id, name: users.name, email: users.email, role: studioMembers.role })
    .from(studioMembers)
    .innerJoin(users, eq(users.id, studioMembers.userId))
    .where(eq(studioMembers.studioId, studioId))
    .orderBy(asc(studioMembers.role), asc(users.name));
}

export async function listSuppliers(studioId: string) {
  return db.select().from(suppliers).where(eq(suppliers.studioId, studioId)).orderBy(asc(suppliers.name));
}

export async function getSupplierInStudio(studioId: string, supplierId: string) {
  return db.query.suppliers.findFirst({ where: and(eq(suppliers.studioId, studioId), eq(suppliers.id, supplierId)) });
}
