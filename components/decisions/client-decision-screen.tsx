"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Button, LinkButton, Notice, Section, cx } from "@/components/ui";
import { GUIDANCE_ONLY } from "@/lib/cautions";
import { SCREEN_COLOUR_CAUTION } from "@/lib/colour";
import type { DecisionView } from "@/lib/decisions/types";
import { describeDue, formatDay } from "@/lib/format";
import { BudgetSummary } from "./budget-summary";
import { ChoiceHistory } from "./choice-history";
import { ClientPickPanel } from "./client-pick-panel";
import { decisionApi, decisionKey, DecisionRequestError, fetchDecision, postJson } from "./decision-fetch";
import { LockedBanner } from "./locked-banner";
import { OptionCard } from "./option-card";
import { OptionsAtAGlance } from "./options-at-a-glance";
import { VariationList } from "./variation-list";

type Props = { initial: DecisionView; justLocked: boolean; today: string };

/** The client's screen for one decision: compare, pick, note, approve; after approval, ask for a change. */
export function ClientDecisionScreen({ initial, justLocked, today }: Props) {
  const queryClient = useQueryClient();
  const key = decisionKey(initial.id);
  const { data: view } = useQuery({ queryKey: key, queryFn: () => fetchDecision(initial.id), initialData: initial });
  const [error, setError] = useState<string | null>(null);
  const pick = useMutation({
    mutationFn: (body: { optionId: string; comment?: string }) => postJson<DecisionView>(`${decisionApi(view.id)}/choice`, { ...body, version: view.version }),
    onMutate: () => setError(null),
    onSuccess: (next) => queryClient.setQueryData(key, next),
    onError: (e) => {
      setError(e instanceof DecisionRequestError && e.status === 409 ? `${e.message} We've loaded the latest.` : e.message);
      void queryClient.invalidateQueries({ queryKey: key });
    },
  });

  const locked = view.status === "locked";
  const carried = view.options.find((o) => o.id === view.lockedOptionId);
  const offered = view.options.filter((o) => !o.addedByVariation);
  const current = view.currentChoice;
  const openVariation = view.variations.some((v) => v.status === "requested" || v.status === "priced");

  return (
    <div className="space-y-8">
      <header className="flex flex-col gap-1.5 border-b border-line pb-6">
        <p className="text-sm font-medium uppercase tracking-[0.08em] text-stone-600">
          {view.roomName} · {view.projectName}
        </p>
        <h1 className="font-display text-3xl font-semibold text-ink sm:text-4xl">{view.title}</h1>
        {!locked && (
          <p className="text-ink-soft">
            Please decide by <span className="font-medium text-ink">{formatDay(view.dueDate)}</span> ({describeDue(view.dueDate, today)}), so it can be
            ordered in time. You can change your pick until you approve.
          </p>
        )}
      </header>

      {locked && carried && <LockedBanner approvals={view.approvals} carriedOptionId={carried.id} optionLabel={carried.label} justLocked={justLocked} audience="client" />}
      {!locked && <ClientPickPanel view={view} pending={pick.isPending} onNote={(comment) => current && pick.mutate({ optionId: current.optionId, comment })} />}
      {error && (
        <p role="alert" className="rounded-md bg-problem-wash px-3 py-2 text-problem-ink">
          {error}
        </p>
      )}

      {locked && carried ? (
        <div className="space-y-4">
          <OptionCard option={carried} taxBasisPoints={view.taxBasisPoints} marker="Approved" emphasised />
          {offered.length > 1 && (
            <details className="rounded-lg border border-line bg-card p-4">
              <summary className="min-h-tap cursor-pointer content-center font-medium">The other options you compared</summary>
              <div className="mt-4 grid gap-4 md:grid-cols-2">
                {offered.filter((o) => o.id !== carried.id).map((o) => (
                  <OptionCard key={o.id} option={o} taxBasisPoints={view.taxBasisPoints} headingLevel={3} />
                ))}
              </div>
            </details>
          )}
        </div>
      ) : (
        <>
          <OptionsAtAGlance options={offered} pickedId={current?.optionId ?? null} taxBasisPoints={view.taxBasisPoints} />
          <div className={cx("grid gap-4 md:grid-cols-2", offered.length > 2 && "xl:grid-cols-3", offered.length > 3 && "2xl:grid-cols-4")}>
            {offered.map((o) => {
              const isPick = current?.optionId === o.id;
              return (
                <OptionCard key={o.id} option={o} taxBasisPoints={view.taxBasisPoints} emphasised={isPick} marker={isPick ? `Current pick${current && current.by.id !== view.viewer.id ? ` (${current.by.name})` : ""}` : undefined}>
                  {isPick ? (
                    <LinkButton href={`/client/decisions/${view.id}/approve/${o.id}`} size="lg">
                      Approve this option…
                    </LinkButton>
                  ) : (
                    <Button variant="secondary" size="lg" pending={pick.isPending && pick.variables?.optionId === o.id} onClick={() => pick.mutate({ optionId: o.id })}>
                      Pick this one
                    </Button>
                  )}
                </OptionCard>
              );
            })}
          </div>
        </>
      )}

      {locked && (
        <Section title="Changes after approval" description="A change now is a variation: your designer prices it (including GST, and any delay), and it only happens once you approve it.">
          {view.variations.length > 0 && (
            <VariationList
              variations={view.variations}
              hrefFor={(v) => `/client/decisions/${view.id}/variations/${v.id}`}
              actionWord={(v) => (v.status === "priced" ? "Review the price and decide" : null)}
            />
          )}
          {openVariation ? (
            <p className="text-ink-soft">One change is under way; you can ask for another once it is settled.</p>
          ) : (
            <div>
              <LinkButton href={`/client/decisions/${view.id}/variations/new`} variant="secondary" size="lg">
                Ask for a change
              </LinkButton>
            </div>
          )}
        </Section>
      )}

      <Section title="Picks and notes" level={2}>
        <ChoiceHistory choices={view.choices} earlier={view.earlierChoiceCount} viewerId={view.viewer.id} />
      </Section>

      <BudgetSummary budget={view.budget} heading="Your project's running total" />

      <Notice tone="info" title={locked ? "Good to know" : "Before you decide"}>
        <p>{SCREEN_COLOUR_CAUTION}</p>
        <p className="mt-1">{GUIDANCE_ONLY}</p>
      </Notice>
    </div>
  );
}
