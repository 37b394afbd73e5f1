import { comparedFields, type ComparedField, type SpecLineContent } from "./types";

export type FieldChange = { field: ComparedField; before: SpecLineContent[ComparedField]; after: SpecLineContent[ComparedField] };
export type ChangedLine = { lineKey: string; before: SpecLineContent; after: SpecLineContent; changes: FieldChange[] };

export type SpecDiff = {
  added: SpecLineContent[];
  removed: SpecLineContent[];
  changed: ChangedLine[];
  unchanged: number;
};

function sameValue(a: unknown, b: unknown): boolean {
  // Cautions are a set: the same warnings in another order are not a change.
  if (Array.isArray(a) && Array.isArray(b)) return JSON.stringify([...a].sort()) === JSON.stringify([...b].sort());
  return a === b;
}

/** Which compared fields differ between two versions of one line. */
export function changedFields(before: SpecLineContent, after: SpecLineContent): FieldChange[] {
  return comparedFields
    .filter((field) => !sameValue(before[field], after[field]))
    .map((field) => ({ field, before: before[field], after: after[field] }));
}

/** Two revisions (or a revision and the current specification) compared by line key. */
export function diffLines(before: readonly SpecLineContent[], after: readonly SpecLineContent[]): SpecDiff {
  const old = new Map(before.map((l) => [l.lineKey, l]));
  const next = new Map(after.map((l) => [l.lineKey, l]));
  const diff: SpecDiff = { added: [], removed: [], changed: [], unchanged: 0 };
  for (const line of after) {
    const prior = old.get(line.lineKey);
    if (!prior) {
      diff.added.push(line);
      continue;
    }
    const changes = changedFields(prior, line);
    if (changes.length) diff.changed.push({ lineKey: line.lineKey, before: prior, after: line, changes });
    else diff.unchanged += 1;
  }
  for (const line of before) if (!next.has(line.lineKey)) diff.removed.push(line);
  return diff;
}

export function hasChanges(diff: SpecDiff): boolean {
  return diff.added.length + diff.removed.length + diff.changed.length > 0;
}

/** One supplier's view of a comparison: a line that moved to another supplier is removed for them. */
export function linesForSupplier<T extends { supplierId: string | null }>(lines: readonly T[], supplierId: string): T[] {
  return lines.filter((l) => l.supplierId === supplierId);
}

export const fieldLabels: Record<ComparedField, string> = {
  room: "Room",
  item: "Item",
  location: "Location",
  finishName: "Finish",
  productCode: "Product code",
  supplierName: "Supplier",
  quantity: "Quantity",
  unit: "Unit",
  leadTimeDays: "Lead time",
  orderByDate: "Order by",
  cautions: "Cautions",
  finishId: "Finish record",
  supplierId: "Supplier record",
};

/** The changes worth showing a person: an id change is implied when its name changed too. */
export function visibleChanges(changes: FieldChange[]): FieldChange[] {
  const named = new Set(changes.map((c) => c.field));
  return changes.filter(
    (c) => !(c.field === "finishId" && named.has("finishName")) && !(c.field === "supplierId" && named.has("supplierName")),
  );
}
