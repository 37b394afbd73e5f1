import { eq } from "drizzle-orm";
import { db } from "@/db";
import { projectMembers, projects, studioMembers, studios, users, type ProjectRole, type StudioRole } from "@/db/schema";
import { readCache } from "./read-cache";

export async function getUserByEmail(email: string) {
  return db.query.users.findFirst({ where: eq(users.email, email.toLowerCase()) });
}

export type Actor = {
  userId: string;
  email: string;
  name: string | null;
  /** Sessions sealed with another number are over (db/queries/sessions.ts). */
  sessionVersion: number;
  /** Set when the person is staff of a studio. */
  studio: { id: string; name: string; role: StudioRole } | null;
  /** Projects the person belongs to as a client or a supplier's contact. */
  projects: { projectId: string; studioId: string; role: ProjectRole; supplierId: string | null }[];
};

const cachedActor = readCache<Actor | null>("actor", 2000);

/**
 * Everything the permission checks need about a signed-in person. Cached until the next write
 * (read-cache.ts), so a change of role or membership, or an ended session, counts from the very
 * next request.
 */
export function getActor(userId: string): Promise<Actor | null> {
  return cachedActor(userId, () => readActor(userId));
}

async function readActor(userId: string): Promise<Actor | null> {
  const user = await db.query.users.findFirst({ where: eq(users.id, userId) });
  if (!user) return null;
  const [staff] = await db
    .select({ id: studios.id, name: studios.name, role: studioMembers.role })
    .from(studioMembers)
    .innerJoin(studios, eq(studios.id, studioMembers.studioId))
    .where(eq(studioMembers.userId, userId))
    .limit(1);
  const memberships = await db
    .select({
      projectId: projectMembers.projectId,
      studioId: projects.studioId,
      role: projectMembers.role,
      supplierId: projectMembers.supplierId,
    })
    .from(projectMembers)
    .innerJoin(projects, eq(projects.id, projectMembers.projectId))
    .where(eq(projectMembers.userId, userId));
  return {
    userId: user.id,
    email: user.email,
    name: user.name,
    sessionVersion: user.sessionVersion,
    studio: staff ?? null,
    projects: memberships,
  };
}

/** Where a person lands after signing in: staff first, then client, then supplier. */
export function homePathFor(actor: Actor): string {
  if (actor.studio) return "/studio";
  if (actor.projects.some((p) => p.role === "client")) return "/client";
  if (actor.projects.some((p) => p.role === "supplier")) return "/supplier";
  return "/welcome";
}
