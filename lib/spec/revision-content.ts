import { canonicalJson, sha256Hex, type Json } from "./canonical";
import type { SpecLineContent } from "./types";

/** Exactly the frozen fields of a line, whatever else the caller's object carries (ids, order dates…). */
export function pickLineContent(line: SpecLineContent): SpecLineContent {
  return {
    lineKey: line.lineKey,
    room: line.room,
    item: line.item,
    location: line.location,
    finishId: line.finishId,
    finishName: line.finishName,
    supplierId: line.supplierId,
    supplierName: line.supplierName,
    productCode: line.productCode,
    quantity: line.quantity,
    unit: line.unit,
    leadTimeDays: line.leadTimeDays,
    orderByDate: line.orderByDate,
    cautions: [...line.cautions],
    sortOrder: line.sortOrder,
  };
}

/**
 * The text a revision's SHA-256 is taken of: canonical JSON (sorted keys, no whitespace) of its
 * letter, project and lines in sort order. Issue time and issuer are recorded beside it, not in it,
 * so the hash says "this content", and the same content read back always gives the same hash.
 */
export function serialiseRevision(input: { letter: string; projectId: string; lines: SpecLineContent[] }): string {
  const lines = [...input.lines].sort((a, b) => a.sortOrder - b.sortOrder).map(pickLineContent);
  return canonicalJson({ letter: input.letter, projectId: input.projectId, lines: lines as unknown as Json[] });
}

export function hashRevision(content: string): string {
  return sha256Hex(content);
}

/** A revision checks out when its stored text hashes to its stored hash and its rows say the same. */
export function verifyRevision(input: {
  letter: string;
  projectId: string;
  content: string;
  sha256: string;
  lines: SpecLineContent[];
}): boolean {
  if (hashRevision(input.content) !== input.sha256) return false;
  return serialiseRevision({ letter: input.letter, projectId: input.projectId, lines: input.lines }) === input.content;
}
