import { NextResponse } from "next/server";
import { todayUtc } from "@/db/queries/attention";
import { getDecisionView } from "@/db/queries/decision-view";
import { createDecision } from "@/db/queries/decision-writes";
import { listDecisionsForProject } from "@/db/queries/decisions";
import { getProjectForStaff } from "@/db/queries/projects";
import { requireApiUser } from "@/lib/auth/session";
import { notifyDecisionWaiting } from "@/lib/decisions/notify";
import { readJson, route } from "@/lib/http";
import { createDecisionSchema } from "@/lib/validation/decision";

type Context = { params: Promise<{ projectId: string }> };

/** The project's decisions, soonest due first, and its running total against its allowances. */
export const GET = route(async (_request, { params }: Context) => {
  const actor = await requireApiUser();
  const { projectId } = await params;
  const { items, budget } = await listDecisionsForProject(actor, projectId);
  return NextResponse.json({ items, budget });
});

/** A designer opens a decision with two to four options; the clients are e-mailed unless notify is false. */
export const POST = route(async (request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { projectId } = await params;
  await getProjectForStaff(actor, projectId);
  const input = createDecisionSchema(todayUtc()).parse(await readJson(request));
  const { decision, project } = await createDecision(actor, projectId, input);
  if (input.notify) await notifyDecisionWaiting(project, decision);
  return NextResponse.json(await getDecisionView(actor, decision.id), { status: 201 });
});
