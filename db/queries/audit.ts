import { and, desc, eq } from "drizzle-orm";
import { db } from "@/db";
import { auditLog, users } from "@/db/schema";

import { nameOnProject } from "./people-names";

type Executor = Pick<typeof db, "insert">;

export type AuditInput = {
  studioId: string;
  projectId?: string | null;
  actorId: string | null;
  action: string;
  entityType: string;
  entityId: string;
  detail?: Record<string, unknown>;
};

/** Pass the transaction when the audited change is part of one, so both land or neither does. */
export async function writeAudit(entry: AuditInput, executor: Executor = db) {
  await executor.insert(auditLog).values(entry);
}

export async function listAuditForProject(studioId: string, projectId: string, limit = 200) {
  return db
    .select({
      id: auditLog.id,
      action: auditLog.action,
      entityType: auditLog.entityType,
      entityId: auditLog.entityId,
      detail: auditLog.detail,
      createdAt: auditLog.createdAt,
      // A client's or supplier's name as this studio typed it, never as another studio stored it.
      actorName: nameOnProject(projectId),
      actorEmail: users.email,
    })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.actorId))
    .where(and(eq(auditLog.studioId, studioId), eq(auditLog.projectId, projectId)))
    .orderBy(desc(auditLog.createdAt))
    .limit(limit);
}
