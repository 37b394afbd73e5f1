import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { projectMembers, studioMembers, users } from "@/db/schema";
import { nameOnProject } from "./people-names";

export type Recipient = { email: string; name: string | null };

/** The project's designers: the staff of its studio (there is no per-project staff list). */
export async function listStudioStaffRecipients(studioId: string): Promise<Recipient[]> {
  return db
    .select({ email: users.email, name: users.name })
    .from(studioMembers)
    .innerJoin(users, eq(users.id, studioMembers.userId))
    .where(eq(studioMembers.studioId, studioId));
}

/** The project's clients, named as this project's studio named them. */
export async function listProjectClientRecipients(projectId: string): Promise<Recipient[]> {
  return db
    .select({ email: users.email, name: projectMembers.displayName })
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.role, "client")));
}

/** One person's name as this project shows it (see people-names.ts). */
export async function readNameOnProject(projectId: string, userId: string): Promise<string> {
  const [row] = await db.select({ name: nameOnProject(projectId) }).from(users).where(eq(users.id, userId));
  return row?.name ?? "A client";
}
