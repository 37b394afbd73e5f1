"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Button, LinkButton, Money, Notice } from "@/components/ui";
import type { DecisionView } from "@/lib/decisions/types";
import { describeTimeImpact } from "@/lib/decisions/words";
import { decisionApi, decisionKey, fetchDecision, postJson } from "./decision-fetch";
import { VariationSummary } from "./variation-summary";

type Mode = "idle" | "approving" | "declining";

/** A client looks at a change after approval and approves it (with explicit confirmation), declines or withdraws it. */
export function ClientVariationScreen({ initial, variationId }: { initial: DecisionView; variationId: string }) {
  const queryClient = useQueryClient();
  const key = decisionKey(initial.id);
  const { data: view } = useQuery({ queryKey: key, queryFn: () => fetchDecision(initial.id), initialData: initial });
  const [mode, setMode] = useState<Mode>("idle");
  const variation = view.variations.find((v) => v.id === variationId);
  const base = `${decisionApi(view.id)}/variations/${variationId}`;
  const act = useMutation({
    mutationFn: (step: "approve" | "decline" | "withdraw") =>
      postJson(`${base}/${step}`, step === "approve" ? { confirm: true, pricedAt: variation?.pricedAt ?? undefined } : {}),
    onSettled: async () => {
      setMode("idle");
      await queryClient.invalidateQueries({ queryKey: key });
    },
  });
  if (!variation) return <p>This variation is no longer here.</p>;
  const to = view.options.find((o) => o.id === variation.optionId);
  const from = view.options.find((o) => o.id === view.lockedOptionId);

  return (
    <div className="mx-auto max-w-2xl space-y-6">
      <h1 className="font-display text-3xl font-semibold">Change to {view.title}</h1>
      <VariationSummary view={view} variation={variation} />
      {act.error && (
        <p role="alert" className="rounded-md bg-problem-wash px-3 py-2 text-problem-ink">
          {act.error.message}
        </p>
      )}

      {variation.status === "requested" && (
        <div className="space-y-3">
          <p>Your designer is pricing this change. You&apos;ll get an e-mail when the price is ready.</p>
          {variation.requestedBy.id === view.viewer.id && (
            <Button variant="secondary" pending={act.isPending} onClick={() => act.mutate("withdraw")}>
              Withdraw my request
            </Button>
          )}
        </div>
      )}

      {variation.status === "priced" && mode === "idle" && (
        <div className="flex flex-col gap-3 sm:flex-row">
          <Button size="lg" onClick={() => setMode("approving")}>
            Approve this change…
          </Button>
          <Button size="lg" variant="secondary" onClick={() => setMode("declining")}>
            Decline
          </Button>
        </div>
      )}

      {variation.status === "priced" && mode === "approving" && (
        <section aria-label="Confirm the change" className="space-y-4 rounded-lg border border-ink bg-card p-4 sm:p-5">
          <p>
            You are approving a variation to <strong>{view.title}</strong>:{" "}
            {to && to.id !== from?.id ? (
              <>
                “{from?.label}” becomes <strong>“{to.label}”</strong>
              </>
            ) : (
              <>the change of work you see above, with the same finishes (“{from?.label}”)</>
            )}
            , for{" "}
            <strong>
              <Money cents={variation.priceDeltaCents ?? 0} signed /> including GST
            </strong>
            ; it {describeTimeImpact(variation.timeImpactDays)}.
          </p>
          <p className="text-ink-soft">Your first approval stays on record. Your designer will issue an updated specification to the suppliers.</p>
          <div className="flex flex-col gap-3 sm:flex-row">
            <Button size="lg" pending={act.isPending} onClick={() => act.mutate("approve")}>
              Yes, approve the change
            </Button>
            <Button size="lg" variant="secondary" onClick={() => setMode("idle")}>
              Cancel
            </Button>
          </div>
        </section>
      )}

      {variation.status === "priced" && mode === "declining" && (
        <section aria-label="Confirm declining" className="space-y-4 rounded-lg border border-line bg-card p-4">
          <p>Decline this change? {view.title} stays as approved: “{from?.label}”.</p>
          <div className="flex flex-col gap-3 sm:flex-row">
            <Button size="lg" variant="danger" pending={act.isPending} onClick={() => act.mutate("decline")}>
              Yes, decline it
            </Button>
            <Button size="lg" variant="secondary" onClick={() => setMode("idle")}>
              Keep it open
            </Button>
          </div>
        </section>
      )}

      {variation.status === "approved" && (
        <Notice tone="info">
          {optionBefore(view, variation.id) !== to?.id ? `${view.title} now carries “${to?.label}”.` : `The change is approved; ${view.title} keeps the same finishes.`} Your designer
          will send the suppliers an updated specification.
        </Notice>
      )}
      <LinkButton href={`/client/decisions/${view.id}`} variant="quiet">
        Back to {view.title}
      </LinkButton>
    </div>
  );
}

/** The option the decision carried just before this variation was approved. */
function optionBefore(view: DecisionView, variationId: string): string | null {
  const i = view.approvals.findIndex((a) => a.variationId === variationId);
  return i > 0 ? (view.approvals[i - 1]?.optionId ?? null) : null;
}
