import { NextResponse } from "next/server";
import { getBoardView } from "@/db/queries/boards";
import type { Actor } from "@/db/queries/users";
import { readJson } from "@/lib/http";
import { readCct, versionOnlySchema } from "@/lib/validation/board";

export type BoardParams = { params: Promise<{ boardId: string }> };

/**
 * Every board write answers with the whole board as it now stands (new version, checks under the
 * light named by `?cct=`), so the screen can replace its copy without a second request.
 */
export async function respondWithBoard(actor: Actor, boardId: string, request: Request, status = 200, createdId?: string) {
  const view = await getBoardView(actor, boardId, readCct(request));
  return NextResponse.json(createdId ? { ...view, createdId } : view, { status });
}

/** DELETE carries the version in a JSON body, or as `?version=` for clients that send no body. */
export async function readDeleteVersion(request: Request): Promise<number> {
  const fromQuery = new URL(request.url).searchParams.get("version");
  const body = fromQuery !== null ? { version: Number(fromQuery) } : await readJson(request);
  return versionOnlySchema.parse(body).version;
}
