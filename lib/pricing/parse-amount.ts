/**
 * The one parser for amounts people type: dollars in every money field (library, decisions,
 * variations) and percentages in the studio's settings. Both are kept in hundredths (cents,
 * basis points), so one set of rules serves both.
 *
 * Accepted: "1234", "1,234.50", "$1,234.50", "1234.5", " 12 ", "15 %". Refused, with a sentence
 * the person can act on: "12,34" (is that twelve dollars thirty-four or 1,234?), more than two
 * decimals, a minus sign unless `allowNegative`, and anything that isn't a number.
 */
export type AmountResult = { ok: true; value: number } | { ok: false; message: string };

type Options = { allowNegative?: boolean; kind?: "money" | "percent"; max?: number };

const DEFAULT_MAX = 100_000_000_00;

const words = {
  money: { example: "1234.50", comma: "Use a full stop for cents, like 12.34.", decimals: "Use at most two decimal places (whole cents).", negative: "The amount can't be negative." },
  percent: { example: "12.5", comma: "Use a full stop for part of a percent, like 12.5.", decimals: "Use at most two decimal places, like 12.25.", negative: "The percentage can't be negative." },
};

export function parseAmount(input: string, { allowNegative = false, kind = "money", max = DEFAULT_MAX }: Options = {}): AmountResult {
  const w = words[kind];
  const fail = (message: string): AmountResult => ({ ok: false, message });
  let text = input.trim();
  if (kind === "money") text = text.replace(/^([-\u2212]?)\s*\$\s*/, "$1");
  else text = text.replace(/\s*%$/, "");
  const negative = /^[-\u2212]/.test(text);
  if (negative) text = text.slice(1).trimStart();
  if (text === "") return fail(kind === "money" ? `Enter an amount in dollars, like ${w.example}.` : `Enter a percentage, like ${w.example}.`);
  if (/^\d+,\d{1,2}$/.test(text)) return fail(w.comma);
  if (text.includes(",") && !/^\d{1,3}(,\d{3})+(\.\d+)?$/.test(text)) return fail(/,\d{1,2}$/.test(text) ? w.comma : "Put commas only between groups of three digits, like 1,234.50.");
  const plain = text.replace(/,/g, "");
  const m = /^(\d+)(?:\.(\d+))?$/.exec(plain);
  if (!m) return fail(kind === "money" ? `That isn't an amount of dollars. Write it like ${w.example}.` : `That isn't a percentage. Write it like ${w.example}.`);
  const [, whole = "0", fraction = ""] = m;
  if (fraction.length > 2) return fail(w.decimals);
  if (negative && !allowNegative) return fail(w.negative);
  const magnitude = Number(whole) * 100 + Number(fraction.padEnd(2, "0"));
  if (!Number.isSafeInteger(magnitude) || magnitude > max) return fail(kind === "money" ? "That amount looks too large." : "That percentage looks too large.");
  return { ok: true, value: negative && magnitude !== 0 ? -magnitude : magnitude };
}

/** Dollars typed by a person → cents, or the reason it isn't an amount. */
export function parseMoney(input: string, options: { allowNegative?: boolean } = {}): AmountResult {
  return parseAmount(input, { ...options, kind: "money" });
}

/** Cents → what goes back into a form field: "1234.50", "-250.00". */
export function centsToInput(cents: number): string {
  const sign = cents < 0 ? "-" : "";
  const abs = Math.abs(cents);
  return `${sign}${Math.floor(abs / 100)}.${String(abs % 100).padStart(2, "0")}`;
}

/** Basis points → a percentage for a form field: 1000 → "10", 1250 → "12.5", 1225 → "12.25". */
export function basisPointsToInput(bp: number): string {
  const text = centsToInput(bp);
  return text.replace(/\.?0+$/, "") || "0";
}
