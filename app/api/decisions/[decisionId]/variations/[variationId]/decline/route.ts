import { NextResponse } from "next/server";
import { closeVariation } from "@/db/queries/variations";
import { requireApiUser } from "@/lib/auth/session";
import { route } from "@/lib/http";

type Context = { params: Promise<{ decisionId: string; variationId: string }> };

/** The client says no to a variation; the decision keeps what it carries. */
export const POST = route(async (_request, { params }: Context) => {
  const actor = await requireApiUser("client");
  const { decisionId, variationId } = await params;
  const { variation } = await closeVariation(actor, decisionId, variationId, "declined");
  return NextResponse.json({ variation });
});
