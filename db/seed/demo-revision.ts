import type { Database } from "@/db/client";
import * as t from "@/db/schema";
import { demoFinishes } from "./demo-finishes";
import { demoId } from "./ids";
import { hashRevision, serialiseRevision } from "@/lib/spec/revision-content";

type Ctx = { studio: string; project: string; user: (key: string) => string };

const INSTALL = "2027-04-12";
const supplierNames: Record<string, string> = {
  stone: "Ridgeline Stoneworks", flooring: "Groundswell Floors", lighting: "Lanternfield Lighting", appliances: "Hearthline Appliances",
};

function orderBy(leadDays: number) {
  const d = new Date(`${INSTALL}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() - leadDays);
  return d.toISOString().slice(0, 10);
}

/** Fixed items, then revision A: the kitchen and laundry benchtops as first locked, plus the fixed items. */
export async function seedDemoRevision(db: Database, ctx: Ctx) {
  const fixed = [
    ["cooktop", "kitchen", "app-induction-900", "Cooktop", "Island", 1, "each"],
    ["oven", "kitchen", "app-oven-600", "Wall oven", "Tall cabinets", 1, "each"],
    ["rangehood", "kitchen", "app-rangehood", "Rangehood", "Above cooktop", 1, "each"],
    ["downlights", "kitchen", "light-downlight", "Downlights", "Ceiling", 8, "each"],
    ["floor", "kitchen", "floor-oak-herringbone", "Floor", "Kitchen and dining", 18, "m²"],
  ] as const;
  await db.insert(t.fixedItems).values(fixed.map(([key, room, finish, item, location, quantity, unit]) => ({
    id: demoId("fixed", key), projectId: ctx.project, roomId: demoId("room", room), finishId: demoId("finish", finish), item, location, quantity, unit,
  }))).onConflictDoNothing();

  const source = [
    ...fixed.map(([key, room, finish, item, location, quantity, unit]) => ({ lineKey: `fixed:${demoId("fixed", key)}`, room, finish, item, location, quantity, unit })),
    { lineKey: `decision:${demoId("decision", "kitchen-benchtop")}`, room: "kitchen", finish: "saltbush", item: "Benchtop", location: "Perimeter and island", quantity: 6.5, unit: "m²" },
    { lineKey: `decision:${demoId("decision", "laundry-benchtop")}`, room: "laundry", finish: "porcelain-graphite", item: "Laundry benchtop", location: "Laundry", quantity: 2, unit: "m²" },
  ];
  const lines = source.map((s, i) => {
    const f = demoFinishes.find((x) => x.key === s.finish);
    if (!f) throw new Error(`demo finish ${s.finish} missing`);
    return {
      lineKey: s.lineKey, room: s.room[0]?.toUpperCase() + s.room.slice(1), item: s.item, location: s.location,
      finishId: demoId("finish", f.key), finishName: f.name, supplierId: f.supplier ? demoId("supplier", f.supplier) : null,
      supplierName: f.supplier ? (supplierNames[f.supplier] ?? null) : null, productCode: f.code, quantity: s.quantity, unit: s.unit,
      leadTimeDays: f.leadDays, orderByDate: orderBy(f.leadDays), cautions: [...(f.cautions ?? [])], sortOrder: i,
    };
  });
  const content = serialiseRevision({ letter: "A", projectId: ctx.project, lines });
  const revision = demoId("revision", "a");
  await db.insert(t.specRevisions).values({
    id: revision, projectId: ctx.project, letter: "A", sequence: 1, issuedAt: new Date("2026-11-19T00:30:00Z"),
    issuedBy: ctx.user("designer"), content, sha256: hashRevision(content),
  }).onConflictDoNothing();
  await db.insert(t.specLines).values(lines.map((l, i) => ({ id: demoId("spec-line", `a-${i}`), revisionId: revision, ...l }))).onConflictDoNothing();
  await db.insert(t.supplierAcknowledgements).values({
    id: demoId("ack", "a-stone"), revisionId: revision, supplierId: demoId("supplier", "stone"), userId: ctx.user("stone"), acknowledgedAt: new Date("2026-11-20T22:00:00Z"),
  }).onConflictDoNothing();
  await db.insert(t.lineOrders).values({
    lineId: demoId("spec-line", "a-5"), orderedOn: "2026-11-21", expectedOn: "2027-03-08", updatedBy: ctx.user("stone"), updatedAt: new Date("2026-11-21T01:00:00Z"),
  }).onConflictDoNothing();
  await db.insert(t.auditLog).values([
    { id: demoId("audit", "rev-a"), studioId: ctx.studio, projectId: ctx.project, actorId: ctx.user("designer"), action: "revision.issued", entityType: "spec_revision", entityId: revision, detail: { letter: "A" }, createdAt: new Date("2026-11-19T00:30:00Z") },
  ]).onConflictDoNothing();
}
