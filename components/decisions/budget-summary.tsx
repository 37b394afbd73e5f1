import { Money } from "@/components/ui";
import type { BudgetSummary as Budget } from "@/lib/decisions/budget";

/** The project's running total against its total allowances, with how it is made up. */
export function BudgetSummary({ budget, heading = "Running total" }: { budget: Budget; heading?: string }) {
  const { differenceCents: diff } = budget;
  return (
    <section aria-label={heading} className="rounded-lg border border-line bg-card p-4 sm:p-5">
      <h2 className="text-sm font-medium uppercase tracking-[0.08em] text-stone-600">{heading}</h2>
      <p className="mt-1 text-2xl font-semibold">
        <Money cents={budget.runningCents} />
        <span className="block text-base font-normal text-ink-soft">
          of <Money cents={budget.allowanceCents} /> in allowances
        </span>
      </p>
      <p className="mt-1 font-medium">
        {diff === 0 ? "Exactly on the allowances" : <><Money cents={Math.abs(diff)} /> {diff > 0 ? "over" : "under"} the allowances so far</>}
      </p>
      <dl className="mt-3 grid max-w-xl grid-cols-[1fr_auto] gap-x-4 gap-y-1 text-sm text-ink-soft">
        <dt>Approved ({budget.counts.approved})</dt>
        <dd className="text-right"><Money cents={budget.approvedCents} /></dd>
        <dt>Picked, not yet approved ({budget.counts.picked})</dt>
        <dd className="text-right"><Money cents={budget.pickedCents} /></dd>
        <dt>Still to choose ({budget.counts.open}), counted at their allowance</dt>
        <dd className="text-right"><Money cents={budget.openAllowanceCents} /></dd>
      </dl>
    </section>
  );
}
