"use client";

import Link from "next/link";
import { Button, cx } from "@/components/ui";

export type Paper = "a4" | "letter";

/** Screen-only: choose the paper the page is laid out for, then print (or save as PDF). */
export function PrintControls({ paper, hrefs, backHref }: { paper: Paper; hrefs: Record<Paper, string>; backHref: string }) {
  const papers: { value: Paper; label: string }[] = [
    { value: "a4", label: "A4" },
    { value: "letter", label: "US Letter" },
  ];
  return (
    <div className="no-print flex flex-wrap items-center gap-3 rounded-lg border border-line bg-card p-3">
      <span className="text-ink-soft" id="paper-label">
        Paper
      </span>
      <ul aria-labelledby="paper-label" className="inline-flex rounded-md border border-line-strong p-0.5">
        {papers.map((p) => (
          <li key={p.value}>
            <Link
              href={hrefs[p.value]}
              replace
              aria-current={paper === p.value ? "true" : undefined}
              className={cx("inline-flex min-h-tap items-center rounded px-4", paper === p.value ? "bg-ink text-white" : "text-ink hover:bg-stone-100")}
            >
              {p.label}
            </Link>
          </li>
        ))}
      </ul>
      <Button type="button" onClick={() => window.print()}>
        Print
      </Button>
      <Link href={backHref} className="inline-flex min-h-tap items-center px-2 text-spruce underline underline-offset-4">
        Back
      </Link>
    </div>
  );
}
