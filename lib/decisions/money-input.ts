/**
 * What a person types as dollars ("1,234.50", "$980", "-120") → integer cents, or null when it
 * isn't an amount. Forms send cents; the server checks them again.
 */
export function parseMoneyToCents(input: string, { allowNegative = false } = {}): number | null {
  const text = input.trim().replace(/[$,\s]/g, "").replace(/^\u2212/, "-");
  const m = /^(-?)(\d+)(?:\.(\d{1,2}))?$/.exec(text);
  if (!m) return null;
  const [, sign, whole, fraction = ""] = m;
  if (sign && !allowNegative) return null;
  const cents = Number(whole) * 100 + Number(fraction.padEnd(2, "0"));
  if (!Number.isSafeInteger(cents)) return null;
  return sign ? -cents : cents;
}

/** Cents → what goes back into a form field: "1234.50". */
export function centsToInput(cents: number): string {
  const sign = cents < 0 ? "-" : "";
  const abs = Math.abs(cents);
  return `${sign}${Math.floor(abs / 100)}.${String(abs % 100).padStart(2, "0")}`;
}
