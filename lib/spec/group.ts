export type LineGroup<T> = { key: string; title: string; lines: T[] };

/** Lines arrive in specification order (rooms in the project's order), so rooms keep that order. */
export function groupByRoom<T extends { room: string }>(lines: readonly T[]): LineGroup<T>[] {
  const groups = new Map<string, LineGroup<T>>();
  for (const line of lines) {
    const group = groups.get(line.room) ?? { key: line.room, title: line.room, lines: [] };
    group.lines.push(line);
    groups.set(line.room, group);
  }
  return [...groups.values()];
}

/** By supplier, alphabetically; lines with no supplier (paint bought by the painter…) last. */
export function groupBySupplier<T extends { supplierId: string | null; supplierName: string | null }>(lines: readonly T[]): LineGroup<T>[] {
  const groups = new Map<string, LineGroup<T>>();
  for (const line of lines) {
    const key = line.supplierId ?? "";
    const group = groups.get(key) ?? { key, title: line.supplierName ?? "No supplier named", lines: [] };
    group.lines.push(line);
    groups.set(key, group);
  }
  return [...groups.values()].sort((a, b) => (a.key === "") !== (b.key === "") ? (a.key === "" ? 1 : -1) : a.title.localeCompare(b.title));
}

/** Quantities keep the decimals they were entered with (6.5 m², 18 m², 0.25 L), up to two. */
export function quantityDigits(quantity: number): number {
  if (Number.isInteger(quantity)) return 0;
  return Number.isInteger(quantity * 10) ? 1 : 2;
}
