import type { FinishDetail } from "@/db/queries/finish-dto";
import type { ColourSource, FinishCategory } from "@/db/schema/library";
import { deltaE2000, parseColour, toHex } from "@/lib/colour";
import type { Lab } from "@/lib/colour";
import type { Measurement } from "@/lib/uploads/measured";
import { ApiError } from "./library-api";
import { parseMoney } from "@/lib/pricing/parse-amount";
import { settleColour, type SettledColour } from "@/lib/validation/finish-colour";

export type Photo = { id: string; url: string; thumbUrl: string; width: number; height: number };

/** Everything the finish form holds, as the designer typed it. */
export type FinishDraft = {
  name: string;
  category: FinishCategory | "";
  supplierId: string;
  productCode: string;
  surface: string;
  format: string;
  unit: string;
  price: string;
  leadTime: string;
  careNotes: string;
  cautions: string[];
  colourSource: ColourSource;
  publishedColour: string;
  lrv: string;
  photo: Photo | null;
  measurement: Measurement | null;
  /** The colour kept from the photo: the measured one or one of the palette. */
  pickedLab: [number, number, number] | null;
};

export const emptyDraft: FinishDraft = {
  name: "", category: "", supplierId: "", productCode: "", surface: "", format: "", unit: "m²", price: "", leadTime: "",
  careNotes: "", cautions: [], colourSource: "published", publishedColour: "", lrv: "", photo: null, measurement: null, pickedLab: null,
};

/** A stored colour as the designer would type it: its hex when that says the same colour, else lab(). */
function describeStoredColour(lab: [number, number, number]): string {
  const hex = toHex(lab);
  return deltaE2000(parseColour(hex), lab) < 0.05 ? hex : `lab(${lab.map((v) => Math.round(v * 100) / 100).join(" ")})`;
}

export function draftFromFinish(f: FinishDetail): FinishDraft {
  return {
    name: f.name, category: f.category, supplierId: f.supplierId ?? "", productCode: f.productCode ?? "", surface: f.surface ?? "",
    format: f.format ?? "", unit: f.unit, price: (f.unitPriceCents / 100).toFixed(2), leadTime: String(f.leadTimeDays),
    careNotes: f.careNotes ?? "", cautions: f.cautions, colourSource: f.colourSource,
    publishedColour: f.colourSource === "published" ? describeStoredColour(f.lab) : "",
    lrv: f.lrvSource === "published" ? String(f.lrv) : "",
    photo: f.image, measurement: null, pickedLab: f.colourSource === "photo" ? f.lab : null,
  };
}

/** A number as typed, or the text itself so the server can say what is wrong with it. */
function numberOrText(text: string): number | string | null {
  const t = text.trim();
  if (t === "") return null;
  return /^-?\d+(\.\d+)?$/.test(t) ? Number(t) : t;
}

function colourBody(d: FinishDraft) {
  if (d.colourSource === "photo") return { source: "photo" as const, lab: d.pickedLab };
  if (d.colourSource === "computed") return { source: "computed" as const };
  return { source: "published" as const, value: d.publishedColour };
}

/**
 * The JSON the API takes. When editing, the colour and LRV are sent only if the designer touched
 * them, so saving other fields never nudges a stored colour through a hex round trip.
 */
export function toRequestBody(d: FinishDraft, initial: FinishDraft | null) {
  const price = parseMoney(d.price);
  // A price the one money parser refuses is answered here, in its words ("Use a full stop for cents…").
  if (!price.ok && d.price.trim() !== "") throw new ApiError(400, "Some fields need attention.", { unitPriceCents: [price.message] });
  const colourChanged =
    !initial || d.colourSource !== initial.colourSource || d.publishedColour !== initial.publishedColour || d.pickedLab !== initial.pickedLab;
  return {
    name: d.name, category: d.category || null, supplierId: d.supplierId || null, productCode: d.productCode, surface: d.surface,
    format: d.format, unit: d.unit, unitPriceCents: price.ok ? price.value : null, leadTimeDays: numberOrText(d.leadTime),
    careNotes: d.careNotes, cautions: d.cautions, imageId: d.photo?.id ?? null,
    ...(colourChanged ? { colour: colourBody(d) } : {}),
    ...(!initial || d.lrv !== initial.lrv || colourChanged ? { lrv: numberOrText(d.lrv) } : {}),
  };
}

/** The colour and LRV the finish would be saved with, for the live preview; null while incomplete. */
export function previewColour(d: FinishDraft): (SettledColour & { hex: string }) | null {
  const lrvNumber = Number(d.lrv);
  const lrv = d.lrv.trim() !== "" && Number.isFinite(lrvNumber) && lrvNumber >= 0 && lrvNumber <= 100 ? lrvNumber : null;
  try {
    let settled: SettledColour | null = null;
    if (d.colourSource === "photo") settled = d.pickedLab ? settleColour({ source: "photo", lab: d.pickedLab as Lab }, lrv) : null;
    else if (d.colourSource === "computed") settled = settleColour({ source: "computed" }, lrv);
    else if (d.publishedColour.trim()) settled = settleColour({ source: "published", value: d.publishedColour }, lrv);
    return settled ? { ...settled, hex: toHex(settled.lab) } : null;
  } catch {
    return null;
  }
}
