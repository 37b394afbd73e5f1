import { parse } from "csv-parse/sync";
import { describe, expect, it } from "vitest";
import { POST as issue } from "@/app/api/projects/[projectId]/revisions/route";
import { GET as getRevision } from "@/app/api/revisions/[revisionId]/route";
import { GET as exportCsv } from "@/app/api/revisions/[revisionId]/export.csv/route";
import { POST as acknowledge } from "@/app/api/revisions/[revisionId]/acknowledge/route";
import { PATCH as patchLine } from "@/app/api/revisions/[revisionId]/lines/[lineId]/route";
import { listAuditForProject } from "@/db/queries/audit";
import { getHandoffView } from "@/db/queries/spec-handoff-view";
import { getActor } from "@/db/queries/users";
import { readCaughtMail } from "@/lib/mail/caught";
import { actAsAny, appliances, call, project, revisionA, stone } from "./spec-helpers";

type Line = { id: string; lineKey: string; item: string; quantity: number; orderByDate: string; supplierId: string; status: string; order: { orderedOn: string | null; expectedOn: string | null } | null };

const designer = async () => {
  const actor = await getActor("demo-user-designer");
  if (!actor) throw new Error("no designer");
  return actor;
};
const linesOf = async (revisionId: string) => (await call(getRevision, { revisionId })).body.lines as Line[];
const setDates = (revisionId: string, lineId: string, body: unknown) => call(patchLine, { revisionId, lineId }, { method: "PATCH", body });

async function mailTo(address: string, subject: string) {
  const dir = process.env.MAIL_CATCHER_DIR ?? "";
  for (let i = 0; i < 50; i++) {
    const found = (await readCaughtMail(dir, { to: address })).filter((m) => m.subject.includes(subject));
    if (found.length) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  return [];
}

describe("supplier hand-off", () => {
  let b = "";
  let benchtop: Line;
  let laundry: Line;

  it("shows a supplier what changed for them since the last revision they acknowledged", async () => {
    actAsAny("designer");
    const issued = await call(issue, { projectId: project }, { method: "POST" });
    b = String(issued.body.id);
    actAsAny("stone");
    const res = await call(getRevision, { revisionId: b });
    const changes = res.body.changes as { since: { letter: string }; changed: { lineKey: string }[]; added: unknown[]; removed: unknown[] };
    expect(changes.since.letter).toBe("A");
    expect(changes.changed.map((c) => c.lineKey)).toEqual(["decision:demo-decision-laundry-benchtop"]);
    const lines = res.body.lines as Line[];
    benchtop = lines.find((l) => l.item === "Benchtop") as Line;
    laundry = lines.find((l) => l.item === "Laundry benchtop") as Line;
    // The benchtop did not change, so the order the supplier recorded on A carries over to B.
    expect(benchtop.order).toEqual({ orderedOn: "2026-11-21", expectedOn: "2027-03-08" });
    expect(laundry.order).toBeNull();
  });

  it("needs an acknowledgement before order dates, and a new one for each revision", async () => {
    actAsAny("stone");
    const early = await setDates(b, laundry.id, { orderedOn: "2026-11-30" });
    expect(early.status).toBe(409);
    expect(early.body.error).toMatch(/Acknowledge revision B/);
    const first = await call(acknowledge, { revisionId: b }, { method: "POST" });
    expect(first.status).toBe(201);
    const again = await call(acknowledge, { revisionId: b }, { method: "POST" });
    expect(again.status).toBe(200);
    expect(again.body.acknowledgedAt).toBe(first.body.acknowledgedAt);
  });

  it("e-mails the studio once when a supplier acknowledges, with a link to the hand-off", async () => {
    const mail = await mailTo("designer@demo.example", "acknowledged revision B");
    expect(mail).toHaveLength(1);
    expect(mail[0]?.links).toContain(`http://mottle.test/studio/projects/${project}/handoff`);
    expect(await mailTo("owner@demo.example", "acknowledged revision B")).toHaveLength(1);
  });

  it("records order dates with plain errors for dates that can't be right", async () => {
    actAsAny("stone");
    const cases: [unknown, string][] = [
      [{ orderedOn: "2026-02-30" }, "orderedOn"],
      [{ orderedOn: "30/11/2026" }, "orderedOn"],
      [{ orderedOn: "2099-01-01" }, "orderedOn"],
      [{ orderedOn: "2026-11-30", expectedOn: "2026-11-01" }, "expectedOn"],
      [{ orderedOn: null, expectedOn: "2027-02-01" }, "expectedOn"],
    ];
    for (const [body, field] of cases) {
      const res = await setDates(b, laundry.id, body);
      expect(res.status).toBe(400);
      expect(Object.keys(res.body.fieldErrors as object)).toContain(field);
    }
    const ok = await setDates(b, laundry.id, { orderedOn: "2026-11-30", expectedOn: "2027-03-01" });
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({ orderedOn: "2026-11-30", expectedOn: "2027-03-01", status: "expected" });
    // Leaving a key out keeps it; null clears it.
    const partial = await setDates(b, laundry.id, { expectedOn: null });
    expect(partial.body).toMatchObject({ orderedOn: "2026-11-30", expectedOn: null, status: "ordered" });
  });

  it("refuses changes to a line's frozen content (409) and dates on a replaced revision (409)", async () => {
    actAsAny("stone");
    const edit = await setDates(b, laundry.id, { quantity: 3 });
    expect(edit.status).toBe(409);
    expect(edit.body.error).toMatch(/never changes/);
    actAsAny("designer");
    expect((await linesOf(b)).find((l) => l.id === laundry.id)?.quantity).toBe(2);
    actAsAny("stone");
    const onA = (await linesOf(revisionA)).find((l) => l.item === "Laundry benchtop");
    const stale = await setDates(revisionA, onA?.id ?? "", { orderedOn: "2026-11-30" });
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatch(/Revision B replaces revision A/);
  });

  it("exports a supplier's CSV that reads back to the same lines as their JSON", async () => {
    actAsAny("stone");
    const lines = await linesOf(b);
    const res = await call(exportCsv, { revisionId: b }, { path: `/api/revisions/${b}/export.csv?supplier=${stone}` });
    const rows = parse(res.text, { bom: true, columns: true }) as Record<string, string>[];
    expect(rows.map((r) => [r["Line reference"], r["Item"], Number(r["Quantity"]), r["Order by"], r["Ordered on"]])).toEqual(
      lines.map((l) => [l.lineKey, l.item, l.quantity, l.orderByDate, l.order?.orderedOn ?? ""]),
    );
  });

  it("shows the designer who acknowledged what, what changed since, and what is late", async () => {
    const view = await getHandoffView(await designer(), project, "2027-02-01");
    const stoneRow = view.suppliers.find((s) => s.supplierId === stone);
    expect(stoneRow?.acknowledged.map((a) => a.letter)).toEqual(["A", "B"]);
    expect(stoneRow?.upToDate).toBe(true);
    expect(stoneRow?.late).toEqual([]);
    const applianceRow = view.suppliers.find((s) => s.supplierId === appliances);
    expect(applianceRow?.acknowledged).toEqual([]);
    expect(applianceRow?.upToDate).toBe(false);
    // Appliances lead 84 days: order by 2027-01-18 for a 2027-04-12 install; on 1 Feb they are late.
    expect(applianceRow?.late.map((l) => l.item).sort()).toEqual(["Cooktop", "Rangehood", "Wall oven"]);
    expect(view.late.length).toBeGreaterThanOrEqual(3);
  });

  it("keeps an audit entry for the issue, the acknowledgement and the order dates", async () => {
    const actor = await designer();
    const log = await listAuditForProject(actor.studio?.id ?? "", project);
    const actions = log.map((a) => a.action);
    expect(actions).toEqual(expect.arrayContaining(["revision.issued", "revision.acknowledged", "line.order-dates"]));
    // Acknowledging B twice logs once (the seed logs the stonemason's acknowledgement of A as well).
    expect(log.filter((a) => a.action === "revision.acknowledged" && (a.detail as { letter?: string } | null)?.letter === "B")).toHaveLength(1);
  });
});
