import { z } from "zod";

export const email = z
  .string({ error: "Enter an e-mail address." })
  .trim()
  .toLowerCase()
  .max(254, "That e-mail address is too long.")
  .pipe(z.email({ error: "Enter a valid e-mail address, like name@example.com." }));

/** The rule for every password a person chooses (sign-up, setting or changing one). */
export const newPassword = z
  .string({ error: "Enter a password." })
  .min(10, "Use at least 10 characters.")
  .max(200, "Use at most 200 characters.");

const personName = z.string().trim().min(1, "Enter a name.").max(120, "Use at most 120 characters.");

export const signInSchema = z.object({
  email,
  password: z.string().min(1, "Enter your password.").max(200),
});

export const linkRequestSchema = z.object({ email });

export const signUpSchema = z.object({
  studioName: z.string().trim().min(2, "Enter your studio's name.").max(120, "Use at most 120 characters."),
  name: personName,
  email,
  password: newPassword,
});
export type SignUpInput = z.infer<typeof signUpSchema>;

export const inviteDesignerSchema = z.object({ email, name: personName });

export const inviteToProjectSchema = z
  .object({
    email,
    name: personName,
    role: z.enum(["client", "supplier"], { error: "Choose client or supplier." }),
    supplierId: z.string().trim().optional(),
  })
  .refine((v) => v.role !== "supplier" || (v.supplierId && v.supplierId.length > 0), {
    message: "Choose which supplier this person works for.",
    path: ["supplierId"],
  });
export type InviteToProjectInput = z.infer<typeof inviteToProjectSchema>;
