import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { todayUtc } from "@/db/queries/attention";
import { getDecisionView } from "@/db/queries/decision-view";
import { StudioDecisionScreen } from "@/components/decisions/studio-decision-screen";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";

export const metadata: Metadata = { title: "Decision" };

type Props = { params: Promise<{ projectId: string; decisionId: string }> };

export default async function StudioDecisionPage({ params }: Props) {
  const { projectId, decisionId } = await params;
  const actor = await requireRole("designer");
  const view = await pageGuard(getDecisionView(actor, decisionId));
  if (view.projectId !== projectId || view.viewer.role !== "staff") notFound();
  return <StudioDecisionScreen initial={view} today={todayUtc()} />;
}
