import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { getDecisionView } from "@/db/queries/decision-view";
import { listBoardsForPicker, listFinishesForPicker } from "@/db/queries/decision-finishes";
import { listRooms } from "@/db/queries/projects";
import { getStudioRates } from "@/db/queries/studio-settings";
import { draftFromView } from "@/components/decisions/decision-draft";
import { DecisionForm } from "@/components/decisions/decision-form";
import { LinkButton, Notice, PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";

export const metadata: Metadata = { title: "Edit decision" };

type Props = { params: Promise<{ projectId: string; decisionId: string }> };

export default async function EditDecisionPage({ params }: Props) {
  const { projectId, decisionId } = await params;
  const actor = await requireRole("designer");
  const view = await pageGuard(getDecisionView(actor, decisionId));
  if (view.projectId !== projectId || view.viewer.role !== "staff") notFound();
  const back = `/studio/projects/${projectId}/decisions/${decisionId}`;
  if (view.status === "locked") {
    // Locked means locked: no form at all, only the way forward.
    return (
      <div className="space-y-6">
        <PageHeader title={`Edit ${view.title}`} />
        <Notice tone="info" title="This decision is approved and locked">
          Nobody can edit it. To change it, record a variation on the decision: you price it, the client approves it.
        </Notice>
        <LinkButton href={back}>Back to the decision</LinkButton>
      </div>
    );
  }
  const studioId = actor.studio?.id ?? "";
  const [rooms, boards, finishes] = await Promise.all([listRooms(projectId), listBoardsForPicker(projectId), listFinishesForPicker(studioId)]);
  return (
    <div className="space-y-8">
      <PageHeader
        title={`Edit ${view.title}`}
        description={view.choices.length ? "The clients have already picked. Options you keep keep their picks; an option you remove takes its picks with it." : undefined}
      />
      <DecisionForm
        projectId={projectId}
        installDate={view.installDate}
        rooms={rooms}
        boards={boards}
        finishes={finishes}
        rates={view.rates ?? (await getStudioRates(studioId))}
        initial={draftFromView(view)}
        editing={{ decisionId, version: view.version }}
      />
    </div>
  );
}
