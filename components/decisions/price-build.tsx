import { Badge, Money } from "@/components/ui";
import type { OptionPriceDetail } from "@/lib/decisions/types";
import { formatBasisPoints, taxWords, type PriceBuild, type StudioRates } from "@/lib/pricing/option-price";

const taxName = (bp: number) => (bp === 1000 ? "GST" : "Tax");

/** Cost, markup, tax and total, one per row: how an option's price is worked out from its finishes. */
export function PriceBuildList({ build, rates }: { build: PriceBuild; rates: StudioRates }) {
  const rows: [string, number, boolean][] = [
    ["Cost of the finishes, excluding tax", build.costCents, false],
    [`Markup on cost (${formatBasisPoints(rates.markupBasisPoints)})`, build.markupCents, false],
    [`${taxName(rates.taxBasisPoints)} (${formatBasisPoints(rates.taxBasisPoints)})`, build.taxCents, false],
    [`Price for the client, ${taxWords(rates.taxBasisPoints)}`, build.totalCents, true],
  ];
  return (
    <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-0.5 text-sm">
      {rows.map(([label, cents, total]) => (
        <div key={label} className={total ? "contents font-semibold" : "contents"}>
          <dt className={total ? "border-t border-line pt-1" : "text-ink-soft"}>{label}</dt>
          <dd className={total ? "border-t border-line pt-1 text-right" : "text-right"}>
            <Money cents={cents} />
          </dd>
        </div>
      ))}
    </dl>
  );
}

/** The designer's view of an option's price: set by hand (and what it would be worked out), or how it was worked out. */
export function StaffPriceDetail({ detail, priceCents }: { detail: OptionPriceDetail; priceCents: number }) {
  const { build, rates, overridden } = detail;
  return (
    <div className="space-y-2">
      {overridden && <Badge tone="info">Price set by hand</Badge>}
      <details className="rounded-md bg-stone-50 px-3 py-2" open={!overridden}>
        <summary className="min-h-tap cursor-pointer content-center text-sm font-medium">
          {overridden ? "Worked out from the finishes instead" : "How this price is worked out"}
        </summary>
        <div className="mt-2 space-y-2">
          <PriceBuildList build={build} rates={rates} />
          {!overridden && build.totalCents !== priceCents && (
            <p className="text-sm text-caution-ink">
              Worked out with today&apos;s library prices and rates it comes to <Money cents={build.totalCents} />; the price saved is <Money cents={priceCents} />.
            </p>
          )}
        </div>
      </details>
    </div>
  );
}

/** A client's price with the words that say tax is in it. */
export function PriceWithTax({ cents, taxBasisPoints, className }: { cents: number; taxBasisPoints: number; className?: string }) {
  return (
    <>
      <Money cents={cents} className={className} /> <span className="text-sm font-normal text-ink-soft">{taxWords(taxBasisPoints)}</span>
    </>
  );
}
