import { z } from "zod";
import { HttpError, fieldErrorsOf, type FieldErrors } from "@/lib/http-error";
import { tradeKeys } from "@/lib/suppliers/trades";

export const MAX_CONTACTS = 30;

const optionalText = (max: number) =>
  z
    .string({ error: "Enter text here, or leave it blank." })
    .trim()
    .max(max, `Use at most ${max} characters.`)
    .nullish()
    .transform((v) => (v ? v : null));

/** Blank means "none"; anything else must look like an e-mail address. */
const optionalEmail = z
  .string({ error: "Enter an e-mail address, or leave it blank." })
  .trim()
  .toLowerCase()
  .max(254, "That e-mail address is too long.")
  .nullish()
  .transform((v) => (v ? v : null))
  .pipe(z.email({ error: "Enter a valid e-mail address, like orders@example.com." }).nullable());

const name = z.string({ error: "Enter a name." }).trim().min(1, "Enter a name.").max(120, "Use at most 120 characters.");

export const supplierContactSchema = z.object({
  /** An existing contact's id keeps it; without one the contact is new. */
  id: z.string().trim().max(100).regex(/^[A-Za-z0-9_-]*$/, "That contact was not found.").optional(),
  name,
  email: optionalEmail,
  phone: optionalText(40),
  role: optionalText(80),
});
export type SupplierContactInput = z.infer<typeof supplierContactSchema>;

const contacts = z.array(supplierContactSchema, { error: "Contacts must be a list." }).max(MAX_CONTACTS, `Keep at most ${MAX_CONTACTS} contacts.`);

const supplierFields = {
  name: z.string({ error: "Enter the company's name." }).trim().min(1, "Enter the company's name.").max(120, "Use at most 120 characters."),
  trade: z.enum(tradeKeys, { error: "Choose the trade." }),
  email: optionalEmail,
  phone: optionalText(40),
  accountNumber: optionalText(60),
  notes: optionalText(2000),
};

export const supplierInputSchema = z.object({ ...supplierFields, contacts: contacts.default([]) });
export type SupplierInput = z.infer<typeof supplierInputSchema>;

/** Any subset of the fields; `contacts` replaces the whole list; `archived` archives or brings back. */
export const supplierPatchSchema = z
  .object(supplierFields)
  .partial()
  .extend({ contacts: contacts.optional(), archived: z.boolean({ error: "archived is true or false." }).optional() });
export type SupplierPatch = z.infer<typeof supplierPatchSchema>;

export const supplierListQuerySchema = z.object({
  archived: z.enum(["0", "1", "true", "false"], { error: "archived is 1 or 0." }).optional().transform((v) => v === "1" || v === "true"),
});

const contactKeys = ["id", "name", "email", "phone", "role"] as const;

/**
 * The supplier form as posted: company fields by name, contacts as `contacts.N.name` and so on.
 * A row left blank (the spare "add a contact" row) or ticked `contacts.N.remove` is left out.
 * Field errors name the form's own rows, so they land beside the field that was typed in.
 */
export function readSupplierForm(values: Record<string, string>): SupplierInput {
  const rows: { row: number; contact: Record<string, string | undefined> }[] = [];
  const rowNumbers = new Set<number>();
  for (const key of Object.keys(values)) {
    const match = /^contacts\.(\d{1,3})\./.exec(key);
    if (match) rowNumbers.add(Number(match[1]));
  }
  for (const row of [...rowNumbers].sort((a, b) => a - b)) {
    const contact: Record<string, string | undefined> = Object.fromEntries(contactKeys.map((k) => [k, values[`contacts.${row}.${k}`] ?? ""]));
    const blank = ["name", "email", "phone", "role"].every((k) => !contact[k]?.trim());
    if (blank || values[`contacts.${row}.remove`]) continue;
    rows.push({ row, contact: { ...contact, id: contact.id || undefined } });
  }
  const parsed = supplierInputSchema.safeParse({ ...values, contacts: rows.map((r) => r.contact) });
  if (parsed.success) return parsed.data;
  const errors: FieldErrors = {};
  for (const [key, messages] of Object.entries(fieldErrorsOf(parsed.error))) {
    const formKey = key.replace(/^contacts\.(\d+)/, (_, i: string) => `contacts.${rows[Number(i)]?.row ?? i}`);
    errors[formKey] = messages;
  }
  throw new HttpError(400, "Some fields need attention.", errors);
}
