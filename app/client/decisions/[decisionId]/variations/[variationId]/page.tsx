import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { getDecisionView } from "@/db/queries/decision-view";
import { ClientVariationScreen } from "@/components/decisions/client-variation-screen";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";

export const metadata: Metadata = { title: "Variation" };

type Props = { params: Promise<{ decisionId: string; variationId: string }> };

export default async function ClientVariationPage({ params }: Props) {
  const { decisionId, variationId } = await params;
  const actor = await requireRole("client");
  const view = await pageGuard(getDecisionView(actor, decisionId));
  if (!view.variations.some((v) => v.id === variationId)) notFound();
  return <ClientVariationScreen initial={view} variationId={variationId} />;
}
