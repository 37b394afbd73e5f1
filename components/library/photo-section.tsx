"use client";

import { useState } from "react";
import { Button, Notice } from "@/components/ui";
import type { FinishDraft } from "./finish-draft";
import { measureAgain, type UploadAnswer } from "./library-api";
import { MeasuredChoice } from "./measured-choice";
import { NeutralBox, type Box } from "./neutral-box";
import { PhotoDrop } from "./photo-drop";

type Props = { draft: FinishDraft; error?: string[]; onChange: (change: Partial<FinishDraft>) => void };

/** The sample photo: drop one, see what was measured, and re-measure against a grey or white card in the shot. */
export function PhotoSection({ draft, error, onChange }: Props) {
  const [box, setBox] = useState<Box | null>(null);
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const { photo, measurement } = draft;

  const uploaded = (answer: UploadAnswer) => {
    const { id, url, thumbUrl, width, height, ...measured } = answer;
    setBox(null);
    // A fresh photo's measured colour is what the designer most likely wants, unless they typed the maker's.
    const takeColour = draft.colourSource !== "published" || draft.publishedColour.trim() === "";
    onChange({
      photo: { id, url, thumbUrl, width, height },
      measurement: measured,
      pickedLab: measured.colour.lab,
      ...(takeColour ? { colourSource: "photo" as const } : {}),
    });
  };

  const measure = async (neutral?: Box) => {
    if (!photo) return;
    setBusy(true);
    setProblem(null);
    try {
      const result = await measureAgain(photo.id, neutral);
      onChange({ measurement: result, pickedLab: result.colour.lab });
    } catch (e) {
      setProblem(e instanceof Error ? e.message : "The photo couldn't be measured again.");
    } finally {
      setBusy(false);
    }
  };

  if (!photo) {
    return (
      <div className="flex flex-col gap-2">
        <PhotoDrop onUploaded={uploaded} />
        {error?.[0] && <p className="text-sm font-medium text-problem-ink">{error[0]}</p>}
      </div>
    );
  }
  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-4 md:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
        <div className="flex flex-col gap-2">
          <NeutralBox src={photo.url} alt="The sample photo" photoWidth={photo.width} photoHeight={photo.height} box={box} onBox={setBox} />
          <p className="text-sm text-stone-600">
            White or grey card in the shot? Drag a box over it, then measure again to take the light&apos;s colour out.
          </p>
        </div>
        <div className="flex flex-col gap-3">
          <div className="flex flex-wrap gap-2">
            <Button type="button" variant="secondary" disabled={!box} pending={busy && box !== null} onClick={() => box && measure(box)}>
              Measure with the card
            </Button>
            {measurement === null && (
              <Button type="button" variant="secondary" pending={busy && box === null} onClick={() => measure()}>
                Measure the photo
              </Button>
            )}
            {box && (
              <Button type="button" variant="quiet" onClick={() => setBox(null)}>
                Clear the box
              </Button>
            )}
            <Button type="button" variant="quiet" onClick={() => onChange({ photo: null, measurement: null, pickedLab: null, ...(draft.colourSource === "photo" ? { colourSource: "published" as const } : {}) })}>
              Remove photo
            </Button>
          </div>
          {problem && <Notice tone="problem" title="Not measured">{problem}</Notice>}
          {measurement && <MeasuredChoice measurement={measurement} picked={draft.pickedLab} onPick={(pickedLab) => onChange({ pickedLab, colourSource: "photo" })} />}
          {measurement?.corrected && <p className="text-sm text-ink-soft">Measured with the light&apos;s cast removed, using the card you boxed.</p>}
        </div>
      </div>
    </div>
  );
}
