"use client";

import { useState } from "react";
import { Button, Notice } from "@/components/ui";
import type { Measurement } from "@/lib/uploads/measured";
import type { FinishDraft } from "./finish-draft";
import { measureAgain, type UploadAnswer } from "./library-api";
import { MeasuredChoice } from "./measured-choice";
import { NeutralBox, type Box } from "./neutral-box";
import { PhotoAccuracy } from "./photo-accuracy";
import { defaultCardChoice, PhotoCard, readCardReflectance, type CardChoice } from "./photo-card";
import { PhotoDrop } from "./photo-drop";

type Props = { draft: FinishDraft; error?: string[]; onChange: (change: Partial<FinishDraft>) => void };

/** The measurement part of an upload's answer, or null when the photo was kept but not measured. */
function readMeasurement(answer: UploadAnswer): Measurement | null {
  if (!answer.measured) return null;
  const { colour, palette, corrected, cardReflectance, likelyError } = answer;
  return { colour, palette, corrected, cardReflectance, likelyError };
}

/**
 * The sample photo: drop one, see what was measured and how far off it may be, and re-measure
 * against a grey or white card in the shot (its reflectance asked) to correct cast and exposure.
 */
export function PhotoSection({ draft, error, onChange }: Props) {
  const [box, setBox] = useState<Box | null>(null);
  const [card, setCard] = useState<CardChoice>(defaultCardChoice);
  const [cardProblem, setCardProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const { photo, measurement } = draft;

  const uploaded = (answer: UploadAnswer) => {
    const { id, url, thumbUrl, width, height } = answer;
    const measured = readMeasurement(answer);
    setBox(null);
    setProblem(answer.measured ? null : answer.notMeasured);
    // A fresh photo's measured colour is what the designer most likely wants, unless they typed the maker's.
    const takeColour = measured !== null && (draft.colourSource !== "published" || draft.publishedColour.trim() === "");
    onChange({
      photo: { id, url, thumbUrl, width, height },
      measurement: measured,
      pickedLab: measured ? measured.colour.lab : null,
      ...(takeColour ? { colourSource: "photo" as const } : {}),
    });
  };

  const measure = async (withCard: boolean) => {
    if (!photo) return;
    let request: Parameters<typeof measureAgain>[1];
    if (withCard && box) {
      const read = readCardReflectance(card);
      if ("problem" in read) return setCardProblem(read.problem);
      request = { neutral: box, reflectance: read.reflectance };
    }
    setCardProblem(null);
    setBusy(true);
    setProblem(null);
    try {
      const result = await measureAgain(photo.id, request);
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
    <div className="grid gap-4 md:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
      <div className="flex flex-col gap-2">
        <NeutralBox src={photo.url} alt="The sample photo" photoWidth={photo.width} photoHeight={photo.height} box={box} onBox={setBox} />
        <p className="text-sm text-stone-600">
          Grey or white card in the shot? Drag a box over it, say which card it is, then measure again to take out the light&apos;s colour and set the exposure.
        </p>
        {box && <PhotoCard choice={card} onChange={setCard} problem={cardProblem} />}
      </div>
      <div className="flex flex-col gap-3">
        <div className="flex flex-wrap gap-2">
          <Button type="button" variant="secondary" disabled={!box} pending={busy && box !== null} onClick={() => measure(true)}>
            Measure with the card
          </Button>
          {measurement === null && (
            <Button type="button" variant="secondary" pending={busy && box === null} onClick={() => measure(false)}>
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
        {measurement && <PhotoAccuracy measurement={measurement} />}
      </div>
    </div>
  );
}
