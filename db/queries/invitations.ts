import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { projectInvitations, projectMembers, projects, studios, suppliers } from "@/db/schema";
import { conflict, notFound } from "@/lib/http";
import { writeAudit } from "./audit";
import { writeTransaction } from "./serial-write";
import type { Actor } from "./users";

/** Why studio staff can't take up a client's or supplier's invitation; shown only to them. */
export const STAFF_CANNOT_JOIN =
  "You're on a studio's team in Mottle, so this address can't also join another project as a client or a supplier's contact. Decline it, and ask them to invite a different e-mail address.";

export type PendingInvitation = {
  id: string;
  projectName: string;
  studioName: string;
  role: "client" | "supplier";
  supplierName: string | null;
  invitedAt: Date;
  /** Set when this person may only decline, with the reason in plain words. */
  blocked: string | null;
};

/** Invitations waiting for the signed-in person: matched on their own e-mail address only. */
export async function listPendingInvitations(actor: Actor): Promise<PendingInvitation[]> {
  const rows = await db
    .select({
      id: projectInvitations.id,
      projectName: projects.name,
      studioName: studios.name,
      role: projectInvitations.role,
      supplierName: suppliers.name,
      invitedAt: projectInvitations.createdAt,
    })
    .from(projectInvitations)
    .innerJoin(projects, eq(projects.id, projectInvitations.projectId))
    .innerJoin(studios, eq(studios.id, projects.studioId))
    .leftJoin(suppliers, eq(suppliers.id, projectInvitations.supplierId))
    .where(eq(projectInvitations.email, actor.email.toLowerCase()))
    .orderBy(asc(projectInvitations.createdAt));
  return rows.map((r) => ({ ...r, blocked: actor.studio ? STAFF_CANNOT_JOIN : null }));
}

/**
 * Accepting makes the person a member under the name the studio typed; declining only removes the
 * invitation. Someone else's invitation answers 404, exactly like one that doesn't exist.
 */
export async function answerInvitation(actor: Actor, invitationId: string, answer: "accept" | "decline") {
  return writeTransaction(async (tx) => {
    const invitation = await tx.query.projectInvitations.findFirst({ where: eq(projectInvitations.id, invitationId) });
    if (!invitation || invitation.email !== actor.email.toLowerCase()) throw notFound("That invitation");
    const project = await tx.query.projects.findFirst({ where: eq(projects.id, invitation.projectId) });
    if (!project) throw notFound("That invitation");
    if (answer === "accept") {
      if (actor.studio) throw conflict(STAFF_CANNOT_JOIN);
      const existing = await tx.query.projectMembers.findFirst({
        where: and(eq(projectMembers.projectId, project.id), eq(projectMembers.userId, actor.userId)),
      });
      if (!existing) {
        await tx.insert(projectMembers).values({
          projectId: project.id,
          userId: actor.userId,
          role: invitation.role,
          supplierId: invitation.role === "supplier" ? invitation.supplierId : null,
          displayName: invitation.name,
          invitedBy: invitation.invitedBy,
        });
      }
    }
    await tx.delete(projectInvitations).where(eq(projectInvitations.id, invitation.id));
    await writeAudit(
      {
        studioId: project.studioId,
        projectId: project.id,
        actorId: actor.userId,
        action: answer === "accept" ? "invitation.accepted" : "invitation.declined",
        entityType: "project_invitation",
        entityId: invitation.id,
        detail: { email: invitation.email, role: invitation.role },
      },
      tx,
    );
    return { projectId: project.id, role: invitation.role };
  });
}
