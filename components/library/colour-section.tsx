"use client";

import { Notice, Swatch } from "@/components/ui";
import type { ColourSource } from "@/db/schema/library";
import { SCREEN_COLOUR_CAUTION } from "@/lib/colour";
import type { FieldErrors } from "@/lib/http";
import { previewColour, type FinishDraft } from "./finish-draft";
import { colourSourceWords, lrvSourceWords } from "./library-words";
import { TextInputField } from "./text-input-field";

type Props = { draft: FinishDraft; errors: FieldErrors; onChange: (change: Partial<FinishDraft>) => void };

const sources: { value: ColourSource; label: string; hint: string }[] = [
  { value: "published", label: "The maker's published colour", hint: "A hex, rgb() or Lab value from the maker's data sheet." },
  { value: "photo", label: "Measured from the sample photo", hint: "The colour you keep from the photo above." },
  { value: "computed", label: "Only the maker's LRV", hint: "Shown as a neutral grey of that lightness." },
];

/** Where the colour comes from, the maker's LRV, and the finish as it will be saved. */
export function ColourSection({ draft, errors, onChange }: Props) {
  const preview = previewColour(draft);
  const colourError = errors["colour.value"] ?? errors["colour.lab"] ?? errors.colour;
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_auto]">
      <div className="flex flex-col gap-4">
        <fieldset className="flex flex-col gap-2">
          <legend className="mb-1 text-base font-medium text-ink">Colour comes from</legend>
          {sources.map((s) => {
            const disabled = s.value === "photo" && !draft.pickedLab;
            return (
              <label key={s.value} className={`flex min-h-tap items-start gap-3 rounded-md border p-3 ${draft.colourSource === s.value ? "border-ink bg-stone-50" : "border-line bg-card"} ${disabled ? "opacity-60" : "cursor-pointer"}`}>
                <input type="radio" name="colour-source" className="mt-1 size-5 shrink-0 accent-[var(--color-ink)]" value={s.value} checked={draft.colourSource === s.value} disabled={disabled} onChange={() => onChange({ colourSource: s.value })} />
                <span className="flex flex-col">
                  <span className="font-medium text-ink">{s.label}</span>
                  <span className="text-sm text-stone-600">{disabled ? "Add a photo first." : s.hint}</span>
                </span>
              </label>
            );
          })}
        </fieldset>
        {draft.colourSource === "published" && (
          <TextInputField id="finish-colour" label="Maker's colour" hint="#d9d2c3, rgb(217 210 195) or lab(84.2 0.9 7.6)" value={draft.publishedColour} onValue={(publishedColour) => onChange({ publishedColour })} error={colourError} autoComplete="off" spellCheck={false} />
        )}
        {draft.colourSource === "photo" && colourError && <p className="text-sm font-medium text-problem-ink">{colourError[0]}</p>}
        <TextInputField
          id="finish-lrv"
          label="Maker's LRV"
          optional={draft.colourSource !== "computed"}
          hint="From the data sheet, 0–100. A published LRV is used over one computed from the colour."
          inputMode="decimal"
          value={draft.lrv}
          onValue={(lrv) => onChange({ lrv })}
          error={errors.lrv}
        />
      </div>
      <div className="flex flex-col gap-3 lg:w-[252px]" aria-live="polite">
        {preview ? (
          <>
            <Swatch hex={preview.hex} imageUrl={draft.photo?.thumbUrl} name={draft.name || "This finish"} productCode={draft.productCode || null} lrv={preview.lrv} lrvSource={preview.lrvSource} size="lg" />
            <p className="text-sm text-ink-soft">
              Colour: {colourSourceWords[preview.colourSource]}. <strong className="font-semibold text-ink">LRV used: {preview.lrv}</strong>, {lrvSourceWords[preview.lrvSource]}.
            </p>
          </>
        ) : (
          <Swatch hex="" name="No colour yet" size="lg" caption={false} />
        )}
        <Notice title="Screens are not samples">{SCREEN_COLOUR_CAUTION}</Notice>
      </div>
    </div>
  );
}
