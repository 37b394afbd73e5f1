import type { BoardEditAction } from "@/lib/activity/kinds";
import { writeAudit } from "./audit";
import type { Tx } from "./board-version";
import type { Actor } from "./users";

type BoardRef = { id: string; name: string };
type ProjectRef = { id: string; studioId: string };

/** One saved board edit, in the same transaction as the edit; the activity log gathers a run of them into one entry. */
export function auditBoardEdit(tx: Tx, actor: Actor, board: BoardRef, project: ProjectRef, action: BoardEditAction, detail: Record<string, unknown> = {}) {
  return writeAudit(
    { studioId: project.studioId, projectId: project.id, actorId: actor.userId, action, entityType: "board", entityId: board.id, detail: { board: board.name, ...detail } },
    tx,
  );
}
