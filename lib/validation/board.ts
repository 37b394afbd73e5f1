import { z } from "zod";
import { HttpError } from "@/lib/http";
import { CANVAS, MIN_SIZE } from "@/lib/boards/canvas";
import { DAYLIGHT, LIGHT_CCTS } from "@/lib/boards/lights";
import { pairIntents } from "@/db/schema/boards";
import { finishCategories } from "@/db/schema/library";

const version = z.number({ error: "Reload the board: this change did not say which version it was based on." }).int().min(1);
const id = (what: string) => z.string({ error: `Choose ${what}.` }).trim().min(1, `Choose ${what}.`).max(100);
const label = z.string({ error: "Say where this finish goes." }).trim().min(1, "Say where this finish goes.").max(60, "Keep the label under 60 characters.");
const coordinate = (max: number, what: string) =>
  z.number({ error: `Give the ${what} as a number.` }).finite().min(0, `The ${what} must be on the board.`).max(max, `The ${what} must be on the board.`);
const size = (max: number, what: string) =>
  z
    .number({ error: `Give the ${what} as a number.` })
    .finite()
    .min(MIN_SIZE, `Make the ${what} at least ${MIN_SIZE}.`)
    .max(max, `The ${what} must fit on the board.`);

const OFF_CANVAS = "The swatch must sit wholly on the board (1200 × 800).";

/** A rectangle wholly on the canvas: each edge checked, then the far corner. */
const rect = z
  .object({
    x: coordinate(CANVAS.width - MIN_SIZE, "left edge"),
    y: coordinate(CANVAS.height - MIN_SIZE, "top edge"),
    width: size(CANVAS.width, "width"),
    height: size(CANVAS.height, "height"),
  })
  .refine((r) => r.x + r.width <= CANVAS.width, { message: OFF_CANVAS, path: ["width"] })
  .refine((r) => r.y + r.height <= CANVAS.height, { message: OFF_CANVAS, path: ["height"] });

export const createBoardSchema = z.object({
  roomId: id("a room"),
  name: z.string({ error: "Name the board." }).trim().min(2, "Name the board.").max(80, "Keep the name under 80 characters."),
});
export type CreateBoardInput = z.infer<typeof createBoardSchema>;

export const duplicateBoardSchema = z.object({
  version,
  name: z.string().trim().min(2, "Name the copy.").max(80, "Keep the name under 80 characters.").optional(),
});
export type DuplicateBoardInput = z.infer<typeof duplicateBoardSchema>;

export const addItemSchema = rect.and(z.object({ version, finishId: id("a finish"), label }));
export type AddItemInput = z.infer<typeof addItemSchema>;

/** Move, resize and relabel in one: send what changed; position and size are checked together. */
export const changeItemSchema = z
  .object({
    version,
    x: z.number().finite().optional(),
    y: z.number().finite().optional(),
    width: z.number().finite().optional(),
    height: z.number().finite().optional(),
    label: label.optional(),
  })
  .refine((v) => v.x !== undefined || v.y !== undefined || v.width !== undefined || v.height !== undefined || v.label !== undefined, {
    message: "Nothing to change.",
    path: ["_"],
  });
export type ChangeItemInput = z.infer<typeof changeItemSchema>;

/** The full rectangle after a change, checked as a whole (a move can push a wide swatch off). */
export const itemRectSchema = rect;

export const reorderItemsSchema = z.object({
  version,
  itemIds: z.array(z.string().min(1)).min(1, "List the swatches in their new order.").max(500),
});
export type ReorderItemsInput = z.infer<typeof reorderItemsSchema>;

export const versionOnlySchema = z.object({ version });

export const addPairSchema = z
  .object({
    version,
    itemAId: id("the first swatch"),
    itemBId: id("the second swatch"),
    intent: z.enum(pairIntents, { error: "Say whether the two are meant to match or contrast." }),
    accessRelevant: z.boolean({ error: "Say whether this meeting matters for access." }).default(false),
  })
  .refine((v) => v.itemAId !== v.itemBId, { message: "Choose two different swatches.", path: ["itemBId"] });
export type AddPairInput = z.infer<typeof addPairSchema>;

export const changePairSchema = z
  .object({
    version,
    intent: z.enum(pairIntents, { error: "Say whether the two are meant to match or contrast." }).optional(),
    accessRelevant: z.boolean().optional(),
  })
  .refine((v) => v.intent !== undefined || v.accessRelevant !== undefined, { message: "Nothing to change.", path: ["_"] });
export type ChangePairInput = z.infer<typeof changePairSchema>;

/** `?cct=` on GET and on writes (writes answer with the board as seen under that light). */
export const cctSchema = z.coerce
  .number({ error: "Choose a light." })
  .int()
  .refine((v) => LIGHT_CCTS.includes(v), { message: `Choose one of the lights: ${LIGHT_CCTS.join(", ")} K.` });

export const finderQuerySchema = z.object({
  q: z.string().trim().max(80, "Keep the search under 80 characters.").optional(),
  category: z.enum(finishCategories, { error: "Choose a category from the list." }).optional(),
  near: z.string().trim().min(1).max(100).optional(),
});
export type FinderQuery = z.infer<typeof finderQuerySchema>;

/** The light a request asks for: `?cct=2700|3000|4000|6504` (or `daylight`); daylight when absent. */
export function readCct(request: Request): number {
  const raw = new URL(request.url).searchParams.get("cct");
  if (raw === null || raw === "" || raw === "daylight") return DAYLIGHT.cct;
  const parsed = cctSchema.safeParse(raw);
  if (!parsed.success) {
    const message = parsed.error.issues[0]?.message ?? "Choose a light.";
    throw new HttpError(400, message, { cct: [message] });
  }
  return parsed.data;
}
