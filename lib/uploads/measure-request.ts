import { z } from "zod";

/**
 * The cards a designer is likely to have, by reflectance (CIE Y, per cent). Photographic grey cards
 * are made to reflect 18%, and white balance / white cards about 90%. [common practice; the
 * figures are the makers' nominal values, so the card's own tolerance is part of the likely error]
 */
export const cardPresets = [
  { id: "grey-18", label: "18% grey card", reflectance: 18 },
  { id: "white-90", label: "90% white card", reflectance: 90 },
] as const;

export const MIN_CARD_REFLECTANCE = 2;
export const MAX_CARD_REFLECTANCE = 98;

const reflectanceMessage = `Enter the card's reflectance as a per cent from ${MIN_CARD_REFLECTANCE} to ${MAX_CARD_REFLECTANCE} (an 18% grey card is 18).`;

/**
 * The body of POST /api/uploads/:imageId/measure. With `neutral` (a box over a grey or white card,
 * in pixels of the stored photo) the card's known `reflectance` (per cent) is required: the card
 * corrects exposure as well as the cast, so what it really reflects must be said, not guessed.
 */
export const measureRequestSchema = z
  .object({
    neutral: z
      .object({
        left: z.number().int().min(0),
        top: z.number().int().min(0),
        width: z.number().int().min(1, "Draw a box at least a few pixels wide."),
        height: z.number().int().min(1, "Draw a box at least a few pixels high."),
      })
      .optional(),
    reflectance: z
      .number({ error: reflectanceMessage })
      .min(MIN_CARD_REFLECTANCE, reflectanceMessage)
      .max(MAX_CARD_REFLECTANCE, reflectanceMessage)
      .optional(),
  })
  .superRefine((value, ctx) => {
    if (value.neutral && value.reflectance === undefined) {
      ctx.addIssue({ code: "custom", path: ["reflectance"], message: "Say what the card is: an 18% grey card, a 90% white card, or its reflectance in per cent." });
    }
    if (!value.neutral && value.reflectance !== undefined) {
      ctx.addIssue({ code: "custom", path: ["neutral"], message: "Draw a box over the card the reflectance belongs to." });
    }
  });
export type MeasureRequest = z.infer<typeof measureRequestSchema>;
