import { NextResponse } from "next/server";
import { markDecisionSent } from "@/db/queries/decision-writes";
import { requireApiUser } from "@/lib/auth/session";
import { notifyDecisionWaiting } from "@/lib/decisions/notify";
import { route } from "@/lib/http";

type Context = { params: Promise<{ decisionId: string }> };

/** "Send to client": e-mails the project's clients that the decision is waiting for them. */
export const POST = route(async (request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { decisionId } = await params;
  const { decision, project } = await markDecisionSent(actor, decisionId);
  await notifyDecisionWaiting(project, decision);
  return NextResponse.json({ sent: true });
});
