import { describe, expect, it } from "vitest";
import { POST as requestVariation } from "@/app/api/decisions/[decisionId]/variations/route";
import { POST as approveVariation } from "@/app/api/decisions/[decisionId]/variations/[variationId]/approve/route";
import { POST as price } from "@/app/api/decisions/[decisionId]/variations/[variationId]/price/route";
import { GET as getDecision } from "@/app/api/decisions/[decisionId]/route";
import { POST as issue } from "@/app/api/projects/[projectId]/revisions/route";
import { POST as acknowledge } from "@/app/api/revisions/[revisionId]/acknowledge/route";
import { POST as confirmLine } from "@/app/api/revisions/[revisionId]/lines/[lineId]/confirmation/route";
import { PATCH as patchLine } from "@/app/api/revisions/[revisionId]/lines/[lineId]/route";
import { GET as getRevision } from "@/app/api/revisions/[revisionId]/route";
import { confirmLineAction } from "@/app/studio/projects/[projectId]/specification/revisions/[revisionId]/actions";
import { readActivityPage } from "@/db/queries/audit";
import { listChangedIssuedLines } from "@/db/queries/spec-revision-view";
import { getActor } from "@/db/queries/users";
import { idle } from "@/lib/actions/result";
import type { LineChange } from "@/lib/spec/line-change";
import { queryRows } from "@/tests/support/db-read";
import { actAsAny, call, project, revisionA, type SpecPersona } from "./spec-helpers";

type Line = { id: string; item: string; lineKey: string; change: LineChange | null };

const LAUNDRY_A = "demo-spec-line-a-6";
const BENCHTOP_A = "demo-spec-line-a-5";
const laundryDecision = "demo-decision-laundry-benchtop";

const linesAs = async (persona: SpecPersona, revisionId: string) => {
  actAsAny(persona);
  const res = await call(getRevision, { revisionId });
  expect(res.status).toBe(200);
  return res.body.lines as Line[];
};
const order = (revisionId: string, lineId: string, body: unknown = { orderedOn: "2026-12-01" }) => {
  actAsAny("stone");
  return call(patchLine, { revisionId, lineId }, { method: "PATCH", body });
};
const confirm = (persona: SpecPersona, lineId: string, body: unknown = { note: "Same slab size; the stone yard has it." }, revisionId = revisionA) => {
  actAsAny(persona);
  return call(confirmLine, { revisionId, lineId }, { method: "POST", body });
};
const form = (fields: Record<string, string>) => {
  const f = new FormData();
  for (const [k, v] of Object.entries(fields)) f.set(k, v);
  return f;
};

describe("a line an approved variation overtook (the demo's laundry benchtop in revision A)", () => {
  it("shows the supplier, on the line, that it changed and a new revision is coming", async () => {
    const lines = await linesAs("stone", revisionA);
    const laundry = lines.find((l) => l.id === LAUNDRY_A);
    expect(laundry?.change).toEqual({ state: "superseded", decisionTitle: "Laundry benchtop", variedAt: "2026-11-26T05:00:00.000Z" });
    // The kitchen benchtop has only a variation asked for, not approved: nothing changed yet.
    expect(lines.find((l) => l.id === BENCHTOP_A)?.change).toBeNull();
    // The studio's specification page lists it too.
    const actor = await getActor("demo-user-designer");
    if (!actor) throw new Error("no designer");
    const changed = await listChangedIssuedLines(actor, project);
    expect(changed?.lines.map((l) => [l.id, l.change.state])).toEqual([[LAUNDRY_A, "superseded"]]);
  });

  it("refuses an order on it with 409 and a plain reason, while other lines take orders", async () => {
    const refused = await order(revisionA, LAUNDRY_A);
    expect(refused.status).toBe(409);
    expect(refused.body.error).toMatch(/changed after revision A was issued: a variation to “Laundry benchtop” was approved on .*26 Nov 2026.*new revision is coming/);
    // Clearing dates is an order change too.
    expect((await order(revisionA, LAUNDRY_A, { orderedOn: null })).status).toBe(409);
    expect(await queryRows(`select 1 from line_order where line_id = ?`, [LAUNDRY_A])).toHaveLength(0);
    expect((await order(revisionA, BENCHTOP_A, { orderedOn: "2026-11-21", expectedOn: "2027-03-09" })).status).toBe(200);
  });

  it("lets only the project's designers confirm the issued line stands", async () => {
    for (const persona of ["client", "client2", "stone", "joinery"] as const) {
      expect((await confirm(persona, LAUNDRY_A)).status, persona).toBe(403);
    }
    // A designer of another studio: as if the revision weren't there.
    expect((await confirm("other", LAUNDRY_A)).status).toBe(404);
    actAsAny("client");
    expect(await confirmLineAction(idle, form({ revisionId: revisionA, lineId: LAUNDRY_A }))).toMatchObject({ ok: false, status: 403 });
    expect(await queryRows(`select 1 from line_confirmation`)).toHaveLength(0);
    // Nothing to confirm on a line no variation touched.
    const untouched = await confirm("designer", BENCHTOP_A);
    expect(untouched.status).toBe(409);
    expect(untouched.body.error).toMatch(/nothing to confirm/);
    expect((await confirm("designer", LAUNDRY_A, { note: "x".repeat(501) })).status).toBe(400);
  });

  it("after the designer confirms it (audited), the supplier sees why and may order it", async () => {
    const first = await confirm("designer", LAUNDRY_A);
    expect(first.status).toBe(201);
    expect((await confirm("owner", LAUNDRY_A)).status).toBe(200);
    const laundry = (await linesAs("stone", revisionA)).find((l) => l.id === LAUNDRY_A);
    expect(laundry?.change).toMatchObject({ state: "confirmed", confirmedBy: "Rafe Lindqvist", note: "Same slab size; the stone yard has it." });
    expect((await order(revisionA, LAUNDRY_A)).status).toBe(200);
    const [entry] = (await readActivityPage("demo-studio-fernleaf", project, { kind: "specification" })).entries;
    expect(entry).toMatchObject({ action: "line.confirmed", actorName: "Rafe Lindqvist", detail: expect.objectContaining({ letter: "A", item: "Laundry benchtop" }) });
    const [row] = await queryRows(`select created_at from line_confirmation where line_id = ?`, [LAUNDRY_A]);
    expect(entry?.at.getTime()).toBe(Number(row?.created_at));
  });

  it("a later approved variation overtakes the confirmation; confirming again opens it", async () => {
    // Back to the dark top: the decision carries the issued line's finish again, so there is nothing
    // new to issue, but a variation was approved after A and after the confirmation.
    await varyLaundry("Back to the dark top, please.", "demo-option-lb-graphite");
    actAsAny("designer");
    const nothingNew = await call(issue, { projectId: project }, { method: "POST" });
    expect(nothingNew.status).toBe(409);
    expect((await linesAs("stone", revisionA)).find((l) => l.id === LAUNDRY_A)?.change?.state).toBe("superseded");
    expect((await order(revisionA, LAUNDRY_A)).status).toBe(409);
    expect((await confirm("designer", LAUNDRY_A, { note: "Graphite again, as issued." })).status).toBe(201);
    expect((await linesAs("stone", revisionA)).find((l) => l.id === LAUNDRY_A)?.change).toMatchObject({ state: "confirmed", note: "Graphite again, as issued." });
    expect((await order(revisionA, LAUNDRY_A)).status).toBe(200);
  });

  it("a new revision opens the changed line again, on the new revision", async () => {
    await varyLaundry("The lighter top after all.", "demo-option-lb-chalk");
    expect((await order(revisionA, LAUNDRY_A)).status).toBe(409);
    actAsAny("designer");
    const b = await call(issue, { projectId: project }, { method: "POST" });
    expect(b.status).toBe(201);
    const revisionB = String(b.body.id);
    actAsAny("stone");
    expect((await call(acknowledge, { revisionId: revisionB }, { method: "POST" })).status).toBe(201);
    const onB = (await linesAs("stone", revisionB)).find((l) => l.lineKey === `decision:${laundryDecision}`);
    expect(onB?.change).toBeNull();
    expect((await order(revisionB, onB?.id ?? "")).status).toBe(200);
    // Revision A is replaced as a whole now; its lines are not asked about one by one.
    const stale = await order(revisionA, LAUNDRY_A);
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatch(/Revision B replaces revision A/);
    expect((await confirm("designer", LAUNDRY_A)).status).toBe(409);
    const actor = await getActor("demo-user-designer");
    if (!actor) throw new Error("no designer");
    expect((await listChangedIssuedLines(actor, project))?.lines).toEqual([]);
  });
});

async function varyLaundry(reason: string, optionId: string) {
  actAsAny("client");
  const asked = await call(requestVariation, { decisionId: laundryDecision }, { method: "POST", body: { reason } });
  expect(asked.status).toBe(201);
  const variationId = String((asked.body.variation as { id: string }).id);
  actAsAny("designer");
  expect((await call(price, { decisionId: laundryDecision, variationId }, { method: "POST", body: { priceDeltaCents: 0, timeImpactDays: 0, optionId } })).status).toBe(200);
  const pricedAt = ((await call(getDecision, { decisionId: laundryDecision })).body.variations as { id: string; pricedAt: number }[]).find((v) => v.id === variationId)?.pricedAt;
  actAsAny("client");
  expect((await call(approveVariation, { decisionId: laundryDecision, variationId }, { method: "POST", body: { confirm: true, pricedAt } })).status).toBe(200);
}
