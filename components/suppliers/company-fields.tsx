import { describeField, Field, Input, Select, Textarea } from "@/components/ui";
import type { FieldErrors } from "@/lib/http";
import { tradeKeys, tradeLabels } from "@/lib/suppliers/trades";
import type { SupplierDraft } from "./supplier-draft";
import { TradeCaution } from "./trade-caution";

type Props = {
  draft: SupplierDraft;
  errors: FieldErrors | undefined;
  autoFocus: (name: string) => boolean;
  onChange: (next: Partial<SupplierDraft>) => void;
};

const hints = {
  accountNumber: "Your studio's account with them, as quoted on orders.",
  notes: "Delivery days, trade discount, who to ring for site measures…",
};

type TextKey = "name" | "email" | "phone" | "accountNumber";

/** The company itself: name, trade, how to reach it, the studio's account and notes. */
export function CompanyFields({ draft, errors, autoFocus, onChange }: Props) {
  const wire = (key: keyof typeof draft, hint?: string) => ({
    ...describeField(`supplier-${key}`, { hint, error: errors?.[key] }),
    name: key,
    autoFocus: autoFocus(key),
  });
  const text = (key: TextKey, label: string, extra: { type?: string; optional?: boolean; hint?: string; autoComplete?: string } = {}) => (
    <Field htmlFor={`supplier-${key}`} label={label} optional={extra.optional} hint={extra.hint} error={errors?.[key]}>
      <Input
        {...wire(key, extra.hint)}
        type={extra.type ?? "text"}
        value={draft[key]}
        autoComplete={extra.autoComplete ?? "off"}
        onChange={(e) => onChange({ [key]: e.target.value })}
      />
    </Field>
  );
  return (
    <div className="flex flex-col gap-5">
      {text("name", "Company name", { autoComplete: "organization" })}
      <Field htmlFor="supplier-trade" label="Trade" error={errors?.trade}>
        <Select {...wire("trade")} value={draft.trade} onChange={(e) => onChange({ trade: e.target.value })}>
          <option value="" disabled>
            Choose a trade
          </option>
          {tradeKeys.map((key) => (
            <option key={key} value={key}>
              {tradeLabels[key]}
            </option>
          ))}
        </Select>
      </Field>
      <TradeCaution trade={draft.trade} />
      <div className="grid gap-5 sm:grid-cols-2">
        {text("email", "Orders e-mail", { type: "email", optional: true })}
        {text("phone", "Phone", { type: "tel", optional: true })}
      </div>
      {text("accountNumber", "Account number", { optional: true, hint: hints.accountNumber })}
      <Field htmlFor="supplier-notes" label="Notes" optional hint={hints.notes} error={errors?.notes}>
        <Textarea {...wire("notes", hints.notes)} rows={3} value={draft.notes} onChange={(e) => onChange({ notes: e.target.value })} />
      </Field>
    </div>
  );
}
