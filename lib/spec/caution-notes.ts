import { cautions as cautionList, isCautionKey, type CautionKey } from "@/lib/cautions";

export type CautionNote = { key: CautionKey; title: string; text: string };

/** The cautions a line carries, with their plain texts; keys no longer in the list are skipped. */
export function cautionNotes(keys: readonly string[]): CautionNote[] {
  return keys.filter(isCautionKey).map((key) => ({ key, ...cautionList[key] }));
}

export function cautionTitles(keys: readonly string[]): string[] {
  return cautionNotes(keys).map((c) => c.title);
}

/** Every distinct caution across some lines, in the order of the one list, for a print footnote. */
export function cautionsAcross(lines: readonly { cautions: readonly string[] }[]): CautionNote[] {
  const used = new Set(lines.flatMap((l) => l.cautions));
  return cautionNotes(Object.keys(cautionList).filter((k) => used.has(k)));
}
