import { describe, expect, it } from "vitest";
import { POST as approve } from "@/app/api/decisions/[decisionId]/approve/route";
import { GET as getDecision, PATCH as patchDecision } from "@/app/api/decisions/[decisionId]/route";
import { POST as createDecision } from "@/app/api/projects/[projectId]/decisions/route";
import { PATCH as patchSettings } from "@/app/api/studio/settings/route";
import { call, demo, newDecisionBody } from "@/tests/support/decision-calls";
import { countRows } from "@/tests/support/library";
import { actAs } from "@/tests/support/session";

type Option = { id: string; label: string; priceCents: number; priceDetail: { overridden: boolean; build: { costCents: number; markupCents: number; taxCents: number; totalCents: number } } | null };
type View = { id: string; version: number; status: string; taxBasisPoints: number; options: Option[] };

// Demo finishes (invented): Natural Oak and Walnut Veneer cost the studio $420.00 per m², excluding tax.
const oak = { finishId: demo.finish("cab-oak-natural"), quantity: 1.2, unit: "m²" };
const walnut = { finishId: demo.finish("cab-walnut"), quantity: 1.2, unit: "m²" };
// 1.2 m² × $420.00 = $504.00 cost. GST 10 %: A New Tax System (Goods and Services Tax) Act 1999 s 9-70.
const COST = 50400;
const NO_MARKUP_PRICE = 55440; // 504.00 × 1.10
const MARKUP_20_PRICE = 66528; // 504.00 × 1.20 × 1.10 (markup on cost: common practice)

async function create(options: unknown[]): Promise<View> {
  actAs("designer");
  const reply = await call(createDecision, { projectId: demo.project }, { body: newDecisionBody({ notify: false, options }) });
  expect(reply.status).toBe(201);
  return reply.body as unknown as View;
}
async function view(id: string, persona: "designer" | "client" = "designer"): Promise<View> {
  actAs(persona);
  return (await call(getDecision, { decisionId: id })).body as unknown as View;
}
async function setMarkup(markupBasisPoints: number) {
  actAs("owner");
  const reply = await call(patchSettings, {}, { method: "PATCH", body: { markupBasisPoints, taxBasisPoints: 1000 } });
  expect(reply.status).toBe(200);
  return reply.body.repriced as { options: number; decisions: number };
}

describe("an option's price is worked out from its lines", () => {
  it("a body without prices gets the built price, shown built to the designer and as a total to the client", async () => {
    const created = await create([{ label: "Oak", lines: [oak] }, { label: "Walnut", lines: [walnut] }]);
    expect(created.options.map((o) => o.priceCents)).toEqual([NO_MARKUP_PRICE, NO_MARKUP_PRICE]);
    expect(created.options[0]?.priceDetail).toMatchObject({ overridden: false, build: { costCents: COST, markupCents: 0, taxCents: 5040, totalCents: NO_MARKUP_PRICE } });
    expect(await countRows("decision_option", `decision_id = '${created.id}' and price_overridden = 0 and price_cents = ${NO_MARKUP_PRICE}`)).toBe(2);

    const client = await view(created.id, "client");
    expect(client.taxBasisPoints).toBe(1000);
    expect(client.options.map((o) => [o.priceCents, o.priceDetail])).toEqual([[NO_MARKUP_PRICE, null], [NO_MARKUP_PRICE, null]]);
    // The studio's cost and markup never reach a client.
    expect(JSON.stringify(client)).not.toMatch(/costCents|markup/i);
  });

  it("a price sent with priceOverridden (or alone, as before) is kept and marked set by hand", async () => {
    const created = await create([{ label: "Oak", priceCents: 98000, priceOverridden: true, lines: [oak] }, { label: "Walnut", priceCents: 134000, lines: [walnut] }]);
    expect(created.options.map((o) => [o.priceCents, o.priceDetail?.overridden])).toEqual([[98000, true], [134000, true]]);
    // What it would be, worked out, is still shown beside it.
    expect(created.options[0]?.priceDetail?.build.totalCents).toBe(NO_MARKUP_PRICE);
  });

  it("priceOverridden: false builds the price and ignores a price sent with it", async () => {
    const created = await create([{ label: "Oak", priceCents: 1, priceOverridden: false, lines: [oak] }, { label: "Walnut", lines: [walnut] }]);
    expect(created.options[0]).toMatchObject({ priceCents: NO_MARKUP_PRICE, priceDetail: { overridden: false } });
  });

  it("priceOverridden: true without a price is 400 on that field, writing nothing", async () => {
    const before = await countRows("decision");
    actAs("designer");
    const reply = await call(createDecision, { projectId: demo.project }, { body: newDecisionBody({ options: [{ label: "Oak", priceOverridden: true, lines: [oak] }, { label: "Walnut", lines: [walnut] }] }) });
    expect(reply.status).toBe(400);
    expect(Object.keys(reply.body.fieldErrors as object)).toEqual(["options.0.priceCents"]);
    expect(await countRows("decision")).toBe(before);
  });
});

describe("a change of markup: open decisions follow, overrides stay, locked decisions never change", () => {
  it("re-prices built options on open decisions only", async () => {
    const open = await create([{ label: "Oak", lines: [oak] }, { label: "Walnut by hand", priceCents: 134000, priceOverridden: true, lines: [walnut] }]);
    const locked = await create([{ label: "Oak", lines: [oak] }, { label: "Walnut", lines: [walnut] }]);
    const lockedOption = locked.options[0]?.id ?? "";
    actAs("client");
    expect((await call(approve, { decisionId: locked.id }, { body: { optionId: lockedOption, confirm: true } })).status).toBe(200);

    const repriced = await setMarkup(2000);
    expect(repriced.options).toBeGreaterThanOrEqual(1);

    const openAfter = await view(open.id);
    expect(openAfter.options.map((o) => o.priceCents)).toEqual([MARKUP_20_PRICE, 134000]);
    expect(openAfter.options[0]?.priceDetail?.build).toMatchObject({ costCents: COST, markupCents: 10080, taxCents: 6048, totalCents: MARKUP_20_PRICE });
    expect(openAfter.options[1]?.priceDetail?.overridden).toBe(true);
    // A new version: a client approving from a page loaded before the change is asked to look again.
    expect(openAfter.version).toBe(open.version + 1);
    expect(await countRows("audit_log", `action = 'decision.repriced' and entity_id = '${open.id}'`)).toBe(1);

    const lockedAfter = await view(locked.id);
    expect(lockedAfter.status).toBe("locked");
    expect(lockedAfter.options.map((o) => o.priceCents)).toEqual([NO_MARKUP_PRICE, NO_MARKUP_PRICE]);
    expect(await countRows("audit_log", `action = 'decision.repriced' and entity_id = '${locked.id}'`)).toBe(0);

    // New options, and edited ones sent without a price, are built with the new markup.
    const fresh = await create([{ label: "Oak", lines: [oak] }, { label: "Walnut", lines: [walnut] }]);
    expect(fresh.options.map((o) => o.priceCents)).toEqual([MARKUP_20_PRICE, MARKUP_20_PRICE]);
    await setMarkup(0);
  });

  it("an edit that sends no price rebuilds it; one that sends a price by hand keeps it", async () => {
    const created = await create([{ label: "Oak", lines: [oak] }, { label: "Walnut", lines: [walnut] }]);
    const [a, b] = created.options;
    actAs("designer");
    const reply = await call(patchDecision, { decisionId: created.id }, {
      method: "PATCH",
      body: newDecisionBody({
        version: created.version,
        options: [{ id: a?.id, label: "Oak, more", lines: [{ ...oak, quantity: 2.4 }] }, { id: b?.id, label: "Walnut", priceCents: 120000, priceOverridden: true, lines: [walnut] }],
      }),
    });
    expect(reply.status).toBe(200);
    const edited = reply.body as unknown as View;
    // 2.4 m² × $420.00 = $1,008.00 × 1.10 = $1,108.80.
    expect(edited.options.map((o) => [o.priceCents, o.priceDetail?.overridden])).toEqual([[110880, false], [120000, true]]);
  });

  it("never re-prices a price that no longer matches its lines (typed before prices were built)", async () => {
    const created = await create([{ label: "Oak", lines: [oak] }, { label: "Walnut", lines: [walnut] }]);
    const target = created.options[0]?.id ?? "";
    const { runSql } = await import("@/tests/support/library");
    await runSql("update decision_option set price_cents = 70000 where id = ?", [target]);
    await setMarkup(2000);
    expect((await view(created.id)).options.map((o) => o.priceCents)).toEqual([70000, MARKUP_20_PRICE]);
    await setMarkup(0);
  });
});

describe("the demo's typed prices", () => {
  it("are marked set by hand, since none equals its lines' worked-out price", async () => {
    expect(await countRows("decision_option", "id like 'demo-option-%' and price_overridden = 0")).toBe(0);
    expect(await countRows("decision_option", "id like 'demo-option-%' and price_overridden = 1")).toBeGreaterThan(10);
  });
});
