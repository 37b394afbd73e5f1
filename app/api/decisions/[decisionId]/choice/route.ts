import { NextResponse } from "next/server";
import { chooseOption } from "@/db/queries/decision-choices";
import { buildDecisionView } from "@/db/queries/decision-view";
import { getDecisionAccess } from "@/db/queries/decisions";
import { requireApiUser } from "@/lib/auth/session";
import { notifyClientChose } from "@/lib/decisions/notify";
import { readJson, route } from "@/lib/http";
import { choiceSchema } from "@/lib/validation/decision";

type Context = { params: Promise<{ decisionId: string }> };

/** The client picks an option (or changes their mind, with an optional comment). Not an approval. */
export const POST = route(async (request, { params }: Context) => {
  const actor = await requireApiUser("client");
  const { decisionId } = await params;
  await getDecisionAccess(actor, decisionId);
  const input = choiceSchema.parse(await readJson(request));
  const { decision, project, option, changed } = await chooseOption(actor, decisionId, input);
  if (changed) {
    await notifyClientChose(
      project,
      decision,
      { clientId: actor.userId, optionLabel: option.label, approved: false },
    );
  }
  // The decision as this write left it: no need to look up who may see it a third time.
  return NextResponse.json(await buildDecisionView(actor, { decision, project, role: "client" }));
});
