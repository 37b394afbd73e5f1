import { z } from "zod";
import { isoDay } from "./project";

/** Whole cents, never negative: prices and allowances are amounts of money, not differences. */
const cents = (what: string) =>
  z
    .number({ error: `Enter the ${what} in cents, as a whole number.` })
    .int(`The ${what} must be a whole number of cents.`)
    .min(0, `The ${what} can't be negative.`)
    .max(100_000_000_00, `The ${what} looks too large.`);

const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `Use at most ${max} characters.`)
    .nullish()
    .transform((v) => (v ? v : null));

export const optionLineSchema = z.object({
  finishId: z.string({ error: "Choose a finish." }).trim().min(1, "Choose a finish."),
  quantity: z
    .number({ error: "Enter a quantity." })
    .positive("The quantity must be more than zero.")
    .max(100_000, "The quantity looks too large."),
  unit: z.string({ error: "Enter a unit." }).trim().min(1, "Enter a unit.").max(20, "Keep the unit short."),
  /** What the line is as the trades name it ("Benchtop", "Splashback"); the decision's title when empty. */
  item: optionalText(80),
  location: optionalText(80),
});

const optionFields = z.object({
  /** Present when editing an option that already exists. */
  id: z.string().trim().min(1).optional(),
  label: z.string({ error: "Name this option." }).trim().min(1, "Name this option.").max(120, "Use at most 120 characters."),
  /**
   * The client's price including tax. Leave it out to have it built from the lines (cost × markup ×
   * tax, lib/pricing/option-price.ts); send it to set the price by hand.
   */
  priceCents: cents("price").optional(),
  /**
   * true: the price was set by hand and is kept as sent. false: it is built from the lines and any
   * priceCents sent is ignored. Left out: set by hand exactly when priceCents is sent.
   */
  priceOverridden: z.boolean({ error: "priceOverridden is true or false." }).optional(),
  notes: optionalText(1000),
  boardId: optionalText(100),
  lines: z
    .array(optionLineSchema, { error: "Add at least one finish." })
    .min(1, "Add at least one finish.")
    .max(12, "At most 12 finishes in one option."),
});

type PriceChoice = { priceCents?: number; priceOverridden?: boolean };

/** True when the designer set this option's price by hand (see the fields above). */
export function isPriceSetByHand(o: PriceChoice): o is PriceChoice & { priceCents: number } {
  return o.priceCents !== undefined && o.priceOverridden !== false;
}

function checkPriceChoice(o: PriceChoice, ctx: z.RefinementCtx) {
  if (o.priceOverridden === true && o.priceCents === undefined) {
    ctx.addIssue({ code: "custom", path: ["priceCents"], message: "Enter the price you are setting by hand, or let it be worked out from the finishes." });
  }
}

export const optionSchema = optionFields.superRefine(checkPriceChoice);
/** An option a variation adds: the same, without an id. */
export const newOptionSchema = optionFields.omit({ id: true }).superRefine(checkPriceChoice);
export type OptionInput = z.infer<typeof optionSchema>;

const decisionFields = {
  room: z.string({ error: "Choose a room." }).trim().min(1, "Choose a room."),
  title: z.string({ error: "Say what is being decided." }).trim().min(2, "Say what is being decided.").max(120, "Use at most 120 characters."),
  allowanceCents: cents("allowance"),
  dueDate: isoDay,
  options: z
    .array(optionSchema, { error: "Add two to four options." })
    .min(2, "Give the client at least two options.")
    .max(4, "At most four options: more is hard to compare on a phone."),
};

/** A due date in the past makes no sense for a new decision; `today` is passed in so tests can fix it. */
export function createDecisionSchema(today: string) {
  return z.object({
    ...decisionFields,
    dueDate: isoDay.refine((v) => v >= today, "The due date can't be in the past."),
    /** E-mail the project's clients that the decision is waiting (default yes). */
    notify: z.boolean().optional().default(true),
  });
}
export type CreateDecisionInput = z.infer<ReturnType<typeof createDecisionSchema>>;

export const updateDecisionSchema = z.object({
  ...decisionFields,
  /** The version the designer edited; an older one means someone else changed it first (409). */
  version: z.number({ error: "Reload the decision and try again." }).int().min(1),
});
export type UpdateDecisionInput = z.infer<typeof updateDecisionSchema>;

const versionToken = z.number().int().min(1).optional();

export const choiceSchema = z.object({
  optionId: z.string({ error: "Choose one of the options." }).trim().min(1, "Choose one of the options."),
  comment: optionalText(1000),
  version: versionToken,
});
export type ChoiceInput = z.infer<typeof choiceSchema>;

const confirmation = z.literal(true, { error: "Approval needs your explicit confirmation (confirm: true)." });

export const approveSchema = z.object({
  optionId: z.string({ error: "Choose the option you approve." }).trim().min(1, "Choose the option you approve."),
  confirm: confirmation,
  version: versionToken,
});
export type ApproveInput = z.infer<typeof approveSchema>;

export const variationRequestSchema = z.object({
  reason: z.string({ error: "Say what you'd like to change and why." }).trim().min(3, "Say what you'd like to change and why.").max(2000, "Use at most 2,000 characters."),
  optionId: optionalText(100),
});
export type VariationRequestInput = z.infer<typeof variationRequestSchema>;

export const variationPriceSchema = z
  .object({
    /** Difference against the carried option, including GST; negative is a credit. */
    priceDeltaCents: z
      .number({ error: "Enter the price difference in cents, including GST." })
      .int("The price difference must be a whole number of cents.")
      .min(-100_000_000_00, "The price difference looks too large.")
      .max(100_000_000_00, "The price difference looks too large."),
    timeImpactDays: z
      .number({ error: "Enter the time impact in days (0 for none)." })
      .int("Enter the time impact as a whole number of days.")
      .min(-365, "The time impact looks too large.")
      .max(365, "The time impact looks too large."),
    /** The option the decision will carry; leave out to keep the current one (a change of work, not of finish). */
    optionId: optionalText(100),
    /** Or a new option, added to the decision by this variation. */
    newOption: newOptionSchema.optional(),
  })
  .refine((v) => !(v.optionId && v.newOption), { message: "Pick an existing option or describe a new one, not both.", path: ["optionId"] });
export type VariationPriceInput = z.infer<typeof variationPriceSchema>;

export const variationApproveSchema = z.object({
  confirm: confirmation,
  /** When the client saw the price; a newer price means they must look again (409). */
  pricedAt: z.number().int().optional(),
});
export type VariationApproveInput = z.infer<typeof variationApproveSchema>;
