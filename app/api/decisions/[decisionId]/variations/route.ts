import { NextResponse } from "next/server";
import { getDecisionAccess } from "@/db/queries/decisions";
import { requestVariation } from "@/db/queries/variations";
import { requireApiUser } from "@/lib/auth/session";
import { notifyVariation } from "@/lib/decisions/notify";
import { readJson, route } from "@/lib/http";
import { variationRequestSchema } from "@/lib/validation/decision";

type Context = { params: Promise<{ decisionId: string }> };

/** A client or a designer asks for a change to a locked decision, with a reason. */
export const POST = route(async (request, { params }: Context) => {
  const actor = await requireApiUser("designer", "client");
  const { decisionId } = await params;
  await getDecisionAccess(actor, decisionId);
  const input = variationRequestSchema.parse(await readJson(request));
  const { project, decision, variation, role } = await requestVariation(actor, decisionId, input);
  // The designers price it; when a designer asked, the clients hear of it too.
  await notifyVariation(project, decision, variation.id, "requested", "staff");
  if (role === "staff") await notifyVariation(project, decision, variation.id, "requested", "clients");
  return NextResponse.json({ variation }, { status: 201 });
});
