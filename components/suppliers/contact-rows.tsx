"use client";

import { useEffect, useState } from "react";
import { Button, describeField, Field, Input } from "@/components/ui";
import type { FieldErrors } from "@/lib/http";
import { spareRow, type ContactRow } from "./supplier-draft";

type Props = {
  rows: ContactRow[];
  errors: FieldErrors | undefined;
  autoFocus: (name: string) => boolean;
  onChange: (rows: ContactRow[]) => void;
};

const labels = { name: "Name", role: "Role there", email: "E-mail", phone: "Phone" } as const;
const types = { name: "text", role: "text", email: "email", phone: "tel" } as const;

/**
 * The people at the company, one fieldset each, posted as `contacts.N.field`. The last row is a
 * spare: filled in, it adds a contact; left blank, it is ignored. Ticking "Remove" drops a saved
 * contact on save. "Add another contact" appears once JavaScript runs (without it, save and the
 * page comes back with a fresh spare row).
 */
export function ContactRows({ rows, errors, autoFocus, onChange }: Props) {
  const [scripted, setScripted] = useState(false);
  useEffect(() => setScripted(true), []);
  const set = (index: number, next: Partial<ContactRow>) => onChange(rows.map((r, i) => (i === index ? { ...r, ...next } : r)));
  return (
    <div className="flex flex-col gap-4">
      <p className="text-ink-soft">The people you deal with there, and what they do: sales, accounts, site measure.</p>
      {errors?.contacts && <p className="text-sm font-medium text-problem-ink">{errors.contacts[0]}</p>}
      {rows.map((row, i) => {
        const saved = Boolean(row.id);
        const legend = saved ? row.name || "Contact" : "Add a contact";
        return (
          <fieldset key={row.key} className={`flex flex-col gap-4 rounded-md border p-4 ${row.remove ? "border-problem/40 bg-problem-wash" : "border-line"}`}>
            <legend className="px-1 font-medium text-ink">{legend}</legend>
            <input type="hidden" name={`contacts.${i}.id`} value={row.id} />
            <div className="grid gap-4 sm:grid-cols-2">
              {(["name", "role", "email", "phone"] as const).map((f) => {
                const key = `contacts.${i}.${f}`;
                const id = `contact-${i}-${f}`;
                return (
                  <Field key={f} htmlFor={id} label={labels[f]} optional={f !== "name"} error={errors?.[key]}>
                    <Input
                      {...describeField(id, { error: errors?.[key] })}
                      name={key}
                      type={types[f]}
                      value={row[f]}
                      autoComplete="off"
                      autoFocus={autoFocus(key)}
                      onChange={(e) => set(i, { [f]: e.target.value })}
                    />
                  </Field>
                );
              })}
            </div>
            {saved && (
              <label className="flex min-h-tap cursor-pointer items-center gap-3 self-start rounded-md px-1">
                <input type="checkbox" name={`contacts.${i}.remove`} value="1" checked={row.remove} onChange={(e) => set(i, { remove: e.target.checked })} className="size-5" />
                <span>Remove this contact when saving</span>
              </label>
            )}
          </fieldset>
        );
      })}
      {scripted && (
        <div>
          <Button type="button" variant="secondary" onClick={() => onChange([...rows, spareRow()])}>
            Add another contact
          </Button>
        </div>
      )}
    </div>
  );
}
