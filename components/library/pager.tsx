"use client";

import { Button } from "@/components/ui";

type Props = { page: number; pageSize: number; total: number; onPage: (page: number) => void };

const count = new Intl.NumberFormat("en-AU");

/** "Showing 51–100 of 10,000" with previous and next. */
export function Pager({ page, pageSize, total, onPage }: Props) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <nav aria-label="Pages of the library" className="flex flex-wrap items-center justify-between gap-3">
      <p className="figures text-ink-soft" aria-live="polite">
        Showing {count.format(first)}–{count.format(last)} of {count.format(total)} {total === 1 ? "finish" : "finishes"}
      </p>
      <div className="flex items-center gap-2">
        <Button type="button" variant="secondary" disabled={page <= 1} onClick={() => onPage(page - 1)}>
          Previous
        </Button>
        <span className="figures px-1 text-ink-soft">
          Page {count.format(Math.min(page, pages))} of {count.format(pages)}
        </span>
        <Button type="button" variant="secondary" disabled={page >= pages} onClick={() => onPage(page + 1)}>
          Next
        </Button>
      </div>
    </nav>
  );
}
