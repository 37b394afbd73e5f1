import { describe, expect, it } from "vitest";
import * as projectRoute from "@/app/api/projects/[projectId]/route";
import * as decisionsRoute from "@/app/api/projects/[projectId]/decisions/route";
import { getSpecificationView } from "@/db/queries/spec";
import { getActor } from "@/db/queries/users";
import { shiftDay } from "@/lib/spec/order-by";
import { auditActions, queryRows } from "@/tests/support/db-read";
import { call, demo } from "@/tests/support/decision-calls";
import { actAs, demoUserId, type Persona } from "@/tests/support/session";

const patch = (body: unknown, projectId = demo.project) => call(projectRoute.PATCH, { projectId }, { method: "PATCH", body });
const projectRow = async () => (await queryRows(`select name, site_address, install_date from project where id = ?`, [demo.project]))[0];

type OrderBy = { date: string; leadTimeDays: number } | null;
async function decisionOrderBys() {
  actAs("designer");
  const res = await call(decisionsRoute.GET, { projectId: demo.project });
  return (res.body.items as { id: string; orderBy: OrderBy }[]).filter((d) => d.orderBy);
}

// Status codes per RFC 9110 §15 (400, 401, 403, 404); "another studio's project is 404" is our rule.
describe("PATCH /api/projects/:projectId", () => {
  it.each<[Persona, number]>([["anonymous", 401], ["client", 403], ["stone", 403], ["otherclient", 403], ["other", 404]])("refuses %s with %i and changes nothing", async (persona, status) => {
    const before = await projectRow();
    actAs(persona);
    expect((await patch({ name: "Taken over" })).status).toBe(status);
    expect(await projectRow()).toEqual(before);
  });

  it("refuses bad bodies with field errors, writing nothing", async () => {
    actAs("designer");
    const before = await projectRow();
    const cases: [unknown, string][] = [
      [{ name: "" }, "name"],
      [{ installDate: "2027-02-30" }, "installDate"],
      [{ installDate: "12/04/2027" }, "installDate"],
      [{ siteAddress: "x".repeat(201) }, "siteAddress"],
      [{}, "_"],
    ];
    for (const [body, field] of cases) {
      const res = await patch(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(Object.keys((res.body.fieldErrors as object) ?? {})).toContain(field);
    }
    expect((await patch({ name: "Fine", owner: "me" })).status).toBe(400);
    expect(await projectRow()).toEqual(before);
  });

  it("corrects the details as any of the studio's staff, recording from → to in the audit log", async () => {
    actAs("owner");
    const res = await patch({ name: "Marrow St terrace", siteAddress: "16 Marrow Street, Eastbrook" });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ name: "Marrow St terrace", siteAddress: "16 Marrow Street, Eastbrook", installDate: "2027-04-12" });
    const [row] = await queryRows(`select detail from audit_log where action = 'project.updated' and entity_id = ? order by created_at desc limit 1`, [demo.project]);
    expect(JSON.parse(String(row?.detail))).toMatchObject({ changes: { name: { from: "Marrow Street terrace", to: "Marrow St terrace" } } });
    actAs("designer");
    expect((await patch({ siteAddress: null })).body.siteAddress).toBeNull();
  });

  it("moves the order-by dates of decisions and of the current specification; an issued revision keeps its own", async () => {
    const before = await decisionOrderBys();
    expect(before.length).toBeGreaterThan(0);
    const designer = await getActor(demoUserId("designer"));
    if (!designer) throw new Error("no designer");
    const specBefore = await getSpecificationView(designer, demo.project);
    const [issuedBefore] = await queryRows(`select content from spec_revision where project_id = ? order by sequence limit 1`, [demo.project]);

    expect((await patch({ installDate: "2027-06-01" })).status).toBe(200);
    // Order-by = install date − lead time (common practice; lib/decisions/order-by.ts).
    for (const d of await decisionOrderBys()) expect(d.orderBy?.date).toBe(shiftDay("2027-06-01", -(d.orderBy?.leadTimeDays ?? 0)));
    const specAfter = await getSpecificationView(designer, demo.project);
    const dated = specAfter.lines.filter((l) => l.orderByDate);
    expect(dated.length).toBeGreaterThan(0);
    for (const l of dated) expect(l.orderByDate).toBe(shiftDay("2027-06-01", -l.leadTimeDays));
    expect(specAfter.lines.map((l) => l.orderByDate)).not.toEqual(specBefore.lines.map((l) => l.orderByDate));
    const [issuedAfter] = await queryRows(`select content from spec_revision where project_id = ? order by sequence limit 1`, [demo.project]);
    expect(issuedAfter?.content).toBe(issuedBefore?.content);

    // Clearing the date leaves no order-by date anywhere live.
    expect((await patch({ installDate: null })).body.installDate).toBeNull();
    expect(await decisionOrderBys()).toEqual([]);
    expect(await auditActions(demo.project)).toContain("project.updated");
  });
});
