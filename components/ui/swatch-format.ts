// Pure helpers behind Swatch, kept apart so they can be unit-tested without rendering.

export type LrvSource = "published" | "photo" | "computed";

const lrvSourceWords: Record<LrvSource, string> = {
  published: "published",
  photo: "from photo",
  computed: "computed",
};

/**
 * "#ABC" or "a1b2c3" → "#aabbcc"; anything else → null. Only a checked value reaches a
 * style attribute, and a missing colour is shown as missing rather than as black.
 */
export function normaliseHex(hex: string | null | undefined): string | null {
  const m = /^#?([0-9a-f]{3}|[0-9a-f]{6})$/i.exec((hex ?? "").trim());
  if (!m || !m[1]) return null;
  const h = m[1].toLowerCase();
  return h.length === 3 ? `#${h[0]}${h[0]}${h[1]}${h[1]}${h[2]}${h[2]}` : `#${h}`;
}

const lrvFormat = new Intl.NumberFormat("en-AU", { maximumFractionDigits: 1 });

/** LRV is 0–100; published values are whole or one decimal, so show at most one. */
export function formatLrv(lrv: number): string {
  return lrvFormat.format(lrv);
}

/** "LRV 62 (published)", or "LRV 62" when the source is unknown; null when there is no LRV. */
export function lrvText(lrv: number | null | undefined, source?: LrvSource | null): string | null {
  if (lrv == null || !Number.isFinite(lrv)) return null;
  const base = `LRV ${formatLrv(lrv)}`;
  return source ? `${base} (${lrvSourceWords[source]})` : base;
}

/** "Colour sample of Warm Limestone, LRV 62" — what a screen reader hears for the chip. */
export function swatchLabel(name: string, lrv: number | null | undefined, hasColour: boolean): string {
  if (!hasColour) return `No colour recorded for ${name}`;
  const l = lrv != null && Number.isFinite(lrv) ? `, LRV ${formatLrv(lrv)}` : "";
  return `Colour sample of ${name}${l}`;
}
