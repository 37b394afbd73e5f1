"use client";

import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { ApiError, requestJson, sendJson } from "@/components/library/library-api";
import { Button, describeField, Field, Select } from "@/components/ui";
import { tradeKeys, tradeLabels } from "@/lib/suppliers/trades";
import { TradeCaution } from "./trade-caution";

type Props = { names: string[]; onAdded: () => void };

/** Suppliers a spreadsheet names that the studio doesn't have: add each with its trade, then the file is checked again. */
export function MissingSuppliers({ names, onAdded }: Props) {
  return (
    <section aria-labelledby="missing-suppliers" className="flex flex-col gap-3 rounded-lg border border-line bg-stone-50 p-4">
      <h3 id="missing-suppliers" className="font-semibold text-ink">
        {names.length === 1 ? "A supplier to add" : `${names.length} suppliers to add`}
      </h3>
      <p className="text-ink-soft">The file names {names.length === 1 ? "a supplier" : "suppliers"} your studio doesn&apos;t have yet. Add each one with its trade and the file is checked again; contacts and account numbers can wait for its page under Suppliers.</p>
      <ul className="flex flex-col gap-3">
        {names.map((name, i) => (
          <li key={name}>
            <AddOne name={name} index={i} onAdded={onAdded} />
          </li>
        ))}
      </ul>
    </section>
  );
}

function AddOne({ name, index, onAdded }: { name: string; index: number; onAdded: () => void }) {
  const [trade, setTrade] = useState("");
  const add = useMutation({
    mutationFn: () => requestJson("/api/suppliers", sendJson("POST", { name, trade })),
    onSuccess: onAdded,
  });
  const fieldErrors = add.error instanceof ApiError ? add.error.fieldErrors : {};
  const error = fieldErrors.trade ?? fieldErrors.name ?? (add.error ? [add.error.message] : undefined);
  const id = `missing-supplier-${index}`;
  return (
    <form
      noValidate
      className="flex flex-col gap-3 rounded-md border border-line bg-card p-3"
      onSubmit={(e) => {
        e.preventDefault();
        add.mutate();
      }}
    >
      <p className="font-medium text-ink">{name}</p>
      <div className="flex flex-col gap-3 sm:flex-row sm:items-end">
        <Field htmlFor={id} label="Trade" error={error} className="sm:flex-1">
          <Select {...describeField(id, { error })} value={trade} onChange={(e) => setTrade(e.target.value)}>
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
        <Button type="submit" pending={add.isPending} disabled={add.isSuccess}>
          {add.isSuccess ? "Added" : "Add supplier"}
        </Button>
      </div>
      <TradeCaution trade={trade} />
    </form>
  );
}
