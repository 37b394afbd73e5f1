import { NextResponse } from "next/server";
import { listProjectClientRecipients } from "@/db/queries/decision-people";
import { markDecisionSent } from "@/db/queries/decision-writes";
import { getDecisionAccess } from "@/db/queries/decisions";
import { requireApiUser } from "@/lib/auth/session";
import { sendDecisionWaiting } from "@/lib/decisions/notify";
import { conflict, forbidden, route } from "@/lib/http";

type Context = { params: Promise<{ decisionId: string }> };

/**
 * "Send to client": e-mails the project's clients that the decision is waiting for them, and
 * waits for the mail server so the answer is true. 200 `{ sent: true, delivered }` when every
 * client was e-mailed; 502 `{ error, sent: false, delivered, failed }` when any e-mail could not
 * be sent (the decision stays marked as sent; sending again is safe); 409 when the project has no
 * client to send to (nothing is marked).
 */
export const POST = route(async (_request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { decisionId } = await params;
  const access = await getDecisionAccess(actor, decisionId);
  if (access.role !== "staff") throw forbidden();
  if ((await listProjectClientRecipients(access.project.id)).length === 0) {
    throw conflict("This project has no client yet. Invite the client on the project page, then send it.");
  }
  const { decision, project } = await markDecisionSent(actor, decisionId);
  const { delivered, failed } = await sendDecisionWaiting(project, decision);
  if (failed.length) {
    const error = `Marked as sent, but the e-mail could not be sent to ${failed.join(", ")}: the mail server did not answer. Try “Send to client” again later.`;
    return NextResponse.json({ error, sent: false, delivered, failed }, { status: 502 });
  }
  return NextResponse.json({ sent: true, delivered });
});
