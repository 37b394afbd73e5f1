import type { Rect } from "./canvas";
import type { PairIntent } from "./proposed-pairs";
import type { BoardFinish, BoardView } from "./types";

/** Everything a designer can do to a board, as the editor queues it. */
export type BoardChange =
  | { kind: "move"; itemId: string; rect: Rect }
  | { kind: "relabel"; itemId: string; label: string }
  | { kind: "add"; finish: Pick<BoardFinish, "id" | "name" | "category" | "productCode" | "hex" | "lrv" | "lrvSource" | "imageUrl">; label: string; rect: Rect }
  | { kind: "remove"; itemId: string }
  | { kind: "reorder"; itemIds: string[] }
  | { kind: "add-pair"; itemAId: string; itemBId: string; intent: PairIntent; accessRelevant: boolean }
  | { kind: "change-pair"; pairId: string; intent?: PairIntent; accessRelevant?: boolean }
  | { kind: "remove-pair"; pairId: string };

export type ChangeRequest = { method: "POST" | "PATCH" | "DELETE"; path: string; body: Record<string, unknown> };

/** The route and body for a change, given the version it is based on. */
export function describeRequest(boardId: string, version: number, change: BoardChange): ChangeRequest {
  const board = `/api/boards/${encodeURIComponent(boardId)}`;
  switch (change.kind) {
    case "move":
      return { method: "PATCH", path: `${board}/items/${encodeURIComponent(change.itemId)}`, body: { version, ...change.rect } };
    case "relabel":
      return { method: "PATCH", path: `${board}/items/${encodeURIComponent(change.itemId)}`, body: { version, label: change.label } };
    case "add":
      return { method: "POST", path: `${board}/items`, body: { version, finishId: change.finish.id, label: change.label, ...change.rect } };
    case "remove":
      return { method: "DELETE", path: `${board}/items/${encodeURIComponent(change.itemId)}`, body: { version } };
    case "reorder":
      return { method: "POST", path: `${board}/items/order`, body: { version, itemIds: change.itemIds } };
    case "add-pair":
      return {
        method: "POST",
        path: `${board}/pairs`,
        body: { version, itemAId: change.itemAId, itemBId: change.itemBId, intent: change.intent, accessRelevant: change.accessRelevant },
      };
    case "change-pair":
      return { method: "PATCH", path: `${board}/pairs/${encodeURIComponent(change.pairId)}`, body: { version, intent: change.intent, accessRelevant: change.accessRelevant } };
    case "remove-pair":
      return { method: "DELETE", path: `${board}/pairs/${encodeURIComponent(change.pairId)}`, body: { version } };
  }
}

/**
 * The screen's guess at the board after a change, shown at once while the server works. Checks
 * are left as they were (the server's answer brings the new ones a moment later), except that a
 * removed pair's check goes with it.
 */
export function applyChange(view: BoardView, change: BoardChange, tempId: string): BoardView {
  switch (change.kind) {
    case "move":
      return { ...view, items: view.items.map((i) => (i.id === change.itemId ? { ...i, ...change.rect } : i)) };
    case "relabel":
      return { ...view, items: view.items.map((i) => (i.id === change.itemId ? { ...i, label: change.label } : i)) };
    case "add": {
      const top = Math.max(-1, ...view.items.map((i) => i.sortOrder)) + 1;
      const finish: BoardFinish = { ...change.finish, surface: null, lab: [0, 0, 0], tint: change.finish.hex, cautions: [], archived: false };
      return { ...view, items: [...view.items, { id: tempId, label: change.label, ...change.rect, sortOrder: top, finish }] };
    }
    case "remove": {
      const gone = (p: { itemAId: string; itemBId: string }) => p.itemAId === change.itemId || p.itemBId === change.itemId;
      return {
        ...view,
        items: view.items.filter((i) => i.id !== change.itemId),
        pairs: view.pairs.filter((p) => !gone(p)),
        checks: view.checks.filter((c) => !gone(c)),
      };
    }
    case "reorder": {
      const order = new Map(change.itemIds.map((id, i) => [id, i]));
      const items = view.items.map((i) => ({ ...i, sortOrder: order.get(i.id) ?? i.sortOrder }));
      return { ...view, items: items.sort((p, q) => p.sortOrder - q.sortOrder) };
    }
    case "add-pair":
      return {
        ...view,
        pairs: [...view.pairs, { id: tempId, itemAId: change.itemAId, itemBId: change.itemBId, intent: change.intent, accessRelevant: change.accessRelevant }],
        proposals: view.proposals.filter((p) => !(samePair(p, change))),
      };
    case "change-pair":
      return {
        ...view,
        pairs: view.pairs.map((p) =>
          p.id === change.pairId ? { ...p, intent: change.intent ?? p.intent, accessRelevant: change.accessRelevant ?? p.accessRelevant } : p,
        ),
      };
    case "remove-pair":
      return { ...view, pairs: view.pairs.filter((p) => p.id !== change.pairId), checks: view.checks.filter((c) => c.pairId !== change.pairId) };
  }
}

function samePair(x: { itemAId: string; itemBId: string }, y: { itemAId: string; itemBId: string }) {
  return (x.itemAId === y.itemAId && x.itemBId === y.itemBId) || (x.itemAId === y.itemBId && x.itemBId === y.itemAId);
}
