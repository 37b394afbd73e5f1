import { cx } from "./cx";

const MINUS = "\u2212";
const THIN_NBSP = "\u202F"; // narrow no-break space: keeps "2.3 ΔE00" together, close but apart

const formatters = new Map<number, Intl.NumberFormat>();
function formatter(digits: number): Intl.NumberFormat {
  let f = formatters.get(digits);
  if (!f) {
    f = new Intl.NumberFormat("en-AU", { minimumFractionDigits: digits, maximumFractionDigits: digits });
    formatters.set(digits, f);
  }
  return f;
}

/** 2.314 with 1 digit → "2.3"; −0.4 → "−0.4"; `signed` adds "+" for positive differences. */
export function formatFigure(value: number, digits = 0, signed = false): string {
  const text = formatter(digits).format(Math.abs(value));
  // Compare the rounded text, so −0.04 at one digit shows "0.0", not "−0.0".
  const isZero = /^[0.,]+$/.test(text);
  if (value < 0 && !isZero) return `${MINUS}${text}`;
  if (signed && value > 0 && !isZero) return `+${text}`;
  return text;
}

export type FigureProps = {
  /** null/undefined shows a dash and says "not recorded" to screen readers. */
  value: number | null | undefined;
  /** Fixed decimal places, so a column of figures aligns on the point. */
  digits?: number;
  /** "ΔE00", "%", "mm", "m²", "LRV"… shown after the number. */
  unit?: string;
  /** Put the unit before the number instead (e.g. "LRV 62"). */
  unitFirst?: boolean;
  signed?: boolean;
  className?: string;
};

/** A measurement in tabular figures with its unit, e.g. <Figure value={2.31} digits={1} unit="ΔE00" />. */
export function Figure({ value, digits = 0, unit, unitFirst = false, signed = false, className }: FigureProps) {
  if (value == null || !Number.isFinite(value)) {
    return (
      <span className={cx("figures", className)}>
        <span aria-hidden="true">—</span>
        <span className="sr-only">not recorded</span>
      </span>
    );
  }
  const num = formatFigure(value, digits, signed);
  return (
    <data value={value.toFixed(digits)} className={cx("figures whitespace-nowrap", className)}>
      {unit && unitFirst && `${unit}${THIN_NBSP}`}
      {num}
      {unit && !unitFirst && `${THIN_NBSP}${unit}`}
    </data>
  );
}
