// Type only: this file also runs in the browser (the supplier form), which has no business with db/.
import type { Trade } from "@/db/schema/studio";
import { cautions, GUIDANCE_ONLY } from "@/lib/cautions";

/** What the screens call each trade; the keys are what the database holds. */
export const tradeLabels: Record<Trade, string> = {
  stone: "Stonemason",
  joinery: "Cabinetmaker",
  flooring: "Flooring",
  tiles: "Tiler",
  tapware: "Tapware and sinks",
  hardware: "Hardware",
  lighting: "Lighting",
  appliances: "Appliances",
  paint: "Painter",
  electrician: "Electrician",
  plumber: "Plumber",
  builder: "Builder",
  other: "Other",
};

/** Every trade, in the order screens list them (the Record type above keeps it complete). */
export const tradeKeys = Object.keys(tradeLabels) as [Trade, ...Trade[]];

export function isTrade(value: string): value is Trade {
  return Object.hasOwn(tradeLabels, value);
}

/** The label for a stored trade key; an unknown key is shown as it is rather than hidden. */
export function tradeLabel(trade: string): string {
  return isTrade(trade) ? tradeLabels[trade] : trade;
}

export type TradeCaution = { title: string; text: string; guidance: string };

/** The house caution for licensed work (lib/cautions.ts), for the trades that do it; null for the rest. */
export function licensedTradeCaution(trade: string): TradeCaution | null {
  if (trade === "electrician") return { ...cautions["electrical-work"], guidance: GUIDANCE_ONLY };
  if (trade === "plumber") return { ...cautions["plumbing-work"], guidance: GUIDANCE_ONLY };
  return null;
}
