import { describe, expect, it, vi } from "vitest";
import * as meRoute from "@/app/api/me/route";
import * as staffRoute from "@/app/api/studio/staff/[userId]/route";
import { inviteDesignerAction } from "@/app/studio/team/actions";
import { markWritten } from "@/db/queries/read-cache";
import { idle } from "@/lib/actions/result";
import { auditActions, queryRows } from "@/tests/support/db-read";
import { call } from "@/tests/support/decision-calls";
import { holdSession, resumeSession } from "@/tests/support/held-session";
import { actAs, demoUserId, type Persona } from "@/tests/support/session";

vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

const patch = (key: string, body: unknown) => call(staffRoute.PATCH, { userId: demoUserId(key) }, { method: "PATCH", body });
const remove = (key: string) => call(staffRoute.DELETE, { userId: demoUserId(key) }, { method: "DELETE" });
const staffRows = async () => (await queryRows(`select user_id, role from studio_member order by user_id`)).map((r) => `${String(r.user_id)}:${String(r.role)}`);
const invite = (email: string, name = "New Designer") => {
  const form = new FormData();
  form.set("email", email);
  form.set("name", name);
  return inviteDesignerAction(idle, form);
};

// Status codes per RFC 9110 §15; 409 Conflict for the last owner. Ending sessions on a role change: OWASP ASVS v4.0.3 3.3.
describe("the studio's staff", () => {
  it.each<[Persona, number]>([["anonymous", 401], ["designer", 403], ["client", 403], ["stone", 403], ["other", 404]])("refuses %s with %i, changing nothing", async (persona, status) => {
    const before = await staffRows();
    actAs(persona);
    expect((await patch("designer", { role: "owner" })).status).toBe(status);
    expect((await remove("designer")).status).toBe(status);
    expect(await staffRows()).toEqual(before);
  });

  it("refuses bad bodies with field errors, and never leaves a studio without an owner (409)", async () => {
    actAs("owner");
    const before = await staffRows();
    expect((await patch("designer", {})).body.fieldErrors).toHaveProperty("role");
    expect((await patch("designer", { role: "client" })).status).toBe(400);
    expect((await patch("client", { role: "owner" })).status).toBe(404);
    const demote = await patch("owner", { role: "designer" });
    expect(demote).toMatchObject({ status: 409, body: { error: "A studio needs at least one owner." } });
    expect((await remove("owner")).status).toBe(409);
    expect(await staffRows()).toEqual(before);
  });

  it("makes a designer an owner (their next request is refused), then the first owner may step down", async () => {
    const designer = await holdSession("designer");
    expect((await call(meRoute.GET, {})).status).toBe(200);
    actAs("owner");
    expect((await patch("designer", { role: "owner" })).body).toEqual({ userId: demoUserId("designer"), role: "owner" });
    resumeSession(designer);
    expect((await call(meRoute.GET, {})).status).toBe(401);
    actAs("designer");
    expect((await patch("owner", { role: "designer" })).status).toBe(200);
    expect(await auditActions(demoUserId("designer"))).toContain("staff.role_changed");
    // Put things back: the demo's owner is the owner again.
    expect((await patch("owner", { role: "owner" })).status).toBe(200);
    actAs("owner");
    expect((await patch("designer", { role: "designer" })).status).toBe(200);
  });

  it("removes a designer: their very next request is refused and they are staff no more", async () => {
    actAs("owner");
    await invite("temp.designer@example.com", "Temp Designer");
    const [row] = await queryRows(`select id from user where email = 'temp.designer@example.com'`);
    const id = String(row?.id);
    // Not joined until they sign in: until then only "Withdraw invitation" applies (studio-invitations.test.ts).
    expect((await call(staffRoute.DELETE, { userId: id }, { method: "DELETE" })).status).toBe(404);
    await queryRows(`update user set emailVerified = ? where id = ?`, [Date.now(), id]);
    markWritten();
    expect((await call(staffRoute.DELETE, { userId: id }, { method: "DELETE" })).status).toBe(204);
    expect(await staffRows()).not.toContain(`${id}:designer`);
    expect(await auditActions(id)).toEqual(["designer.invited", "staff.removed"]);
    const designer = await holdSession("designer");
    actAs("owner");
    expect((await remove("designer")).status).toBe(204);
    resumeSession(designer);
    expect((await call(meRoute.GET, {})).status).toBe(401);
    actAs("designer");
    expect((await call(meRoute.GET, {})).body.studio).toBeNull();
  });
});

// Which addresses get what, and that the owner can't tell them apart: studio-invitations.test.ts.
describe("inviting a designer", () => {
  it("says truthfully when the e-mail could not be sent after the designer was added", async () => {
    actAs("owner");
    const saved = process.env.SMTP_URL;
    const { env } = await import("@/lib/env");
    const original = env.SMTP_URL;
    Object.assign(env, { SMTP_URL: "smtp://127.0.0.1:9" });
    try {
      const result = await invite("unlucky.designer@example.com");
      expect(result).toMatchObject({ ok: false, status: 502 });
      expect(result.ok ? "" : result.error).toMatch(/^Invited, but the e-mail could not be sent/);
    } finally {
      Object.assign(env, { SMTP_URL: original });
      process.env.SMTP_URL = saved;
    }
    expect((await queryRows(`select count(*) as n from user where email = 'unlucky.designer@example.com'`))[0]?.n).toBe(1);
  });
});
