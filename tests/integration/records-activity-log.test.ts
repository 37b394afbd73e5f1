import { describe, expect, it } from "vitest";
import { POST as reorder } from "@/app/api/boards/[boardId]/items/order/route";
import { DELETE as removeItem, PATCH as changeItem } from "@/app/api/boards/[boardId]/items/[itemId]/route";
import { POST as addItem } from "@/app/api/boards/[boardId]/items/route";
import { DELETE as removePair, PATCH as changePair } from "@/app/api/boards/[boardId]/pairs/[pairId]/route";
import { POST as addPair } from "@/app/api/boards/[boardId]/pairs/route";
import { GET as getBoard } from "@/app/api/boards/[boardId]/route";
import { POST as approve } from "@/app/api/decisions/[decisionId]/approve/route";
import { POST as choose } from "@/app/api/decisions/[decisionId]/choice/route";
import { GET as getDecision } from "@/app/api/decisions/[decisionId]/route";
import { POST as requestVariation } from "@/app/api/decisions/[decisionId]/variations/route";
import { POST as approveVariation } from "@/app/api/decisions/[decisionId]/variations/[variationId]/approve/route";
import { POST as decline } from "@/app/api/decisions/[decisionId]/variations/[variationId]/decline/route";
import { POST as price } from "@/app/api/decisions/[decisionId]/variations/[variationId]/price/route";
import { POST as withdraw } from "@/app/api/decisions/[decisionId]/variations/[variationId]/withdraw/route";
import { POST as issue } from "@/app/api/projects/[projectId]/revisions/route";
import { POST as acknowledge } from "@/app/api/revisions/[revisionId]/acknowledge/route";
import { PATCH as patchLine } from "@/app/api/revisions/[revisionId]/lines/[lineId]/route";
import { GET as getRevision } from "@/app/api/revisions/[revisionId]/route";
import { listActivityPeople, readActivityPage, type ActivityEntry } from "@/db/queries/audit";
import { ACTIVITY_PAGE_SIZE, activityKinds } from "@/lib/activity/kinds";
import { describeAudit } from "@/lib/decisions/audit-words";
import type { DecisionView } from "@/lib/decisions/types";
import { call, demo } from "@/tests/support/decision-calls";
import { queryRows } from "@/tests/support/db-read";
import { actAs } from "@/tests/support/session";
import { BOARD, callRoute } from "./boards-support";

const STUDIO = "demo-studio-fernleaf";
const readAll = async (filter: Parameters<typeof readActivityPage>[2] = {}) => {
  const out: ActivityEntry[] = [];
  for (let page = 1; ; page++) {
    const got = await readActivityPage(STUDIO, demo.project, { ...filter, page });
    out.push(...got.entries);
    if (page >= got.pageCount) return out;
  }
};
const boardVersion = async () => {
  actAs("designer");
  return ((await callRoute(getBoard, `/api/boards/${BOARD}`, { boardId: BOARD })).body as { board: { version: number } }).board.version;
};
const viewOf = async (decisionId: string) => {
  actAs("designer");
  return (await call(getDecision, { decisionId })).body as unknown as DecisionView;
};
const ok = (status: number) => expect([200, 201]).toContain(status);

describe("the seeded activity log", () => {
  it("holds every seeded action at the time its record gives", async () => {
    const log = await readAll();
    const actions = log.map((e) => e.action);
    for (const action of ["project.created", "board.created", "board.edits", "decision.created", "decision.sent", "option.chosen", "decision.approved", "variation.requested", "variation.priced", "variation.approved", "revision.issued", "revision.acknowledged", "line.order-dates"]) {
      expect(actions, action).toContain(action);
    }
    expect(actions.filter((a) => a === "option.chosen")).toHaveLength(4);
    expect(actions.filter((a) => a === "decision.approved")).toHaveLength(2);
    // The same instants as the records themselves (approval.approvedAt, choice.createdAt, variation times, revision.issuedAt).
    const records = await queryRows(`
      select 'decision.approved' as action, created_at as at from approval where variation_id is null and id like 'demo-%'
      union all select 'option.chosen', created_at from choice where id like 'demo-%'
      union all select 'variation.requested', created_at from variation where id like 'demo-%'
      union all select 'variation.priced', priced_at from variation where priced_at is not null and id like 'demo-%'
      union all select 'variation.approved', decided_at from variation where status = 'approved' and id like 'demo-%'
      union all select 'revision.issued', created_at from spec_revision where id like 'demo-%'
      union all select 'revision.acknowledged', created_at from supplier_acknowledgement where id like 'demo-%'
      union all select 'line.order-dates', updated_at from line_order where line_id like 'demo-%'`);
    for (const r of records) {
      const at = Number(r.at);
      expect(log.some((e) => e.action === r.action && e.at.getTime() === at), `${String(r.action)} at ${new Date(at).toISOString()}`).toBe(true);
    }
    // Newest first.
    expect(log.map((e) => e.at.getTime())).toEqual([...log.map((e) => e.at.getTime())].sort((a, b) => b - a));
  });

  it("shows the board's making as one entry, not ten swatches and six pairs", async () => {
    const edits = (await readAll({ kind: "boards" })).filter((e) => e.action === "board.edits");
    expect(edits).toHaveLength(1);
    expect(edits[0]?.parts).toHaveLength(16);
    expect(describeAudit("board.edits", edits[0]?.detail ?? null, edits[0]?.parts)).toBe("added 10 swatches and paired 6 pairs of swatches on “Kitchen: warm limestone scheme”");
  });
});

describe("every kind of action through the routes lands in the log", () => {
  let before = 0;

  it("board edits: one entry for a run of saves by one person on one board", async () => {
    before = (await readActivityPage(STUDIO, demo.project)).total;
    actAs("designer");
    const added = await callRoute(addItem, "", { boardId: BOARD }, { method: "POST", body: { version: await boardVersion(), finishId: demo.finish("cab-walnut"), label: "Open shelf", x: 40, y: 600, width: 100, height: 100 } });
    ok(added.status);
    const itemId = String((added.body as { itemId?: string; item?: { id: string } }).itemId ?? (added.body as { item?: { id: string } }).item?.id ?? "");
    const board = (await callRoute(getBoard, "", { boardId: BOARD })).body as { items: { id: string; label: string }[] };
    const shelf = board.items.find((i) => i.label === "Open shelf")?.id ?? itemId;
    for (const x of [60, 80]) ok((await callRoute(changeItem, "", { boardId: BOARD, itemId: shelf }, { method: "PATCH", body: { version: await boardVersion(), x } })).status);
    ok((await callRoute(changeItem, "", { boardId: BOARD, itemId: "demo-item-tap" }, { method: "PATCH", body: { version: await boardVersion(), x: 1000 } })).status);
    const pair = await callRoute(addPair, "", { boardId: BOARD }, { method: "POST", body: { version: await boardVersion(), itemAId: shelf, itemBId: "demo-item-floor", intent: "contrast", accessRelevant: false } });
    ok(pair.status);
    const pairId = String((pair.body as { pairId?: string }).pairId ?? ((await callRoute(getBoard, "", { boardId: BOARD })).body as { pairs: { id: string; itemAId: string }[] }).pairs.find((p) => p.itemAId === shelf)?.id);
    ok((await callRoute(changePair, "", { boardId: BOARD, pairId }, { method: "PATCH", body: { version: await boardVersion(), intent: "match" } })).status);
    ok((await callRoute(removePair, `/api/boards/${BOARD}/pairs/${pairId}?version=${await boardVersion()}`, { boardId: BOARD, pairId }, { method: "DELETE" })).status);
    const ids = ((await callRoute(getBoard, "", { boardId: BOARD })).body as { items: { id: string }[] }).items.map((i) => i.id);
    ok((await callRoute(reorder, "", { boardId: BOARD }, { method: "POST", body: { version: await boardVersion(), itemIds: [...ids].reverse() } })).status);
    ok((await callRoute(removeItem, `/api/boards/${BOARD}/items/${shelf}?version=${await boardVersion()}`, { boardId: BOARD, itemId: shelf }, { method: "DELETE" })).status);

    const [newest] = (await readActivityPage(STUDIO, demo.project, { kind: "boards" })).entries;
    expect(newest?.action).toBe("board.edits");
    expect(newest?.actorName).toBe("Rafe Lindqvist");
    expect(newest?.parts.map((p) => p.action)).toEqual([
      "board.item-added", "board.item-changed", "board.item-changed", "board.item-changed", "board.pair-added", "board.pair-changed", "board.pair-removed", "board.items-reordered", "board.item-removed",
    ]);
    expect(describeAudit(newest?.action ?? "", newest?.detail ?? null, newest?.parts)).toBe(
      "added 1 swatch, moved 2 swatches, removed 1 swatch, paired two swatches, changed 1 pair, unpaired two swatches and changed which swatch sits on top on “Kitchen: warm limestone scheme”",
    );
    // One entry for nine saves.
    expect((await readActivityPage(STUDIO, demo.project)).total).toBe(before + 1);
  });

  it("picks, approvals, and variations asked, priced, declined, withdrawn and approved", async () => {
    actAs("client");
    const pendant = await viewOf(demo.pendant);
    const [opal, brass] = pendant.options;
    actAs("client");
    ok((await call(choose, { decisionId: demo.pendant }, { body: { optionId: opal?.id, comment: "Softer light" } })).status);
    const { version } = await viewOf(demo.pendant);
    actAs("client");
    ok((await call(approve, { decisionId: demo.pendant }, { body: { optionId: opal?.id, confirm: true, version } })).status);

    const ask = async (who: "client" | "client2", reason: string) => {
      actAs(who);
      const reply = await call(requestVariation, { decisionId: demo.pendant }, { body: { reason } });
      ok(reply.status);
      return String((reply.body.variation as { id: string } | undefined)?.id ?? (await viewOf(demo.pendant)).variations[0]?.id);
    };
    const priceIt = async (variationId: string) => {
      actAs("designer");
      ok((await call(price, { decisionId: demo.pendant, variationId }, { body: { priceDeltaCents: 60000, timeImpactDays: 0, optionId: brass?.id } })).status);
    };
    const first = await ask("client", "Brass after all?");
    await priceIt(first);
    actAs("client");
    ok((await call(decline, { decisionId: demo.pendant, variationId: first }, { body: {} })).status);
    const second = await ask("client2", "What about brass for the pair?");
    actAs("client2");
    ok((await call(withdraw, { decisionId: demo.pendant, variationId: second }, { body: {} })).status);
    const third = await ask("client2", "Brass, final answer.");
    await priceIt(third);
    const pricedAt = (await viewOf(demo.pendant)).variations.find((v) => v.id === third)?.pricedAt;
    actAs("client2");
    ok((await call(approveVariation, { decisionId: demo.pendant, variationId: third }, { body: { confirm: true, pricedAt } })).status);

    const log = await readAll({ kind: "variations" });
    const forPendant = log.filter((e) => (e.detail as { decisionId?: string } | null)?.decisionId === demo.pendant).reverse();
    expect(forPendant.map((e) => [e.action, e.actorName])).toEqual([
      ["variation.requested", "Noor Haddad"],
      ["variation.priced", "Rafe Lindqvist"],
      ["variation.declined", "Noor Haddad"],
      ["variation.requested", "Callum Haddad"],
      ["variation.withdrawn", "Callum Haddad"],
      ["variation.requested", "Callum Haddad"],
      ["variation.priced", "Rafe Lindqvist"],
      ["variation.approved", "Callum Haddad"],
    ]);
    // True times: the log's time of the approval is the variation's decided time, to the millisecond.
    const approved = (await viewOf(demo.pendant)).variations.find((v) => v.id === third);
    expect(forPendant.at(-1)?.at.toISOString()).toBe(approved?.decidedAt);
    const picks = await readAll({ kind: "picks" });
    expect(picks[0]).toMatchObject({ action: "option.chosen", actorName: "Noor Haddad" });
    const approvals = await readAll({ kind: "approvals" });
    expect(approvals[0]).toMatchObject({ action: "decision.approved", actorName: "Noor Haddad", detail: expect.objectContaining({ title: "Pendants over the island" }) });
    expect(approvals[0]?.at.toISOString()).toBe((await viewOf(demo.pendant)).approvals.find((a) => a.variationId === null)?.at);
  });

  it("revisions issued, acknowledgements and order dates", async () => {
    actAs("designer");
    const issued = await call(issue, { projectId: demo.project }, { body: {} });
    ok(issued.status);
    const revisionId = String(issued.body.id);
    actAs("stone");
    ok((await call(acknowledge, { revisionId }, { body: {} })).status);
    const lines = (await call(getRevision, { revisionId })).body.lines as { id: string; item: string }[];
    const laundry = lines.find((l) => l.item === "Laundry benchtop");
    actAs("stone");
    ok((await call(patchLine, { revisionId, lineId: laundry?.id ?? "" }, { method: "PATCH", body: { orderedOn: "2026-12-01" } })).status);
    const [order] = (await readActivityPage(STUDIO, demo.project, { kind: "suppliers" })).entries;
    expect(order).toMatchObject({ action: "line.order-dates", actorName: "Ridgeline Stoneworks orders desk", detail: expect.objectContaining({ letter: "B", item: "Laundry benchtop", orderedOn: "2026-12-01" }) });
    const [ack] = (await readActivityPage(STUDIO, demo.project, { kind: "suppliers", actorId: "demo-user-stone" })).entries.filter((e) => e.action === "revision.acknowledged");
    expect(ack?.detail).toMatchObject({ letter: "B" });
    const [rev] = (await readActivityPage(STUDIO, demo.project, { kind: "specification" })).entries;
    expect(rev).toMatchObject({ action: "revision.issued", actorName: "Rafe Lindqvist", detail: { letter: "B" } });
  });
});

describe("filters and pages", () => {
  it("filters by kind: each entry belongs to its kind, and the kinds together are the whole log", async () => {
    const all = await readAll();
    let covered = 0;
    for (const [kind, def] of Object.entries(activityKinds)) {
      const entries = await readAll({ kind: kind as keyof typeof activityKinds });
      for (const e of entries) {
        const actions = e.action === "board.edits" ? e.parts.map((p) => p.action) : [e.action];
        for (const a of actions) expect((def.actions as readonly string[]).includes(a) || def.prefixes.some((p) => a.startsWith(p)), `${a} in ${kind}`).toBe(true);
      }
      covered += entries.length;
    }
    expect(covered).toBe(all.length);
  });

  it("filters by person, and lists the people who did something", async () => {
    const people = await listActivityPeople(STUDIO, demo.project);
    expect(people.map((p) => p.name)).toEqual(expect.arrayContaining(["Noor Haddad", "Callum Haddad", "Rafe Lindqvist", "Ridgeline Stoneworks orders desk"]));
    const callum = await readAll({ actorId: "demo-user-client2" });
    expect(callum.length).toBeGreaterThan(3);
    expect(callum.every((e) => e.actorId === "demo-user-client2")).toBe(true);
  });

  it("pages 50 at a time, newest first, with nothing lost or repeated", async () => {
    // Enough picks with notes to need a second page.
    actAs("client");
    const splash = await viewOf(demo.splashback);
    for (let i = 0; i < 25; i++) {
      actAs("client");
      ok((await call(choose, { decisionId: demo.splashback }, { body: { optionId: splash.options[i % 2]?.id, comment: `Thinking it over, ${i + 1}` } })).status);
    }
    const first = await readActivityPage(STUDIO, demo.project, { page: 1 });
    expect(first.total).toBeGreaterThan(ACTIVITY_PAGE_SIZE);
    expect(first.entries).toHaveLength(ACTIVITY_PAGE_SIZE);
    expect(first.pageCount).toBe(Math.ceil(first.total / ACTIVITY_PAGE_SIZE));
    const second = await readActivityPage(STUDIO, demo.project, { page: 2 });
    expect(second.entries).toHaveLength(first.total - ACTIVITY_PAGE_SIZE);
    const keys = [...first.entries, ...second.entries].map((e) => e.key);
    expect(new Set(keys).size).toBe(first.total);
    expect(first.entries.at(-1)?.at.getTime()).toBeGreaterThanOrEqual(second.entries[0]?.at.getTime() ?? 0);
    const past = await readActivityPage(STUDIO, demo.project, { page: 99 });
    expect(past.entries).toEqual([]);
    expect(past.total).toBe(first.total);
  });
});
