import { NextResponse } from "next/server";
import { todayUtc } from "@/db/queries/attention";
import { getDecisionView } from "@/db/queries/decision-view";
import { updateDecision } from "@/db/queries/decision-writes";
import { getDecisionAccess } from "@/db/queries/decisions";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { updateDecisionSchema } from "@/lib/validation/decision";

type Context = { params: Promise<{ decisionId: string }> };

/** One decision as its screen shows it: options, checks, picks, approvals, variations, budget. */
export const GET = route(async (_request, { params }: Context) => {
  const actor = await requireApiUser();
  const { decisionId } = await params;
  return NextResponse.json(await getDecisionView(actor, decisionId));
});

/** A designer edits a decision that isn't approved yet (409 once locked or when stale). */
export const PATCH = route(async (request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { decisionId } = await params;
  await getDecisionAccess(actor, decisionId);
  const input = updateDecisionSchema.parse(await readJson(request));
  await updateDecision(actor, decisionId, input, todayUtc());
  return NextResponse.json(await getDecisionView(actor, decisionId));
});
