import { readPlacement, type PlacementKind } from "./labels";

export type PairIntent = "match" | "contrast";

type Rule = { a: PlacementKind; b: PlacementKind; intent: PairIntent; accessRelevant: boolean; why: string };

/**
 * Surfaces that usually meet in a kitchen or bathroom, with the usual intent. [common practice]
 * Access-relevant ones are where people with low vision need to tell two surfaces apart: floor
 * against wall or kickboard, step edges, benchtop edges, doors against walls (as AS 1428.1 and
 * BS 8300-2 frame it, quoted in DOMAIN.md). Only proposals: the designer keeps or changes each.
 */
export const PAIR_RULES: readonly Rule[] = [
  { a: "benchtop", b: "base-cabinets", intent: "contrast", accessRelevant: false, why: "The benchtop sits on the base cabinets." },
  { a: "splashback", b: "benchtop", intent: "match", accessRelevant: false, why: "The splashback stands on the benchtop." },
  { a: "tall-cabinets", b: "base-cabinets", intent: "match", accessRelevant: false, why: "Tall and base cabinets usually read as one run." },
  { a: "wall-cabinets", b: "base-cabinets", intent: "match", accessRelevant: false, why: "Wall and base cabinets usually read as one run." },
  { a: "kickboard", b: "base-cabinets", intent: "match", accessRelevant: false, why: "The kickboard sits under the cabinet doors." },
  { a: "floor", b: "kickboard", intent: "contrast", accessRelevant: true, why: "Where the floor meets the kickboard shows where the floor ends." },
  { a: "floor", b: "wall", intent: "contrast", accessRelevant: true, why: "Where the floor meets the wall shows the size of the room." },
  { a: "benchtop", b: "floor", intent: "contrast", accessRelevant: true, why: "A benchtop edge that stands out is easier to find." },
  { a: "island-panel", b: "floor", intent: "contrast", accessRelevant: true, why: "An island standing out from the floor is easier to walk around." },
  { a: "island-panel", b: "benchtop", intent: "contrast", accessRelevant: false, why: "The island panel sits under the benchtop." },
  { a: "step-edge", b: "floor", intent: "contrast", accessRelevant: true, why: "A step edge must stand out from the floor." },
  { a: "door", b: "wall", intent: "contrast", accessRelevant: true, why: "A door that stands out from its wall is easier to find." },
  { a: "handles", b: "base-cabinets", intent: "contrast", accessRelevant: false, why: "Handles sit on the cabinet doors." },
  { a: "tapware", b: "splashback", intent: "contrast", accessRelevant: false, why: "Taps are seen against the splashback." },
  { a: "sink", b: "benchtop", intent: "match", accessRelevant: false, why: "The sink is set into the benchtop." },
  { a: "splashback", b: "wall", intent: "match", accessRelevant: false, why: "The splashback meets the wall above it." },
];

export type LabelledItem = { id: string; label: string };
export type ExistingPair = { itemAId: string; itemBId: string };
export type ProposedPair = { itemAId: string; itemBId: string; intent: PairIntent; accessRelevant: boolean; why: string };

/** Order-free key of two items, so A–B and B–A are the same pair. */
export function pairKey(x: string, y: string): string {
  return x < y ? `${x}|${y}` : `${y}|${x}`;
}

/** Most proposals worth showing at once; past this a board is better paired by hand. */
export const MAX_PROPOSALS = 24;

/** Pairs the labels suggest that are not marked yet, in the order of PAIR_RULES. */
export function proposePairs(items: readonly LabelledItem[], existing: readonly ExistingPair[]): ProposedPair[] {
  const taken = new Set(existing.map((p) => pairKey(p.itemAId, p.itemBId)));
  const byKind = new Map<PlacementKind, LabelledItem[]>();
  for (const item of items) {
    const kind = readPlacement(item.label);
    if (kind) byKind.set(kind, [...(byKind.get(kind) ?? []), item]);
  }
  const out: ProposedPair[] = [];
  for (const rule of PAIR_RULES) {
    for (const a of byKind.get(rule.a) ?? []) {
      for (const b of byKind.get(rule.b) ?? []) {
        const key = pairKey(a.id, b.id);
        if (a.id === b.id || taken.has(key)) continue;
        taken.add(key);
        out.push({ itemAId: a.id, itemBId: b.id, intent: rule.intent, accessRelevant: rule.accessRelevant, why: rule.why });
        if (out.length >= MAX_PROPOSALS) return out;
      }
    }
  }
  return out;
}
