import { z } from "zod";
import { isoDay } from "./project";

const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `Use at most ${max} characters.`)
    .optional()
    .nullable()
    .transform((v) => (v ? v : null));

/** Forms send "6.5", JSON sends 6.5: both are read as a number. */
const quantity = z.preprocess(
  (v) => (typeof v === "string" && v.trim() !== "" ? Number(v.trim().replace(",", ".")) : v),
  z
    .number({ error: "Enter the quantity as a number, like 6.5." })
    .refine(Number.isFinite, "Enter the quantity as a number, like 6.5.")
    .positive("The quantity must be more than 0.")
    .max(100_000, "That quantity is too large; check the unit."),
);

/** A fixed item: something the specification carries without a client choice (an oven, downlights). */
export const fixedItemSchema = z.object({
  roomId: z.string({ error: "Choose a room." }).trim().min(1, "Choose a room."),
  finishId: z.string({ error: "Choose a finish from the library." }).trim().min(1, "Choose a finish from the library."),
  item: z.string({ error: "Say what the item is." }).trim().min(1, "Say what the item is, like \u201cWall oven\u201d.").max(120, "Use at most 120 characters."),
  location: optionalText(120),
  quantity,
  unit: z.string({ error: "Enter the unit." }).trim().min(1, "Enter the unit, like m\u00b2 or each.").max(16, "Use at most 16 characters."),
  notes: optionalText(500),
});
export type FixedItemInput = z.infer<typeof fixedItemSchema>;

const orderDay = z.union([isoDay, z.literal("").transform(() => null), z.null()]).optional();

/**
 * A supplier's order dates for one line. A key left out keeps its value; null or "" clears it.
 * Rules that need both dates (delivery not before the order) are checked against the stored ones.
 */
export const lineOrderSchema = z.object({ orderedOn: orderDay, expectedOn: orderDay }).strict();
export type LineOrderInput = z.infer<typeof lineOrderSchema>;

/** Fields of the frozen line: a request that tries to change one is refused with 409, not "fixed". */
export const frozenLineFields = [
  "lineKey", "room", "item", "location", "finishId", "finishName", "supplierId", "supplierName",
  "productCode", "quantity", "unit", "leadTimeDays", "orderByDate", "cautions", "sortOrder",
] as const;

export const exportQuerySchema = z.object({
  supplier: z.string().trim().min(1, "Name a supplier, or leave the parameter out.").max(100).optional(),
});
