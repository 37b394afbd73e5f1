/**
 * How an option's price is built from its lines. Pure arithmetic on integers (BigInt where a
 * product could pass 2^53), so the same inputs give the same cents on every machine.
 *
 * - Line cost = the finish's unit price (cost to the studio, excluding tax) × quantity, rounded to
 *   the cent, half away from zero. The quantity is taken as the decimal the designer typed
 *   (6.5, 2.4), not its nearest binary fraction, so 2.4 × $0.05 is exactly 12 cents.
 * - Cost = the sum of the rounded line costs.
 * - Client price = cost × (1 + markup) × (1 + tax), rounded once to the cent, half away from zero.
 * - The breakdown shows the markup rounded to the cent and the tax as what is left, so cost +
 *   markup + tax is always exactly the client price.
 */
export type PriceLine = { unitPriceCents: number; quantity: number };
export type StudioRates = { markupBasisPoints: number; taxBasisPoints: number };
export type PriceBuild = {
  /** Each line's cost to the studio, excluding tax, in cents (same order as the lines). */
  lineCostsCents: number[];
  costCents: number;
  markupCents: number;
  taxCents: number;
  /** What the client pays, including tax. */
  totalCents: number;
};

const BP = 10_000n;

/** n / d rounded to the nearest integer, halves away from zero (d > 0). */
export function divideRounded(n: bigint, d: bigint): bigint {
  const negative = n < 0n;
  const abs = negative ? -n : n;
  const q = (abs * 2n + d) / (2n * d);
  return negative ? -q : q;
}

/** A finite quantity as an exact decimal: 6.5 → { digits: 65n, scale: 10n }. */
export function decimalOf(quantity: number): { digits: bigint; scale: bigint } {
  if (!Number.isFinite(quantity)) throw new RangeError("A quantity must be a finite number.");
  // The shortest text that reads back as the same number is the decimal the person typed.
  const [mantissa = "0", exponent = "0"] = String(quantity).toLowerCase().split("e");
  const [whole = "0", fraction = ""] = mantissa.split(".");
  const shift = fraction.length - Number(exponent);
  const digits = BigInt(`${whole}${fraction}`);
  return shift >= 0 ? { digits, scale: 10n ** BigInt(shift) } : { digits: digits * 10n ** BigInt(-shift), scale: 1n };
}

/** One line's cost in cents: unit price × quantity, rounded half away from zero. */
export function lineCostCents(line: PriceLine): number {
  const { digits, scale } = decimalOf(line.quantity);
  return Number(divideRounded(BigInt(line.unitPriceCents) * digits, scale));
}

/** The client's price of an option and how it was built. */
export function buildOptionPrice(lines: readonly PriceLine[], rates: StudioRates): PriceBuild {
  const lineCostsCents = lines.map(lineCostCents);
  const cost = BigInt(lineCostsCents.reduce((sum, c) => sum + c, 0));
  const markup = BigInt(rates.markupBasisPoints);
  const tax = BigInt(rates.taxBasisPoints);
  const total = divideRounded(cost * (BP + markup) * (BP + tax), BP * BP);
  const markupCents = divideRounded(cost * markup, BP);
  return {
    lineCostsCents,
    costCents: Number(cost),
    markupCents: Number(markupCents),
    taxCents: Number(total - cost - markupCents),
    totalCents: Number(total),
  };
}

/** How a price's tax reads to a client: "including GST" at Australia's 10 %, else the studio's rate. */
export function taxWords(taxBasisPoints: number): string {
  if (taxBasisPoints === 0) return "no tax added";
  if (taxBasisPoints === 1000) return "including GST";
  return `including tax at ${formatBasisPoints(taxBasisPoints)}`;
}

/** 1000 → "10 %", 1250 → "12.5 %". */
export function formatBasisPoints(bp: number): string {
  const percent = bp / 100;
  return `${Number.isInteger(percent) ? percent : percent.toFixed(2).replace(/0$/, "")} %`;
}
