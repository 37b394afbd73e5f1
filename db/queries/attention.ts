import { and, asc, eq, lte, ne } from "drizzle-orm";
import { db } from "@/db";
import { decisions, projects, rooms } from "@/db/schema";

/** Decisions still waiting on the client, due within `days` (or already late), soonest first. */
export async function listDecisionsNeedingAttention(studioId: string, today: string, days = 21) {
  const horizon = addDays(today, days);
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
    .where(and(eq(projects.studioId, studioId), ne(decisions.status, "locked"), lte(decisions.dueDate, horizon)))
    .orderBy(asc(decisions.dueDate))
    .limit(20);
}

export function addDays(isoDay: string, days: number): string {
  const date = new Date(`${isoDay}T00:00:00Z`);
  date.setUTCDate(date.getUTCDate() + days);
  return date.toISOString().slice(0, 10);
}

export function todayUtc(): string {
  return new Date().toISOString().slice(0, 10);
}
