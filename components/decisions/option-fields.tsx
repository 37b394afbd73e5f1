"use client";

import { Button, Field, Input, Money, Select, Swatch, Textarea } from "@/components/ui";
import type { PickerFinish } from "@/lib/decisions/types";
import type { FieldErrors } from "@/lib/http";
import type { StudioRates } from "@/lib/pricing/option-price";
import { emptyLine, type LineDraft, type OptionDraft } from "./decision-draft";
import { OptionPriceFields } from "./option-price-fields";

type Props = {
  option: OptionDraft;
  index: number;
  finishes: PickerFinish[];
  /** The studio's markup and tax, to work out the price as the designer types. */
  rates: StudioRates;
  boards: { id: string; name: string }[];
  errors: FieldErrors | undefined;
  canRemove: boolean;
  onChange: (next: OptionDraft) => void;
  onRemove: () => void;
};

const categoryWords: Record<string, string> = {
  stone: "Stone and benchtops", cabinetry: "Cabinetry", flooring: "Flooring", tile: "Splashback and tile", tapware: "Tapware and sinks",
  hardware: "Hardware", lighting: "Lighting", appliances: "Appliances", paint: "Paint and walls",
};

/** One option in the designer's form: name, price, notes, board, and its finish lines. */
export function OptionFields({ option, index, finishes, rates, boards, errors, canRemove, onChange, onRemove }: Props) {
  const path = `options.${index}`;
  const id = (field: string) => `option-${option.key}-${field}`;
  const setLine = (j: number, patch: Partial<LineDraft>) => onChange({ ...option, lines: option.lines.map((l, k) => (k === j ? { ...l, ...patch } : l)) });
  const categories = [...new Set(finishes.map((f) => f.category))];
  return (
    <fieldset className="space-y-4 rounded-lg border border-line bg-card p-4 sm:p-5">
      <legend className="px-1 font-display text-lg font-semibold">Option {index + 1}</legend>
      <Field label="Name the client sees" htmlFor={id("label")} error={errors?.[`${path}.label`]}>
        <Input id={id("label")} value={option.label} onChange={(e) => onChange({ ...option, label: e.target.value })} invalid={Boolean(errors?.[`${path}.label`])} />
      </Field>
      <Field label="Notes for the client" htmlFor={id("notes")} optional error={errors?.[`${path}.notes`]}>
        <Textarea id={id("notes")} rows={2} value={option.notes} onChange={(e) => onChange({ ...option, notes: e.target.value })} />
      </Field>
      {boards.length > 0 && (
        <Field label="Sample board that shows it" htmlFor={id("board")} optional hint="Its checks are shown to the client beside this option." error={errors?.[`${path}.boardId`]}>
          <Select id={id("board")} value={option.boardId} onChange={(e) => onChange({ ...option, boardId: e.target.value })}>
            <option value="">No board</option>
            {boards.map((b) => (
              <option key={b.id} value={b.id}>
                {b.name}
              </option>
            ))}
          </Select>
        </Field>
      )}
      <div className="space-y-3">
        <p className="font-medium">Finishes</p>
        {errors?.[`${path}.lines`] && <p className="text-sm font-medium text-problem-ink">{errors[`${path}.lines`]?.join(" ")}</p>}
        {option.lines.map((line, j) => {
          const finish = finishes.find((f) => f.id === line.finishId);
          const lp = `${path}.lines.${j}`;
          return (
            <div key={line.key} className="grid items-end gap-3 rounded-md bg-stone-50 p-3 sm:grid-cols-[auto_3fr_1fr_1fr_2fr_2fr_auto]">
              <div className="hidden sm:block">{finish ? <Swatch hex={finish.hex} name={finish.name} size="sm" caption={false} /> : <div className="size-[76px]" />}</div>
              <Field label="Finish" htmlFor={id(`finish-${j}`)} error={errors?.[`${lp}.finishId`]}>
                <Select
                  id={id(`finish-${j}`)}
                  value={line.finishId}
                  invalid={Boolean(errors?.[`${lp}.finishId`])}
                  onChange={(e) => {
                    const next = finishes.find((f) => f.id === e.target.value);
                    setLine(j, { finishId: e.target.value, unit: next && (!line.unit || line.unit === finish?.unit) ? next.unit : line.unit });
                  }}
                >
                  <option value="">Choose a finish</option>
                  {categories.map((c) => (
                    <optgroup key={c} label={categoryWords[c] ?? c}>
                      {finishes.filter((f) => f.category === c).map((f) => (
                        <option key={f.id} value={f.id}>
                          {f.name}
                          {f.productCode ? ` · ${f.productCode}` : ""}
                        </option>
                      ))}
                    </optgroup>
                  ))}
                </Select>
              </Field>
              <Field label="Quantity" htmlFor={id(`qty-${j}`)} error={errors?.[`${lp}.quantity`]}>
                <Input id={id(`qty-${j}`)} inputMode="decimal" value={line.quantity} onChange={(e) => setLine(j, { quantity: e.target.value })} invalid={Boolean(errors?.[`${lp}.quantity`])} />
              </Field>
              <Field label="Unit" htmlFor={id(`unit-${j}`)} error={errors?.[`${lp}.unit`]}>
                <Input id={id(`unit-${j}`)} value={line.unit} onChange={(e) => setLine(j, { unit: e.target.value })} invalid={Boolean(errors?.[`${lp}.unit`])} />
              </Field>
              <Field label="Item" htmlFor={id(`item-${j}`)} optional>
                <Input id={id(`item-${j}`)} value={line.item} onChange={(e) => setLine(j, { item: e.target.value })} placeholder="Benchtop, splashback…" />
              </Field>
              <Field label="Where" htmlFor={id(`loc-${j}`)} optional>
                <Input id={id(`loc-${j}`)} value={line.location} onChange={(e) => setLine(j, { location: e.target.value })} placeholder="Island, perimeter…" />
              </Field>
              <Button type="button" variant="quiet" disabled={option.lines.length < 2} onClick={() => onChange({ ...option, lines: option.lines.filter((_, k) => k !== j) })}>
                Remove
              </Button>
              {finish && (
                <p className="text-sm text-ink-soft sm:col-span-7">
                  <Money cents={finish.unitPriceCents} /> per {finish.unit}, excluding tax · lead time {finish.leadTimeDays} days{finish.supplierName ? ` · ${finish.supplierName}` : ""}
                </p>
              )}
            </div>
          );
        })}
        <OptionPriceFields option={option} path={path} inputId={id("price")} finishes={finishes} rates={rates} errors={errors} onChange={onChange} />
        <div className="flex flex-wrap gap-2">
          <Button type="button" variant="secondary" disabled={option.lines.length >= 12} onClick={() => onChange({ ...option, lines: [...option.lines, emptyLine()] })}>
            Add a finish
          </Button>
          {canRemove && (
            <Button type="button" variant="quiet" onClick={onRemove}>
              Remove this option
            </Button>
          )}
        </div>
      </div>
    </fieldset>
  );
}
