import { z } from "zod";

/** What a person on a project becomes: a client, or the contact at one of the studio's suppliers. */
export const memberRoleSchema = z.discriminatedUnion(
  "role",
  [
    z.object({ role: z.literal("client") }).strict(),
    z
      .object({ role: z.literal("supplier"), supplierId: z.string({ error: "Choose which supplier they work for." }).trim().min(1, "Choose which supplier they work for.").max(100) })
      .strict(),
  ],
  { error: "Choose a client or a supplier's contact." },
);
export type MemberRoleInput = z.infer<typeof memberRoleSchema>;

/** The studio's staff: an owner (also manages the team and settings) or a designer. */
export const staffRoleSchema = z.object({ role: z.enum(["owner", "designer"], { error: "Choose owner or designer." }) }).strict();
export type StaffRoleInput = z.infer<typeof staffRoleSchema>;
