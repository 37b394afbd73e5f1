import { cx } from "./cx";

const MINUS = "\u2212"; // a true minus sign: same width as "+", reads as "minus"

const formatters = new Map<string, Intl.NumberFormat>();
function formatter(currency: string): Intl.NumberFormat {
  let f = formatters.get(currency);
  if (!f) {
    f = new Intl.NumberFormat("en-AU", { style: "currency", currency, minimumFractionDigits: 2, maximumFractionDigits: 2 });
    formatters.set(currency, f);
  }
  return f;
}

/**
 * 123450 → "$1,234.50". Amounts are integer cents (no float money anywhere);
 * `signed` is for differences between options: "+$120.00", "−$80.00". Zero is never signed.
 */
export function formatMoney(cents: number, { currency = "AUD", signed = false }: { currency?: string; signed?: boolean } = {}): string {
  const whole = Math.round(cents);
  const text = formatter(currency).format(Math.abs(whole) / 100);
  if (whole < 0) return `${MINUS}${text}`;
  if (signed && whole > 0) return `+${text}`;
  return text;
}

export type MoneyProps = {
  cents: number;
  currency?: string;
  signed?: boolean;
  className?: string;
};

/** A price in tabular figures; the machine-readable amount goes in <data value>. */
export function Money({ cents, currency = "AUD", signed = false, className }: MoneyProps) {
  return (
    <data value={(Math.round(cents) / 100).toFixed(2)} className={cx("figures whitespace-nowrap", className)}>
      {formatMoney(cents, { currency, signed })}
    </data>
  );
}
