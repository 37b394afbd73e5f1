import { z } from "zod";

/** The designer's word that an issued line stands: an optional note the supplier sees with it. */
export const lineConfirmationSchema = z
  .object({
    note: z
      .string({ error: "Write the note as text." })
      .trim()
      .max(500, "Keep the note under 500 characters.")
      .optional()
      .transform((v) => (v ? v : null)),
  })
  .strict();

export type LineConfirmationInput = z.infer<typeof lineConfirmationSchema>;
