import type { ColourSource } from "@/db/schema/library";

/** Where an LRV figure came from, as the screens say it. */
export const lrvSourceWords: Record<ColourSource, string> = {
  published: "published by the maker",
  photo: "measured from the photo",
  computed: "computed from the colour",
};

/** The same, short enough for a table cell. */
export const lrvSourceShort: Record<ColourSource, string> = { published: "published", photo: "from photo", computed: "computed" };

export const colourSourceWords: Record<ColourSource, string> = {
  published: "the maker's published colour",
  photo: "measured from the sample photo",
  computed: "a neutral grey of the maker's LRV",
};

export function formatDays(days: number): string {
  return days === 1 ? "1 day" : `${days} days`;
}

/** "per m²", "per L", but "each" rather than "per each". */
export function describeUnit(unit: string): string {
  return unit.trim().toLowerCase() === "each" ? "each" : `per ${unit}`;
}
