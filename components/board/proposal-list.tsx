"use client";

import { Button } from "@/components/ui";
import type { BoardChange } from "@/lib/boards/changes";
import type { BoardView } from "@/lib/boards/types";
import { INTENT_WORDS } from "@/lib/boards/words";

type Props = { view: BoardView; names: Map<string, string>; onChange: (change: BoardChange) => void };

/** Pairs the labels suggest; each is one tap to add and can be changed afterwards like any other. */
export function ProposalList({ view, names, onChange }: Props) {
  const proposals = view.proposals.filter((p) => !p.itemAId.startsWith("pending-") && !p.itemBId.startsWith("pending-"));
  if (proposals.length === 0) return null;
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 className="text-lg font-semibold text-ink">Suggested from the labels</h3>
        {proposals.length > 1 && (
          <Button
            type="button"
            variant="quiet"
            onClick={() => proposals.forEach((p) => onChange({ kind: "add-pair", ...p }))}
          >
            Add all {proposals.length}
          </Button>
        )}
      </div>
      <ul className="divide-y divide-line rounded-md border border-line bg-card">
        {proposals.map((p) => {
          const title = `${names.get(p.itemAId) ?? "?"} and ${names.get(p.itemBId) ?? "?"}`;
          return (
            <li key={`${p.itemAId}|${p.itemBId}`} className="flex flex-wrap items-center justify-between gap-3 p-3">
              <span className="flex min-w-0 flex-col">
                <span className="text-ink">{title}</span>
                <span className="text-sm text-stone-600">
                  {INTENT_WORDS[p.intent]}
                  {p.accessRelevant ? ", matters for access" : ""}. {p.why}
                </span>
              </span>
              <Button type="button" variant="secondary" onClick={() => onChange({ kind: "add-pair", ...p })}>
                Add<span className="sr-only"> the pair {title}</span>
              </Button>
            </li>
          );
        })}
      </ul>
    </div>
  );
}
