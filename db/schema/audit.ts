import { index, sqliteTable, text } from "drizzle-orm/sqlite-core";
import { users } from "./auth";
import { createdAt, id } from "./columns";
import { projects, studios } from "./studio";

/** Everything a person does to a decision, a lock, a revision or an upload. Rows are only ever added. */
export const auditLog = sqliteTable(
  "audit_log",
  {
    id: id(),
    studioId: text("studio_id")
      .notNull()
      .references(() => studios.id, { onDelete: "cascade" }),
    projectId: text("project_id").references(() => projects.id, { onDelete: "cascade" }),
    actorId: text("actor_id").references(() => users.id, { onDelete: "set null" }),
    action: text("action").notNull(),
    entityType: text("entity_type").notNull(),
    entityId: text("entity_id").notNull(),
    detail: text("detail", { mode: "json" }).$type<Record<string, unknown>>(),
    createdAt: createdAt(),
  },
  (t) => [index("audit_project_idx").on(t.projectId, t.createdAt), index("audit_studio_idx").on(t.studioId, t.createdAt)],
);
export type AuditEntry = typeof auditLog.$inferSelect;
