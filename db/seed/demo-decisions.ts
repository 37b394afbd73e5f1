import { eq, sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import * as t from "@/db/schema";
import { buildOptionPrice, type StudioRates } from "@/lib/pricing/option-price";
import { demoFinishes } from "./demo-finishes";
import { demoId } from "./ids";

type Line = [finishKey: string, quantity: number, unit: string];
type OptionSpec = { key: string; label: string; price: number; notes?: string; lines: Line[] };
type DecisionSpec = {
  key: string; room: string; title: string; allowance: number; due: string;
  status: t.DecisionStatus; options: OptionSpec[]; lockedOption?: string;
};

/**
 * The demo's story, in order (UTC): the designer opens the decisions on 5 Nov and sends them;
 * the clients pick; the two benchtops are approved and locked on 18 Nov; revision A goes out on
 * 19 Nov; Callum asks on 22 Nov for a lighter laundry top, the designer prices it on 24 Nov and
 * he approves it on 26 Nov; Noor asks about the island edge on 29 Nov. demo-activity.ts logs each
 * step at these same times.
 */
export const demoTimes = {
  decisionsOpened: "2026-11-05T00:00:00Z",
  decisionsSent: "2026-11-05T02:00:00Z",
  lockedAt: { "kitchen-benchtop": "2026-11-18T03:20:00Z", "laundry-benchtop": "2026-11-18T03:25:00Z" } as Record<string, string>,
  laundryVariation: { asked: "2026-11-22T08:15:00Z", priced: "2026-11-24T02:00:00Z", approved: "2026-11-26T05:00:00Z" },
  islandEdgeAsked: "2026-11-29T07:40:00Z",
} as const;

/** The minute after `iso`, n minutes on: each decision opened (and sent) a minute after the one before. */
export const minutesAfter = (iso: string, n: number) => new Date(new Date(iso).getTime() + n * 60_000);

const at = (iso: string) => new Date(iso);

export const decisionSpecs: DecisionSpec[] = [
  { key: "kitchen-benchtop", room: "kitchen", title: "Benchtop", allowance: 900000, due: "2026-11-20", status: "locked", lockedOption: "kb-limestone",
    options: [
      { key: "kb-limestone", label: "Saltbush Limestone, honed", price: 884000, notes: "Warm, soft veining; will patina. Sealed yearly.", lines: [["saltbush", 6.5, "m²"]] },
      { key: "kb-porcelain", label: "Chalk Porcelain Slab", price: 702000, notes: "Very hard-wearing, no sealing.", lines: [["porcelain-chalk", 6.5, "m²"]] },
      { key: "kb-quartzite", label: "Fog Quartzite, polished", price: 1215000, notes: "Hardest natural option; cool grey.", lines: [["quartzite-fog", 6.5, "m²"]] },
    ] },
  { key: "kitchen-cabinets", room: "kitchen", title: "Cabinet colour", allowance: 1800000, due: "2026-12-08", status: "chosen",
    options: [
      { key: "kc-oat", label: "Oat base, Chalk White tall", price: 1760000, lines: [["cab-oat", 14, "m²"], ["cab-chalk", 11, "m²"]] },
      { key: "kc-sage", label: "Dry Sage base, Chalk White tall", price: 1760000, lines: [["cab-sage", 14, "m²"], ["cab-chalk", 11, "m²"]] },
      { key: "kc-ink", label: "Ink Blue base, Oat tall", price: 1810000, lines: [["cab-ink", 14, "m²"], ["cab-oat", 11, "m²"]] },
    ] },
  { key: "kitchen-pendant", room: "kitchen", title: "Pendants over the island", allowance: 150000, due: "2026-12-14", status: "open",
    options: [
      { key: "kp-opal", label: "Opal globe, pair", price: 108000, lines: [["light-pendant-opal", 2, "each"]] },
      { key: "kp-brass", label: "Brass dome, pair", price: 168000, lines: [["light-pendant-brass", 2, "each"]] },
    ] },
  { key: "kitchen-splashback", room: "kitchen", title: "Splashback", allowance: 320000, due: "2026-12-22", status: "open",
    options: [
      { key: "ks-stone", label: "Limestone to match the benchtop", price: 412000, lines: [["saltbush", 2.4, "m²"]] },
      { key: "ks-zellige", label: "White glazed handmade tile", price: 265000, lines: [["tile-zellige-white", 2.4, "m²"]] },
      { key: "ks-green", label: "Deep green glazed handmade tile", price: 265000, lines: [["tile-zellige-green", 2.4, "m²"]] },
    ] },
  { key: "ensuite-floor", room: "ensuite", title: "Floor tile", allowance: 180000, due: "2027-01-15", status: "open",
    options: [
      { key: "ef-porcelain", label: "Limestone-look porcelain, P3", price: 154000, lines: [["tile-porcelain-600", 7.5, "m²"]] },
      { key: "ef-terrazzo", label: "Mist terrazzo, P3", price: 198000, lines: [["floor-terrazzo-mist", 7.5, "m²"]] },
    ] },
  { key: "laundry-benchtop", room: "laundry", title: "Laundry benchtop", allowance: 250000, due: "2026-11-25", status: "locked", lockedOption: "lb-chalk",
    options: [
      { key: "lb-graphite", label: "Graphite Porcelain Slab", price: 216000, lines: [["porcelain-graphite", 2, "m²"]] },
      { key: "lb-laminate", label: "Pale Ash Laminate", price: 98000, lines: [["cab-laminate-ash", 2, "m²"]] },
      { key: "lb-chalk", label: "Chalk Porcelain Slab (variation)", price: 216000, lines: [["porcelain-chalk", 2, "m²"]] },
    ] },
];

/**
 * The demo's prices were typed by hand before prices were worked out from the lines, so each is
 * marked "set by hand" unless it happens to equal the price its lines build with the studio's rates.
 */
function isSetByHand(o: OptionSpec, rates: StudioRates): boolean {
  const lines = o.lines.map(([key, quantity]) => {
    const finish = demoFinishes.find((f) => f.key === key);
    if (!finish) throw new Error(`demo option ${o.key} names an unknown finish ${key}`);
    return { unitPriceCents: finish.price, quantity };
  });
  return buildOptionPrice(lines, rates).totalCents !== o.price;
}

async function studioRates(db: Database, projectId: string): Promise<StudioRates> {
  const [row] = await db
    .select({ markupBasisPoints: t.studios.markupBasisPoints, taxBasisPoints: t.studios.taxBasisPoints })
    .from(t.projects)
    .innerJoin(t.studios, eq(t.studios.id, t.projects.studioId))
    .where(eq(t.projects.id, projectId));
  return row ?? { markupBasisPoints: 0, taxBasisPoints: 1000 };
}

/** Decisions in every state: open, chosen, locked, and locked then varied. */
export async function seedDemoDecisions(db: Database, ctx: { project: string; user: (key: string) => string }) {
  const rates = await studioRates(db, ctx.project);
  for (const [n, d] of decisionSpecs.entries()) {
    const lockedAt = demoTimes.lockedAt[d.key];
    await db.insert(t.decisions).values({
      id: demoId("decision", d.key), projectId: ctx.project, roomId: demoId("room", d.room), title: d.title,
      allowanceCents: d.allowance, dueDate: d.due, status: d.status,
      lockedOptionId: d.lockedOption ? demoId("option", d.lockedOption) : null,
      lockedAt: d.lockedOption && lockedAt ? at(lockedAt) : null,
      createdAt: minutesAfter(demoTimes.decisionsOpened, n),
    }).onConflictDoNothing();
    for (const [i, o] of d.options.entries()) {
      await db.insert(t.options).values({
        id: demoId("option", o.key), decisionId: demoId("decision", d.key), label: o.label, priceCents: o.price,
        priceOverridden: isSetByHand(o, rates), notes: o.notes ?? null, sortOrder: i, addedByVariation: o.key === "lb-chalk",
        boardId: d.key === "kitchen-benchtop" && i === 0 ? demoId("board", "kitchen-a") : null,
      }).onConflictDoUpdate({
        // A demo database seeded before prices were worked out has every option unmarked; mark the
        // ones still carrying the seed's typed price, and leave any a designer has changed since.
        target: t.options.id,
        set: { priceOverridden: isSetByHand(o, rates) },
        setWhere: sql`${t.options.priceCents} = ${o.price} and ${t.options.priceOverridden} = 0`,
      });
      await db.insert(t.optionLines).values(o.lines.map(([finish, quantity, unit], j) => ({
        id: demoId("line", `${o.key}-${j}`), optionId: demoId("option", o.key), finishId: demoId("finish", finish), quantity, unit, sortOrder: j,
      }))).onConflictDoNothing();
    }
  }
  const choice = (key: string, decision: string, option: string, who: string, when: string, comment?: string) =>
    ({ id: demoId("choice", key), decisionId: demoId("decision", decision), optionId: demoId("option", option), userId: ctx.user(who), comment: comment ?? null, createdAt: at(when) });
  await db.insert(t.choices).values([
    choice("kb-1", "kitchen-benchtop", "kb-porcelain", "client2", "2026-11-12T09:00:00Z", "Worried about stains with the limestone."),
    choice("kb-2", "kitchen-benchtop", "kb-limestone", "client", "2026-11-17T21:10:00Z", "We saw the sample in daylight: it's the one."),
    choice("kc-1", "kitchen-cabinets", "kc-oat", "client2", "2026-11-28T08:30:00Z", "Oat feels calmer next to the limestone."),
    choice("lb-1", "laundry-benchtop", "lb-graphite", "client", "2026-11-16T10:00:00Z"),
  ]).onConflictDoNothing();
  await db.insert(t.approvals).values([
    { id: demoId("approval", "kb"), decisionId: demoId("decision", "kitchen-benchtop"), optionId: demoId("option", "kb-limestone"), userId: ctx.user("client"),
      snapshot: { option: "Saltbush Limestone, honed", priceCents: 884000, allowanceCents: 900000, lines: [{ finish: "Saltbush Limestone", code: "RS-LM-204", quantity: 6.5, unit: "m²" }] },
      approvedAt: at("2026-11-18T03:20:00Z") },
    { id: demoId("approval", "lb"), decisionId: demoId("decision", "laundry-benchtop"), optionId: demoId("option", "lb-graphite"), userId: ctx.user("client"),
      snapshot: { option: "Graphite Porcelain Slab", priceCents: 216000, allowanceCents: 250000, lines: [{ finish: "Graphite Porcelain Slab", code: "RS-PS-415", quantity: 2, unit: "m²" }] },
      approvedAt: at("2026-11-18T03:25:00Z") },
    { id: demoId("approval", "lb-variation"), decisionId: demoId("decision", "laundry-benchtop"), optionId: demoId("option", "lb-chalk"), userId: ctx.user("client2"),
      variationId: demoId("variation", "lb"),
      snapshot: { option: "Chalk Porcelain Slab (variation)", priceDeltaCents: 0, timeImpactDays: 0, reason: "Lighter top for the small laundry." },
      approvedAt: at("2026-11-26T05:00:00Z") },
  ]).onConflictDoNothing();
  await db.insert(t.variations).values([
    { id: demoId("variation", "lb"), decisionId: demoId("decision", "laundry-benchtop"), requestedBy: ctx.user("client2"), reason: "Lighter top for the small laundry.",
      optionId: demoId("option", "lb-chalk"), status: "approved", priceDeltaCents: 0, timeImpactDays: 0, pricedBy: ctx.user("designer"),
      pricedAt: at(demoTimes.laundryVariation.priced), decidedBy: ctx.user("client2"), decidedAt: at(demoTimes.laundryVariation.approved),
      createdAt: at(demoTimes.laundryVariation.asked), updatedAt: at(demoTimes.laundryVariation.approved) },
    { id: demoId("variation", "kb"), decisionId: demoId("decision", "kitchen-benchtop"), requestedBy: ctx.user("client"),
      reason: "Could we price a mitred 40 mm edge on the island end?", status: "requested",
      createdAt: at(demoTimes.islandEdgeAsked), updatedAt: at(demoTimes.islandEdgeAsked) },
  ]).onConflictDoNothing();
  await repairDemoTimes(db);
}

/**
 * A demo database seeded before the story had times of its own: variations stamped when the seed
 * ran (asked after they were approved) and both benchtops locked in the same minute. Put the
 * seed's own rows right; rows anyone has changed since are left as they are.
 */
async function repairDemoTimes(db: Database) {
  const v = demoTimes.laundryVariation;
  await db.run(sql`update "variation" set "created_at" = ${Date.parse(v.asked)}
    where "id" = ${demoId("variation", "lb")} and "created_at" > "priced_at"`);
  await db.run(sql`update "variation" set "created_at" = ${Date.parse(demoTimes.islandEdgeAsked)}, "updated_at" = ${Date.parse(demoTimes.islandEdgeAsked)}
    where "id" = ${demoId("variation", "kb")} and "status" = 'requested' and "priced_at" is null and "created_at" > ${Date.parse(demoTimes.islandEdgeAsked)}`);
  await db.run(sql`update "decision" set "locked_at" = ${Date.parse(demoTimes.lockedAt["laundry-benchtop"] ?? "")}
    where "id" = ${demoId("decision", "laundry-benchtop")} and "locked_at" = ${Date.parse("2026-11-18T03:20:00Z")}`);
}
