import { asc, eq, inArray } from "drizzle-orm";
import { alias } from "drizzle-orm/sqlite-core";
import { db } from "@/db";
import { adjacencies, boardItems, boards, finishes, optionLines, options, suppliers, type Finish } from "@/db/schema";
import { toHex, type ThresholdOverrides } from "@/lib/colour";
import { compareToAllowance } from "@/lib/decisions/budget";
import { checkBoardPairs, checkFinishesTogether, type BoardPair, type CheckFinish } from "@/lib/decisions/option-checks";
import type { LineView, OptionView } from "@/lib/decisions/types";
import { buildOptionPrice, type StudioRates } from "@/lib/pricing/option-price";

type Reader = Pick<typeof db, "select">;

type FinishColour = Pick<Finish, "id" | "name" | "labL" | "labA" | "labB" | "lrv" | "lrvSource">;

const toCheckFinish = (f: FinishColour): CheckFinish => ({
  id: f.id,
  name: f.name,
  lab: [f.labL, f.labA, f.labB],
  lrv: f.lrv,
  lrvSource: f.lrvSource,
});

/**
 * The options of one decision with their finishes, price against the allowance and colour checks.
 * Pass `staffRates` (staff only) to include how each price is built; clients never get the cost.
 */
export async function loadOptionViews(
  decision: { id: string; allowanceCents: number },
  thresholds: ThresholdOverrides | undefined,
  reader: Reader = db,
  staffRates: StudioRates | null = null,
): Promise<OptionView[]> {
  const optionRows = await reader
    .select({ option: options, boardName: boards.name })
    .from(options)
    .leftJoin(boards, eq(boards.id, options.boardId))
    .where(eq(options.decisionId, decision.id))
    .orderBy(asc(options.sortOrder), asc(options.createdAt));
  const ids = optionRows.map((r) => r.option.id);
  const lineRows = ids.length
    ? await reader
        .select({ line: optionLines, finish: finishes, supplierName: suppliers.name })
        .from(optionLines)
        .innerJoin(finishes, eq(finishes.id, optionLines.finishId))
        .leftJoin(suppliers, eq(suppliers.id, finishes.supplierId))
        .where(inArray(optionLines.optionId, ids))
        .orderBy(asc(optionLines.sortOrder))
    : [];
  const boardIds = [...new Set(optionRows.map((r) => r.option.boardId).filter((b): b is string => Boolean(b)))];
  const pairsByBoard = await loadBoardPairs(boardIds, reader);

  return optionRows.map(({ option, boardName }) => {
    const lines: LineView[] = lineRows
      .filter((r) => r.line.optionId === option.id)
      .map(({ line, finish, supplierName }) => ({
        id: line.id,
        finishId: finish.id,
        finishName: finish.name,
        productCode: finish.productCode,
        category: finish.category,
        surface: finish.surface,
        hex: toHex([finish.labL, finish.labA, finish.labB]),
        lrv: finish.lrv,
        lrvSource: finish.lrvSource,
        quantity: line.quantity,
        unit: line.unit,
        item: line.item,
        location: line.location,
        leadTimeDays: finish.leadTimeDays,
        supplierName,
        cautions: finish.cautions,
      }));
    const boardPairs = option.boardId ? (pairsByBoard.get(option.boardId) ?? []) : [];
    const checks = boardPairs.length
      ? checkBoardPairs(boardPairs, thresholds)
      : checkFinishesTogether(
          lineRows.filter((r) => r.line.optionId === option.id).map((r) => toCheckFinish(r.finish)),
          thresholds,
        );
    const priceLines = lineRows.filter((r) => r.line.optionId === option.id).map((r) => ({ unitPriceCents: r.finish.unitPriceCents, quantity: r.line.quantity }));
    return {
      id: option.id,
      label: option.label,
      priceCents: option.priceCents,
      priceDetail: staffRates ? { overridden: option.priceOverridden, build: buildOptionPrice(priceLines, staffRates), rates: staffRates } : null,
      notes: option.notes,
      boardId: option.boardId,
      boardName,
      sortOrder: option.sortOrder,
      addedByVariation: option.addedByVariation,
      comparison: compareToAllowance(option.priceCents, decision.allowanceCents),
      lines,
      checks,
      cautionKeys: [...new Set(lines.flatMap((l) => l.cautions))],
    };
  });
}

/** Every marked pair of the given boards, with both sides' finishes. */
async function loadBoardPairs(boardIds: string[], reader: Reader): Promise<Map<string, BoardPair[]>> {
  const out = new Map<string, BoardPair[]>();
  if (boardIds.length === 0) return out;
  const itemA = alias(boardItems, "item_a");
  const itemB = alias(boardItems, "item_b");
  const finishA = alias(finishes, "finish_a");
  const finishB = alias(finishes, "finish_b");
  const rows = await reader
    .select({
      boardId: adjacencies.boardId,
      intent: adjacencies.intent,
      accessRelevant: adjacencies.accessRelevant,
      aLabel: itemA.label,
      bLabel: itemB.label,
      a: { id: finishA.id, name: finishA.name, labL: finishA.labL, labA: finishA.labA, labB: finishA.labB, lrv: finishA.lrv, lrvSource: finishA.lrvSource },
      b: { id: finishB.id, name: finishB.name, labL: finishB.labL, labA: finishB.labA, labB: finishB.labB, lrv: finishB.lrv, lrvSource: finishB.lrvSource },
    })
    .from(adjacencies)
    .innerJoin(itemA, eq(itemA.id, adjacencies.itemAId))
    .innerJoin(itemB, eq(itemB.id, adjacencies.itemBId))
    .innerJoin(finishA, eq(finishA.id, itemA.finishId))
    .innerJoin(finishB, eq(finishB.id, itemB.finishId))
    .where(inArray(adjacencies.boardId, boardIds));
  for (const r of rows) {
    const list = out.get(r.boardId) ?? [];
    list.push({ aLabel: r.aLabel, bLabel: r.bLabel, a: toCheckFinish(r.a), b: toCheckFinish(r.b), intent: r.intent, accessRelevant: r.accessRelevant });
    out.set(r.boardId, list);
  }
  return out;
}
