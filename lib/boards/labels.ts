/**
 * Where a swatch goes. Labels are free text (a designer may write "Vanity top, ensuite"); each is
 * read as one of these kinds by its words, so proposals work whatever the exact wording.
 */
export const placementKinds = [
  "benchtop",
  "base-cabinets",
  "tall-cabinets",
  "wall-cabinets",
  "island-panel",
  "splashback",
  "floor",
  "kickboard",
  "wall",
  "step-edge",
  "door",
  "pendant",
  "handles",
  "tapware",
  "sink",
  "appliances",
] as const;
export type PlacementKind = (typeof placementKinds)[number];

/** What the label picker offers, in the order a kitchen is usually talked through. */
export const LABEL_SUGGESTIONS = [
  "Benchtop",
  "Base cabinets",
  "Tall cabinets",
  "Wall cabinets",
  "Island panel",
  "Splashback",
  "Floor",
  "Kickboard",
  "Wall",
  "Step edge",
  "Door",
  "Pendant",
  "Handles",
  "Tapware",
  "Sink",
  "Appliances",
] as const;

// Checked in this order, so "island benchtop" reads as a benchtop and "wall cabinets" before "wall".
const keywords: readonly [PlacementKind, RegExp][] = [
  ["kickboard", /\b(kick ?boards?|plinths?|toe ?kicks?)\b/],
  ["step-edge", /\b(step|stair|nosing)/],
  ["splashback", /\b(splash ?backs?|backsplash(es)?)\b/],
  ["benchtop", /\b(bench ?tops?|benches|bench|counter ?tops?|worktops?|vanity tops?)\b/],
  ["island-panel", /\bisland\b/],
  ["tall-cabinets", /\b(tall|pantry|pantries)\b/],
  ["wall-cabinets", /\b(wall|overhead|upper) (cabinets?|cupboards?)\b/],
  ["base-cabinets", /\b(base|lower)?\s*(cabinets?|cabinetry|cupboards?|drawers?|doors? fronts?|joinery)\b/],
  ["floor", /\bfloor(s|ing)?\b/],
  ["wall", /\b(walls?|paint)\b/],
  ["door", /\bdoors?\b/],
  ["pendant", /\b(pendants?|lights?|lighting|lamps?)\b/],
  ["handles", /\b(handles?|pulls?|knobs?|hardware)\b/],
  ["tapware", /\b(taps?|tapware|mixers?|spouts?)\b/],
  ["sink", /\b(sinks?|basins?|tubs?)\b/],
  ["appliances", /\b(appliances?|oven|cooktop|rangehood|fridge|dishwasher)\b/],
];

/** The kind a free-text label stands for, or null when its words say nothing we know. */
export function readPlacement(label: string): PlacementKind | null {
  const text = label.toLowerCase().replace(/[-_/]+/g, " ");
  for (const [kind, pattern] of keywords) if (pattern.test(text)) return kind;
  return null;
}

const labelForCategory: Record<string, string> = {
  stone: "Benchtop",
  cabinetry: "Base cabinets",
  flooring: "Floor",
  tile: "Splashback",
  tapware: "Tapware",
  hardware: "Handles",
  lighting: "Pendant",
  appliances: "Appliances",
  paint: "Wall",
};

/** A first guess at where a newly placed finish goes; the designer changes it if wrong. */
export function suggestLabel(category: string): string {
  return labelForCategory[category] ?? "Finish";
}
