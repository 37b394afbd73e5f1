import { NextResponse } from "next/server";
import { getRevisionView } from "@/db/queries/spec-revision-view";
import { requireApiUser } from "@/lib/auth/session";
import { route } from "@/lib/http";
import { refuseEdit } from "@/lib/spec/frozen";

type Context = { params: Promise<{ revisionId: string }> };

/** One revision with its hash, filtered to what the caller may see (a supplier: their lines only). */
export const GET = route(async (_request: Request, { params }: Context) => {
  const actor = await requireApiUser();
  const { revisionId } = await params;
  const view = await getRevisionView(actor, revisionId);
  return NextResponse.json({
    ...view.revision,
    verified: view.verified,
    issuedBy: view.issuedBy,
    project: view.project,
    scope: view.scope,
    content: view.content,
    lines: view.lines,
    acknowledgements: view.acknowledgements,
    changes: view.changes ? { since: view.baseline, ...view.changes } : null,
    newer: view.newer,
    suppliers: view.suppliers,
  });
});

export const PATCH = refuseEdit("GET");
export const PUT = refuseEdit("GET");
export const DELETE = refuseEdit("GET");
