import type { ColourSource, Finish, FinishCategory } from "@/db/schema";
import { toHex } from "@/lib/colour";
import { imageUrl } from "@/lib/uploads/urls";

/** A finish as every screen and route answers it: plain JSON, the same from the server page and the API. */
export type FinishSummary = {
  id: string;
  name: string;
  category: FinishCategory;
  supplierId: string | null;
  supplierName: string | null;
  productCode: string | null;
  surface: string | null;
  format: string | null;
  unit: string;
  unitPriceCents: number;
  leadTimeDays: number;
  cautions: string[];
  lab: [number, number, number];
  hex: string;
  colourSource: ColourSource;
  lrv: number;
  lrvSource: ColourSource;
  imageId: string | null;
  thumbUrl: string | null;
  archived: boolean;
  updatedAt: string;
};

export type FinishUsage = { boardItems: number; optionLines: number; fixedItems: number; specLines: number };

export type FinishDetail = FinishSummary & {
  careNotes: string | null;
  image: { id: string; width: number; height: number; url: string; thumbUrl: string } | null;
  usage: FinishUsage;
};

export type FinishPage = { items: FinishSummary[]; total: number; page: number; pageSize: number };

// Gamut-mapping a colour outside sRGB costs ~0.5 ms; a library repeats the same colours on every page.
const hexes = new Map<string, string>();
function hexFor(lab: [number, number, number]): string {
  const key = lab.join(",");
  let hex = hexes.get(key);
  if (hex === undefined) {
    if (hexes.size > 50_000) hexes.clear();
    hex = toHex(lab);
    hexes.set(key, hex);
  }
  return hex;
}

export function toFinishSummary(row: Finish & { supplierName: string | null }): FinishSummary {
  const lab: [number, number, number] = [row.labL, row.labA, row.labB];
  return {
    id: row.id,
    name: row.name,
    category: row.category,
    supplierId: row.supplierId,
    supplierName: row.supplierName,
    productCode: row.productCode,
    surface: row.surface,
    format: row.format,
    unit: row.unit,
    unitPriceCents: row.unitPriceCents,
    leadTimeDays: row.leadTimeDays,
    cautions: row.cautions,
    lab,
    hex: hexFor(lab),
    colourSource: row.colourSource,
    lrv: row.lrv,
    lrvSource: row.lrvSource,
    imageId: row.imageId,
    thumbUrl: row.imageId ? imageUrl(row.imageId, "400") : null,
    archived: row.archivedAt !== null,
    updatedAt: row.updatedAt.toISOString(),
  };
}
