import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { boards, rooms } from "@/db/schema";
import { computeBoardChecks, countVerdicts, tintForLight } from "@/lib/boards/board-checks";
import { resolveThresholds } from "@/lib/boards/check-settings";
import { DAYLIGHT } from "@/lib/boards/lights";
import type { BoardList, BoardSummary, BoardView } from "@/lib/boards/types";
import { assembleBoardView } from "@/lib/boards/view";
import { encodeJson, HttpError, type JsonBytes } from "@/lib/http";
import type { CreateBoardInput } from "@/lib/validation/board";
import { writeAudit } from "./audit";
import { boardAccess, getStudioThresholds, openProjectForBoards, readBoardHead } from "./board-access";
import { readItemRows, readPairRows } from "./board-rows";
import { runBoardWrite } from "./board-version";
import { readCache } from "./read-cache";
import type { Actor } from "./users";

const boardHeads = readCache<Awaited<ReturnType<typeof readBoardHead>>>("board-head", 2000);
const boardViews = readCache<BoardView>("board-view", 100);
const boardJson = readCache<JsonBytes>("board-json", 200);

/**
 * Who may see the board is decided on every call, outside the caches; what they see is the same
 * for everyone with the same access, so it is cached per light and access until the next write
 * (read-cache.ts).
 */
async function openCachedBoard(actor: Actor, boardId: string, cct: number) {
  const head = await boardHeads(boardId, () => readBoardHead(boardId));
  const access = boardAccess(actor, head.project, "read");
  const key = `${boardId}|${cct}|${access}`;
  const view = () => boardViews(key, () => assembleFromHead(head, cct, access));
  return { key, view };
}

/** The board with its items, pairs and checks under one light (daylight unless told). */
export async function getBoardView(actor: Actor, boardId: string, cct: number = DAYLIGHT.cct): Promise<BoardView> {
  return (await openCachedBoard(actor, boardId, cct)).view();
}

/** The same view as UTF-8 JSON, for GET /api/boards/:id: a repeat read is neither serialised nor encoded again. */
export async function getBoardJson(actor: Actor, boardId: string, cct: number = DAYLIGHT.cct): Promise<JsonBytes> {
  const { key, view } = await openCachedBoard(actor, boardId, cct);
  return boardJson(key, async () => encodeJson(await view()));
}

async function assembleFromHead({ board, project, room, checkSettings, accessStandard }: Awaited<ReturnType<typeof readBoardHead>>, cct: number, access: "edit" | "read") {
  const [items, pairs] = await Promise.all([readItemRows([board.id]), readPairRows([board.id])]);
  const { thresholds, settingsIgnored } = resolveThresholds(checkSettings, accessStandard);
  return assembleBoardView({
    board: { id: board.id, name: board.name, version: board.version, updatedAt: board.updatedAt },
    project: { id: project.id, name: project.name },
    room: { id: room.id, name: room.name },
    access,
    items,
    pairs: pairs.map(({ boardId: _b, ...pair }) => pair),
    cct,
    thresholds,
    settingsIgnored,
  });
}

/** Every room of the project with its boards, each with a verdict count in daylight. */
export async function listBoards(actor: Actor, projectId: string): Promise<BoardList> {
  const { project, access } = await openProjectForBoards(actor, projectId, "read");
  const [roomRows, boardRows, { thresholds }] = await Promise.all([
    db.select().from(rooms).where(eq(rooms.projectId, project.id)).orderBy(asc(rooms.sortOrder), asc(rooms.name)),
    db.select().from(boards).where(eq(boards.projectId, project.id)).orderBy(asc(boards.createdAt), asc(boards.name)),
    getStudioThresholds(project.studioId),
  ]);
  const ids = boardRows.map((b) => b.id);
  const [items, pairs] = await Promise.all([readItemRows(ids), readPairRows(ids)]);
  const summaries = boardRows.map((board): BoardSummary => {
    const mine = items.filter((i) => i.boardId === board.id);
    const checked = mine.map((i) => ({ id: i.id, lab: [i.labL, i.labA, i.labB] as const, lrv: i.lrv }));
    const minePairs = pairs.filter((p) => p.boardId === board.id);
    const checks = computeBoardChecks(checked, minePairs, DAYLIGHT.cct, thresholds);
    return {
      id: board.id,
      name: board.name,
      roomId: board.roomId,
      version: board.version,
      updatedAt: board.updatedAt.toISOString(),
      itemCount: mine.length,
      pairCount: minePairs.length,
      counts: countVerdicts(checks),
      preview: [...mine].sort((p, q) => q.width * q.height - p.width * p.height).slice(0, 6).map((i) => tintForLight([i.labL, i.labA, i.labB], DAYLIGHT.cct)),
    };
  });
  return {
    project: { id: project.id, name: project.name },
    access,
    rooms: roomRows.map((room) => ({ id: room.id, name: room.name, boards: summaries.filter((b) => b.roomId === room.id) })),
  };
}

/** A new, empty board in one of the project's rooms. */
export async function createBoard(actor: Actor, projectId: string, input: CreateBoardInput) {
  const { project } = await openProjectForBoards(actor, projectId, "edit");
  const room = await db.query.rooms.findFirst({ where: and(eq(rooms.id, input.roomId), eq(rooms.projectId, project.id)) });
  if (!room) throw new HttpError(400, "Choose one of this project's rooms.", { roomId: ["Choose one of this project's rooms."] });
  return runBoardWrite(async (tx) => {
    const [board] = await tx.insert(boards).values({ projectId: project.id, roomId: room.id, name: input.name }).returning();
    if (!board) throw new Error("board insert returned nothing");
    await writeAudit(
      { studioId: project.studioId, projectId: project.id, actorId: actor.userId, action: "board.created", entityType: "board", entityId: board.id, detail: { name: board.name } },
      tx,
    );
    return board;
  });
}
