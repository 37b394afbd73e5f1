import Link from "next/link";
import { Money } from "@/components/ui";
import type { VariationView } from "@/lib/decisions/types";
import { VariationStatusBadge } from "./status-badge";
import { When } from "./when";

type Props = { variations: VariationView[]; hrefFor: (v: VariationView) => string; actionWord: (v: VariationView) => string | null };

/** Changes asked for after approval, newest first, each linking to its own screen. */
export function VariationList({ variations, hrefFor, actionWord }: Props) {
  return (
    <ul className="divide-y divide-line">
      {variations.map((v) => {
        const action = actionWord(v);
        return (
          <li key={v.id} className="flex flex-col gap-2 py-3">
            <div className="flex flex-wrap items-center gap-2">
              <VariationStatusBadge status={v.status} />
              {v.priceDeltaCents !== null && (
                <span className="text-sm">
                  <Money cents={v.priceDeltaCents} signed /> including GST
                  {v.timeImpactDays ? `, ${v.timeImpactDays > 0 ? "+" : ""}${v.timeImpactDays} days` : ""}
                </span>
              )}
            </div>
            <p>“{v.reason}”</p>
            <p className="text-sm text-ink-soft">
              Asked by {v.requestedBy.name} · <When iso={v.requestedAt} />
              {v.pricedBy && v.pricedAt !== null && (
                <>
                  {" "}
                  · priced by {v.pricedBy.name} · <When iso={new Date(v.pricedAt).toISOString()} />
                </>
              )}
              {v.decidedBy && v.decidedAt && (
                <>
                  {" "}
                  · {v.status} by {v.decidedBy.name} · <When iso={v.decidedAt} />
                </>
              )}
            </p>
            <Link href={hrefFor(v)} className="inline-flex min-h-tap items-center font-medium text-spruce underline underline-offset-4">
              {action ?? "See this variation"}
            </Link>
          </li>
        );
      })}
    </ul>
  );
}
