import { z } from "zod";
import { parseAmount } from "@/lib/pricing/parse-amount";

/** Markup on cost up to 1,000 %, tax up to 50 %: anything past them is surely a typing slip. */
export const MAX_MARKUP_BASIS_POINTS = 100_000;
export const MAX_TAX_BASIS_POINTS = 5_000;

const basisPoints = (what: string, max: number) =>
  z
    .number({ error: `Enter the ${what} in basis points, as a whole number (1000 = 10 %).` })
    .int(`The ${what} must be a whole number of basis points (1000 = 10 %).`)
    .min(0, `The ${what} can't be negative.`)
    .max(max, `The ${what} can be at most ${max / 100} %.`);

/** PATCH /api/studio/settings: both rates, in basis points (1500 = 15 %). */
export const studioSettingsSchema = z.object({
  markupBasisPoints: basisPoints("markup", MAX_MARKUP_BASIS_POINTS),
  taxBasisPoints: basisPoints("tax", MAX_TAX_BASIS_POINTS),
});
export type StudioSettingsInput = z.infer<typeof studioSettingsSchema>;

/** A percentage as typed ("15", "12.5 %") → basis points, in the one amount parser's words. */
const percentText = (what: string, max: number) =>
  z.string({ error: `Enter the ${what} as a percentage, like 12.5.` }).transform((text, ctx) => {
    const read = parseAmount(text, { kind: "percent" });
    if (!read.ok) {
      ctx.addIssue({ code: "custom", message: read.message });
      return z.NEVER;
    }
    if (read.value > max) {
      ctx.addIssue({ code: "custom", message: `The ${what} can be at most ${max / 100} %.` });
      return z.NEVER;
    }
    return read.value;
  });

/** The settings form (works without JavaScript): its text fields `markup` and `tax`. */
export const studioSettingsFormSchema = z
  .object({ markup: percentText("markup", MAX_MARKUP_BASIS_POINTS), tax: percentText("tax", MAX_TAX_BASIS_POINTS) })
  .transform((v): StudioSettingsInput => ({ markupBasisPoints: v.markup, taxBasisPoints: v.tax }));

/** The form's fields, top to bottom (for focusing the first one to fix). */
export const studioSettingsFormFields = ["markup", "tax"] as const;
