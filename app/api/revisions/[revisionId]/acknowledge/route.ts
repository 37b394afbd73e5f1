import { NextResponse } from "next/server";
import { requireApiUser } from "@/lib/auth/session";
import { route } from "@/lib/http";
import { acknowledgeRevisionAndNotify } from "@/lib/spec/notify";

type Context = { params: Promise<{ revisionId: string }> };

/** A supplier's contact acknowledges receipt: 201 the first time, 200 with the same record after. */
export const POST = route(async (request: Request, { params }: Context) => {
  const actor = await requireApiUser("supplier");
  const { revisionId } = await params;
  const result = await acknowledgeRevisionAndNotify(actor, revisionId);
  const { supplierId, acknowledgedAt } = result.acknowledgement;
  return NextResponse.json(
    { revisionId: result.revision.id, letter: result.revision.letter, supplierId, acknowledgedAt, created: result.created },
    { status: result.created ? 201 : 200 },
  );
});
