// sRGB hex equivalents of the oklch tokens in app/globals.css. Kept here so the WCAG
// contrast of the key pairs can be tested without a browser; a test checks they stay in sync.
export const palette = {
  ink: "#1b1b1b",
  inkSoft: "#484848",
  paper: "#fafafa",
  card: "#ffffff",
  line: "#d7d7d7",
  lineStrong: "#868686",
  stone50: "#f5f5f5",
  stone100: "#ededed",
  stone600: "#5b5b5b",
  surround: "#7c7c7c",
  surroundLight: "#f0f0f0",
  spruce: "#0e5445",
  spruceDeep: "#043f34",
  spruceWash: "#e2f3ee",
  ok: "#33854a",
  okInk: "#1b552c",
  okWash: "#e4f8e7",
  caution: "#ba7917",
  cautionInk: "#774914",
  cautionWash: "#fef2d9",
  problem: "#c5372f",
  problemInk: "#972620",
  problemWash: "#fdeeec",
  info: "#386e99",
  infoInk: "#225176",
  infoWash: "#e9f3fd",
} as const;

export type PaletteName = keyof typeof palette;

/** CSS token name in globals.css for each palette entry (camelCase → --color-kebab-case). */
export function tokenName(name: PaletteName): string {
  return `--color-${name.replace(/([a-z])([A-Z0-9])/g, "$1-$2").toLowerCase()}`;
}

/** Text/background pairs that must reach 4.5:1 (normal text) in the interface. */
export const textPairs: ReadonlyArray<readonly [fg: PaletteName, bg: PaletteName]> = [
  ["ink", "paper"],
  ["ink", "card"],
  ["inkSoft", "paper"],
  ["inkSoft", "stone100"],
  ["stone600", "paper"],
  ["stone600", "card"],
  ["stone600", "stone50"],
  ["spruce", "paper"],
  ["card", "spruce"],
  ["card", "spruceDeep"],
  ["spruceDeep", "spruceWash"],
  ["card", "problem"],
  ["okInk", "okWash"],
  ["okInk", "card"],
  ["cautionInk", "cautionWash"],
  ["cautionInk", "card"],
  ["problemInk", "problemWash"],
  ["problemInk", "card"],
  ["infoInk", "infoWash"],
  ["infoInk", "card"],
];

/** Boundaries and icons that must reach 3:1 (WCAG 1.4.11 non-text contrast). */
export const uiPairs: ReadonlyArray<readonly [fg: PaletteName, bg: PaletteName]> = [
  ["lineStrong", "paper"],
  ["lineStrong", "card"],
  ["spruce", "paper"],
  ["ok", "okWash"],
  ["caution", "cautionWash"],
  ["problem", "problemWash"],
  ["info", "infoWash"],
  ["ok", "card"],
  ["caution", "card"],
  ["problem", "card"],
];
