"use client";

import { useEffect, useState } from "react";
import { Button, Field, Input, Select } from "@/components/ui";
import { finishCategoryKeys, finishCategoryLabels, type FinishListQuery } from "@/lib/validation/finish";

export type SupplierOption = { id: string; name: string };

type Props = {
  query: FinishListQuery;
  suppliers: SupplierOption[];
  onChange: (change: Partial<FinishListQuery>) => void;
};

/** Text search (applied as the designer pauses typing), category, supplier and archived. */
export function FinishFilters({ query, suppliers, onChange }: Props) {
  const [text, setText] = useState(query.q);
  useEffect(() => setText(query.q), [query.q]);
  useEffect(() => {
    if (text.trim() === query.q) return;
    const timer = setTimeout(() => onChange({ q: text.trim(), page: 1 }), 250);
    return () => clearTimeout(timer);
  }, [text, query.q, onChange]);
  const filtered = Boolean(query.q || query.category || query.supplier || query.status !== "current");
  return (
    <form role="search" aria-label="Filter the library" className="grid gap-3 sm:grid-cols-2 lg:grid-cols-[2fr_1fr_1fr_1fr_auto] lg:items-end" onSubmit={(e) => e.preventDefault()}>
      <Field htmlFor="library-q" label="Search">
        <Input id="library-q" type="search" value={text} onChange={(e) => setText(e.target.value)} placeholder="Name, product code, finish or supplier" autoComplete="off" />
      </Field>
      <Field htmlFor="library-category" label="Category">
        <Select id="library-category" value={query.category ?? ""} onChange={(e) => onChange({ category: (e.target.value || undefined) as FinishListQuery["category"], page: 1 })}>
          <option value="">All categories</option>
          {finishCategoryKeys.map((key) => (
            <option key={key} value={key}>
              {finishCategoryLabels[key]}
            </option>
          ))}
        </Select>
      </Field>
      <Field htmlFor="library-supplier" label="Supplier">
        <Select id="library-supplier" value={query.supplier ?? ""} onChange={(e) => onChange({ supplier: e.target.value || undefined, page: 1 })}>
          <option value="">All suppliers</option>
          {suppliers.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
          <option value="none">No supplier</option>
        </Select>
      </Field>
      <Field htmlFor="library-status" label="Showing">
        <Select id="library-status" value={query.status} onChange={(e) => onChange({ status: e.target.value as FinishListQuery["status"], page: 1 })}>
          <option value="current">Current finishes</option>
          <option value="archived">Archived finishes</option>
          <option value="all">Current and archived</option>
        </Select>
      </Field>
      <Button
        type="button"
        variant="quiet"
        disabled={!filtered}
        onClick={() => {
          setText("");
          onChange({ q: "", category: undefined, supplier: undefined, status: "current", page: 1 });
        }}
      >
        Clear filters
      </Button>
    </form>
  );
}
