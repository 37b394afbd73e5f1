import { z } from "zod";

/** A calendar day as YYYY-MM-DD that really exists (no 31 February). */
export const isoDay = z
  .string({ error: "Enter a date." })
  .regex(/^\d{4}-\d{2}-\d{2}$/, "Enter the date as YYYY-MM-DD.")
  .refine((v) => {
    const d = new Date(`${v}T00:00:00Z`);
    return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === v;
  }, "That date doesn't exist.")
  .refine((v) => v >= "2000-01-01" && v <= "2100-12-31", "Enter a date between 2000 and 2100.");

export const createProjectSchema = z.object({
  name: z.string().trim().min(2, "Enter the project's name.").max(120, "Use at most 120 characters."),
  siteAddress: z.string().trim().max(200, "Use at most 200 characters.").optional().or(z.literal("")),
  installDate: isoDay.optional().or(z.literal("")),
  rooms: z
    .string()
    .trim()
    .max(500)
    .transform((v) => v.split(/[,\n]/).map((r) => r.trim()).filter(Boolean))
    .pipe(z.array(z.string().max(60, "Keep each room name under 60 characters.")).max(20, "At most 20 rooms.")),
});
export type CreateProjectInput = z.infer<typeof createProjectSchema>;

const projectName = z.string({ error: "Enter the project's name." }).trim().min(2, "Enter the project's name.").max(120, "Use at most 120 characters.");

/**
 * A change to a project: any of its name, site address and install date. An empty address or
 * date (or null) clears it. At least one of the three must be sent.
 */
export const editProjectSchema = z
  .object({
    name: projectName.optional(),
    siteAddress: z.string({ error: "Enter the site address as text." }).trim().max(200, "Use at most 200 characters.").nullable().optional(),
    installDate: isoDay.or(z.literal("")).nullable().optional(),
  })
  .strict()
  .refine((v) => v.name !== undefined || v.siteAddress !== undefined || v.installDate !== undefined, "Send at least one of name, siteAddress or installDate.")
  .transform((v) => ({
    name: v.name,
    siteAddress: v.siteAddress === undefined ? undefined : v.siteAddress || null,
    installDate: v.installDate === undefined ? undefined : v.installDate || null,
  }));
export type EditProjectInput = z.infer<typeof editProjectSchema>;
