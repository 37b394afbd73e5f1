"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { Button, Figure, formatLrv, LinkButton, Money, Notice, Swatch } from "@/components/ui";
import { cautions, isCautionKey } from "@/lib/cautions";
import { SCREEN_COLOUR_CAUTION } from "@/lib/colour";
import type { DecisionView, OptionView } from "@/lib/decisions/types";
import { AllowanceDifference } from "./allowance-difference";
import { decisionApi, decisionKey, DecisionRequestError, postJson } from "./decision-fetch";
import { OptionChecksList } from "./option-checks-list";
import { PriceWithTax } from "./price-build";

/**
 * The explicit confirmation: it restates the option, its finishes, the price and its difference
 * from the allowance, and what locking means. The approval's snapshot records these same facts.
 */
export function ApproveConfirm({ view, option }: { view: DecisionView; option: OptionView }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const back = `/client/decisions/${view.id}`;
  const approve = useMutation({
    mutationFn: () => postJson<DecisionView>(`${decisionApi(view.id)}/approve`, { optionId: option.id, confirm: true, version: view.version }),
    onSuccess: (next) => {
      queryClient.setQueryData(decisionKey(view.id), next);
      router.push(`${back}?approved=1`);
    },
  });
  const keys = option.cautionKeys.filter(isCautionKey);
  const error = approve.error;

  return (
    <div className="mx-auto max-w-2xl space-y-6">
      <header className="space-y-1.5">
        <p className="text-sm font-medium uppercase tracking-[0.08em] text-stone-600">
          {view.roomName} · {view.title}
        </p>
        <h1 className="font-display text-3xl font-semibold">Approve “{option.label}”?</h1>
      </header>

      <section aria-label="What you are approving" className="space-y-4 rounded-lg border border-ink bg-card p-4 sm:p-5">
        <p>
          You are approving <strong>{option.label}</strong> for <strong>{view.title}</strong> ({view.roomName}):
        </p>
        <ul className="space-y-3">
          {option.lines.map((l) => (
            <li key={l.id} className="flex items-center gap-3">
              <Swatch hex={l.hex} name={l.finishName} size="sm" caption={false} />
              <span>
                <span className="font-medium">{l.finishName}</span>
                {l.productCode && <span className="figures text-ink-soft"> · {l.productCode}</span>}
                <br />
                <Figure value={l.quantity} digits={Number.isInteger(l.quantity) ? 0 : 1} unit={l.unit} />
                {l.location ? ` · ${l.location}` : ""}
                <span className="figures text-ink-soft"> · LRV {formatLrv(l.lrv)}</span>
              </span>
            </li>
          ))}
        </ul>
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
          <dt className="text-ink-soft">Price</dt>
          <dd className="font-semibold">
            <PriceWithTax cents={option.priceCents} taxBasisPoints={view.taxBasisPoints} />
          </dd>
          <dt className="text-ink-soft">Allowance</dt>
          <dd>
            <Money cents={view.allowanceCents} />
          </dd>
          <dt className="text-ink-soft">Difference</dt>
          <dd className="font-semibold">
            <Money cents={option.comparison.differenceCents} signed /> (<AllowanceDifference comparison={option.comparison} />)
          </dd>
        </dl>
        <OptionChecksList checks={option.checks} boardName={option.boardName} />
        {keys.length > 0 && <p className="text-sm text-ink-soft">Cautions you have seen: {keys.map((k) => cautions[k].title).join("; ")}.</p>}
      </section>

      <Notice tone="caution" title="Approving locks this decision">
        Once you approve, nobody can change it. If you want something different later, that is a variation: your designer prices it (including
        GST, and any delay) and it only goes ahead once you approve it.
      </Notice>
      <Notice tone="info">{SCREEN_COLOUR_CAUTION}</Notice>

      {error && (
        <div role="alert" className="space-y-1 rounded-md bg-problem-wash px-3 py-2 text-problem-ink">
          <p>{error.message}</p>
          {error instanceof DecisionRequestError && error.status === 409 && (
            <a href={back} className="font-medium underline">
              Look at the decision again
            </a>
          )}
        </div>
      )}

      <div className="flex flex-col gap-3 sm:flex-row">
        <Button size="lg" pending={approve.isPending || approve.isSuccess} onClick={() => approve.mutate()}>
          Yes, approve and lock
        </Button>
        <LinkButton href={back} variant="secondary" size="lg">
          Not yet, go back
        </LinkButton>
      </div>
    </div>
  );
}
