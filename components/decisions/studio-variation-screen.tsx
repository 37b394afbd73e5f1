"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { Button, Notice, Section } from "@/components/ui";
import type { DecisionView, PickerFinish } from "@/lib/decisions/types";
import { decisionApi, decisionKey, fetchDecision, postJson } from "./decision-fetch";
import { VariationPriceForm } from "./variation-price-form";
import { VariationSummary } from "./variation-summary";

type Props = { initial: DecisionView; variationId: string; finishes: PickerFinish[]; boards: { id: string; name: string }[] };

/** Where the designer prices a variation, and sees what happened to it. */
export function StudioVariationScreen({ initial, variationId, finishes, boards }: Props) {
  const queryClient = useQueryClient();
  const key = decisionKey(initial.id);
  const { data: view } = useQuery({ queryKey: key, queryFn: () => fetchDecision(initial.id), initialData: initial });
  const withdraw = useMutation({
    mutationFn: () => postJson(`${decisionApi(view.id)}/variations/${variationId}/withdraw`, {}),
    onSettled: () => queryClient.invalidateQueries({ queryKey: key }),
  });
  const variation = view.variations.find((v) => v.id === variationId);
  if (!variation) return <p>This variation is no longer here.</p>;
  const open = variation.status === "requested" || variation.status === "priced";
  return (
    <div className="space-y-8">
      <div className="space-y-1.5 border-b border-line pb-6">
        <p className="text-sm font-medium uppercase tracking-[0.08em] text-stone-600">
          <Link href={`/studio/projects/${view.projectId}/decisions/${view.id}`} className="underline-offset-4 hover:underline">
            {view.roomName} · {view.title}
          </Link>
        </p>
        <h1 className="font-display text-3xl font-semibold">Variation</h1>
      </div>
      <VariationSummary view={view} variation={variation} />
      {variation.status === "approved" && view.specNeedsRevision && (
        <Notice tone="caution" title="Issue a new specification revision">
          The client approved this change after the last revision was issued.{" "}
          <Link href={`/studio/projects/${view.projectId}/specification`}>Go to the specification</Link>
        </Notice>
      )}
      {open && (
        <Section title={variation.status === "priced" ? "Change the price" : "Price it"} description="Variations are priced including GST with their time impact, and agreed in writing before the work starts (state rules differ).">
          <VariationPriceForm view={view} variation={variation} finishes={finishes} boards={boards} />
        </Section>
      )}
      {open && (
        <div className="space-y-2">
          {withdraw.error && <p role="alert" className="rounded-md bg-problem-wash px-3 py-2 text-problem-ink">{withdraw.error.message}</p>}
          <Button variant="secondary" pending={withdraw.isPending} onClick={() => withdraw.mutate()}>
            Withdraw this variation
          </Button>
        </div>
      )}
    </div>
  );
}
