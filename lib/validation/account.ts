import { z } from "zod";
import { newPassword } from "./auth";

/** A person's own name and phone. An empty phone clears it. */
export const profileSchema = z
  .object({
    name: z.string({ error: "Enter your name." }).trim().min(1, "Enter your name.").max(120, "Use at most 120 characters.").optional(),
    phone: z
      .string({ error: "Enter the phone number as text." })
      .trim()
      .max(40, "Use at most 40 characters.")
      .regex(/^[0-9+()\-.\s]*$/, "Use digits, spaces and + ( ) - only.")
      .nullable()
      .optional(),
  })
  .strict()
  .refine((v) => v.name !== undefined || v.phone !== undefined, "Send a new name, a new phone number, or both.")
  .transform((v) => ({ name: v.name, phone: v.phone === undefined ? undefined : v.phone || null }));
export type ProfileInput = z.infer<typeof profileSchema>;

/** Setting a first password, or changing one (then the current one is checked too). */
export const passwordChangeSchema = z
  .object({
    currentPassword: z.string().max(200, "Use at most 200 characters.").optional(),
    newPassword,
    repeatPassword: z.string({ error: "Type the new password again." }),
  })
  .refine((v) => v.newPassword === v.repeatPassword, { path: ["repeatPassword"], message: "The two new passwords don't match." });
export type PasswordChangeInput = z.infer<typeof passwordChangeSchema>;
