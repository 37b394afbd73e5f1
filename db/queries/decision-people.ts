import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { projectMembers, studioMembers, users } from "@/db/schema";

export type Recipient = { email: string; name: string | null };

/** The project's designers: the staff of its studio (there is no per-project staff list). */
export async function listStudioStaffRecipients(studioId: string): Promise<Recipient[]> {
  return db
    .select({ email: users.email, name: users.name })
    .from(studioMembers)
    .innerJoin(users, eq(users.id, studioMembers.userId))
    .where(eq(studioMembers.studioId, studioId));
}

export async function listProjectClientRecipients(projectId: string): Promise<Recipient[]> {
  return db
    .select({ email: users.email, name: users.name })
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.role, "client")));
}
