import { and, eq, inArray } from "drizzle-orm";
import { boards, decisions, finishes, optionLines, options, projects, rooms } from "@/db/schema";
import { buildOptionPrice } from "@/lib/pricing/option-price";
import { isPriceSetByHand, type OptionInput } from "@/lib/validation/decision";
import { HttpError, type FieldErrors } from "@/lib/http";
import type { Tx } from "./serial-write";
import { getStudioRates } from "./studio-settings";

type NewOption = Omit<OptionInput, "id">;

export const LOCKED_MESSAGE = "This decision is approved and locked. Changes now go through a variation.";
export const STALE_MESSAGE = "This decision changed since you opened it. Look at it again, then try once more.";

function badInput(fieldErrors: FieldErrors): HttpError {
  return new HttpError(400, "Some fields need attention.", fieldErrors);
}

/** `room` may be the room's id or its name (an API caller may only know "Kitchen"). */
export async function resolveRoom(tx: Tx, projectId: string, room: string): Promise<string> {
  const list = await tx.select({ id: rooms.id, name: rooms.name }).from(rooms).where(eq(rooms.projectId, projectId));
  const found = list.find((r) => r.id === room) ?? list.find((r) => r.name.toLowerCase() === room.trim().toLowerCase());
  if (!found) throw badInput({ room: ["Choose one of this project's rooms."] });
  return found.id;
}

/**
 * Every finish must be in the project's studio library and every board on this project; anything
 * else is refused field by field, before a row is written. `prefix` names where the options sit
 * in the request body ("options" or "newOption").
 */
export async function checkOptionInputs(tx: Tx, studioId: string, projectId: string, list: NewOption[], prefix: (i: number) => string) {
  const finishIds = [...new Set(list.flatMap((o) => o.lines.map((l) => l.finishId)))];
  const boardIds = [...new Set(list.map((o) => o.boardId).filter((b): b is string => Boolean(b)))];
  const [okFinishes, okBoards] = await Promise.all([
    finishIds.length ? tx.select({ id: finishes.id }).from(finishes).where(and(inArray(finishes.id, finishIds), eq(finishes.studioId, studioId))) : [],
    boardIds.length ? tx.select({ id: boards.id }).from(boards).where(and(inArray(boards.id, boardIds), eq(boards.projectId, projectId))) : [],
  ]);
  const finishOk = new Set(okFinishes.map((f) => f.id));
  const boardOk = new Set(okBoards.map((b) => b.id));
  const errors: FieldErrors = {};
  list.forEach((o, i) => {
    if (o.boardId && !boardOk.has(o.boardId)) errors[`${prefix(i)}.boardId`] = ["Choose one of this project's sample boards."];
    o.lines.forEach((l, j) => {
      if (!finishOk.has(l.finishId)) errors[`${prefix(i)}.lines.${j}.finishId`] = ["Choose a finish from your studio's library."];
    });
  });
  if (Object.keys(errors).length) throw badInput(errors);
}

/**
 * The price an option is saved with: as sent when the designer set it by hand, otherwise built
 * from its lines with the studio's markup and tax (lib/pricing/option-price.ts).
 */
export async function resolveOptionPrice(tx: Tx, decisionId: string, o: NewOption): Promise<{ priceCents: number; priceOverridden: boolean }> {
  if (isPriceSetByHand(o)) return { priceCents: o.priceCents, priceOverridden: true };
  const [owner] = await tx
    .select({ studioId: projects.studioId })
    .from(decisions)
    .innerJoin(projects, eq(projects.id, decisions.projectId))
    .where(eq(decisions.id, decisionId));
  if (!owner) throw new Error("option's decision not found");
  const ids = [...new Set(o.lines.map((l) => l.finishId))];
  const [rates, rows] = await Promise.all([
    getStudioRates(owner.studioId, tx),
    tx.select({ id: finishes.id, unitPriceCents: finishes.unitPriceCents }).from(finishes).where(and(inArray(finishes.id, ids), eq(finishes.studioId, owner.studioId))),
  ]);
  const unitPrice = new Map(rows.map((r) => [r.id, r.unitPriceCents]));
  const lines = o.lines.map((l) => {
    const unitPriceCents = unitPrice.get(l.finishId);
    // checkOptionInputs refused finishes from outside the studio before anything was written.
    if (unitPriceCents === undefined) throw new Error("option line's finish not in the studio");
    return { unitPriceCents, quantity: l.quantity };
  });
  return { priceCents: buildOptionPrice(lines, rates).totalCents, priceOverridden: false };
}

export async function insertOption(tx: Tx, decisionId: string, o: NewOption, sortOrder: number, addedByVariation = false) {
  const price = await resolveOptionPrice(tx, decisionId, o);
  const [row] = await tx
    .insert(options)
    .values({ decisionId, label: o.label, ...price, notes: o.notes, boardId: o.boardId, sortOrder, addedByVariation })
    .returning();
  if (!row) throw new Error("option insert returned nothing");
  await insertLines(tx, row.id, o.lines);
  return row;
}

export async function insertLines(tx: Tx, optionId: string, lines: NewOption["lines"]) {
  await tx.insert(optionLines).values(
    lines.map((l, j) => ({ optionId, finishId: l.finishId, quantity: l.quantity, unit: l.unit, item: l.item ?? null, location: l.location, sortOrder: j })),
  );
}
