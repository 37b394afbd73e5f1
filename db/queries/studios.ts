import bcrypt from "bcryptjs";
import { and, asc, eq, isNull } from "drizzle-orm";
import { db } from "@/db";
import { writeTransaction, type Tx } from "./serial-write";
import { studioInvitations, studioMembers, studios, suppliers, users } from "@/db/schema";
import { conflict } from "@/lib/http";
import type { SignUpInput } from "@/lib/validation/auth";
import { writeAudit } from "./audit";
import { takeInviteAllowance } from "./invite-limits";
import { hasSignedIn } from "./project-invite";

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
 * What the team invite e-mails: "added" (a new person, now on the staff, who signs in by e-mailed
 * link) or "invited" (someone with an account, whoever they are, who signs in to accept). The
 * owner is told the same either way, the audit entry is the same, and the team list shows both as
 * "Invited, not joined yet", so the form can't be used to learn who has an account.
 */
export type DesignerInviteOutcome = { kind: "added" | "invited"; email: string };

/**
 * Invites a designer to the studio. A new address becomes a person on the staff at once; an
 * address that already has an account only gets a studio invitation to accept. Inviting again
 * someone not joined yet sends the e-mail again (with the new name); someone on this studio's
 * staff who has joined (the owner sees them listed) is 409. Every invitation, either way, counts
 * against the invitation limits (invite-limits.ts).
 */
export async function addDesigner(studioId: string, invitedBy: string, input: { email: string; name: string }): Promise<DesignerInviteOutcome> {
  return writeTransaction(async (tx) => {
    const user = await tx.query.users.findFirst({ where: eq(users.email, input.email) });
    const ours = user ? await tx.query.studioMembers.findFirst({ where: and(eq(studioMembers.userId, user.id), eq(studioMembers.studioId, studioId)) }) : undefined;
    if (user && ours && hasSignedIn(user)) throw conflict("That person is already on your studio's staff.");
    await takeInviteAllowance(tx, studioId, input.email);
    const outcome = await recordDesignerInvite(tx, studioId, invitedBy, input, user && { id: user.id, ours: Boolean(ours) });
    await writeAudit(
      { studioId, actorId: invitedBy, action: "designer.invited", entityType: "studio_person", entityId: outcome.entryId, detail: { email: input.email } },
      tx,
    );
    return { kind: outcome.kind, email: input.email };
  });
}

/** The row behind the team list's entry: the new person's membership, or the account holder's invitation. */
async function recordDesignerInvite(
  tx: Tx,
  studioId: string,
  invitedBy: string,
  input: { email: string; name: string },
  user: { id: string; ours: boolean } | undefined,
): Promise<{ kind: DesignerInviteOutcome["kind"]; entryId: string }> {
  if (user?.ours) {
    // Someone this studio added who hasn't signed in yet: nobody else has named them.
    await tx.update(users).set({ name: input.name }).where(eq(users.id, user.id));
    return { kind: "added", entryId: user.id };
  }
  if (user) {
    const values = { name: input.name, role: "designer" as const, invitedBy };
    const [invitation] = await tx
      .insert(studioInvitations)
      .values({ studioId, email: input.email, ...values })
      .onConflictDoUpdate({ target: [studioInvitations.studioId, studioInvitations.email], set: values })
      .returning();
    if (!invitation) throw new Error("studio invitation insert returned nothing");
    return { kind: "invited", entryId: invitation.id };
  }
  const [created] = await tx.insert(users).values({ email: input.email, name: input.name }).returning();
  if (!created) throw new Error("designer insert returned nothing");
  await tx.insert(studioMembers).values({ studioId, userId: created.id, role: "designer" });
  return { kind: "added", entryId: created.id };
}

/** The studio's suppliers that may be chosen for something new: archived ones are left out. */
export async function listSuppliers(studioId: string) {
  return db
    .select()
    .from(suppliers)
    .where(and(eq(suppliers.studioId, studioId), isNull(suppliers.archivedAt)))
    .orderBy(asc(suppliers.name));
}
