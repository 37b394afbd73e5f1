import { describe, expect, it } from "vitest";
import { GET as listDecisions } from "@/app/api/projects/[projectId]/decisions/route";
import { GET as getDecision } from "@/app/api/decisions/[decisionId]/route";
import { getSpecificationView } from "@/db/queries/spec";
import { getActor } from "@/db/queries/users";
import { decisionSpecs } from "@/db/seed/demo-decisions";
import { demoFinishes } from "@/db/seed/demo-finishes";
import { readLockFacts } from "@/lib/decisions/lock-facts";
import { shiftDay } from "@/lib/decisions/order-by";
import type { DecisionListItem, DecisionView } from "@/lib/decisions/types";
import { call, demo } from "@/tests/support/decision-calls";
import { queryRows } from "@/tests/support/db-read";
import { actAs, type Persona } from "@/tests/support/session";

const INSTALL = "2027-04-12";

async function sqlRows<T>(sql: string, args: (string | number)[] = []): Promise<T[]> {
  return (await queryRows(sql, args)).map((r) => ({ ...r }) as unknown as T);
}

async function viewAs(persona: Persona, decisionId: string): Promise<DecisionView> {
  actAs(persona);
  const reply = await call(getDecision, { decisionId });
  expect(reply.status).toBe(200);
  return reply.body as unknown as DecisionView;
}

const leadOf = (finishKey: string) => demoFinishes.find((f) => f.key === finishKey)?.leadDays ?? Number.NaN;
/** Install minus the slowest lead time of these options' finishes (common practice: order-by = install − lead time; DOMAIN.md). */
const expectedOrderBy = (optionKeys: string[]) => {
  const leads = decisionSpecs.flatMap((d) => d.options).filter((o) => optionKeys.includes(o.key)).flatMap((o) => o.lines.map(([f]) => leadOf(f)));
  return shiftDay(INSTALL, -Math.max(...leads));
};

describe("the demo's laundry benchtop tells the truth (locked, then varied)", () => {
  it("credits the carried option to the variation's approver at its time, and the first approval to its own", async () => {
    for (const persona of ["designer", "client"] as const) {
      const view = await viewAs(persona, demo.laundry);
      expect(view.status).toBe("locked");
      expect(view.lockedOptionId).toBe(demo.option("lb-chalk"));
      const { carrying, first } = readLockFacts(view.approvals, view.lockedOptionId);
      expect(carrying).toMatchObject({ optionId: demo.option("lb-chalk"), by: { name: "Callum Haddad" }, at: "2026-11-26T05:00:00.000Z", variationId: "demo-variation-lb" });
      expect(first).toMatchObject({ optionId: demo.option("lb-graphite"), by: { name: "Noor Haddad" }, at: "2026-11-18T03:25:00.000Z", variationId: null });
      // The lock is the first approval's moment, not another decision's.
      expect(view.lockedAt).toBe("2026-11-18T03:25:00.000Z");
    }
  });

  it("dates its variation in order: asked after the lock, priced after asked, approved after priced", async () => {
    const view = await viewAs("designer", demo.laundry);
    const [v] = view.variations;
    expect(v).toMatchObject({ status: "approved", requestedBy: { name: "Callum Haddad" }, pricedBy: { name: "Rafe Lindqvist" }, decidedBy: { name: "Callum Haddad" } });
    const asked = Date.parse(v?.requestedAt ?? "");
    const priced = v?.pricedAt ?? Number.NaN;
    const decided = Date.parse(v?.decidedAt ?? "");
    expect(asked).toBeGreaterThan(Date.parse(view.lockedAt ?? ""));
    expect(priced).toBeGreaterThan(asked);
    expect(decided).toBeGreaterThan(priced);
    // The approval record of the variation carries the variation's decided time exactly.
    expect(view.approvals.find((a) => a.variationId === v?.id)?.at).toBe(v?.decidedAt);
  });

  it("takes its order-by date from the option it carries, and the list and the specification agree", async () => {
    const view = await viewAs("designer", demo.laundry);
    // Chalk porcelain: 21 days. The laminate nobody chose (56 days) no longer sets the date.
    expect(view.orderBy).toEqual({ date: "2027-03-22", leadTimeDays: 21, finishName: "Chalk Porcelain Slab" });
    actAs("designer");
    const list = await call(listDecisions, { projectId: demo.project });
    const item = (list.body.items as DecisionListItem[]).find((i) => i.id === demo.laundry);
    expect(item?.orderBy).toEqual(view.orderBy);
    expect(item?.approvedBy).toBe("Callum Haddad");
    const actor = await getActor("demo-user-designer");
    if (!actor) throw new Error("no designer");
    const spec = await getSpecificationView(actor, demo.project);
    const line = spec.lines.find((l) => l.lineKey === `decision:${demo.laundry}`);
    expect(line?.finishName).toBe("Chalk Porcelain Slab");
    expect(line?.orderByDate).toBe(view.orderBy?.date);
  });
});

describe("every seeded decision state shows facts from its records", () => {
  it("open and chosen decisions take their order-by date from every option still offered", async () => {
    for (const d of decisionSpecs.filter((s) => s.status !== "locked")) {
      const view = await viewAs("designer", `demo-decision-${d.key}`);
      expect(view.status, d.key).toBe(d.status);
      expect(view.orderBy?.date, d.key).toBe(expectedOrderBy(d.options.map((o) => o.key)));
      expect(view.approvals, d.key).toEqual([]);
      expect(view.lockedAt, d.key).toBeNull();
    }
  });

  it("a chosen decision shows the latest pick, by whom and when, as the choice table holds it", async () => {
    const view = await viewAs("client", demo.cabinets);
    expect(view.currentChoice).toMatchObject({ optionId: demo.option("kc-oat"), by: { name: "Callum Haddad" }, at: "2026-11-28T08:30:00.000Z" });
    const rows = await sqlRows<{ user_id: string; created_at: number }>(`select user_id, created_at from choice where decision_id = ? order by created_at desc limit 1`, [demo.cabinets]);
    expect(rows[0]?.created_at).toBe(Date.parse(view.currentChoice?.at ?? ""));
  });

  it("the locked kitchen benchtop: approved by Noor when it locked, order-by from the limestone, an open variation asked after", async () => {
    const view = await viewAs("client", demo.benchtop);
    const { carrying, first } = readLockFacts(view.approvals, view.lockedOptionId);
    expect(carrying).toMatchObject({ optionId: demo.option("kb-limestone"), by: { name: "Noor Haddad" }, at: "2026-11-18T03:20:00.000Z" });
    expect(first).toBeNull();
    expect(view.lockedAt).toBe(carrying?.at);
    expect(view.orderBy).toMatchObject({ date: expectedOrderBy(["kb-limestone"]), finishName: "Saltbush Limestone" });
    const [open] = view.variations;
    expect(open).toMatchObject({ status: "requested", requestedBy: { name: "Noor Haddad" }, pricedBy: null, decidedBy: null });
    expect(Date.parse(open?.requestedAt ?? "")).toBeGreaterThan(Date.parse(view.lockedAt ?? ""));
    expect(Date.parse(open?.requestedAt ?? "")).toBeLessThan(Date.now());
  });

  it("every seeded record is in order: lock = first approval, revision A after the locks, acknowledgement and order after A", async () => {
    const times = await sqlRows<{ what: string; at: number }>(`
      select 'lock:' || id as what, locked_at as at from decision where locked_at is not null and id like 'demo-%'
      union all select 'approval:' || decision_id || ':' || coalesce(variation_id, 'first'), created_at from approval where id like 'demo-%'
      union all select 'revision', created_at from spec_revision where id = 'demo-revision-a'
      union all select 'ack', created_at from supplier_acknowledgement where id like 'demo-%'
      union all select 'order', updated_at from line_order where line_id like 'demo-%'`);
    const at = (what: string) => times.find((t) => t.what === what)?.at ?? Number.NaN;
    for (const key of ["kitchen-benchtop", "laundry-benchtop"]) {
      expect(at(`lock:demo-decision-${key}`), key).toBe(at(`approval:demo-decision-${key}:first`));
      expect(at("revision")).toBeGreaterThan(at(`lock:demo-decision-${key}`));
    }
    expect(at("ack")).toBeGreaterThan(at("revision"));
    expect(at("order")).toBeGreaterThan(at("ack"));
    expect(at("approval:demo-decision-laundry-benchtop:demo-variation-lb")).toBeGreaterThan(at("revision"));
  });
});
