"use client";

import { Field, Input, Money } from "@/components/ui";
import type { PickerFinish } from "@/lib/decisions/types";
import type { FieldErrors } from "@/lib/http";
import { buildOptionPrice, taxWords, type PriceLine, type StudioRates } from "@/lib/pricing/option-price";
import { centsToInput } from "@/lib/pricing/parse-amount";
import { readQuantity, type OptionDraft } from "./decision-draft";
import { PriceBuildList } from "./price-build";

type Props = {
  option: OptionDraft;
  path: string;
  inputId: string;
  finishes: PickerFinish[];
  rates: StudioRates;
  errors: FieldErrors | undefined;
  onChange: (next: OptionDraft) => void;
};

/** The option's lines as the price maths takes them, or null while a finish or quantity is missing. */
function priceLines(option: OptionDraft, finishes: PickerFinish[]): PriceLine[] | null {
  const out: PriceLine[] = [];
  for (const l of option.lines) {
    const finish = finishes.find((f) => f.id === l.finishId);
    const quantity = readQuantity(l.quantity);
    if (!finish || quantity === null || quantity <= 0) return null;
    out.push({ unitPriceCents: finish.unitPriceCents, quantity });
  }
  return out;
}

/** The option's price: worked out from its finishes as the designer types, or set by hand. */
export function OptionPriceFields({ option, path, inputId, finishes, rates, errors, onChange }: Props) {
  const lines = priceLines(option, finishes);
  const build = lines ? buildOptionPrice(lines, rates) : null;
  const otherUnits = option.lines.filter((l) => {
    const f = finishes.find((x) => x.id === l.finishId);
    return f && l.unit.trim() && l.unit.trim() !== f.unit;
  });
  const error = errors?.[`${path}.priceCents`];
  return (
    <div className="space-y-3 rounded-md border border-line p-3">
      <p className="font-medium">Price for the client</p>
      {build ? <PriceBuildList build={build} rates={rates} /> : <p className="text-sm text-ink-soft">Choose each finish and its quantity to work out the price.</p>}
      {otherUnits.length > 0 && (
        <p className="text-sm text-caution-ink">
          A line&apos;s unit differs from the library&apos;s: the price is worked out per the library&apos;s unit ({otherUnits.map((l) => finishes.find((f) => f.id === l.finishId)?.unit).join(", ")}).
        </p>
      )}
      <label className="flex min-h-tap items-center gap-3">
        <input
          type="checkbox"
          className="size-5 accent-spruce"
          checked={option.priceSetByHand}
          onChange={(e) => onChange({ ...option, priceSetByHand: e.target.checked, price: option.price || (build ? centsToInput(build.totalCents) : "") })}
        />
        Set this price by hand
      </label>
      {option.priceSetByHand && (
        <Field
          label={`Price set by hand, ${taxWords(rates.taxBasisPoints)} ($)`}
          htmlFor={inputId}
          hint={build ? <>Worked out from the finishes it would be <Money cents={build.totalCents} />.</> : "It stays as you set it when prices or rates change."}
          error={error}
        >
          <Input id={inputId} inputMode="decimal" value={option.price} onChange={(e) => onChange({ ...option, price: e.target.value })} invalid={Boolean(error)} />
        </Field>
      )}
    </div>
  );
}
