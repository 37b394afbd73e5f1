import { asc, eq, sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import * as t from "@/db/schema";
import { DEMO_BOARD_STARTED } from "./demo-board";
import { decisionSpecs, demoTimes, minutesAfter } from "./demo-decisions";
import { demoId } from "./ids";

type Ctx = { studio: string; project: string; user: (key: string) => string };
type Row = typeof t.auditLog.$inferInsert;

const at = (iso: string) => new Date(iso);

/**
 * The activity log of the demo's story: one row for every seeded record, at the time the record
 * itself gives (a choice's createdAt, an approval's approvedAt, a variation's asked / priced /
 * decided times, the revision's issuedAt…), in the words the app's own writes use.
 */
export async function seedDemoActivity(db: Database, ctx: Ctx) {
  const base = { studioId: ctx.studio, projectId: ctx.project };
  const rows: Row[] = [];
  const add = (key: string, when: Date, who: string, action: string, entityType: string, entityId: string, detail: Record<string, unknown>) =>
    rows.push({ id: demoId("audit", key), ...base, actorId: ctx.user(who), action, entityType, entityId, detail, createdAt: when });

  const [project] = await db.select({ createdAt: t.projects.createdAt }).from(t.projects).where(eq(t.projects.id, ctx.project));
  add("project", project?.createdAt ?? at("2026-11-02T22:00:00Z"), "designer", "project.created", "project", ctx.project, {});

  // The board: started, then its swatches placed and paired a minute or two apart (one entry in the log).
  const board = demoId("board", "kitchen-a");
  const boardName = "Kitchen: warm limestone scheme";
  add("board", at(DEMO_BOARD_STARTED), "designer", "board.created", "board", board, { name: boardName });
  const items = await db.select({ id: t.boardItems.id, label: t.boardItems.label }).from(t.boardItems).where(eq(t.boardItems.boardId, board)).orderBy(asc(t.boardItems.sortOrder));
  const pairs = await db.select({ id: t.adjacencies.id, intent: t.adjacencies.intent }).from(t.adjacencies).where(eq(t.adjacencies.boardId, board)).orderBy(asc(t.adjacencies.id));
  items.forEach((item, i) => add(`board-item-${item.id}`, minutesAfter(DEMO_BOARD_STARTED, 2 + i * 2), "designer", "board.item-added", "board", board, { board: boardName, itemId: item.id, label: item.label }));
  pairs.forEach((pair, i) => add(`board-pair-${pair.id}`, minutesAfter(DEMO_BOARD_STARTED, 2 + items.length * 2 + i), "designer", "board.pair-added", "board", board, { board: boardName, pairId: pair.id, intent: pair.intent }));

  for (const [n, d] of decisionSpecs.entries()) {
    const id = demoId("decision", d.key);
    const offered = d.options.filter((o) => o.key !== "lb-chalk");
    add(`decision-${d.key}`, minutesAfter(demoTimes.decisionsOpened, n), "designer", "decision.created", "decision", id, {
      title: d.title, options: offered.map((o) => o.label), allowanceCents: d.allowance, dueDate: d.due,
    });
    add(`sent-${d.key}`, minutesAfter(demoTimes.decisionsSent, n), "designer", "decision.sent", "decision", id, { title: d.title });
  }

  const titleOf = (key: string) => decisionSpecs.find((d) => d.key === key)?.title ?? key;
  const labelOf = (key: string) => decisionSpecs.flatMap((d) => d.options).find((o) => o.key === key)?.label ?? key;
  const choices = await db.select().from(t.choices).where(sql`${t.choices.id} like 'demo-choice-%'`);
  for (const c of choices) {
    const decisionKey = c.decisionId.replace("demo-decision-", "");
    const optionKey = c.optionId.replace("demo-option-", "");
    add(`choice-${c.id}`, c.createdAt, c.userId.replace("demo-user-", ""), "option.chosen", "decision", c.decisionId, {
      title: titleOf(decisionKey), option: labelOf(optionKey), optionId: c.optionId, ...(c.comment ? { comment: c.comment } : {}),
    });
  }
  const approvals = await db.select().from(t.approvals).where(sql`${t.approvals.id} like 'demo-approval-%' and ${t.approvals.variationId} is null`);
  for (const a of approvals) {
    const decision = decisionSpecs.find((d) => demoId("decision", d.key) === a.decisionId);
    const option = decision?.options.find((o) => demoId("option", o.key) === a.optionId);
    add(`approval-${a.id}`, a.approvedAt, a.userId.replace("demo-user-", ""), "decision.approved", "decision", a.decisionId, {
      title: decision?.title, option: option?.label, optionId: a.optionId, priceCents: option?.price, allowanceCents: decision?.allowance,
    });
  }

  const laundry = demoId("decision", "laundry-benchtop");
  const lb = demoId("variation", "lb");
  const v = demoTimes.laundryVariation;
  const laundryDetail = { title: titleOf("laundry-benchtop"), decisionId: laundry };
  add("variation-lb-asked", at(v.asked), "client2", "variation.requested", "variation", lb, { ...laundryDetail, reason: "Lighter top for the small laundry." });
  add("variation-lb-priced", at(v.priced), "designer", "variation.priced", "variation", lb, { ...laundryDetail, priceDeltaCents: 0, timeImpactDays: 0, optionId: demoId("option", "lb-chalk") });
  add("variation-lb-approved", at(v.approved), "client2", "variation.approved", "variation", lb, { ...laundryDetail, option: labelOf("lb-chalk"), priceDeltaCents: 0, timeImpactDays: 0 });
  add("variation-kb-asked", at(demoTimes.islandEdgeAsked), "client", "variation.requested", "variation", demoId("variation", "kb"), {
    title: titleOf("kitchen-benchtop"), decisionId: demoId("decision", "kitchen-benchtop"), reason: "Could we price a mitred 40 mm edge on the island end?",
  });

  const revision = demoId("revision", "a");
  const acks = await db.select().from(t.supplierAcknowledgements).where(eq(t.supplierAcknowledgements.revisionId, revision));
  for (const ack of acks) {
    add(`ack-${ack.id}`, ack.acknowledgedAt, ack.userId.replace("demo-user-", ""), "revision.acknowledged", "spec_revision", revision, { letter: "A", supplierId: ack.supplierId });
  }
  const orders = await db
    .select({ lineId: t.lineOrders.lineId, orderedOn: t.lineOrders.orderedOn, expectedOn: t.lineOrders.expectedOn, updatedBy: t.lineOrders.updatedBy, updatedAt: t.lineOrders.updatedAt, item: t.specLines.item })
    .from(t.lineOrders)
    .innerJoin(t.specLines, eq(t.specLines.id, t.lineOrders.lineId))
    .where(eq(t.specLines.revisionId, revision));
  for (const o of orders) {
    add(`order-${o.lineId}`, o.updatedAt, (o.updatedBy ?? "stone").replace("demo-user-", ""), "line.order-dates", "spec_line", o.lineId, {
      letter: "A", item: o.item, orderedOn: o.orderedOn, expectedOn: o.expectedOn, before: null,
    });
  }

  await db.insert(t.auditLog).values(rows).onConflictDoNothing();
  // Revision A's row was seeded before it had a time of its own; it says when A was issued.
  await db.run(sql`update "audit_log" set "created_at" = (select r."created_at" from "spec_revision" r where r."id" = ${revision})
    where "id" = ${demoId("audit", "rev-a")} and "created_at" <> (select r."created_at" from "spec_revision" r where r."id" = ${revision})`);
}
