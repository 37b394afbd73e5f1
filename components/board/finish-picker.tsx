"use client";

import { useQuery } from "@tanstack/react-query";
import { useEffect, useId, useState } from "react";
import { Button, Input, lrvText, Select, Spinner } from "@/components/ui";
import type { FinderHit } from "@/lib/boards/types";
import { fetchJson } from "./board-fetch";

type Props = {
  boardId: string;
  categories: readonly { value: string; label: string }[];
  onPlace: (finish: FinderHit) => void;
};

/** Find a finish in the studio's library by words, category or likeness of colour, and place it. */
export function FinishPicker({ boardId, categories, onPlace }: Props) {
  const ids = useId();
  const [q, setQ] = useState("");
  const [category, setCategory] = useState("");
  const [near, setNear] = useState<FinderHit | null>(null);
  const [words, setWords] = useState("");
  // Ask the server once typing pauses, not on every key.
  useEffect(() => {
    const timer = setTimeout(() => setWords(q.trim()), 250);
    return () => clearTimeout(timer);
  }, [q]);
  const params = new URLSearchParams();
  if (words) params.set("q", words);
  if (category) params.set("category", category);
  if (near) params.set("near", near.id);
  const query = useQuery({
    queryKey: ["board-finder", boardId, params.toString()],
    queryFn: () => fetchJson<{ items: FinderHit[]; total: number }>(`/api/boards/${encodeURIComponent(boardId)}/finishes?${params}`),
    placeholderData: (previous) => previous,
  });
  const hits = query.data?.items ?? [];

  return (
    <section aria-labelledby={`${ids}-title`} className="flex flex-col gap-4">
      <h2 id={`${ids}-title`} className="font-display text-2xl font-semibold text-ink">
        Add finishes
      </h2>
      <div className="grid gap-3 sm:grid-cols-2">
        <label className="flex flex-col gap-1.5">
          <span className="font-medium text-ink">Search the library</span>
          <Input type="search" value={q} onChange={(e) => setQ(e.target.value)} placeholder="Name, code, surface or supplier" />
        </label>
        <label className="flex flex-col gap-1.5">
          <span className="font-medium text-ink">Category</span>
          <Select value={category} onChange={(e) => setCategory(e.target.value)}>
            <option value="">Every category</option>
            {categories.map((c) => (
              <option key={c.value} value={c.value}>
                {c.label}
              </option>
            ))}
          </Select>
        </label>
      </div>
      {near && (
        <div className="flex flex-wrap items-center justify-between gap-2 rounded-md bg-stone-100 px-3 py-2">
          <span>
            Nearest in colour to <strong className="font-semibold">{near.name}</strong> (CIEDE2000)
          </span>
          <Button type="button" variant="quiet" onClick={() => setNear(null)}>
            Show all again
          </Button>
        </div>
      )}
      <div aria-live="polite" className="text-sm text-stone-600">
        {query.isFetching ? <Spinner label="Searching" /> : describeCount(hits.length, query.data?.total ?? 0)}
        {query.error && <span className="text-problem-ink"> {query.error.message}</span>}
      </div>
      <ul className="grid max-h-[36rem] gap-2 overflow-y-auto pr-1 sm:grid-cols-2">
        {hits.map((hit) => (
          <li key={hit.id} className="flex items-center gap-3 rounded-md border border-line bg-card p-2" data-finish-id={hit.id}>
            <span className="shrink-0 rounded-chip bg-surround p-1.5" aria-hidden="true">
              <span className="block size-12" data-swatch-colour="" style={{ backgroundColor: hit.hex }} />
            </span>
            <span className="flex min-w-0 flex-1 flex-col leading-tight">
              <span className="truncate font-medium text-ink">{hit.name}</span>
              <span className="figures truncate text-sm text-stone-600">
                {[hit.productCode, lrvText(hit.lrv, hit.lrvSource), hit.deltaE === null ? null : `${hit.deltaE.toFixed(1)} ΔE00`]
                  .filter(Boolean)
                  .join(" · ")}
              </span>
              <span className="flex flex-wrap gap-1">
                <Button type="button" variant="secondary" className="min-h-tap px-3" onClick={() => onPlace(hit)}>
                  Place<span className="sr-only"> {hit.name} on the board</span>
                </Button>
                <Button type="button" variant="quiet" className="min-h-tap px-2" onClick={() => setNear(hit)}>
                  Similar<span className="sr-only"> colours to {hit.name}</span>
                </Button>
              </span>
            </span>
          </li>
        ))}
      </ul>
    </section>
  );
}

function describeCount(shown: number, total: number) {
  if (total > shown) return `The first ${shown} of ${total} finishes: search or choose a category to narrow them.`;
  return `${total} finish${total === 1 ? "" : "es"}`;
}
