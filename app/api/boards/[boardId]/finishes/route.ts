import { NextResponse } from "next/server";
import { findFinishesForBoard } from "@/db/queries/board-finder";
import { requireApiUser } from "@/lib/auth/session";
import { route } from "@/lib/http";
import { finderQuerySchema } from "@/lib/validation/board";
import type { BoardParams } from "../board-response";

/** Finishes to place on this board: `?q=` words, `?category=`, `?near=<finishId>` for similar colours → `{ items, total }`. */
export const GET = route(async (request: Request, { params }: BoardParams) => {
  const actor = await requireApiUser("designer");
  const { boardId } = await params;
  const search = new URL(request.url).searchParams;
  const query = finderQuerySchema.parse({
    q: search.get("q") || undefined,
    category: search.get("category") || undefined,
    near: search.get("near") || undefined,
  });
  return NextResponse.json(await findFinishesForBoard(actor, boardId, query));
});
