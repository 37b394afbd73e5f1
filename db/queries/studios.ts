import bcrypt from "bcryptjs";
import { and, asc, eq, isNull } from "drizzle-orm";
import { db } from "@/db";
import { writeTransaction } from "./serial-write";
import { studioMembers, studios, suppliers, users } from "@/db/schema";
import { conflict } from "@/lib/http";
import type { SignUpInput } from "@/lib/validation/auth";
import { writeAudit } from "./audit";
import { takeInviteAllowance } from "./invite-limits";

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

/**
 * What the team invite e-mails: "added" (a new person, now a designer, who signs in by e-mailed
 * link) or "has-account" (nothing added; they get a note to ask for an invitation to another
 * address). The owner is told the same either way, so the form can't be used to learn who has an
 * account or works for another studio.
 */
export type DesignerInviteOutcome = { kind: "added" | "has-account"; email: string };

/**
 * Adds a designer to the studio. Inviting again someone already added who hasn't signed in yet
 * sends the e-mail again; someone on this studio's staff who has (the owner sees them listed) is 409.
 * Every invitation, either way, counts against the invitation limits (invite-limits.ts).
 */
export async function addDesigner(studioId: string, invitedBy: string, input: { email: string; name: string }): Promise<DesignerInviteOutcome> {
  return writeTransaction(async (tx) => {
    const user = await tx.query.users.findFirst({ where: eq(users.email, input.email) });
    const ours = user ? await tx.query.studioMembers.findFirst({ where: and(eq(studioMembers.userId, user.id), eq(studioMembers.studioId, studioId)) }) : undefined;
    if (user && ours && (user.emailVerified || user.passwordHash)) throw conflict("That person is already on your studio's staff.");
    await takeInviteAllowance(tx, studioId, input.email);
    if (user && ours) return { kind: "added", email: user.email };
    if (user) return { kind: "has-account", email: user.email };
    const [created] = await tx.insert(users).values({ email: input.email, name: input.name }).returning();
    if (!created) throw new Error("designer insert returned nothing");
    await tx.insert(studioMembers).values({ studioId, userId: created.id, role: "designer" });
    await writeAudit(
      { studioId, actorId: invitedBy, action: "designer.invited", entityType: "user", entityId: created.id, detail: { email: input.email } },
      tx,
    );
    return { kind: "added", email: created.email };
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

/** The studio's suppliers that may be chosen for something new: archived ones are left out. */
export async function listSuppliers(studioId: string) {
  return db
    .select()
    .from(suppliers)
    .where(and(eq(suppliers.studioId, studioId), isNull(suppliers.archivedAt)))
    .orderBy(asc(suppliers.name));
}

export async function getSupplierInStudio(studioId: string, supplierId: string) {
  return db.query.suppliers.findFirst({ where: and(eq(suppliers.studioId, studioId), eq(suppliers.id, supplierId)) });
}
