import { orderByDate } from "./order-by";
import type { SpecLineContent } from "./types";

/** What a spec line is made of, as read from a locked decision's option line or a fixed item. */
export type LineSource = {
  kind: "decision" | "fixed";
  /** The decision id or the fixed item id. */
  sourceId: string;
  /** Position of the line within its decision's locked option (0 for fixed items). */
  position: number;
  room: { name: string; sortOrder: number };
  item: string;
  location: string | null;
  finish: {
    id: string;
    name: string;
    productCode: string | null;
    leadTimeDays: number;
    cautions: string[];
    supplierId: string | null;
    supplierName: string | null;
  };
  quantity: number;
  unit: string;
};

/**
 * Line keys stay the same from one revision to the next, so revisions compare line by line: a
 * decision's first line keeps `decision:<id>` even when a variation swaps its finish.
 */
export function lineKeyFor(source: Pick<LineSource, "kind" | "sourceId" | "position">): string {
  if (source.kind === "fixed") return `fixed:${source.sourceId}`;
  return source.position === 0 ? `decision:${source.sourceId}` : `decision:${source.sourceId}:${source.position + 1}`;
}

function compareSources(a: LineSource, b: LineSource): number {
  return (
    a.room.sortOrder - b.room.sortOrder ||
    a.room.name.localeCompare(b.room.name) ||
    // Within a room by item, then key: the order never depends on which rows the database returns first.
    a.item.localeCompare(b.item) ||
    lineKeyFor(a).localeCompare(lineKeyFor(b))
  );
}

/** The specification's lines: one per locked option line and per fixed item, in a stable order. */
export function buildSpecLines(sources: LineSource[], installDate: string | null): SpecLineContent[] {
  return [...sources].sort(compareSources).map((s, index) => ({
    lineKey: lineKeyFor(s),
    room: s.room.name,
    item: s.item,
    location: s.location,
    finishId: s.finish.id,
    finishName: s.finish.name,
    supplierId: s.finish.supplierId,
    supplierName: s.finish.supplierName,
    productCode: s.finish.productCode,
    quantity: s.quantity,
    unit: s.unit,
    leadTimeDays: s.finish.leadTimeDays,
    orderByDate: orderByDate(installDate, s.finish.leadTimeDays),
    cautions: [...new Set(s.finish.cautions)],
    sortOrder: index,
  }));
}
