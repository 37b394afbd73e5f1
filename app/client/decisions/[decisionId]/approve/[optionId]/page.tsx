import type { Metadata } from "next";
import { notFound, redirect } from "next/navigation";
import { getDecisionView } from "@/db/queries/decision-view";
import { ApproveConfirm } from "@/components/decisions/approve-confirm";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";

export const metadata: Metadata = { title: "Approve" };

type Props = { params: Promise<{ decisionId: string; optionId: string }> };

/** One screen that restates exactly what is being approved before the client confirms it. */
export default async function ApprovePage({ params }: Props) {
  const { decisionId, optionId } = await params;
  const actor = await requireRole("client");
  const view = await pageGuard(getDecisionView(actor, decisionId));
  if (view.status === "locked") redirect(`/client/decisions/${view.id}`);
  const option = view.options.find((o) => o.id === optionId && !o.addedByVariation);
  if (!option) notFound();
  return <ApproveConfirm view={view} option={option} />;
}
