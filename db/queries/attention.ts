import { and, asc, eq, inArray, isNull, lte } from "drizzle-orm";
import { db } from "@/db";
import { decisions, projects, rooms, variations } from "@/db/schema";
import { readLatestRevisions, readLateLines, readUnacknowledged, readSpecsNeedingRevision } from "./attention-handoff";
import type { Actor } from "./users";

/** How far ahead a decision's due date counts as waiting on the studio (days). */
export const DUE_WITHIN_DAYS = 14;
const LIMIT = 20;

const live = (studioId: string) => and(eq(projects.studioId, studioId), isNull(projects.archivedAt));

/** Decisions still open or chosen, due within `days` or already late, soonest first. */
export async function listDecisionsNeedingAttention(studioId: string, today: string, days = DUE_WITHIN_DAYS) {
  return db
    .select({
      id: decisions.id,
      title: decisions.title,
      dueDate: decisions.dueDate,
      status: decisions.status,
      projectId: projects.id,
      projectName: projects.name,
      roomName: rooms.name,
    })
    .from(decisions)
    .innerJoin(projects, eq(projects.id, decisions.projectId))
    .innerJoin(rooms, eq(rooms.id, decisions.roomId))
    .where(and(live(studioId), inArray(decisions.status, ["open", "chosen"]), lte(decisions.dueDate, addDays(today, days))))
    .orderBy(asc(decisions.dueDate), asc(decisions.title))
    .limit(LIMIT);
}

/** Variations a client asked for that the studio has not priced yet, oldest first. */
async function listVariationsToPrice(studioId: string) {
  return db
    .select({
      id: variations.id,
      decisionId: decisions.id,
      title: decisions.title,
      reason: variations.reason,
      requestedAt: variations.createdAt,
      projectId: projects.id,
      projectName: projects.name,
    })
    .from(variations)
    .innerJoin(decisions, eq(decisions.id, variations.decisionId))
    .innerJoin(projects, eq(projects.id, decisions.projectId))
    .where(and(live(studioId), eq(variations.status, "requested")))
    .orderBy(asc(variations.createdAt))
    .limit(LIMIT);
}

/**
 * What is waiting on the studio across its live projects, each with where it is dealt with:
 * decisions due, variations to price, specifications that need a new revision, suppliers who
 * have not acknowledged the latest revision, and lines late against their order-by date.
 * Six reads, each on an index (decision project/due, variation decision, revision project/sequence,
 * spec line revision/supplier, audit project/time).
 */
export async function getStudioAttention(actor: Actor, today: string) {
  // Staff only; anyone else's studio is "none", so every read below finds nothing.
  const studioId = actor.studio?.id ?? "";
  const [due, toPrice, needsRevision, latest] = await Promise.all([
    listDecisionsNeedingAttention(studioId, today),
    listVariationsToPrice(studioId),
    readSpecsNeedingRevision(studioId),
    readLatestRevisions(studioId),
  ]);
  const [unacknowledged, late] = await Promise.all([readUnacknowledged(latest), readLateLines(latest, today)]);
  return { due, toPrice, needsRevision, unacknowledged, late };
}

export type StudioAttention = Awaited<ReturnType<typeof getStudioAttention>>;

export function countAttention(a: StudioAttention): number {
  return a.due.length + a.toPrice.length + a.needsRevision.length + a.unacknowledged.length + a.late.length;
}

export function addDays(isoDay: string, days: number): string {
  const date = new Date(`${isoDay}T00:00:00Z`);
  date.setUTCDate(date.getUTCDate() + days);
  return date.toISOString().slice(0, 10);
}

export function todayUtc(): string {
  return new Date().toISOString().slice(0, 10);
}

