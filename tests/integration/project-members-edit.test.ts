import { describe, expect, it, vi } from "vitest";
import * as meRoute from "@/app/api/me/route";
import * as decisionsRoute from "@/app/api/projects/[projectId]/decisions/route";
import * as memberRoute from "@/app/api/projects/[projectId]/members/[userId]/route";
import * as revisionRoute from "@/app/api/revisions/[revisionId]/route";
import { withdrawInvitationAction } from "@/app/studio/projects/[projectId]/member-actions";
import { inviteToProject } from "@/db/queries/project-invite";
import { listProjectPeople } from "@/db/queries/projects";
import { getActor } from "@/db/queries/users";
import { idle } from "@/lib/actions/result";
import { projectInviteeSchema } from "@/lib/validation/project-invite";
import { auditActions, queryRows } from "@/tests/support/db-read";
import { call, demo } from "@/tests/support/decision-calls";
import { holdSession, resumeSession } from "@/tests/support/held-session";
import { actAs, demoUserId, type Persona } from "@/tests/support/session";

vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

const params = (key: string) => ({ projectId: demo.project, userId: demoUserId(key) });
const patch = (key: string, body: unknown) => call(memberRoute.PATCH, params(key), { method: "PATCH", body });
const remove = (key: string) => call(memberRoute.DELETE, params(key), { method: "DELETE" });
const me = () => call(meRoute.GET, {});
const memberRow = async (key: string) =>
  (await queryRows(`select pm.role, pm.supplier_id, u.session_version from project_member pm join user u on u.id = pm.user_id where pm.project_id = ? and pm.user_id = ?`, [demo.project, demoUserId(key)]))[0] ?? null;

// Status codes per RFC 9110 §15. Ending sessions on a change of role or removal: OWASP ASVS v4.0.3 3.3.
describe("changing and removing people on a project", () => {
  it.each<[Persona, number]>([["anonymous", 401], ["client", 403], ["stone", 403], ["otherclient", 403], ["other", 404]])("refuses %s with %i, changing nothing", async (persona, status) => {
    const before = await memberRow("client2");
    actAs(persona);
    expect((await patch("client2", { role: "supplier", supplierId: "demo-supplier-stone" })).status).toBe(status);
    expect((await remove("client2")).status).toBe(status);
    expect(await memberRow("client2")).toEqual(before);
  });

  it("refuses bad bodies with field errors, and people not on the project with 404", async () => {
    await queryRows(`update supplier set archived_at = 1 where id = 'demo-supplier-appliances'`);
    const before = await memberRow("client2");
    actAs("designer");
    for (const [body, field] of [
      [{}, "role"],
      [{ role: "owner" }, "role"],
      [{ role: "supplier" }, "supplierId"],
      [{ role: "supplier", supplierId: "no-such-supplier" }, "supplierId"],
      [{ role: "supplier", supplierId: "demo-supplier-appliances" }, "supplierId"], // archived
    ] as const) {
      const res = await patch("client2", body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.fieldErrors, JSON.stringify(body)).toHaveProperty(field);
    }
    expect((await patch("client2", { role: "client", supplierId: "demo-supplier-stone" })).status).toBe(400);
    expect((await patch("otherclient", { role: "client" })).status).toBe(404);
    expect((await remove("designer")).status).toBe(404);
    expect(await memberRow("client2")).toEqual(before);
    await queryRows(`update supplier set archived_at = null where id = 'demo-supplier-appliances'`);
  });

  it("moves a supplier's contact to client: their very next request is refused, then they see only what a client may", async () => {
    const stone = await holdSession("stone");
    expect((await call(revisionRoute.GET, { revisionId: "demo-revision-a" })).status).toBe(200);
    actAs("designer");
    const res = await patch("stone", { role: "client" });
    expect(res.body).toMatchObject({ role: "client", supplierId: null });
    resumeSession(stone);
    expect((await me()).status).toBe(401);
    actAs("stone"); // signs in again
    expect((await getActor(demoUserId("stone")))?.projects.find((p) => p.projectId === demo.project)?.role).toBe("client");
    actAs("designer");
    expect((await patch("stone", { role: "supplier", supplierId: "demo-supplier-stone" })).status).toBe(200);
    expect(await auditActions(demoUserId("stone"))).toEqual(expect.arrayContaining(["member.role_changed"]));
  });

  it("removes a client: their next request is refused, their picks and approvals stay", async () => {
    const count = async () => (await queryRows(`select (select count(*) from choice where user_id = ?1) + (select count(*) from approval where user_id = ?1) as n`, [demoUserId("client")]))[0]?.n;
    const picks = await count();
    expect(Number(picks)).toBeGreaterThan(0);
    const client = await holdSession("client");
    expect((await call(decisionsRoute.GET, { projectId: demo.project })).status).toBe(200);
    actAs("owner");
    expect((await remove("client")).status).toBe(204);
    resumeSession(client);
    expect((await call(decisionsRoute.GET, { projectId: demo.project })).status).toBe(401);
    actAs("client");
    expect((await call(decisionsRoute.GET, { projectId: demo.project })).status).toBe(404);
    expect(await count()).toBe(picks);
    expect(await memberRow("client")).toBeNull();
    expect(await auditActions(demoUserId("client"))).toContain("member.removed");
  });

  it("withdraws a not-yet-joined person the same way whichever kind of invitation they have", async () => {
    const designer = await getActor(demoUserId("designer"));
    if (!designer) throw new Error("no designer");
    await inviteToProject(designer, demo.project, projectInviteeSchema.parse({ email: "brand.new@example.com", name: "Brand New", role: "client" }));
    await inviteToProject(designer, demo.project, projectInviteeSchema.parse({ email: "otherclient@demo.example", name: "Wren", role: "client" }));
    actAs("designer");
    const pending = (await listProjectPeople(demo.project)).filter((p) => !p.joined);
    expect(pending.map((p) => p.email).sort()).toEqual(["brand.new@example.com", "otherclient@demo.example"]);
    for (const p of pending) {
      const form = new FormData();
      form.set("projectId", demo.project);
      form.set("entryId", p.id);
      expect(await withdrawInvitationAction(idle, form)).toEqual({ ok: true, data: undefined });
    }
    expect((await listProjectPeople(demo.project)).filter((p) => !p.joined)).toEqual([]);
  });
});
