import { NextResponse } from "next/server";
import { approveDecision } from "@/db/queries/decision-choices";
import { getDecisionView } from "@/db/queries/decision-view";
import { getDecisionAccess } from "@/db/queries/decisions";
import { requireApiUser } from "@/lib/auth/session";
import { notifyClientChose } from "@/lib/decisions/notify";
import { readJson, route } from "@/lib/http";
import { approveSchema } from "@/lib/validation/decision";

type Context = { params: Promise<{ decisionId: string }> };

/** The client approves one option with `confirm: true`; the decision locks. 409 if it already is. */
export const POST = route(async (request, { params }: Context) => {
  const actor = await requireApiUser("client");
  const { decisionId } = await params;
  await getDecisionAccess(actor, decisionId);
  const input = approveSchema.parse(await readJson(request));
  const { decision, project, option } = await approveDecision(actor, decisionId, input);
  await notifyClientChose(
    project,
    decision,
    { clientId: actor.userId, optionLabel: option.label, approved: true },
  );
  return NextResponse.json(await getDecisionView(actor, decisionId));
});
