import { NextResponse } from "next/server";
import { closeVariation } from "@/db/queries/variations";
import { requireApiUser } from "@/lib/auth/session";
import { route } from "@/lib/http";

type Context = { params: Promise<{ decisionId: string; variationId: string }> };

/** Whoever asked (or the studio) withdraws a variation that isn't decided yet. */
export const POST = route(async (_request, { params }: Context) => {
  const actor = await requireApiUser("designer", "client");
  const { decisionId, variationId } = await params;
  const { variation } = await closeVariation(actor, decisionId, variationId, "withdrawn");
  return NextResponse.json({ variation });
});
