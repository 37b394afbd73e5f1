import { and, asc, eq, ne, or } from "drizzle-orm";
import type { db } from "@/db";
import { decisions, finishes, fixedItems, optionLines, rooms, suppliers, variations } from "@/db/schema";
import { buildSpecLines, type LineSource } from "@/lib/spec/build-lines";
import type { SpecLineContent } from "@/lib/spec/types";

/** The app's handle or an open transaction: issuing reads the specification inside its transaction. */
export type Reader = Pick<typeof db, "select">;

export type PendingDecision = { id: string; title: string; room: string; dueDate: string; status: string };

const finishColumns = {
  finishId: finishes.id,
  finishName: finishes.name,
  productCode: finishes.productCode,
  leadTimeDays: finishes.leadTimeDays,
  cautions: finishes.cautions,
  supplierId: suppliers.id,
  supplierName: suppliers.name,
};

type FinishRow = {
  finishId: string;
  finishName: string;
  productCode: string | null;
  leadTimeDays: number;
  cautions: string[];
  supplierId: string | null;
  supplierName: string | null;
};

function finishOf(row: FinishRow): LineSource["finish"] {
  return {
    id: row.finishId,
    name: row.finishName,
    productCode: row.productCode,
    leadTimeDays: row.leadTimeDays,
    cautions: row.cautions,
    supplierId: row.supplierId,
    supplierName: row.supplierName,
  };
}

async function readDecisionSources(reader: Reader, projectId: string): Promise<LineSource[]> {
  const rows = await reader
    .select({
      decisionId: decisions.id,
      title: decisions.title,
      roomName: rooms.name,
      roomOrder: rooms.sortOrder,
      location: optionLines.location,
      lineItem: optionLines.item,
      quantity: optionLines.quantity,
      unit: optionLines.unit,
      ...finishColumns,
    })
    .from(decisions)
    .innerJoin(rooms, eq(rooms.id, decisions.roomId))
    .innerJoin(optionLines, eq(optionLines.optionId, decisions.lockedOptionId))
    .innerJoin(finishes, eq(finishes.id, optionLines.finishId))
    .leftJoin(suppliers, eq(suppliers.id, finishes.supplierId))
    .where(and(eq(decisions.projectId, projectId), eq(decisions.status, "locked")))
    .orderBy(asc(decisions.id), asc(optionLines.sortOrder), asc(optionLines.id));
  const seen = new Map<string, number>();
  return rows.map((r) => {
    const position = seen.get(r.decisionId) ?? 0;
    seen.set(r.decisionId, position + 1);
    return {
      kind: "decision" as const,
      sourceId: r.decisionId,
      position,
      room: { name: r.roomName, sortOrder: r.roomOrder },
      // Named for the item where the designer named it; older lines keep the decision's title (so issued revisions still verify).
      item: r.lineItem ?? r.title,
      location: r.location,
      finish: finishOf(r),
      quantity: r.quantity,
      unit: r.unit,
    };
  });
}

async function readFixedSources(reader: Reader, projectId: string): Promise<LineSource[]> {
  const rows = await reader
    .select({
      id: fixedItems.id,
      item: fixedItems.item,
      location: fixedItems.location,
      quantity: fixedItems.quantity,
      unit: fixedItems.unit,
      roomName: rooms.name,
      roomOrder: rooms.sortOrder,
      ...finishColumns,
    })
    .from(fixedItems)
    .innerJoin(rooms, eq(rooms.id, fixedItems.roomId))
    .innerJoin(finishes, eq(finishes.id, fixedItems.finishId))
    .leftJoin(suppliers, eq(suppliers.id, finishes.supplierId))
    .where(eq(fixedItems.projectId, projectId));
  return rows.map((r) => ({
    kind: "fixed" as const,
    sourceId: r.id,
    position: 0,
    room: { name: r.roomName, sortOrder: r.roomOrder },
    item: r.item,
    location: r.location,
    finish: finishOf(r),
    quantity: r.quantity,
    unit: r.unit,
  }));
}

/** The current specification: each locked decision's option lines plus the fixed items. */
export async function readCurrentLines(reader: Reader, project: { id: string; installDate: string | null }): Promise<SpecLineContent[]> {
  const [chosen, fixed] = await Promise.all([readDecisionSources(reader, project.id), readFixedSources(reader, project.id)]);
  return buildSpecLines([...chosen, ...fixed], project.installDate);
}

/** Decisions not locked yet: they show as pending rows and are never issued. */
export async function readPendingDecisions(reader: Reader, projectId: string): Promise<PendingDecision[]> {
  return reader
    .select({ id: decisions.id, title: decisions.title, room: rooms.name, dueDate: decisions.dueDate, status: decisions.status })
    .from(decisions)
    .innerJoin(rooms, eq(rooms.id, decisions.roomId))
    .where(and(eq(decisions.projectId, projectId), ne(decisions.status, "locked")))
    .orderBy(asc(rooms.sortOrder), asc(decisions.dueDate), asc(decisions.title));
}

/** Locked decisions with a variation under way: their lines may change before they are ordered. */
export async function readDecisionsWithOpenVariations(reader: Reader, projectId: string): Promise<Set<string>> {
  const rows = await reader
    .select({ decisionId: variations.decisionId })
    .from(variations)
    .innerJoin(decisions, eq(decisions.id, variations.decisionId))
    .where(and(eq(decisions.projectId, projectId), or(eq(variations.status, "requested"), eq(variations.status, "priced"))));
  return new Set(rows.map((r) => r.decisionId));
}

export function decisionIdOf(lineKey: string): string | null {
  return lineKey.startsWith("decision:") ? (lineKey.slice("decision:".length).split(":")[0] ?? null) : null;
}
