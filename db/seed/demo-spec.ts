import { and, eq, isNull } from "drizzle-orm";
import type { Database } from "@/db/client";
import * as t from "@/db/schema";
import { demoId } from "./ids";

/** Where each demo option's finish goes, as the specification says it (revision A uses the same words). */
const locations: [lineKey: string, location: string][] = [
  ["kb-limestone-0", "Perimeter and island"],
  ["kb-porcelain-0", "Perimeter and island"],
  ["kb-quartzite-0", "Perimeter and island"],
  ["kc-oat-0", "Base cabinets"],
  ["kc-oat-1", "Tall cabinets"],
  ["kc-sage-0", "Base cabinets"],
  ["kc-sage-1", "Tall cabinets"],
  ["kc-ink-0", "Base cabinets"],
  ["kc-ink-1", "Tall cabinets"],
  ["kp-opal-0", "Over the island"],
  ["kp-brass-0", "Over the island"],
  ["ks-stone-0", "Behind the cooktop and sink"],
  ["ks-zellige-0", "Behind the cooktop and sink"],
  ["ks-green-0", "Behind the cooktop and sink"],
  ["ef-porcelain-0", "Ensuite floor"],
  ["ef-terrazzo-0", "Ensuite floor"],
  ["lb-graphite-0", "Laundry"],
  ["lb-laminate-0", "Laundry"],
  ["lb-chalk-0", "Laundry"],
];

/** Fills in option-line locations the decisions seed leaves empty; safe to run again (only empty ones). */
export async function seedDemoSpec(db: Database) {
  for (const [key, location] of locations) {
    await db
      .update(t.optionLines)
      .set({ location })
      .where(and(eq(t.optionLines.id, demoId("line", key)), isNull(t.optionLines.location)));
  }
}
