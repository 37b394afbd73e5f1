import { NextResponse } from "next/server";
import { getRevisionView } from "@/db/queries/spec-revision-view";
import { requireApiUser } from "@/lib/auth/session";
import { route } from "@/lib/http";
import { refuseEdit } from "@/lib/spec/frozen";
import { toRevisionJson } from "@/lib/spec/revision-json";

type Context = { params: Promise<{ revisionId: string }> };

/** One revision with its hash, filtered to what the caller may see (a supplier: their lines only). */
export const GET = route(async (_request: Request, { params }: Context) => {
  const actor = await requireApiUser();
  const { revisionId } = await params;
  return NextResponse.json(toRevisionJson(await getRevisionView(actor, revisionId)), { headers: { "Cache-Control": "private, no-store" } });
});

export const PATCH = refuseEdit("GET");
export const PUT = refuseEdit("GET");
export const DELETE = refuseEdit("GET");
