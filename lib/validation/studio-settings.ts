import { z } from "zod";
import { ACCESS_STANDARDS } from "@/lib/colour";
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

const accessStandard = z.enum(ACCESS_STANDARDS, { error: "Choose the access standard the checks follow: AS 1428.1, BS 8300-2 or both." });

/**
 * PATCH /api/studio/settings: the rates together, in basis points (1500 = 15 %), the access
 * standard (`"as1428" | "bs8300" | "both"`), or both. The rates come as a pair: a body with neither
 * rate and no standard asks for the rates, as before the standard could be set on its own.
 */
export const studioSettingsSchema = z
  .object({
    markupBasisPoints: basisPoints("markup", MAX_MARKUP_BASIS_POINTS).optional(),
    taxBasisPoints: basisPoints("tax", MAX_TAX_BASIS_POINTS).optional(),
    accessStandard: accessStandard.optional(),
  })
  .superRefine((v, ctx) => {
    const anyRate = v.markupBasisPoints !== undefined || v.taxBasisPoints !== undefined;
    if (!anyRate && v.accessStandard !== undefined) return;
    if (v.markupBasisPoints === undefined) ctx.addIssue({ code: "custom", path: ["markupBasisPoints"], message: "Enter the markup in basis points, as a whole number (1000 = 10 %)." });
    if (v.taxBasisPoints === undefined) ctx.addIssue({ code: "custom", path: ["taxBasisPoints"], message: "Enter the tax in basis points, as a whole number (1000 = 10 %)." });
  });
export type StudioSettingsInput = z.infer<typeof studioSettingsSchema>;
export type StudioRatesInput = Required<Pick<StudioSettingsInput, "markupBasisPoints" | "taxBasisPoints">>;

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

/** The access-check form (works without JavaScript): one radio group, `accessStandard`. */
export const accessStandardFormSchema = z.object({ accessStandard });

/** Which of the settings forms was posted: the access form says so in a hidden `section=access`. */
export function isAccessStandardForm(values: Record<string, string>): boolean {
  return values.section === "access";
}

export const accessStandardFormFields = ["accessStandard"] as const;
