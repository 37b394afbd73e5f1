"use client";

import { useId, useState } from "react";
import { Button, Select } from "@/components/ui";
import type { BoardChange } from "@/lib/boards/changes";
import type { PairIntent } from "@/lib/boards/proposed-pairs";
import type { BoardView } from "@/lib/boards/types";
import { INTENT_WORDS } from "@/lib/boards/words";
import { ProposalList } from "./proposal-list";

type Props = { view: BoardView; onChange: (change: BoardChange) => void };

/** Where surfaces meet: the proposals from the labels, a form to mark a pair, and the pairs so far. */
export function PairsEditor({ view, onChange }: Props) {
  const ids = useId();
  const [a, setA] = useState("");
  const [b, setB] = useState("");
  const [intent, setIntent] = useState<PairIntent>("contrast");
  const [access, setAccess] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const names = new Map(view.items.map((i) => [i.id, `${i.label} (${i.finish.name})`]));
  const placed = view.items.filter((i) => !i.id.startsWith("pending-"));

  function submit() {
    if (!a || !b) return setError("Choose the two swatches that meet.");
    if (a === b) return setError("Choose two different swatches.");
    setError(null);
    onChange({ kind: "add-pair", itemAId: a, itemBId: b, intent, accessRelevant: access });
    setA("");
    setB("");
  }

  return (
    <section aria-labelledby={`${ids}-title`} className="flex flex-col gap-5">
      <h2 id={`${ids}-title`} className="font-display text-2xl font-semibold text-ink">
        Where surfaces meet
      </h2>
      <ProposalList view={view} names={names} onChange={onChange} />
      <form
        className="flex flex-col gap-3 rounded-md border border-line bg-card p-4"
        onSubmit={(e) => {
          e.preventDefault();
          submit();
        }}
      >
        <h3 className="text-lg font-semibold text-ink">Mark a pair</h3>
        <div className="grid gap-3 sm:grid-cols-2">
          {(
            [
              ["first", a, setA],
              ["second", b, setB],
            ] as const
          ).map(([which, value, set]) => (
            <label key={which} className="flex flex-col gap-1.5">
              <span className="font-medium text-ink">{which === "first" ? "This swatch" : "meets this one"}</span>
              <Select value={value} onChange={(e) => set(e.target.value)} name={`pair-${which}`}>
                <option value="">Choose a swatch</option>
                {placed.map((item) => (
                  <option key={item.id} value={item.id}>
                    {names.get(item.id)}
                  </option>
                ))}
              </Select>
            </label>
          ))}
        </div>
        <fieldset className="flex flex-wrap gap-4">
          <legend className="mb-1 font-medium text-ink">They are meant to</legend>
          {(["match", "contrast"] as const).map((value) => (
            <label key={value} className="inline-flex min-h-tap items-center gap-2">
              <input type="radio" name={`${ids}-intent`} checked={intent === value} onChange={() => setIntent(value)} className="size-5 accent-ink" />
              {value === "match" ? "Match" : "Contrast"}
            </label>
          ))}
        </fieldset>
        <label className="inline-flex min-h-tap items-center gap-2">
          <input type="checkbox" checked={access} onChange={(e) => setAccess(e.target.checked)} className="size-5 accent-ink" />
          Matters for access (floor against wall or kickboard, a step or benchtop edge)
        </label>
        {error && (
          <p role="alert" className="text-problem-ink">
            {error}
          </p>
        )}
        <Button type="submit" variant="secondary" className="self-start">
          Add the pair
        </Button>
      </form>
      <PairList view={view} names={names} onChange={onChange} />
    </section>
  );
}

function PairList({ view, names, onChange }: Props & { names: Map<string, string> }) {
  if (view.pairs.length === 0) return null;
  return (
    <div className="flex flex-col gap-2">
      <h3 className="text-lg font-semibold text-ink">Pairs on this board ({view.pairs.length})</h3>
      <ul className="divide-y divide-line rounded-md border border-line bg-card">
        {view.pairs.map((pair) => {
          const title = `${names.get(pair.itemAId) ?? "?"} and ${names.get(pair.itemBId) ?? "?"}`;
          const pending = pair.id.startsWith("pending-");
          return (
            <li key={pair.id} className="flex flex-col gap-2 p-3" data-pair-row={pair.id}>
              <span className="text-ink">{title}</span>
              <div className="flex flex-wrap items-center gap-3">
                <Select
                  aria-label={`Intent of ${title}`}
                  value={pair.intent}
                  disabled={pending}
                  className="w-auto"
                  onChange={(e) => onChange({ kind: "change-pair", pairId: pair.id, intent: e.target.value as PairIntent })}
                >
                  <option value="match">{INTENT_WORDS.match}</option>
                  <option value="contrast">{INTENT_WORDS.contrast}</option>
                </Select>
                <label className="inline-flex min-h-tap items-center gap-2">
                  <input
                    type="checkbox"
                    checked={pair.accessRelevant}
                    disabled={pending}
                    onChange={(e) => onChange({ kind: "change-pair", pairId: pair.id, accessRelevant: e.target.checked })}
                    className="size-5 accent-ink"
                  />
                  Matters for access
                </label>
                <Button type="button" variant="quiet" disabled={pending} onClick={() => onChange({ kind: "remove-pair", pairId: pair.id })}>
                  Remove<span className="sr-only"> the pair {title}</span>
                </Button>
              </div>
            </li>
          );
        })}
      </ul>
    </div>
  );
}
