import type { Metadata } from "next";
import Link from "next/link";
import { getDecisionView } from "@/db/queries/decision-view";
import { VariationRequestForm } from "@/components/decisions/variation-request-form";
import { Notice } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";

export const metadata: Metadata = { title: "Ask for a change" };

type Props = { params: Promise<{ decisionId: string }> };

export default async function ClientNewVariationPage({ params }: Props) {
  const { decisionId } = await params;
  const actor = await requireRole("client");
  const view = await pageGuard(getDecisionView(actor, decisionId));
  const busy = view.variations.some((v) => v.status === "requested" || v.status === "priced");
  const carried = view.options.find((o) => o.id === view.lockedOptionId);
  const back = (
    <Link href={`/client/decisions/${view.id}`} className="inline-flex min-h-tap items-center text-ink-soft underline-offset-4 hover:underline">
      ← {view.title}
    </Link>
  );
  if (view.status !== "locked" || busy) {
    return (
      <div className="mx-auto max-w-2xl space-y-6">
        {back}
        <h1 className="font-display text-3xl font-semibold">Ask for a change</h1>
        <Notice tone="info">
          {view.status !== "locked"
            ? `${view.title} isn't approved yet, so you can still change your pick on the decision itself.`
            : "A change to this decision is already under way. Once it is approved, declined or withdrawn you can ask for another."}
        </Notice>
      </div>
    );
  }
  return (
    <div className="mx-auto max-w-2xl space-y-6">
      {back}
      <h1 className="font-display text-3xl font-semibold">Ask for a change</h1>
      <p className="text-ink-soft">
        {view.title} is approved as “{carried?.label}”. Tell your designer what you&apos;d like instead. They will price the change, including GST and
        any delay, and nothing changes until you approve that price.
      </p>
      <Notice tone="caution">Late changes can hold up orders that are already placed, and some suppliers charge for cancelling.</Notice>
      <VariationRequestForm view={view} audience="client" />
    </div>
  );
}
