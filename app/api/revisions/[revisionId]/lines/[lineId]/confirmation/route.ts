import { NextResponse } from "next/server";
import { confirmLineStands } from "@/db/queries/spec-handoff";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { lineConfirmationSchema } from "@/lib/validation/line-confirmation";

type Context = { params: Promise<{ revisionId: string; lineId: string }> };

/**
 * The designer confirms that an issued line stands although an approved variation changed its
 * decision: 201 the first time, 200 when it already stands; 409 for a line nothing changed or a
 * replaced revision. Clients and suppliers are refused before anything is read.
 */
export const POST = route(async (request: Request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { revisionId, lineId } = await params;
  const input = lineConfirmationSchema.parse(await readJson(request));
  const result = await confirmLineStands(actor, revisionId, lineId, input);
  return NextResponse.json(result.confirmation, { status: result.created ? 201 : 200 });
});
