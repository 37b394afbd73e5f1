import { and, eq, isNull } from "drizzle-orm";
import { db } from "@/db";
import { projectInvitations, projectMembers, studioInvitations, studioMembers, suppliers, users, type Project } from "@/db/schema";
import { conflict, HttpError } from "@/lib/http";
import type { ProjectInviteeInput } from "@/lib/validation/project-invite";
import { writeAudit } from "./audit";
import { takeInviteAllowance } from "./invite-limits";
import { getProjectForStaff } from "./projects";
import { writeTransaction, type Tx } from "./serial-write";
import type { Actor } from "./users";

/**
 * What the caller e-mails: "added" (a new person, now a member, signs in with a link) or "invited"
 * (someone with an account, who signs in to accept). The studio is told the same either way.
 */
export type InviteOutcome = { project: Project; email: string; kind: "added" | "invited" };

/** True once a person has ever signed in (a used e-mail link, or a password). */
export const hasSignedIn = (u: { emailVerified: Date | null; passwordHash: string | null }) => Boolean(u.emailVerified || u.passwordHash);

/**
 * A designer invites a client or a supplier's contact. A new address becomes a person and a member
 * at once; an address that already has an account only gets an invitation to accept, so nobody is
 * put on a project without asking and the studio learns nothing about the account. Inviting again
 * someone who hasn't joined yet sends the e-mail again (with any new name or role).
 */
export async function inviteToProject(actor: Actor, projectId: string, input: ProjectInviteeInput): Promise<InviteOutcome> {
  const project = await getProjectForStaff(actor, projectId);
  const supplierId = await checkSupplier(project.studioId, input);
  const details = { name: input.name, role: input.role, supplierId };
  return writeTransaction(async (tx) => {
    const user = await tx.query.users.findFirst({ where: eq(users.email, input.email) });
    if (user && (await isStaffOf(tx, user, project.studioId))) {
      throw conflict("That person is on your studio's team; they see every project already.");
    }
    const member = user
      ? await tx.query.projectMembers.findFirst({ where: and(eq(projectMembers.projectId, projectId), eq(projectMembers.userId, user.id)) })
      : undefined;
    if (user && member && hasSignedIn(user)) throw conflict(`${input.email} is already on this project.`);
    await takeInviteAllowance(tx, project.studioId, input.email);
    const audit = (entityType: string, entityId: string) =>
      writeAudit(
        { studioId: project.studioId, projectId, actorId: actor.userId, action: `${input.role}.invited`, entityType, entityId, detail: { email: input.email } },
        tx,
      );
    if (user && member) {
      await tx.update(projectMembers).set({ role: details.role, supplierId, displayName: details.name }).where(eq(projectMembers.id, member.id));
      await audit("user", user.id);
      return { project, email: input.email, kind: "added" };
    }
    if (user) {
      const [invitation] = await tx
        .insert(projectInvitations)
        .values({ projectId, email: input.email, ...details, invitedBy: actor.userId })
        .onConflictDoUpdate({ target: [projectInvitations.projectId, projectInvitations.email], set: { ...details, invitedBy: actor.userId } })
        .returning();
      if (!invitation) throw new Error("invitation insert returned nothing");
      await audit("project_invitation", invitation.id);
      return { project, email: input.email, kind: "invited" };
    }
    const [created] = await tx.insert(users).values({ email: input.email, name: input.name }).returning();
    if (!created) throw new Error("member insert returned nothing");
    await tx.insert(projectMembers).values({ projectId, userId: created.id, role: details.role, supplierId, displayName: details.name, invitedBy: actor.userId });
    await audit("user", created.id);
    return { project, email: input.email, kind: "added" };
  });
}

/** A supplier's contact joins as one of this studio's current (not archived) suppliers; a client never carries one. */
async function checkSupplier(studioId: string, input: ProjectInviteeInput): Promise<string | null> {
  if (input.role === "client") {
    if (input.supplierId) throw new HttpError(400, "A client doesn't work for a supplier.", { supplierId: ["A client doesn't work for a supplier."] });
    return null;
  }
  const message = "Choose one of your studio's suppliers.";
  const supplier = input.supplierId
    ? await db.query.suppliers.findFirst({ where: and(eq(suppliers.id, input.supplierId), eq(suppliers.studioId, studioId), isNull(suppliers.archivedAt)) })
    : undefined;
  if (!supplier) throw new HttpError(400, message, { supplierId: [message] });
  return supplier.id;
}

/**
 * On the studio's team, or invited onto it: a new designer not yet signed in is already staff, so
 * an account holder invited to the team counts too, or this answer would tell the two apart.
 */
async function isStaffOf(tx: Tx, user: { id: string; email: string }, studioId: string) {
  const member = await tx.query.studioMembers.findFirst({ where: and(eq(studioMembers.userId, user.id), eq(studioMembers.studioId, studioId)) });
  const invited = member ? undefined : await tx.query.studioInvitations.findFirst({ where: and(eq(studioInvitations.email, user.email), eq(studioInvitations.studioId, studioId)) });
  return Boolean(member ?? invited);
}
