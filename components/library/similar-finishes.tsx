"use client";

import { keepPreviousData, useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import { Card, Figure, Notice, Select, Spinner, Swatch } from "@/components/ui";
import { fetchSimilar, libraryKeys } from "./library-api";
import { finishCategoryLabels } from "@/lib/validation/finish";
import { formatDays } from "./library-words";

export const SIMILAR_STEPS = [1, 2, 3, 5, 8] as const;

/**
 * Current finishes within a chosen CIEDE2000 difference of this one, nearest first: substitutes
 * when a line is discontinued or its lead time is too long. Only the same category unless the
 * designer asks for every category (a colour to echo elsewhere, not a substitute).
 */
export function SimilarFinishes({ finishId, category, leadTimeDays }: { finishId: string; category: string; leadTimeDays: number }) {
  const [maxDeltaE, setMaxDeltaE] = useState(3);
  const [anyCategory, setAnyCategory] = useState(false);
  const { data, isFetching, isError, error } = useQuery({
    queryKey: libraryKeys.similar(finishId, maxDeltaE, anyCategory),
    queryFn: () => fetchSimilar(finishId, maxDeltaE, anyCategory),
    placeholderData: keepPreviousData,
  });
  return (
    <Card title="Similar colours" level={2}>
      <div className="flex flex-col gap-4">
        <label className="flex flex-col gap-1.5">
          <span className="font-medium text-ink">Within ΔE00 (CIEDE2000)</span>
          <Select value={maxDeltaE} onChange={(e) => setMaxDeltaE(Number(e.target.value))}>
            {SIMILAR_STEPS.map((step) => (
              <option key={step} value={step}>
                {step} ΔE00{step === 3 ? (anyCategory ? " (close colour)" : " (close substitute)") : ""}
              </option>
            ))}
          </Select>
        </label>
        <label className="flex min-h-tap cursor-pointer items-center gap-3">
          <input type="checkbox" className="size-5 shrink-0 accent-[var(--color-ink)]" checked={anyCategory} onChange={(e) => setAnyCategory(e.target.checked)} />
          <span className="text-ink">Include other categories</span>
        </label>
        <p className="text-sm text-ink-soft">
          {anyCategory ? "Every category: colours to echo elsewhere, not substitutes." : `${category} only: finishes that could take this one's place.`}
        </p>
        {isError && <Notice tone="problem">{error.message}</Notice>}
        {!data ? (
          <Spinner label="Finding similar colours" />
        ) : data.items.length === 0 ? (
          <p className="text-ink-soft">
            No other current {anyCategory ? "finish" : `${category.toLowerCase()} finish`} is within {maxDeltaE} ΔE00. Try a wider difference{anyCategory ? "" : " or other categories"}.
          </p>
        ) : (
          <ul className={`flex flex-col gap-3 ${isFetching ? "opacity-70" : ""}`} aria-busy={isFetching}>
            {data.items.map((f) => (
              <li key={f.id} className="flex gap-3">
                <Swatch hex={f.hex} imageUrl={f.thumbUrl} name={f.name} size="sm" caption={false} />
                <div className="flex min-w-0 flex-col text-sm">
                  <Link href={`/studio/library/${f.id}`} className="font-medium text-ink underline underline-offset-4">
                    {f.name}
                  </Link>
                  <span className="text-ink-soft">{[anyCategory ? finishCategoryLabels[f.category] : null, f.supplierName, f.productCode].filter(Boolean).join(" · ")}</span>
                  <span>
                    <Figure value={f.deltaE} digits={1} unit="ΔE00" /> · LRV <Figure value={f.lrv} digits={Number.isInteger(f.lrv) ? 0 : 1} />
                  </span>
                  <span className={f.leadTimeDays < leadTimeDays ? "font-medium text-ok-ink" : "text-ink-soft"}>
                    {formatDays(f.leadTimeDays)} lead time{f.leadTimeDays < leadTimeDays ? " (shorter)" : ""}
                  </span>
                </div>
              </li>
            ))}
          </ul>
        )}
        <p className="text-sm text-stone-600">
          Smaller is closer; side by side, under about 1 is hard to see. Compare physical samples before substituting.
        </p>
      </div>
    </Card>
  );
}
