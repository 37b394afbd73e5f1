import { and, asc, desc, eq, sql, type SQL } from "drizzle-orm";
import { db } from "@/db";
import { auditLog, users } from "@/db/schema";
import { ACTIVITY_PAGE_SIZE, activityKinds, BOARD_EDIT_GAP_MS, boardEditActions, type ActivityKind } from "@/lib/activity/kinds";

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
  /** When it happened, if the record itself carries a time (an approval's approvedAt): both then say the same. */
  at?: Date;
};

/** Pass the transaction when the audited change is part of one, so both land or neither does. */
export async function writeAudit({ at, ...entry }: AuditInput, executor: Executor = db) {
  await executor.insert(auditLog).values(at ? { ...entry, createdAt: at } : entry);
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
      actorId: auditLog.actorId,
      // A client's or supplier's name as this studio typed it, never as another studio stored it.
      actorName: nameOnProject(projectId),
      actorEmail: users.email,
    })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.actorId))
    .where(and(eq(auditLog.studioId, studioId), eq(auditLog.projectId, projectId)))
    .orderBy(desc(auditLog.createdAt), desc(sql`${auditLog}.rowid`))
    .limit(limit);
}

/** One line of the activity log: a single action, or one person's run of edits on one board. */
export type ActivityEntry = {
  key: string;
  actorId: string | null;
  actorName: string | null;
  action: string;
  entityId: string;
  /** The newest action's detail; for a run of board edits, each edit's action and detail, oldest first. */
  detail: Record<string, unknown> | null;
  parts: { action: string; detail: Record<string, unknown> | null }[];
  at: Date;
  firstAt: Date;
};

export type ActivityFilter = { kind?: ActivityKind; actorId?: string; page?: number };

function kindCondition(kind: ActivityKind): SQL {
  const { actions, prefixes } = activityKinds[kind];
  const parts: SQL[] = [
    ...actions.map((a) => sql`a."action" = ${a}`),
    ...prefixes.map((p) => sql`a."action" like ${`${p}%`}`),
  ];
  return sql`(${sql.join(parts, sql` or `)})`;
}

const list = (values: readonly string[]) => sql.join(values.map((v) => sql`${v}`), sql`, `);

type Row = { key: string; actor_id: string | null; actor_name: string | null; action: string; entity_id: string; parts: string; at: number; first_at: number; total: number };

/**
 * A page of the project's activity, newest first, 50 to a page. Rows are only ever added (one per
 * save); a person's board edits less than five minutes apart are shown as one entry, worked out
 * here with window functions rather than by changing stored rows.
 */
export type ActivityPage = { entries: ActivityEntry[]; page: number; pageCount: number; total: number };

export async function readActivityPage(studioId: string, projectId: string, filter: ActivityFilter = {}): Promise<ActivityPage> {
  const page = Math.max(1, Math.floor(filter.page ?? 1));
  const where = [sql`a."studio_id" = ${studioId}`, sql`a."project_id" = ${projectId}`];
  if (filter.kind) where.push(kindCondition(filter.kind));
  if (filter.actorId) where.push(sql`a."actor_id" = ${filter.actorId}`);
  const rows = await db.all<Row>(sql`
    with base as (
      select a."id", a."actor_id", a."action", a."entity_id", a."detail", a."created_at", a.rowid as seq,
        case when a."action" in (${list(boardEditActions)}) then 1 else 0 end as is_edit
      from "audit_log" a where ${sql.join(where, sql` and `)}
    ),
    marked as (
      select *, case when is_edit = 1 and "created_at" - lag("created_at") over w <= ${BOARD_EDIT_GAP_MS} then 0 else 1 end as starts
      from base window w as (partition by is_edit, "actor_id", "entity_id" order by "created_at", seq)
    ),
    runs as (
      select *, sum(starts) over (partition by is_edit, "actor_id", "entity_id" order by "created_at", seq rows unbounded preceding) as run
      from marked
    ),
    entries as (
      select
        case when is_edit = 1 then 'edits:' || coalesce("actor_id", '') || ':' || "entity_id" || ':' || run else "id" end as key,
        max("actor_id") as actor_id, max("action") as action, max("entity_id") as entity_id,
        json_group_array(json_object('action', "action", 'detail', json("detail"))) as parts,
        max("created_at") as at, min("created_at") as first_at, max(seq) as last_seq
      from (select * from runs order by "created_at", seq)
      group by key
    )
    select e.key, e.actor_id, e.action, e.entity_id, e.parts, e.at, e.first_at, count(*) over () as total,
      ${nameOnProject(projectId)} as actor_name
    from entries e left join "user" on "user"."id" = e.actor_id
    order by e.at desc, e.last_seq desc
    limit ${ACTIVITY_PAGE_SIZE} offset ${(page - 1) * ACTIVITY_PAGE_SIZE}
  `);
  const entries: ActivityEntry[] = rows.map((r) => {
    const parts = JSON.parse(r.parts) as ActivityEntry["parts"];
    return {
      key: r.key,
      actorId: r.actor_id,
      actorName: r.actor_name,
      action: r.key.startsWith("edits:") ? "board.edits" : r.action,
      entityId: r.entity_id,
      detail: parts[parts.length - 1]?.detail ?? null,
      parts,
      at: new Date(r.at),
      firstAt: new Date(r.first_at),
    };
  });
  const total: number = rows[0]?.total ?? (page > 1 ? await countEntries(studioId, projectId, filter) : 0);
  return { entries, page, pageCount: Math.max(1, Math.ceil(total / ACTIVITY_PAGE_SIZE)), total };
}

async function countEntries(studioId: string, projectId: string, filter: ActivityFilter): Promise<number> {
  // Past the last page: read the first page's count rather than repeat the query's grouping here.
  return (await readActivityPage(studioId, projectId, { ...filter, page: 1 })).total;
}

/** Everyone who has done something on the project, for the log's "by whom" filter. */
export async function listActivityPeople(studioId: string, projectId: string) {
  return db
    .selectDistinct({ id: users.id, name: nameOnProject(projectId) })
    .from(auditLog)
    .innerJoin(users, eq(users.id, auditLog.actorId))
    .where(and(eq(auditLog.studioId, studioId), eq(auditLog.projectId, projectId)))
    .orderBy(asc(nameOnProject(projectId)));
}
