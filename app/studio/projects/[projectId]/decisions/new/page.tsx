import type { Metadata } from "next";
import { listBoardsForPicker, listFinishesForPicker } from "@/db/queries/decision-finishes";
import { getProjectForStaff, listRooms } from "@/db/queries/projects";
import { getStudioRates } from "@/db/queries/studio-settings";
import { emptyDraft } from "@/components/decisions/decision-draft";
import { DecisionForm } from "@/components/decisions/decision-form";
import { EmptyState, LinkButton, PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";

export const metadata: Metadata = { title: "New decision" };

type Props = { params: Promise<{ projectId: string }> };

export default async function NewDecisionPage({ params }: Props) {
  const { projectId } = await params;
  const actor = await requireRole("designer");
  const project = await pageGuard(getProjectForStaff(actor, projectId));
  const [rooms, boards, finishes, rates] = await Promise.all([
    listRooms(project.id),
    listBoardsForPicker(project.id),
    listFinishesForPicker(project.studioId),
    getStudioRates(project.studioId),
  ]);
  const firstRoom = rooms[0];
  return (
    <div className="space-y-8">
      <PageHeader title="New decision" description="Two to four options for the clients to compare, each with its finishes; prices are worked out from the library and the studio's markup and tax." />
      {firstRoom ? (
        <DecisionForm projectId={project.id} installDate={project.installDate} rooms={rooms} boards={boards} finishes={finishes} rates={rates} initial={emptyDraft(firstRoom.id)} />
      ) : (
        <EmptyState title="This project has no rooms" action={<LinkButton href={`/studio/projects/${project.id}`}>Back to the project</LinkButton>}>
          A decision belongs to a room. Add the project&apos;s rooms first.
        </EmptyState>
      )}
    </div>
  );
}
