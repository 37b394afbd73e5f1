import type { ReactNode } from "react";
import { useId } from "react";
import { Figure, Notice, Swatch, cx } from "@/components/ui";
import { cautions, isCautionKey } from "@/lib/cautions";
import type { OptionView } from "@/lib/decisions/types";
import { AllowanceDifference } from "./allowance-difference";
import { OptionChecksList } from "./option-checks-list";
import { PriceWithTax, StaffPriceDetail } from "./price-build";

type Props = {
  option: OptionView;
  /** The studio's tax (1000 = GST 10 %), named beside the price. */
  taxBasisPoints: number;
  /** Words shown above the name, e.g. "Your pick" or "Approved"; the ring says the same without words. */
  marker?: ReactNode;
  emphasised?: boolean;
  /** Buttons for this option (choose, approve…). */
  children?: ReactNode;
  headingLevel?: 2 | 3;
};

/** One option as the client compares it: swatches on a neutral mount, finishes, price against the allowance, checks, cautions. */
export function OptionCard({ option, taxBasisPoints, marker, emphasised = false, children, headingLevel = 2 }: Props) {
  const headingId = useId();
  const Heading = headingLevel === 2 ? "h2" : "h3";
  const keys = option.cautionKeys.filter(isCautionKey);
  return (
    <article
      aria-labelledby={headingId}
      id={`option-${option.id}`}
      data-option-id={option.id}
      className={cx(
        "flex scroll-mt-4 flex-col gap-4 rounded-lg border bg-card p-4 shadow-card sm:p-5",
        emphasised ? "border-ink outline-2 outline-offset-2 outline-ink" : "border-line",
      )}
    >
      <header className="flex flex-col gap-1">
        {marker && <div className="text-sm font-semibold text-ink">{marker}</div>}
        <Heading id={headingId} className="font-display text-xl font-semibold text-ink">
          {option.label}
        </Heading>
      </header>
      <div className="flex flex-wrap gap-3">
        {option.lines.map((l) => (
          <Swatch key={l.id} hex={l.hex} name={l.finishName} productCode={l.productCode} lrv={l.lrv} lrvSource={l.lrvSource} size="md" />
        ))}
      </div>
      <ul className="space-y-1 text-sm">
        {option.lines.map((l) => (
          <li key={l.id}>
            <Figure value={l.quantity} digits={Number.isInteger(l.quantity) ? 0 : 1} unit={l.unit} /> {l.finishName}
            {l.surface ? `, ${l.surface}` : ""}
            {l.location ? <span className="text-ink-soft"> · {l.location}</span> : null}
          </li>
        ))}
      </ul>
      <div>
        <p className="text-2xl font-semibold">
          <PriceWithTax cents={option.priceCents} taxBasisPoints={taxBasisPoints} />
        </p>
        <p className="font-medium text-ink-soft">
          <AllowanceDifference comparison={option.comparison} />
        </p>
      </div>
      {option.priceDetail && <StaffPriceDetail detail={option.priceDetail} priceCents={option.priceCents} />}
      <OptionChecksList checks={option.checks} boardName={option.boardName} />
      {option.notes && <p className="text-ink-soft">{option.notes}</p>}
      {keys.map((key) => (
        <Notice key={key} tone="caution" title={cautions[key].title}>
          {cautions[key].text}
        </Notice>
      ))}
      {children && <div className="mt-auto flex flex-col gap-2 pt-2">{children}</div>}
    </article>
  );
}
