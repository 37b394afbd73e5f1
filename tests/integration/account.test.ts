import bcrypt from "bcryptjs";
import { describe, expect, it, vi } from "vitest";
import * as meRoute from "@/app/api/me/route";
import { setPasswordAction, saveProfileAction } from "@/app/account/actions";
import { idle } from "@/lib/actions/result";
import { auditActions, queryRows } from "@/tests/support/db-read";
import { call } from "@/tests/support/decision-calls";
import { actAs, demoUserId } from "@/tests/support/session";

vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

const patchMe = (body: unknown) => call(meRoute.PATCH, {}, { method: "PATCH", body });
const userRow = async (key: string) => (await queryRows(`select name, phone, password_hash from user where id = ?`, [demoUserId(key)]))[0];
const form = (fields: Record<string, string>) => {
  const f = new FormData();
  for (const [k, v] of Object.entries(fields)) f.set(k, v);
  return f;
};

// Status codes per RFC 9110 §15. Re-checking the current password before changing it: OWASP ASVS v4.0.3 2.1.5.
describe("a person's own account", () => {
  it("PATCH /api/me: 401 signed out; 400 with field errors for bad bodies, writing nothing", async () => {
    actAs("anonymous");
    expect((await patchMe({ name: "X" })).status).toBe(401);
    actAs("client");
    const before = await userRow("client");
    for (const [body, field] of [[{}, "_"], [{ name: "" }, "name"], [{ phone: "call me" }, "phone"], [{ name: "x".repeat(121) }, "name"]] as const) {
      const res = await patchMe(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.fieldErrors).toHaveProperty(field);
    }
    expect((await patchMe({ email: "me@example.com" })).status).toBe(400);
    expect(await userRow("client")).toEqual(before);
  });

  it("changes the name and phone of whoever is signed in, and audits it", async () => {
    actAs("designer");
    const res = await patchMe({ name: "Rafe Lindqvist-Oakes", phone: "+61 400 000 111" });
    expect(res).toMatchObject({ status: 200, body: { name: "Rafe Lindqvist-Oakes", phone: "+61 400 000 111" } });
    expect((await call(meRoute.GET, {})).body.name).toBe("Rafe Lindqvist-Oakes");
    expect((await patchMe({ phone: "" })).body.phone).toBeNull();
    actAs("stone");
    expect((await patchMe({ phone: "02 9000 0000" })).status).toBe(200);
    expect(await auditActions(demoUserId("designer"))).toContain("account.updated");
    expect(await auditActions(demoUserId("stone"))).toContain("account.updated");
  });

  it("lets someone without a password set one, then asks for it before changing it", async () => {
    actAs("client");
    expect((await userRow("client"))?.password_hash).toBeNull();
    const short = await setPasswordAction(idle, form({ newPassword: "short", repeatPassword: "short" }));
    expect(short).toMatchObject({ ok: false, status: 400 });
    expect(short.ok ? null : short.fieldErrors).toHaveProperty("newPassword");
    expect(short.ok ? null : short.values).toEqual({}); // passwords never come back
    const mismatch = await setPasswordAction(idle, form({ newPassword: "a-long-password", repeatPassword: "another-password" }));
    expect(mismatch.ok ? null : mismatch.fieldErrors).toHaveProperty("repeatPassword");
    expect(await setPasswordAction(idle, form({ newPassword: "a-long-password", repeatPassword: "a-long-password" }))).toEqual({ ok: true, data: "set" });
    expect(await bcrypt.compare("a-long-password", String((await userRow("client"))?.password_hash))).toBe(true);
    const wrong = await setPasswordAction(idle, form({ currentPassword: "not-it-at-all", newPassword: "b-long-password", repeatPassword: "b-long-password" }));
    expect(wrong.ok ? null : wrong.fieldErrors).toHaveProperty("currentPassword");
    const missing = await setPasswordAction(idle, form({ newPassword: "b-long-password", repeatPassword: "b-long-password" }));
    expect(missing.ok ? null : missing.fieldErrors).toHaveProperty("currentPassword");
    expect(await setPasswordAction(idle, form({ currentPassword: "a-long-password", newPassword: "b-long-password", repeatPassword: "b-long-password" }))).toEqual({ ok: true, data: "changed" });
    expect(await auditActions(demoUserId("client"))).toEqual(expect.arrayContaining(["account.password_set", "account.password_changed"]));
  });

  it("the profile form keeps what was typed after a refusal", async () => {
    actAs("owner");
    const refused = await saveProfileAction(idle, form({ name: "", phone: "0400 000 000" }));
    expect(refused).toMatchObject({ ok: false, status: 400, values: { name: "", phone: "0400 000 000" } });
    actAs("anonymous");
    expect(await saveProfileAction(idle, form({ name: "Someone" }))).toMatchObject({ ok: false, status: 401 });
  });
});
