import { Figure, Money } from "@/components/ui";
import { readSnapshot } from "@/lib/decisions/snapshot";
import type { ApprovalView } from "@/lib/decisions/types";
import { describeTimeImpact } from "@/lib/decisions/words";
import { When } from "./when";

/** One approval as it was recorded: who, when, and the snapshot of what they were shown. */
export function ApprovalRecord({ approval }: { approval: ApprovalView }) {
  const s = readSnapshot(approval.snapshot);
  const isVariation = approval.variationId !== null;
  return (
    <article className="space-y-2 rounded-lg border border-line bg-card p-4">
      <p className="font-medium">
        {isVariation ? "Variation approved" : "Approved"} by {approval.by.name} · <When iso={approval.at} />
      </p>
      {!s ? (
        <p className="text-ink-soft">“{approval.optionLabel}” (the record of what was shown can&apos;t be read).</p>
      ) : isVariation ? (
        <p>
          {s.fromOption ? `“${s.fromOption}” became ` : ""}“{s.option ?? approval.optionLabel}” for <Money cents={s.priceDeltaCents ?? 0} signed /> including GST;{" "}
          {describeTimeImpact(s.timeImpactDays ?? 0)}.{s.reason ? ` Reason: “${s.reason}”` : ""}
        </p>
      ) : (
        <p>
          “{s.option ?? approval.optionLabel}” at <Money cents={s.priceCents ?? 0} />
          {s.allowanceCents !== undefined && (
            <>
              {" "}
              against an allowance of <Money cents={s.allowanceCents} /> (<Money cents={(s.priceCents ?? 0) - s.allowanceCents} signed />)
            </>
          )}
          .
        </p>
      )}
      {s && s.lines.length > 0 && (
        <ul className="text-sm text-ink-soft">
          {s.lines.map((l, i) => (
            <li key={i}>
              <Figure value={l.quantity} digits={Number.isInteger(l.quantity) ? 0 : 1} unit={l.unit} /> {l.finish}
              {l.code ? ` · ${l.code}` : ""}
              {l.lrv != null ? ` · LRV ${l.lrv}` : ""}
              {l.colour ? ` · ${l.colour}` : ""}
            </li>
          ))}
        </ul>
      )}
      {s?.checks && s.checks.shown.length > 0 && (
        <p className="text-sm text-ink-soft">Checks shown: {s.checks.shown.map((c) => `${c.between}: ${c.reason}`).join(" ")}</p>
      )}
    </article>
  );
}
