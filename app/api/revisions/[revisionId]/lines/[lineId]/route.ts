import { NextResponse } from "next/server";
import { recordLineOrder, refuseContentEdits } from "@/db/queries/spec-handoff";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { refuseEdit } from "@/lib/spec/frozen";
import { lineOrderSchema } from "@/lib/validation/spec";

type Context = { params: Promise<{ revisionId: string; lineId: string }> };

/**
 * A supplier records the order and expected-delivery dates of one of their lines. Only those two
 * fields: a body that names a frozen field (quantity, finish…) is refused with 409.
 */
export const PATCH = route(async (request: Request, { params }: Context) => {
  const actor = await requireApiUser("supplier");
  const { revisionId, lineId } = await params;
  const body = await readJson(request);
  refuseContentEdits(body);
  const input = lineOrderSchema.parse(body);
  return NextResponse.json(await recordLineOrder(actor, revisionId, lineId, input));
});

export const PUT = refuseEdit("PATCH");
export const DELETE = refuseEdit("PATCH");
