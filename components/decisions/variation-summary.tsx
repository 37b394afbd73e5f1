import { Money, Swatch } from "@/components/ui";
import type { DecisionView, VariationView } from "@/lib/decisions/types";
import { describeTimeImpact } from "@/lib/decisions/words";
import { taxWords } from "@/lib/pricing/option-price";
import { VariationStatusBadge } from "./status-badge";
import { When } from "./when";

/** What a variation changes: from which option to which, its price including GST, and the time. */
export function VariationSummary({ view, variation }: { view: DecisionView; variation: VariationView }) {
  const approvedFrom = view.approvals.find((a) => a.variationId === variation.id);
  const fromId = approvedFrom ? (view.approvals[view.approvals.indexOf(approvedFrom) - 1]?.optionId ?? null) : view.lockedOptionId;
  const from = view.options.find((o) => o.id === fromId);
  const to = view.options.find((o) => o.id === variation.optionId);
  const priced = variation.priceDeltaCents !== null;
  return (
    <section aria-label="The change" className="space-y-4 rounded-lg border border-line bg-card p-4 sm:p-5">
      <div className="flex flex-wrap items-center gap-2">
        <VariationStatusBadge status={variation.status} />
      </div>
      <blockquote className="border-l-2 border-line-strong pl-3">“{variation.reason}”</blockquote>
      <p className="text-sm text-ink-soft">
        Asked by {variation.requestedBy.name} · <When iso={variation.requestedAt} />
      </p>
      {priced && (
        <dl className="grid gap-x-4 gap-y-2 sm:grid-cols-[auto_1fr]">
          <dt className="text-ink-soft">Before the change</dt>
          <dd>{from?.label ?? "—"}</dd>
          <dt className="text-ink-soft">After the change</dt>
          <dd>
            <p className="font-medium">{to && to.id !== from?.id ? to.label : `${from?.label ?? "The same finishes"} (same finishes, changed work)`}</p>
            {to && to.id !== from?.id && (
              <div className="mt-2 flex flex-wrap gap-3">
                {to.lines.map((l) => (
                  <Swatch key={l.id} hex={l.hex} name={l.finishName} productCode={l.productCode} lrv={l.lrv} lrvSource={l.lrvSource} size="sm" />
                ))}
              </div>
            )}
          </dd>
          <dt className="text-ink-soft">Price difference</dt>
          <dd className="text-xl font-semibold">
            <Money cents={variation.priceDeltaCents ?? 0} signed /> <span className="text-base font-normal">{taxWords(view.taxBasisPoints)}</span>
          </dd>
          <dt className="text-ink-soft">Time</dt>
          <dd>{describeTimeImpact(variation.timeImpactDays)}</dd>
          {variation.pricedBy && (
            <>
              <dt className="text-ink-soft">Priced by</dt>
              <dd>
                {variation.pricedBy.name}
                {variation.pricedAt !== null && (
                  <>
                    {" "}
                    · <When iso={new Date(variation.pricedAt).toISOString()} />
                  </>
                )}
              </dd>
            </>
          )}
        </dl>
      )}
      {variation.decidedBy && variation.decidedAt && (
        <p className="font-medium">
          {variation.status === "approved" ? "Approved" : variation.status === "declined" ? "Declined" : "Withdrawn"} by {variation.decidedBy.name} ·{" "}
          <When iso={variation.decidedAt} />
        </p>
      )}
    </section>
  );
}
