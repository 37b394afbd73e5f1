import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { listBoardsForPicker, listFinishesForPicker } from "@/db/queries/decision-finishes";
import { getDecisionView } from "@/db/queries/decision-view";
import { StudioVariationScreen } from "@/components/decisions/studio-variation-screen";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";

export const metadata: Metadata = { title: "Variation" };

type Props = { params: Promise<{ projectId: string; decisionId: string; variationId: string }> };

export default async function StudioVariationPage({ params }: Props) {
  const { projectId, decisionId, variationId } = await params;
  const actor = await requireRole("designer");
  const view = await pageGuard(getDecisionView(actor, decisionId));
  if (view.projectId !== projectId || view.viewer.role !== "staff" || !view.variations.some((v) => v.id === variationId)) notFound();
  const [finishes, boards] = await Promise.all([listFinishesForPicker(actor.studio?.id ?? ""), listBoardsForPicker(projectId)]);
  return <StudioVariationScreen initial={view} variationId={variationId} finishes={finishes} boards={boards} />;
}
