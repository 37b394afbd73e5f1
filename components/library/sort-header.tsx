"use client";

import { Th } from "@/components/ui";
import type { FinishSortKey } from "@/lib/validation/finish";

type Props = {
  label: string;
  column: FinishSortKey;
  sort: FinishSortKey;
  dir: "asc" | "desc";
  numeric?: boolean;
  onSort: (column: FinishSortKey) => void;
};

/** A column heading that sorts by its column; aria-sort says which way for screen readers. */
export function SortHeader({ label, column, sort, dir, numeric = false, onSort }: Props) {
  const active = sort === column;
  return (
    <Th numeric={numeric} aria-sort={active ? (dir === "asc" ? "ascending" : "descending") : "none"} className="py-0">
      <button
        type="button"
        onClick={() => onSort(column)}
        className={`inline-flex min-h-tap w-full items-center gap-1 font-semibold underline-offset-4 hover:underline ${numeric ? "justify-end" : ""} ${active ? "text-ink" : "text-ink-soft"}`}
      >
        {label}
        <svg viewBox="0 0 12 12" width="12" height="12" aria-hidden="true" focusable="false" className={active ? "" : "opacity-30"}>
          {active && dir === "desc" ? (
            <path d="M3 4.5l3 3 3-3" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" strokeLinejoin="round" />
          ) : (
            <path d="M3 7.5l3-3 3 3" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" strokeLinejoin="round" />
          )}
        </svg>
      </button>
    </Th>
  );
}
