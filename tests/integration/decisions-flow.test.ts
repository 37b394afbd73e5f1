import { describe, expect, it } from "vitest";
import { POST as approve } from "@/app/api/decisions/[decisionId]/approve/route";
import { POST as choose } from "@/app/api/decisions/[decisionId]/choice/route";
import { GET as getDecision, PATCH as patchDecision } from "@/app/api/decisions/[decisionId]/route";
import { POST as send } from "@/app/api/decisions/[decisionId]/send/route";
import { POST as approveVariation } from "@/app/api/decisions/[decisionId]/variations/[variationId]/approve/route";
import { POST as price } from "@/app/api/decisions/[decisionId]/variations/[variationId]/price/route";
import { POST as requestVariation } from "@/app/api/decisions/[decisionId]/variations/route";
import { POST as createDecision } from "@/app/api/projects/[projectId]/decisions/route";
import { listAuditForProject } from "@/db/queries/audit";
import { waitForMail } from "@/lib/mail/caught";
import type { DecisionView } from "@/lib/decisions/types";
import { call, demo, newDecisionBody } from "@/tests/support/decision-calls";
import { actAs } from "@/tests/support/session";

const mailDir = process.env.MAIL_CATCHER_DIR ?? "";
const mail = (to: string, subjectIncludes: string, after: Date) => waitForMail(mailDir, { to, subjectIncludes, after, timeoutMs: 5000 });
const asView = (body: unknown) => body as DecisionView;

async function viewAs(persona: "designer" | "client" | "client2", decisionId: string) {
  actAs(persona);
  const reply = await call(getDecision, { decisionId });
  expect(reply.status).toBe(200);
  return asView(reply.body);
}

describe("a decision from first e-mail to an approved variation", () => {
  let id = "";
  const started = new Date(Date.now() - 1000);

  it("the designer opens a decision and both clients are e-mailed a link straight to it", async () => {
    actAs("designer");
    const reply = await call(createDecision, { projectId: demo.project }, { body: newDecisionBody() });
    expect(reply.status).toBe(201);
    id = asView(reply.body).id;
    for (const to of ["client@demo.example", "client2@demo.example"]) {
      const message = await mail(to, "A decision is waiting for you: Open shelf timber", started);
      expect(message.links).toContain(`http://mottle.test/client/decisions/${id}`);
    }
  });

  it("“Send to client” e-mails them again", async () => {
    const before = new Date();
    actAs("owner");
    expect((await call(send, { decisionId: id }, { body: {} })).status).toBe(200);
    expect((await mail("client2@demo.example", "A decision is waiting for you", before)).links).toContain(`http://mottle.test/client/decisions/${id}`);
  });

  it("the client sees prices against the allowance, the running budget and checks", async () => {
    const view = await viewAs("client", id);
    expect(view.options.map((o) => [o.label, o.comparison.differenceCents, o.comparison.direction])).toEqual([
      ["Natural oak", -22000, "under"],
      ["Walnut", 14000, "over"],
    ]);
    expect(view.options[0]?.lines[0]).toMatchObject({ finishName: "Natural Oak Veneer", productCode: "TJ-VN-201", unit: "m²" });
    expect(view.options[0]?.lines[0]?.hex).toMatch(/^#[0-9a-f]{6}$/);
    expect(view.budget.allowanceCents).toBeGreaterThan(0);
    expect(view.budget.counts.open).toBeGreaterThan(0);
    expect(view.specNeedsRevision).toBe(false);
  });

  it("choosing e-mails the studio; the other client may change their mind", async () => {
    const before = new Date();
    actAs("client");
    expect((await call(choose, { decisionId: id }, { body: { optionId: asView((await viewAs("client", id))).options[1]?.id, comment: "Love the walnut" } })).status).toBe(200);
    for (const to of ["owner@demo.example", "designer@demo.example"]) {
      const message = await mail(to, "Noor Haddad chose Walnut for Open shelf timber", before);
      expect(message.links).toContain(`http://mottle.test/studio/projects/${demo.project}/decisions/${id}`);
      expect(message.text).toMatch(/isn.t approved yet/);
    }
    const oak = (await viewAs("client2", id)).options[0]?.id;
    actAs("client2");
    expect((await call(choose, { decisionId: id }, { body: { optionId: oak } })).status).toBe(200);
    const view = await viewAs("client", id);
    expect(view.status).toBe("chosen");
    expect(view.currentChoice).toMatchObject({ optionId: oak, by: { name: "Callum Haddad" } });
    expect(view.choices.map((c) => c.comment)).toEqual([null, "Love the walnut"]);
  });

  it("the designer may still edit it, keeping the picks of options that stay", async () => {
    const view = await viewAs("designer", id);
    const body = {
      room: view.roomId,
      title: view.title,
      allowanceCents: view.allowanceCents,
      dueDate: view.dueDate,
      version: view.version,
      options: view.options.map((o, i) => ({
        id: o.id,
        label: o.label,
        priceCents: i === 0 ? 101500 : o.priceCents,
        notes: o.notes,
        lines: o.lines.map((l) => ({ finishId: l.finishId, quantity: l.quantity, unit: l.unit })),
      })),
    };
    const reply = await call(patchDecision, { decisionId: id }, { method: "PATCH", body });
    expect(reply.status).toBe(200);
    const after = asView(reply.body);
    expect(after.options[0]?.priceCents).toBe(101500);
    expect(after.choices).toHaveLength(2);
    expect(after.version).toBe(view.version + 1);
  });

  it("approval records a snapshot of exactly what was shown, locks, and e-mails the studio", async () => {
    const before = new Date();
    const shown = await viewAs("client2", id);
    const oak = shown.options[0];
    actAs("client2");
    const reply = await call(approve, { decisionId: id }, { body: { optionId: oak?.id, confirm: true, version: shown.version } });
    expect(reply.status).toBe(200);
    const view = asView(reply.body);
    expect(view.status).toBe("locked");
    expect(view.lockedOptionId).toBe(oak?.id);
    expect(view.approvals).toHaveLength(1);
    expect(view.approvals[0]?.by.name).toBe("Callum Haddad");
    expect(view.approvals[0]?.snapshot).toMatchObject({
      option: "Natural oak",
      priceCents: 101500,
      allowanceCents: 120000,
      differenceCents: -18500,
      lines: [{ finish: "Natural Oak Veneer", code: "TJ-VN-201", colour: oak?.lines[0]?.hex, lrv: oak?.lines[0]?.lrv, quantity: 1.2, unit: "m²" }],
      checks: { source: "none" },
    });
    const message = await mail("designer@demo.example", "Callum Haddad approved Natural oak", before);
    expect(message.links).toContain(`http://mottle.test/studio/projects/${demo.project}/decisions/${id}`);
    // The other client sees who approved.
    expect((await viewAs("client", id)).approvals[0]?.by.name).toBe("Callum Haddad");
  });

  let variationId = "";
  it("a client asks for a variation; the designers are e-mailed a link to price it", async () => {
    const before = new Date();
    actAs("client");
    const reply = await call(requestVariation, { decisionId: id }, { body: { reason: "We'd rather have the walnut after all." } });
    expect(reply.status).toBe(201);
    variationId = (reply.body.variation as { id: string }).id;
    const message = await mail("designer@demo.example", "Variation requested: Open shelf timber", before);
    expect(message.links).toContain(`http://mottle.test/studio/projects/${demo.project}/decisions/${id}/variations/${variationId}`);
  });

  it("the designer prices it including GST with the time impact; the clients are e-mailed", async () => {
    const before = new Date();
    const walnut = (await viewAs("designer", id)).options[1]?.id;
    actAs("designer");
    const reply = await call(price, { decisionId: id, variationId }, { body: { priceDeltaCents: 38500, timeImpactDays: 10, optionId: walnut } });
    expect(reply.status).toBe(200);
    for (const to of ["client@demo.example", "client2@demo.example"]) {
      const message = await mail(to, "Variation priced: Open shelf timber", before);
      expect(message.links).toContain(`http://mottle.test/client/decisions/${id}/variations/${variationId}`);
    }
    // Still the first option until the client approves.
    expect((await viewAs("client", id)).lockedOptionId).not.toBe(walnut);
  });

  it("the client approves the variation: the decision carries the new option, the first approval stays readable", async () => {
    const before = new Date();
    const shown = await viewAs("client", id);
    const variation = shown.variations.find((v) => v.id === variationId);
    expect(variation).toMatchObject({ status: "priced", priceDeltaCents: 38500, timeImpactDays: 10, optionLabel: "Walnut" });
    actAs("client");
    const reply = await call(approveVariation, { decisionId: id, variationId }, { body: { confirm: true, pricedAt: variation?.pricedAt } });
    expect(reply.status).toBe(200);
    const view = await viewAs("designer", id);
    expect(view.lockedOptionId).toBe(view.options[1]?.id);
    expect(view.approvals.map((a) => [a.optionLabel, a.variationId])).toEqual([
      ["Natural oak", null],
      ["Walnut", variationId],
    ]);
    expect(view.approvals[0]?.snapshot).toMatchObject({ option: "Natural oak", priceCents: 101500 });
    expect(view.approvals[1]?.snapshot).toMatchObject({ kind: "variation", fromOption: "Natural oak", option: "Walnut", priceDeltaCents: 38500, priceIncludesGst: true, timeImpactDays: 10 });
    // Revision A of the demo specification was issued before this change.
    expect(view.specNeedsRevision).toBe(true);
    const message = await mail("designer@demo.example", "Variation approved: Open shelf timber", before);
    expect(message.links).toContain(`http://mottle.test/studio/projects/${demo.project}/decisions/${id}/variations/${variationId}`);
  });

  it("the running total counts the first approved price plus the variation", async () => {
    const view = await viewAs("client", id);
    const row = view.budget;
    expect(row.approvedCents).toBeGreaterThanOrEqual(101500 + 38500);
    expect(row.runningCents).toBe(row.approvedCents + row.pickedCents + row.openAllowanceCents);
  });

  it("every step is in the audit log, in order", async () => {
    const log = (await listAuditForProject("demo-studio-fernleaf", demo.project, 10_000))
      .filter((e) => e.entityId === id || (e.detail as { decisionId?: string } | null)?.decisionId === id)
      .reverse()
      .map((e) => e.action);
    expect(log).toEqual([
      "decision.created",
      "decision.sent",
      "option.chosen",
      "option.chosen",
      "decision.updated",
      "decision.approved",
      "variation.requested",
      "variation.priced",
      "variation.approved",
    ]);
  });
});

describe("a variation that brings a new option", () => {
  it("adds the option through the variation, marked as added by it, and carries it once approved", async () => {
    actAs("client2");
    const asked = await call(requestVariation, { decisionId: demo.laundry }, { body: { reason: "A white top with a thicker edge instead" } });
    expect(asked.status).toBe(201);
    const variationId = (asked.body.variation as { id: string }).id;
    actAs("designer");
    const newOption = { label: "Snow composite, 40 mm edge", priceCents: 265000, notes: "Mitred edge", lines: [{ finishId: demo.finish("porcelain-chalk"), quantity: 2, unit: "m²", location: "Laundry" }] };
    expect((await call(price, { decisionId: demo.laundry, variationId }, { body: { priceDeltaCents: 49000, timeImpactDays: 7, newOption } })).status).toBe(200);
    const priced = await viewAs("client2", demo.laundry);
    const added = priced.options.find((o) => o.label === newOption.label);
    expect(added?.addedByVariation).toBe(true);
    expect(priced.variations.find((v) => v.id === variationId)?.optionId).toBe(added?.id);
    actAs("client");
    expect((await call(approveVariation, { decisionId: demo.laundry, variationId }, { body: { confirm: true } })).status).toBe(200);
    const after = await viewAs("designer", demo.laundry);
    expect(after.lockedOptionId).toBe(added?.id);
    // Three approvals now: the first, the demo's earlier variation, and this one; none was changed.
    expect(after.approvals.map((a) => a.variationId)).toEqual([null, "demo-variation-lb", variationId]);
  });
});
