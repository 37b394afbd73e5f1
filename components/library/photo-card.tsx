"use client";

import { useId } from "react";
import { Input } from "@/components/ui";
import { cardPresets, MAX_CARD_REFLECTANCE, MIN_CARD_REFLECTANCE } from "@/lib/uploads/measure-request";

export type CardChoice = { preset: string; custom: string };
export const defaultCardChoice: CardChoice = { preset: cardPresets[0].id, custom: "" };

/** The card's reflectance in per cent, or the plain reason it can't be used yet. */
export function readCardReflectance(choice: CardChoice): { reflectance: number } | { problem: string } {
  const preset = cardPresets.find((p) => p.id === choice.preset);
  if (preset) return { reflectance: preset.reflectance };
  const value = Number(choice.custom.replace("%", "").trim());
  if (choice.custom.trim() === "" || !Number.isFinite(value) || value < MIN_CARD_REFLECTANCE || value > MAX_CARD_REFLECTANCE) {
    return { problem: `Enter the card's reflectance as a per cent from ${MIN_CARD_REFLECTANCE} to ${MAX_CARD_REFLECTANCE}.` };
  }
  return { reflectance: value };
}

type Props = { choice: CardChoice; onChange: (choice: CardChoice) => void; problem?: string | null };

/**
 * Which card is boxed: its reflectance sets the exposure, so it is asked, not assumed. The maker's
 * figure is printed on most cards; an 18% grey card and a 90% white card are the usual ones.
 */
export function PhotoCard({ choice, onChange, problem }: Props) {
  const id = useId();
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 text-base font-medium text-ink">Which card is in the box?</legend>
      {cardPresets.map((p) => (
        <label key={p.id} className="flex min-h-11 cursor-pointer items-center gap-2 text-base text-ink">
          <input type="radio" name={`${id}-card`} className="size-5 shrink-0" checked={choice.preset === p.id} onChange={() => onChange({ ...choice, preset: p.id })} />
          {p.label}
        </label>
      ))}
      <label className="flex min-h-11 cursor-pointer flex-wrap items-center gap-2 text-base text-ink">
        <input type="radio" name={`${id}-card`} className="size-5 shrink-0" checked={choice.preset === "other"} onChange={() => onChange({ ...choice, preset: "other" })} />
        Another card, reflecting
        <span className="flex items-center gap-2">
          <span className="w-24">
            <Input
              aria-label="The card's reflectance, per cent"
              inputMode="decimal"
              value={choice.custom}
              invalid={Boolean(problem)}
              onFocus={() => onChange({ ...choice, preset: "other" })}
              onChange={(e) => onChange({ preset: "other", custom: e.target.value })}
            />
          </span>
          %
        </span>
      </label>
      {problem && <p className="text-sm font-medium text-problem-ink">{problem}</p>}
    </fieldset>
  );
}
