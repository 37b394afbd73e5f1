/**
 * Spreadsheets run a cell that starts with = + - @ as a formula (OWASP, "CSV Injection"). They
 * also fold look-alikes: full-width ＝＋－＠ and the small forms ﹦﹢﹣﹫ are the same characters
 * after Unicode NFKC normalisation (Unicode Standard Annex #15), and a leading tab, return,
 * zero-width space or other invisible character can hide one. Any such cell gets a leading
 * apostrophe, which spreadsheets show as text and drop from the value.
 */
const FORMULA_START = new Set(["=", "+", "-", "@", "\u2212"]);
/** Control, format (zero-width, BOM, bidi marks) and space/separator characters. */
const INVISIBLE = /^[\p{Cc}\p{Cf}\p{Z}]/u;

function startsLikeFormula(value: string): boolean {
  const first = String.fromCodePoint(value.codePointAt(0) ?? 0);
  if (!value) return false;
  return INVISIBLE.test(first) || FORMULA_START.has(first.normalize("NFKC").charAt(0));
}

/** A text cell made safe to open in a spreadsheet. */
export function neutraliseCell(value: string): string {
  return startsLikeFormula(value) ? `'${value}` : value;
}

/** The value a neutralised cell stood for (import reads back what export wrote). */
export function restoreCell(value: string): string {
  return value.startsWith("'") && startsLikeFormula(value.slice(1)) ? value.slice(1) : value;
}
