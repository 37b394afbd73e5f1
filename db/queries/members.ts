import { and, eq, isNull } from "drizzle-orm";
import { db } from "@/db";
import { projectInvitations, projectMembers, suppliers, users, type ProjectMember } from "@/db/schema";
import { conflict, HttpError, notFound } from "@/lib/http";
import { hasSignedIn } from "./project-invite";
import type { MemberRoleInput } from "@/lib/validation/member";
import { writeAudit } from "./audit";
import { getProjectForStaff } from "./projects";
import { endSessions } from "./sessions";
import { writeTransaction, type Tx } from "./serial-write";
import type { Actor } from "./users";

async function findMember(tx: Tx, projectId: string, userId: string) {
  const [row] = await tx
    .select({ member: projectMembers, email: users.email, supplierName: suppliers.name })
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .leftJoin(suppliers, eq(suppliers.id, projectMembers.supplierId))
    .where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.userId, userId)));
  if (!row) throw notFound("That person on this project");
  return row;
}

/** Access before the body: the project as its staff see it, and this person on it (404 otherwise). */
export async function getMemberForStaff(actor: Actor, projectId: string, userId: string): Promise<ProjectMember> {
  const project = await getProjectForStaff(actor, projectId);
  const member = await db.query.projectMembers.findFirst({ where: and(eq(projectMembers.projectId, project.id), eq(projectMembers.userId, userId)) });
  if (!member) throw notFound("That person on this project");
  return member;
}

const roleWords = (role: ProjectMember["role"], supplierName: string | null) => (role === "supplier" ? `contact at ${supplierName ?? "a supplier"}` : "client");

/**
 * Moves a person between client and a supplier's contact (the supplier must be one of this
 * studio's, not archived). Their sessions end with the change, so their very next request is
 * answered by what they are now.
 */
export async function changeMemberRole(actor: Actor, projectId: string, userId: string, input: MemberRoleInput): Promise<ProjectMember> {
  const project = await getProjectForStaff(actor, projectId);
  return writeTransaction(async (tx) => {
    const { member, email, supplierName } = await findMember(tx, project.id, userId);
    let target: { id: string; name: string } | null = null;
    if (input.role === "supplier") {
      const found = await tx.query.suppliers.findFirst({
        where: and(eq(suppliers.id, input.supplierId), eq(suppliers.studioId, project.studioId), isNull(suppliers.archivedAt)),
      });
      const message = "Choose one of your studio's suppliers.";
      if (!found) throw new HttpError(400, message, { supplierId: [message] });
      target = { id: found.id, name: found.name };
    }
    if (member.role === input.role && member.supplierId === (target?.id ?? null)) return member;
    const [updated] = await tx
      .update(projectMembers)
      .set({ role: input.role, supplierId: target?.id ?? null })
      .where(eq(projectMembers.id, member.id))
      .returning();
    if (!updated) throw new Error("member update returned nothing");
    await endSessions(userId, tx);
    await writeAudit(
      {
        studioId: project.studioId,
        projectId: project.id,
        actorId: actor.userId,
        action: "member.role_changed",
        entityType: "user",
        entityId: userId,
        detail: { name: member.displayName ?? email, email, from: roleWords(member.role, supplierName), to: roleWords(input.role, target?.name ?? null) },
      },
      tx,
    );
    return updated;
  });
}

/**
 * Takes a person off the project. What they did stays: their picks, approvals and variation
 * requests point at their account, not at the membership, and are shown by e-mail address from
 * now on (people-names.ts). Their sessions end with the change.
 */
export async function removeMember(actor: Actor, projectId: string, userId: string): Promise<void> {
  const project = await getProjectForStaff(actor, projectId);
  await writeTransaction(async (tx) => {
    const { member, email, supplierName } = await findMember(tx, project.id, userId);
    await tx.delete(projectMembers).where(eq(projectMembers.id, member.id));
    await endSessions(userId, tx);
    await writeAudit(
      {
        studioId: project.studioId,
        projectId: project.id,
        actorId: actor.userId,
        action: "member.removed",
        entityType: "user",
        entityId: userId,
        detail: { name: member.displayName ?? email, email, role: roleWords(member.role, supplierName) },
      },
      tx,
    );
  });
}

/**
 * Withdraws an invitation nobody has taken up yet. The project's list shows two kinds alike (a new
 * person added who hasn't signed in, an account holder who hasn't accepted) so it never tells
 * whether an address had an account; this takes either by the list entry's id and answers alike.
 */
export async function withdrawPending(actor: Actor, projectId: string, entryId: string): Promise<void> {
  const project = await getProjectForStaff(actor, projectId);
  await writeTransaction(async (tx) => {
    const invitation = await tx.query.projectInvitations.findFirst({ where: and(eq(projectInvitations.id, entryId), eq(projectInvitations.projectId, project.id)) });
    const [member] = invitation
      ? []
      : await tx
          .select({ id: projectMembers.id, userId: projectMembers.userId, email: users.email, emailVerified: users.emailVerified, passwordHash: users.passwordHash })
          .from(projectMembers)
          .innerJoin(users, eq(users.id, projectMembers.userId))
          .where(and(eq(projectMembers.id, entryId), eq(projectMembers.projectId, project.id)));
    if (!invitation && !member) throw notFound("That invitation");
    if (member && hasSignedIn(member)) throw conflict("They have joined the project since; remove them instead.");
    if (invitation) await tx.delete(projectInvitations).where(eq(projectInvitations.id, invitation.id));
    if (member) {
      await tx.delete(projectMembers).where(eq(projectMembers.id, member.id));
      await endSessions(member.userId, tx);
    }
    const email = invitation?.email ?? member?.email ?? "";
    await writeAudit(
      { studioId: project.studioId, projectId: project.id, actorId: actor.userId, action: "invitation.withdrawn", entityType: "project_person", entityId: entryId, detail: { email } },
      tx,
    );
  });
}
