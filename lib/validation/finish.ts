import { z } from "zod";
// Type only: this file also runs in the browser (the finish form), which has no business with db/.
import type { FinishCategory } from "@/db/schema/library";
import { cautionKeys, type CautionKey } from "@/lib/cautions";
import { ColourInputError, parseColour } from "@/lib/colour";

/** What the screens call each category; the keys are what the database and CSV files hold. */
export const finishCategoryLabels: Record<FinishCategory, string> = {
  stone: "Stone and benchtops",
  cabinetry: "Cabinetry",
  flooring: "Flooring",
  tile: "Splashback and tile",
  tapware: "Tapware and sinks",
  hardware: "Hardware",
  lighting: "Lighting",
  appliances: "Appliances",
  paint: "Paint and walls",
};

/** Every category, in the order screens list them (the Record type above keeps it complete). */
export const finishCategoryKeys = Object.keys(finishCategoryLabels) as [FinishCategory, ...FinishCategory[]];

export const MAX_LEAD_TIME_DAYS = 730;
const MAX_PRICE_CENTS = 100_000_000_00;

const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `Use at most ${max} characters.`)
    .nullish()
    .transform((v) => (v ? v : null));

const lab = z.tuple(
  [
    z.number().min(0, "Lab lightness runs from 0 to 100.").max(100, "Lab lightness runs from 0 to 100."),
    z.number().min(-160).max(160),
    z.number().min(-160).max(160),
  ],
  { error: "Pick one of the measured colours." },
);

/**
 * Where the colour comes from: a value the maker publishes (typed as hex, rgb() or lab()), a
 * colour measured from the uploaded photo, or (when the maker publishes only an LRV) a neutral
 * grey of that lightness.
 */
export const colourInputSchema = z.discriminatedUnion(
  "source",
  [
    z.object({
      source: z.literal("published"),
      value: z
        .string()
        .trim()
        .min(1, "Enter the maker's colour, like #d9d2c3 or lab(84 1 7).")
        .superRefine((value, ctx) => {
          try {
            parseColour(value);
          } catch (error) {
            if (!(error instanceof ColourInputError)) throw error;
            ctx.addIssue({ code: "custom", message: error.message });
          }
        }),
    }),
    z.object({ source: z.literal("photo"), lab }),
    z.object({ source: z.literal("computed") }),
  ],
  { error: "Choose where the colour comes from." },
);
export type ColourInput = z.infer<typeof colourInputSchema>;

const cautionKey = z.enum(cautionKeys as [CautionKey, ...CautionKey[]], { error: "Pick cautions from the list." });
const cautionList = z
  .array(cautionKey, { error: "Pick cautions from the list." })
  .max(cautionKeys.length)
  .transform((keys) => [...new Set(keys)]);

const finishFields = {
  name: z.string({ error: "Enter the finish's name." }).trim().min(1, "Enter the finish's name.").max(120, "Use at most 120 characters."),
  category: z.enum(finishCategoryKeys, { error: "Choose a category." }),
  supplierId: z.string().trim().max(100).nullish().transform((v) => (v ? v : null)),
  productCode: optionalText(60),
  surface: optionalText(80),
  format: optionalText(80),
  unit: z.string({ error: "Enter the unit it is priced by, like m², each or L." }).trim().min(1, "Enter the unit it is priced by, like m², each or L.").max(20, "Use at most 20 characters."),
  unitPriceCents: z
    .number({ error: "Enter the price per unit in dollars, like 680 or 680.50." })
    .int("Enter the price in whole cents.")
    .min(0, "A price can't be negative.")
    .max(MAX_PRICE_CENTS, "That price is too large."),
  leadTimeDays: z
    .number({ error: "Enter the lead time in days." })
    .int("Enter the lead time in whole days.")
    .min(0, "A lead time can't be negative.")
    .max(MAX_LEAD_TIME_DAYS, `Enter at most ${MAX_LEAD_TIME_DAYS} days.`),
  careNotes: optionalText(2000),
  cautions: cautionList.default([]),
  colour: colourInputSchema,
  /** The LRV the maker publishes; null when they don't (then it is computed from the colour). */
  lrv: z.number({ error: "Enter the LRV as a number from 0 to 100." }).min(0, "LRV runs from 0 to 100.").max(100, "LRV runs from 0 to 100.").nullish(),
  imageId: z.string().trim().max(100).nullish().transform((v) => (v ? v : null)),
};

type ColourChecked = { colour?: ColourInput; lrv?: number | null; imageId?: string | null };

/** Checks across fields: an LRV-only colour needs the LRV, a measured one needs the photo. */
function checkColour(value: ColourChecked, ctx: z.RefinementCtx, partial: boolean) {
  const { colour } = value;
  if (colour?.source === "computed" && value.lrv == null && !(partial && value.lrv === undefined)) {
    ctx.addIssue({ code: "custom", path: ["lrv"], message: "Enter the maker's LRV, or give a colour or a photo." });
  }
  if (colour?.source === "photo" && !value.imageId && !(partial && value.imageId === undefined)) {
    ctx.addIssue({ code: "custom", path: ["imageId"], message: "Add a photo to measure the colour from." });
  }
}

// Run the cross-field checks even when other fields have errors, so a form shows every problem at
// once; they only read `colour`, `lrv` and `imageId`, so any object is safe to look at.
const always = { when: (payload: { value: unknown }) => typeof payload.value === "object" && payload.value !== null };

export const finishInputSchema = z.object(finishFields).superRefine((v, ctx) => checkColour(v, ctx, false), always);
export type FinishInput = z.infer<typeof finishInputSchema>;

/** PATCH: some or all of the fields, plus archiving. */
export const finishPatchSchema = z
  // No default for cautions here: a PATCH that leaves them out must leave them alone.
  .object({ ...finishFields, cautions: cautionList })
  .partial()
  .extend({ archived: z.boolean({ error: "archived is true or false." }).optional() })
  .superRefine((v, ctx) => checkColour(v, ctx, true), always);
export type FinishPatch = z.infer<typeof finishPatchSchema>;

export const finishSortKeys = ["name", "category", "supplier", "code", "surface", "price", "lead", "lrv", "updated"] as const;
export type FinishSortKey = (typeof finishSortKeys)[number];

/** Empty query parameters mean "not given", as a cleared filter box sends them. */
const blankToUndefined = (v: unknown) => (v === "" ? undefined : v);

export const finishListQuerySchema = z.object({
  q: z.preprocess(blankToUndefined, z.string().trim().max(100, "Search for at most 100 characters.").default("")),
  category: z.preprocess(blankToUndefined, z.enum(finishCategoryKeys, { error: "Choose a category." }).optional()),
  /** A supplier id, or "none" for finishes with no supplier. */
  supplier: z.preprocess(blankToUndefined, z.string().max(100).optional()),
  page: z.preprocess(blankToUndefined, z.coerce.number({ error: "page is a whole number from 1." }).int().min(1).max(100_000).default(1)),
  pageSize: z.preprocess(blankToUndefined, z.coerce.number().int().min(1).max(200, "Ask for at most 200 a page.").default(50)),
  sort: z.preprocess(blankToUndefined, z.enum(finishSortKeys, { error: "Sort by one of the table's columns." }).default("name")),
  dir: z.preprocess(blankToUndefined, z.enum(["asc", "desc"]).default("asc")),
  status: z.preprocess(blankToUndefined, z.enum(["current", "archived", "all"]).default("current")),
});
export type FinishListQuery = z.infer<typeof finishListQuerySchema>;

export const similarQuerySchema = z.object({
  maxDeltaE: z.preprocess(
    blankToUndefined,
    z.coerce
      .number({ error: "maxDeltaE is a number of ΔE00 units." })
      .min(0, "maxDeltaE can't be negative.")
      .max(20, "Search within at most 20 ΔE00.")
      .default(3),
  ),
  limit: z.preprocess(blankToUndefined, z.coerce.number().int().min(1).max(100).default(24)),
  /** Substitutes come from the finish's own category unless `anyCategory=1` asks for every category. */
  anyCategory: z.preprocess(blankToUndefined, z.enum(["0", "1"], { error: "anyCategory is 1 (every category) or 0 (this finish's category)." }).default("0")).transform((v) => v === "1"),
});
