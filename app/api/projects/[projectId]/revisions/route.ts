import { NextResponse } from "next/server";
import { listRevisionsForActor } from "@/db/queries/spec-revision-view";
import { requireApiUser } from "@/lib/auth/session";
import { route } from "@/lib/http";
import { issueRevisionAndNotify } from "@/lib/spec/notify";

type Context = { params: Promise<{ projectId: string }> };

/** Revisions of the project the caller may see, newest first. */
export const GET = route(async (_request: Request, { params }: Context) => {
  const actor = await requireApiUser();
  const { projectId } = await params;
  return NextResponse.json({ items: await listRevisionsForActor(actor, projectId) });
});

/** Studio staff: freeze the current specification as the next revision and e-mail its suppliers. */
export const POST = route(async (request: Request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { projectId } = await params;
  const issued = await issueRevisionAndNotify(actor, projectId);
  const { id, letter, sequence, sha256, issuedAt } = issued.revision;
  return NextResponse.json(
    { id, letter, sequence, sha256, issuedAt, lineCount: issued.lines.length, notified: issued.notified },
    { status: 201, headers: { Location: `/api/revisions/${id}` } },
  );
});
