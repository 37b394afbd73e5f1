import { describe, expect, it } from "vitest";
import { POST as approve } from "@/app/api/decisions/[decisionId]/approve/route";
import { POST as choose } from "@/app/api/decisions/[decisionId]/choice/route";
import { GET as getDecision } from "@/app/api/decisions/[decisionId]/route";
import { POST as approveVariation } from "@/app/api/decisions/[decisionId]/variations/[variationId]/approve/route";
import { POST as price } from "@/app/api/decisions/[decisionId]/variations/[variationId]/price/route";
import { GET as listDecisions, POST as createDecision } from "@/app/api/projects/[projectId]/decisions/route";
import { listAuditForProject } from "@/db/queries/audit";
import { call, dayFromToday, demo, newDecisionBody } from "@/tests/support/decision-calls";
import { actAs } from "@/tests/support/session";

const count = async () => {
  actAs("designer");
  return ((await call(listDecisions, { projectId: demo.project })).body.items as unknown[]).length;
};
const audits = async () => (await listAuditForProject("demo-studio-fernleaf", demo.project, 10_000)).length;
const option = (o: Record<string, unknown>) => ({ label: "Option", priceCents: 1000, lines: [{ finishId: demo.finish("cab-oak-natural"), quantity: 1, unit: "m²" }], ...o });

describe("bad input for a new decision: 400 with field errors, nothing written", () => {
  it.each<[string, Record<string, unknown>, string]>([
    ["a negative price", { options: [option({ priceCents: -100 }), option({})] }, "options.0.priceCents"],
    ["a price that isn't whole cents", { options: [option({}), option({ priceCents: 12.5 })] }, "options.1.priceCents"],
    ["a price given as text", { options: [option({ priceCents: "1000" }), option({})] }, "options.0.priceCents"],
    ["a negative allowance", { allowanceCents: -1 }, "allowanceCents"],
    ["a due date in the past", { dueDate: dayFromToday(-1) }, "dueDate"],
    ["a date that doesn't exist", { dueDate: "2027-02-30" }, "dueDate"],
    ["one option only", { options: [option({})] }, "options"],
    ["five options", { options: [1, 2, 3, 4, 5].map(() => option({})) }, "options"],
    ["an option with no finish", { options: [option({ lines: [] }), option({})] }, "options.0.lines"],
    ["a zero quantity", { options: [option({ lines: [{ finishId: demo.finish("cab-walnut"), quantity: 0, unit: "m²" }] }), option({})] }, "options.0.lines.0.quantity"],
    ["no title", { title: "" }, "title"],
    ["another studio's finish", { options: [option({}), option({ lines: [{ finishId: demo.finish("northwall-limestone"), quantity: 1, unit: "m²" }] })] }, "options.1.lines.0.finishId"],
    ["a finish that doesn't exist", { options: [option({ lines: [{ finishId: "no-such-finish", quantity: 1, unit: "m²" }] }), option({})] }, "options.0.lines.0.finishId"],
    ["a room of another project", { room: "demo-room-quarry-kitchen" }, "room"],
    ["a board of another project", { options: [option({ boardId: "no-such-board" }), option({})] }, "options.0.boardId"],
  ])("%s", async (_what, overrides, field) => {
    const [before, auditsBefore] = [await count(), await audits()];
    actAs("designer");
    const reply = await call(createDecision, { projectId: demo.project }, { body: newDecisionBody(overrides) });
    expect(reply.status).toBe(400);
    expect(Object.keys(reply.body.fieldErrors as object)).toContain(field);
    expect(await count()).toBe(before);
    expect(await audits()).toBe(auditsBefore);
  });

  it("a body that isn't JSON", async () => {
    actAs("designer");
    const reply = await call(createDecision, { projectId: demo.project }, { raw: "{not json" });
    expect(reply.status).toBe(400);
    expect(reply.body.error).toMatch(/JSON/);
  });

  it("accepts the room by name as well as by id, and counts the new decision's order-by date", async () => {
    actAs("designer");
    const reply = await call(createDecision, { projectId: demo.project }, { body: newDecisionBody({ room: "laundry" }) });
    expect(reply.status).toBe(201);
    expect(reply.body.roomName).toBe("Laundry");
    // Install 2027-04-12 minus the joinery's 56-day lead time (demo library) = 2027-02-15.
    expect(reply.body.orderBy).toMatchObject({ date: "2027-02-15", leadTimeDays: 56 });
  });
});

describe("bad input for a client's choice and approval", () => {
  it("a choice of an option from another decision is 400 and writes nothing", async () => {
    actAs("client");
    const before = ((await call(getDecision, { decisionId: demo.pendant })).body.choices as unknown[]).length;
    const reply = await call(choose, { decisionId: demo.pendant }, { body: { optionId: demo.option("ks-green") } });
    expect(reply.status).toBe(400);
    expect(reply.body.fieldErrors).toHaveProperty("optionId");
    expect(((await call(getDecision, { decisionId: demo.pendant })).body.choices as unknown[]).length).toBe(before);
  });

  it.each<[string, Record<string, unknown>]>([
    ["no confirm", { optionId: demo.option("kp-opal") }],
    ["confirm false", { optionId: demo.option("kp-opal"), confirm: false }],
    ["confirm as the text 'true'", { optionId: demo.option("kp-opal"), confirm: "true" }],
    ["an option from another decision", { optionId: demo.option("ks-green"), confirm: true }],
  ])("an approval with %s is 400 and leaves the decision open", async (_what, body) => {
    actAs("client");
    const reply = await call(approve, { decisionId: demo.pendant }, { body });
    expect(reply.status).toBe(400);
    const view = (await call(getDecision, { decisionId: demo.pendant })).body;
    expect(view.status).not.toBe("locked");
    expect(view.approvals).toEqual([]);
  });
});

describe("bad input for a variation", () => {
  const kb = { decisionId: demo.benchtop, variationId: "demo-variation-kb" };

  it.each<[string, Record<string, unknown>, string]>([
    ["a price difference that isn't whole cents", { priceDeltaCents: 10.5, timeImpactDays: 0 }, "priceDeltaCents"],
    ["no time impact", { priceDeltaCents: 1000 }, "timeImpactDays"],
    ["an option of another decision", { priceDeltaCents: 1000, timeImpactDays: 0, optionId: demo.option("kp-opal") }, "optionId"],
    ["a new option with another studio's finish", { priceDeltaCents: 1000, timeImpactDays: 0, newOption: option({ lines: [{ finishId: demo.finish("northwall-limestone"), quantity: 1, unit: "m²" }] }) }, "newOption.lines.0.finishId"],
  ])("pricing with %s is 400", async (_what, body, field) => {
    actAs("designer");
    const reply = await call(price, kb, { body });
    expect(reply.status).toBe(400);
    expect(Object.keys(reply.body.fieldErrors as object)).toContain(field);
  });

  it("a credit (negative difference) is a valid price, and approving needs confirm: true", async () => {
    actAs("designer");
    expect((await call(price, kb, { body: { priceDeltaCents: -25000, timeImpactDays: 0 } })).status).toBe(200);
    actAs("client");
    expect((await call(approveVariation, kb, { body: {} })).status).toBe(400);
    expect((await call(approveVariation, kb, { body: { confirm: "yes" } })).status).toBe(400);
    const view = (await call(getDecision, { decisionId: demo.benchtop })).body as { variations: { id: string; status: string }[] };
    expect(view.variations.find((v) => v.id === kb.variationId)?.status).toBe("priced");
  });
});
