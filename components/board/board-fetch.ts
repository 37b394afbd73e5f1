import type { ChangeRequest } from "@/lib/boards/changes";
import type { BoardView } from "@/lib/boards/types";

/** A failed request with its status, so the screen can tell a stale version (409) from the rest. */
export class BoardRequestError extends Error {
  constructor(
    readonly status: number,
    message: string,
  ) {
    super(message);
  }
}

async function readAnswer<T>(res: Response): Promise<T> {
  const body: unknown = await res.json().catch(() => null);
  if (!res.ok) {
    const message =
      body && typeof body === "object" && "error" in body && typeof body.error === "string"
        ? body.error
        : "We could not reach Mottle. Check your connection and try again.";
    throw new BoardRequestError(res.status, message);
  }
  return body as T;
}

export const boardKey = (boardId: string, cct: number) => ["board", boardId, cct] as const;

export async function fetchBoard(boardId: string, cct: number): Promise<BoardView> {
  return readAnswer<BoardView>(await fetch(`/api/boards/${encodeURIComponent(boardId)}?cct=${cct}`, { headers: { accept: "application/json" } }));
}

export async function sendChange(request: ChangeRequest, cct: number): Promise<BoardView> {
  const res = await fetch(`${request.path}?cct=${cct}`, {
    method: request.method,
    headers: { "content-type": "application/json", accept: "application/json" },
    body: JSON.stringify(request.body),
  });
  return readAnswer<BoardView>(res);
}

export async function fetchJson<T>(path: string): Promise<T> {
  return readAnswer<T>(await fetch(path, { headers: { accept: "application/json" } }));
}

export async function postJson<T>(path: string, body: unknown): Promise<T> {
  return readAnswer<T>(
    await fetch(path, { method: "POST", headers: { "content-type": "application/json", accept: "application/json" }, body: JSON.stringify(body) }),
  );
}
