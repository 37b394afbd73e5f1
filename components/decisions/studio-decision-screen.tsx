"use client";

import { useMutation, useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { Button, LinkButton, Money, Notice, Section, cx } from "@/components/ui";
import type { DecisionView } from "@/lib/decisions/types";
import { isDueAfterOrderBy } from "@/lib/decisions/order-by";
import { describeDue, formatDay } from "@/lib/format";
import { ApprovalRecord } from "./approval-record";
import { ChoiceHistory } from "./choice-history";
import { decisionApi, decisionKey, fetchDecision, postJson } from "./decision-fetch";
import { LockedBanner } from "./locked-banner";
import { OptionCard } from "./option-card";
import { DecisionStatusBadge } from "./status-badge";
import { VariationList } from "./variation-list";
import { VariationRequestForm } from "./variation-request-form";

/** The designer's view of one decision: options with checks, the clients' picks, approvals, variations. */
export function StudioDecisionScreen({ initial, today }: { initial: DecisionView; today: string }) {
  const { data: view } = useQuery({ queryKey: decisionKey(initial.id), queryFn: () => fetchDecision(initial.id), initialData: initial });
  const send = useMutation({ mutationFn: () => postJson<{ sent: boolean }>(`${decisionApi(view.id)}/send`, {}) });
  const base = `/studio/projects/${view.projectId}/decisions/${view.id}`;
  const locked = view.status === "locked";
  const carried = view.options.find((o) => o.id === view.lockedOptionId);
  const openVariation = view.variations.some((v) => v.status === "requested" || v.status === "priced");
  const lateOrder = !locked && isDueAfterOrderBy(view.dueDate, view.orderBy);

  return (
    <div className="space-y-8">
      <div className="flex flex-col gap-4 border-b border-line pb-6 sm:flex-row sm:items-end sm:justify-between">
        <div className="space-y-1.5">
          <p className="text-sm font-medium uppercase tracking-[0.08em] text-stone-600">{view.roomName}</p>
          <h1 className="font-display text-3xl font-semibold sm:text-4xl">{view.title}</h1>
          <DecisionStatusBadge status={view.status} />
        </div>
        {!locked && (
          <div className="flex flex-wrap gap-2">
            <LinkButton href={`${base}/edit`} variant="secondary">
              Edit
            </LinkButton>
            <Button pending={send.isPending} onClick={() => send.mutate()}>
              Send to client
            </Button>
          </div>
        )}
      </div>
      {send.isSuccess && <p role="status" className="rounded-md bg-ok-wash px-3 py-2 text-ok-ink">Sent: the clients have an e-mail with a link to this decision.</p>}
      {send.error && <p role="alert" className="rounded-md bg-problem-wash px-3 py-2 text-problem-ink">{send.error.message}</p>}

      <dl className="grid gap-4 sm:grid-cols-4">
        {[
          ["Allowance", <Money key="a" cents={view.allowanceCents} />],
          ["Due", <>{formatDay(view.dueDate)}{!locked && <span className="block text-sm text-ink-soft">{describeDue(view.dueDate, today)}</span>}</>],
          ["Order by", view.orderBy ? <>{formatDay(view.orderBy.date)}<span className="block text-sm text-ink-soft">{view.orderBy.leadTimeDays} days for {view.orderBy.finishName}</span></> : "Set an install date"],
          ["Install", formatDay(view.installDate)],
        ].map(([label, value]) => (
          <div key={String(label)} className="rounded-lg border border-line bg-card p-3">
            <dt className="text-sm text-ink-soft">{label}</dt>
            <dd className="figures font-medium">{value}</dd>
          </div>
        ))}
      </dl>
      {lateOrder && <Notice tone="caution" title="Due after the order-by date">If the client takes until the due date, the slowest option can&apos;t arrive by install. Consider an earlier due date.</Notice>}
      {locked && carried && <LockedBanner approvals={view.approvals} carriedOptionId={carried.id} optionLabel={carried.label} justLocked={false} audience="staff" />}
      {view.specNeedsRevision && (
        <Notice tone="caution" title="The specification needs a new revision">
          A variation to this decision was approved after the last revision was issued, so the suppliers' copy is out of date.{" "}
          <Link href={`/studio/projects/${view.projectId}/specification`}>Go to the specification</Link>
        </Notice>
      )}

      <div className={cx("grid gap-4 md:grid-cols-2", view.options.length > 2 && "xl:grid-cols-3")}>
        {view.options.map((o) => {
          const marker = o.id === view.lockedOptionId ? "Approved, carried by the decision" : view.currentChoice?.optionId === o.id ? `The clients' current pick (${view.currentChoice.by.name})` : o.addedByVariation ? "Added by a variation" : undefined;
          return <OptionCard key={o.id} option={o} taxBasisPoints={view.taxBasisPoints} marker={marker} emphasised={o.id === view.lockedOptionId || view.currentChoice?.optionId === o.id} />;
        })}
      </div>

      <Section title="Picks and notes from the clients">
        <ChoiceHistory choices={view.choices} earlier={view.earlierChoiceCount} viewerId={view.viewer.id} />
      </Section>
      {view.approvals.length > 0 && (
        <Section title="Approvals" description="Exactly what each approver was shown, as recorded at the time.">
          {view.approvals.map((a) => <ApprovalRecord key={a.id} approval={a} />)}
        </Section>
      )}
      {locked && (
        <Section title="Variations" description="Changes after approval: you price them (including GST, with the time impact); the client approves.">
          {view.variations.length > 0 && (
            <VariationList variations={view.variations} hrefFor={(v) => `${base}/variations/${v.id}`} actionWord={(v) => (v.status === "requested" ? "Price this variation" : null)} />
          )}
          {!openVariation && (
            <details className="rounded-lg border border-line bg-card p-4">
              <summary className="min-h-tap cursor-pointer content-center font-medium">Record a change the client asked for</summary>
              <div className="mt-4">
                <VariationRequestForm view={view} audience="staff" />
              </div>
            </details>
          )}
        </Section>
      )}
      <Link href={`/studio/projects/${view.projectId}/activity`} className="inline-flex min-h-tap items-center underline underline-offset-4">
        Everything done on this project
      </Link>
    </div>
  );
}
