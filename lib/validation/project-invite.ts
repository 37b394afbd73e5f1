import { z } from "zod";
import { email } from "./auth";

const SUPPLIER_PREFIX = "supplier:";

/** The one "They are" choice of the invite form: a client, or a contact at one supplier. */
export function whoValue(role: "client" | "supplier", supplierId?: string | null) {
  return role === "supplier" ? `${SUPPLIER_PREFIX}${supplierId ?? ""}` : "client";
}

/**
 * Who joins as what. A supplier's contact always carries the supplier they work for, and a client
 * never carries one: the two can't be mixed whatever a form or a caller sends.
 */
export const projectInviteeSchema = z
  .object({
    email,
    name: z.string({ error: "Enter a name." }).trim().min(1, "Enter a name.").max(120, "Use at most 120 characters."),
    role: z.enum(["client", "supplier"], { error: "Choose a client or a supplier's contact." }),
    supplierId: z.string().trim().max(100).optional(),
  })
  .superRefine((v, ctx) => {
    if (v.role === "supplier" && !v.supplierId) {
      ctx.addIssue({ code: "custom", path: ["supplierId"], message: "Choose which supplier this person works for." });
    }
    if (v.role === "client" && v.supplierId) {
      ctx.addIssue({ code: "custom", path: ["supplierId"], message: "A client doesn't work for a supplier. Choose a client or a supplier's contact." });
    }
  });
export type ProjectInviteeInput = z.infer<typeof projectInviteeSchema>;

/**
 * The invite form's fields as the invitee schema reads them: the "They are" choice is either
 * "client" or "supplier:<id>"; anything else reaches the schema as an unknown role and is refused.
 */
export function inviteeFromForm(values: Record<string, string | undefined>) {
  const who = (values.who ?? "").trim();
  const supplier = who.startsWith(SUPPLIER_PREFIX);
  return {
    email: values.email,
    name: values.name,
    role: supplier ? "supplier" : who,
    supplierId: supplier ? who.slice(SUPPLIER_PREFIX.length) || undefined : undefined,
  };
}
