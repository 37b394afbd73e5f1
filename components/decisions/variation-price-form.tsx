"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Button, Field, Input, Money } from "@/components/ui";
import { buildOptionPrice, taxWords } from "@/lib/pricing/option-price";
import { centsToInput, parseMoney } from "@/lib/pricing/parse-amount";
import type { DecisionView, PickerFinish, VariationView } from "@/lib/decisions/types";
import type { FieldErrors } from "@/lib/http";
import { draftToBody, emptyOption, readQuantity, type OptionDraft } from "./decision-draft";
import { decisionApi, decisionKey, DecisionRequestError, postJson } from "./decision-fetch";
import { OptionFields } from "./option-fields";

type Props = { view: DecisionView; variation: VariationView; finishes: PickerFinish[]; boards: { id: string; name: string }[] };

/** A new option's client price as the form would save it: typed by hand, or worked out from its lines. */
function draftPrice(o: OptionDraft, finishes: PickerFinish[], rates: NonNullable<DecisionView["rates"]>): number | null {
  if (o.priceSetByHand) {
    const typed = parseMoney(o.price);
    return typed.ok ? typed.value : null;
  }
  const lines = o.lines.map((l) => ({ unitPriceCents: finishes.find((f) => f.id === l.finishId)?.unitPriceCents, quantity: readQuantity(l.quantity) }));
  if (lines.some((l) => l.unitPriceCents === undefined || l.quantity === null)) return null;
  return buildOptionPrice(lines.map((l) => ({ unitPriceCents: l.unitPriceCents ?? 0, quantity: l.quantity ?? 0 })), rates).totalCents;
}

const KEEP = "keep";
const NEW = "new";

/** The designer prices a variation: what the decision will carry, the difference in the client's price including tax, the time. */
export function VariationPriceForm({ view, variation, finishes, boards }: Props) {
  const queryClient = useQueryClient();
  const carried = view.options.find((o) => o.id === view.lockedOptionId);
  const others = view.options.filter((o) => o.id !== view.lockedOptionId);
  const [target, setTarget] = useState(variation.optionId && variation.optionId !== view.lockedOptionId ? variation.optionId : KEEP);
  const [newOption, setNewOption] = useState(emptyOption);
  const [delta, setDelta] = useState(variation.priceDeltaCents === null ? "" : centsToInput(variation.priceDeltaCents));
  const [days, setDays] = useState(variation.timeImpactDays === null ? "0" : String(variation.timeImpactDays));
  const [localErrors, setLocalErrors] = useState<FieldErrors>({});
  const price = useMutation({
    mutationFn: (body: Record<string, unknown>) => postJson(`${decisionApi(view.id)}/variations/${variation.id}/price`, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: decisionKey(view.id) }),
  });
  const serverErrors = price.error instanceof DecisionRequestError ? price.error.fieldErrors : undefined;
  const errors: FieldErrors = { ...serverErrors, ...localErrors };
  const rates = view.rates ?? { markupBasisPoints: 0, taxBasisPoints: view.taxBasisPoints };
  const picked = others.find((o) => o.id === target);
  // Both are client prices including tax, as the difference is.
  const targetPrice = target === NEW ? draftPrice(newOption, finishes, rates) : (picked?.priceCents ?? null);
  const listDifference = targetPrice !== null && carried ? targetPrice - carried.priceCents : null;

  function submit() {
    const deltaRead = parseMoney(delta, { allowNegative: true });
    const priceDeltaCents = deltaRead.ok ? deltaRead.value : null;
    const timeImpactDays = /^-?\d+$/.test(days.trim()) ? Number(days) : null;
    const next: FieldErrors = {};
    if (!deltaRead.ok) next.priceDeltaCents = [delta.trim() ? deltaRead.message : "Enter the difference in dollars, e.g. 385 or -250 for a credit."];
    if (timeImpactDays === null) next.timeImpactDays = ["Enter a whole number of days (0 for none)."];
    let option: Record<string, unknown> = {};
    if (target === NEW) {
      const { body, errors: money } = draftToBody({ room: "", title: "", allowance: "0", dueDate: "", notify: false, options: [newOption] });
      Object.entries(money).forEach(([k, v]) => (next[k.replace(/^options\.0/, "newOption")] = v));
      const [first] = body.options as Record<string, unknown>[];
      option = { newOption: first };
    } else if (target !== KEEP) option = { optionId: target };
    setLocalErrors(next);
    if (Object.keys(next).length === 0) price.mutate({ priceDeltaCents, timeImpactDays, ...option });
  }

  return (
    <form noValidate className="space-y-5" onSubmit={(e) => { e.preventDefault(); submit(); }}>
      <fieldset className="space-y-2">
        <legend className="font-medium">After the change, the decision carries</legend>
        {[{ id: KEEP, label: `“${carried?.label ?? "The approved option"}”, unchanged: a change of work, not of finish` }, ...others.map((o) => ({ id: o.id, label: `“${o.label}”` })), { id: NEW, label: "A new option, described below" }].map((o) => (
          <label key={o.id} className="flex min-h-tap cursor-pointer items-center gap-3 rounded-md border border-line bg-card px-3 py-2">
            <input type="radio" name="variation-target" value={o.id} checked={target === o.id} onChange={() => setTarget(o.id)} className="size-5 accent-spruce" />
            <span>{o.label}</span>
          </label>
        ))}
        {errors.optionId && <p className="text-sm font-medium text-problem-ink">{errors.optionId.join(" ")}</p>}
      </fieldset>
      {target === NEW && (
        <OptionFields
          option={newOption}
          index={0}
          finishes={finishes}
          rates={rates}
          boards={boards}
          errors={Object.fromEntries(Object.entries(errors).map(([k, v]) => [k.replace(/^newOption/, "options.0"), v]))}
          canRemove={false}
          onChange={setNewOption}
          onRemove={() => undefined}
        />
      )}
      <div className="grid gap-4 sm:grid-cols-2">
        <Field
          label={`Price difference, ${taxWords(rates.taxBasisPoints)} ($)`}
          htmlFor="variation-delta"
          hint={listDifference !== null ? <>The option prices differ by <Money cents={listDifference} signed />; add any extra work, fees or restocking.</> : "Against what was approved; a credit is negative, e.g. -250."}
          error={errors.priceDeltaCents}
        >
          <Input id="variation-delta" inputMode="decimal" value={delta} onChange={(e) => setDelta(e.target.value)} invalid={Boolean(errors.priceDeltaCents)} />
        </Field>
        <Field label="Time impact (days)" htmlFor="variation-days" hint="Days it adds to the programme; 0 for none." error={errors.timeImpactDays}>
          <Input id="variation-days" inputMode="numeric" value={days} onChange={(e) => setDays(e.target.value)} invalid={Boolean(errors.timeImpactDays)} />
        </Field>
      </div>
      {price.error && !serverErrors && <p role="alert" className="rounded-md bg-problem-wash px-3 py-2 text-problem-ink">{price.error.message}</p>}
      {price.isSuccess && <p role="status" className="rounded-md bg-ok-wash px-3 py-2 text-ok-ink">Priced. The clients have an e-mail with a link to approve or decline it.</p>}
      <Button type="submit" size="lg" pending={price.isPending}>
        {variation.status === "priced" ? "Change the price" : "Send the price to the clients"}
      </Button>
    </form>
  );
}
