import type { Metadata } from "next";
import Link from "next/link";
import { todayUtc } from "@/db/queries/attention";
import { getDecisionView } from "@/db/queries/decision-view";
import { ClientDecisionScreen } from "@/components/decisions/client-decision-screen";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";

export const metadata: Metadata = { title: "Decision" };

type Props = { params: Promise<{ decisionId: string }>; searchParams: Promise<{ approved?: string }> };

export default async function ClientDecisionPage({ params, searchParams }: Props) {
  const { decisionId } = await params;
  const { approved } = await searchParams;
  const actor = await requireRole("client");
  const view = await pageGuard(getDecisionView(actor, decisionId));
  return (
    <div className="space-y-4">
      <Link href="/client/decisions" className="inline-flex min-h-tap items-center text-ink-soft underline-offset-4 hover:underline">
        ← All decisions
      </Link>
      <ClientDecisionScreen initial={view} justLocked={approved === "1"} today={todayUtc()} />
    </div>
  );
}
