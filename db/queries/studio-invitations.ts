import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { studioInvitations, studioMembers, studios, users, type StudioRole } from "@/db/schema";
import { conflict, forbidden, notFound } from "@/lib/http";
import { writeAudit } from "./audit";
import { hasSignedIn } from "./project-invite";
import { endSessions } from "./sessions";
import { writeTransaction } from "./serial-write";
import type { Actor } from "./users";

/**
 * One line of the team list. Someone not joined yet (a new person added who hasn't signed in, or
 * an account holder who hasn't accepted a studio invitation) is listed with the same fields either
 * way: `userId` is null for both, so the list never tells whether an address had an account.
 */
export type TeamEntry = {
  /** The person's id once joined; for someone not joined yet, the id "Withdraw invitation" posts. */
  id: string;
  /** Set only for joined staff (who can be made owner, made designer or removed). */
  userId: string | null;
  name: string;
  email: string;
  role: StudioRole;
  joined: boolean;
};

/** The studio's staff and the people invited onto it, owners first, then by name. */
export async function listTeam(studioId: string): Promise<TeamEntry[]> {
  const [members, invitations] = await Promise.all([
    db
      .select({ userId: users.id, name: users.name, email: users.email, role: studioMembers.role, emailVerified: users.emailVerified, passwordHash: users.passwordHash })
      .from(studioMembers)
      .innerJoin(users, eq(users.id, studioMembers.userId))
      .where(eq(studioMembers.studioId, studioId)),
    db
      .select({ id: studioInvitations.id, name: studioInvitations.name, email: studioInvitations.email, role: studioInvitations.role })
      .from(studioInvitations)
      .where(eq(studioInvitations.studioId, studioId)),
  ]);
  const entries: TeamEntry[] = [
    ...members.map((m) => {
      const joined = hasSignedIn(m);
      return { id: m.userId, userId: joined ? m.userId : null, name: m.name ?? m.email, email: m.email, role: m.role, joined };
    }),
    ...invitations.map((i) => ({ id: i.id, userId: null, name: i.name ?? i.email, email: i.email, role: i.role, joined: false })),
  ];
  const rank = (e: TeamEntry) => (e.role === "owner" ? 0 : 1);
  return entries.sort((a, b) => rank(a) - rank(b) || a.name.localeCompare(b.name) || a.email.localeCompare(b.email));
}

/**
 * The owner's "Withdraw invitation", for anyone listed as not joined yet: deletes a pending
 * invitation, or takes a new person who never signed in off the staff. Both are found by the list
 * entry's id and answered alike; a joined person is removed with "Remove from studio" instead.
 */
export async function withdrawTeamInvitation(actor: Actor, entryId: string): Promise<void> {
  if (actor.studio?.role !== "owner") throw forbidden();
  const studioId = actor.studio.id;
  await writeTransaction(async (tx) => {
    const invitation = await tx.query.studioInvitations.findFirst({ where: and(eq(studioInvitations.id, entryId), eq(studioInvitations.studioId, studioId)) });
    const [member] = invitation
      ? []
      : await tx
          .select({ userId: users.id, email: users.email, emailVerified: users.emailVerified, passwordHash: users.passwordHash })
          .from(studioMembers)
          .innerJoin(users, eq(users.id, studioMembers.userId))
          .where(and(eq(studioMembers.studioId, studioId), eq(studioMembers.userId, entryId)));
    if (!invitation && !member) throw notFound("That invitation");
    if (member && hasSignedIn(member)) throw conflict("They have joined the studio since; remove them from the studio instead.");
    if (invitation) await tx.delete(studioInvitations).where(eq(studioInvitations.id, invitation.id));
    if (member) {
      await tx.delete(studioMembers).where(and(eq(studioMembers.studioId, studioId), eq(studioMembers.userId, member.userId)));
      await endSessions(member.userId, tx);
    }
    await writeAudit(
      {
        studioId,
        actorId: actor.userId,
        action: "team_invitation.withdrawn",
        entityType: "studio_person",
        entityId: entryId,
        detail: { email: invitation?.email ?? member?.email ?? "" },
      },
      tx,
    );
  });
}

/** Why someone can't accept a studio's invitation; shown only to them. */
export function staffElsewhereReason(ownStudio: string) {
  return `You're on the team at ${ownStudio} in Mottle, and a person can be on one studio's team only. Decline this invitation, or ask them to invite a different e-mail address.`;
}

export type PendingStudioInvitation = {
  id: string;
  studioName: string;
  role: StudioRole;
  invitedAt: Date;
  /** Set when this person may only decline, with the reason in plain words. */
  blocked: string | null;
};

/** Studio invitations waiting for the signed-in person: matched on their own e-mail address only. */
export async function listMyStudioInvitations(actor: Actor): Promise<PendingStudioInvitation[]> {
  const rows = await db
    .select({ id: studioInvitations.id, studioId: studioInvitations.studioId, studioName: studios.name, role: studioInvitations.role, invitedAt: studioInvitations.createdAt })
    .from(studioInvitations)
    .innerJoin(studios, eq(studios.id, studioInvitations.studioId))
    .where(eq(studioInvitations.email, actor.email.toLowerCase()))
    .orderBy(asc(studioInvitations.createdAt));
  return rows.map(({ studioId, ...r }) => ({
    ...r,
    blocked: actor.studio && actor.studio.id !== studioId ? staffElsewhereReason(actor.studio.name) : null,
  }));
}

/**
 * The invited person accepts (joins the staff with the invitation's role) or declines (the
 * invitation goes). Someone else's invitation answers 404, exactly like one that doesn't exist;
 * someone already on another studio's team may only decline (409, the reason in plain words).
 */
export async function answerStudioInvitation(actor: Actor, invitationId: string, answer: "accept" | "decline") {
  return writeTransaction(async (tx) => {
    const invitation = await tx.query.studioInvitations.findFirst({ where: eq(studioInvitations.id, invitationId) });
    if (!invitation || invitation.email !== actor.email.toLowerCase()) throw notFound("That invitation");
    if (answer === "accept") {
      const [current] = await tx
        .select({ studioId: studioMembers.studioId, studioName: studios.name })
        .from(studioMembers)
        .innerJoin(studios, eq(studios.id, studioMembers.studioId))
        .where(eq(studioMembers.userId, actor.userId))
        .limit(1);
      if (current && current.studioId !== invitation.studioId) throw conflict(staffElsewhereReason(current.studioName));
      if (!current) await tx.insert(studioMembers).values({ studioId: invitation.studioId, userId: actor.userId, role: invitation.role });
    }
    await tx.delete(studioInvitations).where(eq(studioInvitations.id, invitation.id));
    await writeAudit(
      {
        studioId: invitation.studioId,
        actorId: actor.userId,
        action: answer === "accept" ? "team_invitation.accepted" : "team_invitation.declined",
        entityType: "studio_invitation",
        entityId: invitation.id,
        detail: { email: invitation.email, role: invitation.role },
      },
      tx,
    );
    return { studioId: invitation.studioId, role: invitation.role };
  });
}
