"use client";

import { describeField, Field, Select, Textarea } from "@/components/ui";
import type { FieldErrors } from "@/lib/http";
import { finishCategoryKeys, finishCategoryLabels } from "@/lib/validation/finish";
import type { FinishDraft } from "./finish-draft";
import type { SupplierOption } from "./finish-filters";
import { TextInputField } from "./text-input-field";

type Props = {
  draft: FinishDraft;
  errors: FieldErrors;
  suppliers: SupplierOption[];
  onChange: (change: Partial<FinishDraft>) => void;
};

/** Name, category, supplier, code, finish and format. */
export function IdentityFields({ draft, errors, suppliers, onChange }: Props) {
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <TextInputField id="finish-name" label="Name" className="sm:col-span-2" value={draft.name} onValue={(name) => onChange({ name })} error={errors.name} autoComplete="off" />
      <Field htmlFor="finish-category" label="Category" error={errors.category}>
        <Select {...describeField("finish-category", { error: errors.category })} value={draft.category} onChange={(e) => onChange({ category: e.target.value as FinishDraft["category"] })}>
          <option value="">Choose a category</option>
          {finishCategoryKeys.map((key) => (
            <option key={key} value={key}>
              {finishCategoryLabels[key]}
            </option>
          ))}
        </Select>
      </Field>
      <Field htmlFor="finish-supplier" label="Supplier" optional error={errors.supplierId}>
        <Select {...describeField("finish-supplier", { error: errors.supplierId })} value={draft.supplierId} onChange={(e) => onChange({ supplierId: e.target.value })}>
          <option value="">No supplier</option>
          {suppliers.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
        </Select>
      </Field>
      <TextInputField id="finish-code" label="Product code" optional value={draft.productCode} onValue={(productCode) => onChange({ productCode })} error={errors.productCode} autoComplete="off" />
      <TextInputField id="finish-surface" label="Finish" optional hint="Polished, honed, matt, satin, textured…" value={draft.surface} onValue={(surface) => onChange({ surface })} error={errors.surface} />
      <TextInputField id="finish-format" label="Size or format" optional hint="20 mm slab, 600 × 600 mm, each…" className="sm:col-span-2" value={draft.format} onValue={(format) => onChange({ format })} error={errors.format} />
    </div>
  );
}

/** Unit, price per unit and lead time. */
export function PriceFields({ draft, errors, onChange }: Omit<Props, "suppliers">) {
  return (
    <div className="grid gap-4 sm:grid-cols-3">
      <TextInputField id="finish-unit" label="Priced per" hint="m², each, L, lineal m…" value={draft.unit} onValue={(unit) => onChange({ unit })} error={errors.unit} />
      <TextInputField id="finish-price" label="Cost per unit, excluding GST/tax" hint="What the studio pays, in dollars. Clients' prices add markup and tax." inputMode="decimal" value={draft.price} onValue={(price) => onChange({ price })} error={errors.unitPriceCents} />
      <TextInputField id="finish-lead" label="Lead time (days)" hint="From order to delivery" inputMode="numeric" value={draft.leadTime} onValue={(leadTime) => onChange({ leadTime })} error={errors.leadTimeDays} />
    </div>
  );
}

const careHint = "Sealing, cleaning, what to avoid.";

export function CareField({ draft, errors, onChange }: Omit<Props, "suppliers">) {
  return (
    <Field htmlFor="finish-care" label="Care notes" optional hint={careHint} error={errors.careNotes}>
      <Textarea {...describeField("finish-care", { hint: careHint, error: errors.careNotes })} rows={3} value={draft.careNotes} onChange={(e) => onChange({ careNotes: e.target.value })} />
    </Field>
  );
}
