import { cx } from "./cx";

const THIN_NBSP = "\u202F"; // as Figure: keeps "29.97 %" together

/**
 * A figure already rounded by the colour engine's one rule (formatAgainst in lib/colour/figures.ts),
 * so it never contradicts the verdict beside it; the exact value rides along for machines.
 */
export function ShownFigure({ value, text, unit, className }: { value: number; text: string; unit?: string; className?: string }) {
  return (
    <data value={String(value)} className={cx("figures whitespace-nowrap", className)}>
      {text}
      {unit && `${THIN_NBSP}${unit}`}
    </data>
  );
}
