import { and, eq, inArray, ne } from "drizzle-orm";
import { decisions, finishes, optionLines, options, projects } from "@/db/schema";
import { buildOptionPrice, type PriceLine, type StudioRates } from "@/lib/pricing/option-price";
import { writeAudit } from "./audit";
import type { Tx } from "./serial-write";

type Change = { studioId: string; actorId: string; before: StudioRates; after: StudioRates };

/**
 * After the studio's markup or tax changes: every option whose price is built (not set by hand)
 * on a decision not yet approved (open or chosen) is worked out again with the new rates. Approved
 * (locked) decisions never change. An option is only re-priced while its stored price is still
 * the one the old rates build from today's library: a price that differs was typed before prices
 * were built, or built from older library prices, and is left for the designer to look at (the
 * decision screen shows both). A decision whose prices moved gets a new version, so a client
 * approving from a page loaded before the change is asked to look again (409).
 */
export async function repriceOpenOptions(tx: Tx, change: Change) {
  const rows = await tx
    .select({ id: options.id, priceCents: options.priceCents, decisionId: decisions.id, title: decisions.title, projectId: decisions.projectId, version: decisions.version })
    .from(options)
    .innerJoin(decisions, eq(decisions.id, options.decisionId))
    .innerJoin(projects, eq(projects.id, decisions.projectId))
    .where(and(eq(projects.studioId, change.studioId), ne(decisions.status, "locked"), eq(options.priceOverridden, false)));
  if (rows.length === 0) return { options: 0, decisions: 0 };
  const lineRows = await tx
    .select({ optionId: optionLines.optionId, quantity: optionLines.quantity, unitPriceCents: finishes.unitPriceCents })
    .from(optionLines)
    .innerJoin(finishes, eq(finishes.id, optionLines.finishId))
    .where(inArray(optionLines.optionId, rows.map((r) => r.id)));
  const linesOf = new Map<string, PriceLine[]>();
  for (const l of lineRows) linesOf.set(l.optionId, [...(linesOf.get(l.optionId) ?? []), l]);

  const moved = new Map<string, (typeof rows)[number]>();
  let count = 0;
  for (const row of rows) {
    const lines = linesOf.get(row.id) ?? [];
    if (buildOptionPrice(lines, change.before).totalCents !== row.priceCents) continue;
    const priceCents = buildOptionPrice(lines, change.after).totalCents;
    if (priceCents === row.priceCents) continue;
    await tx.update(options).set({ priceCents }).where(eq(options.id, row.id));
    moved.set(row.decisionId, row);
    count += 1;
  }
  for (const d of moved.values()) {
    await tx.update(decisions).set({ version: d.version + 1 }).where(eq(decisions.id, d.decisionId));
    await writeAudit(
      {
        studioId: change.studioId,
        projectId: d.projectId,
        actorId: change.actorId,
        action: "decision.repriced",
        entityType: "decision",
        entityId: d.decisionId,
        detail: { title: d.title, reason: "The studio's markup or tax changed.", before: change.before, after: change.after },
      },
      tx,
    );
  }
  return { options: count, decisions: moved.size };
}
