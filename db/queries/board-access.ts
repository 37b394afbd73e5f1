import { eq } from "drizzle-orm";
import { db } from "@/db";
import { boards, projects, rooms, studios } from "@/db/schema";
import { projectRole } from "@/lib/auth/permissions";
import { resolveThresholds } from "@/lib/boards/check-settings";
import { forbidden, notFound } from "@/lib/http";
import type { Actor } from "./users";

export type BoardMode = "read" | "edit";

/**
 * Boards follow their project: the studio's staff edit, the project's clients read, and nobody
 * else sees them. Suppliers are on the project but only ever see locked lines, so they get 403;
 * anyone not on the project gets 404, as if the board did not exist.
 */
function checkRole(role: ReturnType<typeof projectRole>, mode: BoardMode, what: string): "edit" | "read" {
  if (!role) throw notFound(what);
  if (role === "supplier") throw forbidden();
  if (mode === "edit" && role !== "staff") throw forbidden();
  return role === "staff" ? "edit" : "read";
}

export async function openProjectForBoards(actor: Actor, projectId: string, mode: BoardMode) {
  const project = await db.query.projects.findFirst({ where: eq(projects.id, projectId) });
  if (!project) throw notFound("That project");
  const access = checkRole(projectRole(actor, project.id, project.studioId), mode, "That project");
  return { project, access };
}

/** A board with its project, room and the studio's check settings, whoever asks; 404 if there is none. */
export async function readBoardHead(boardId: string) {
  const [row] = await db
    .select({ board: boards, project: projects, room: rooms, checkSettings: studios.checkSettings, accessStandard: studios.accessStandard })
    .from(boards)
    .innerJoin(projects, eq(projects.id, boards.projectId))
    .innerJoin(rooms, eq(rooms.id, boards.roomId))
    .innerJoin(studios, eq(studios.id, projects.studioId))
    .where(eq(boards.id, boardId))
    .limit(1);
  if (!row) throw notFound("That board");
  return row;
}

/** What this person may do with a board of this project, or 404/403 as above. */
export function boardAccess(actor: Actor, project: { id: string; studioId: string }, mode: BoardMode) {
  return checkRole(projectRole(actor, project.id, project.studioId), mode, "That board");
}

/** A board with its project, room and the studio's check settings, or 404/403 as above. */
export async function openBoard(actor: Actor, boardId: string, mode: BoardMode) {
  const row = await readBoardHead(boardId);
  return { ...row, access: boardAccess(actor, row.project, mode) };
}

/** The thresholds this studio's checks use: its own settings over the defaults, and its access standard. */
export async function getStudioThresholds(studioId: string) {
  const studio = await db.query.studios.findFirst({ where: eq(studios.id, studioId), columns: { checkSettings: true, accessStandard: true } });
  return resolveThresholds(studio?.checkSettings ?? null, studio?.accessStandard);
}
