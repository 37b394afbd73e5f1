import { beforeAll, describe, expect, it, vi } from "vitest";
import { GET as getDecision } from "@/app/api/decisions/[decisionId]/route";
import { POST as choose } from "@/app/api/decisions/[decisionId]/choice/route";
import { answerInvitationAction } from "@/app/welcome/actions";
import { listAuditForProject } from "@/db/queries/audit";
import { answerInvitation, listPendingInvitations, STAFF_CANNOT_JOIN } from "@/db/queries/invitations";
import { inviteToProject } from "@/db/queries/project-invite";
import { listProjectPeople } from "@/db/queries/projects";
import { getActor } from "@/db/queries/users";
import { idle } from "@/lib/actions/result";
import { HttpError } from "@/lib/http";
import { call, demo } from "@/tests/support/decision-calls";
import { answerShown, FERNLEAF_PROJECT, mailTo, postInvite } from "@/tests/support/invite-calls";
import { actAs, demoUserId, type Persona } from "@/tests/support/session";
import { sql } from "./boards-support";

// Project rules (no outside source): the product brief for invitations. Identical answers for new
// and existing addresses are the usual defence against account enumeration (common practice, as
// in OWASP's Authentication Cheat Sheet on generic responses).
vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

const person = async (key: Persona) => {
  const a = await getActor(demoUserId(key));
  if (!a) throw new Error(`no demo user ${key}`);
  return a;
};
const status = (p: Promise<unknown>) => p.then(() => 200, (e: unknown) => (e instanceof HttpError ? e.status : 500));
const SENT = { ok: true, data: undefined };

describe("inviting: the studio hears the same whoever the address belongs to", () => {
  it("answers a new address, another studio's client and another studio's staff alike, and e-mails each", async () => {
    actAs("designer");
    const started = new Date();
    const addresses = ["brand.new@example.com", "otherclient@demo.example", "other@demo.example"];
    const answers = [];
    for (const email of addresses) answers.push(answerShown(await postInvite({ name: "Someone", email })));
    expect(answers).toEqual([SENT, SENT, SENT]);
    for (const email of addresses) expect(await mailTo(email, started)).toHaveLength(1);
  });

  it("adds the new address at once, but only invites the people who already have accounts", async () => {
    expect((await person("otherclient")).projects.map((p) => p.projectId)).not.toContain(FERNLEAF_PROJECT);
    const rows = await sql<{ email: string }>(`select email from project_invitation where project_id = ? order by email`, [FERNLEAF_PROJECT]);
    expect(rows.map((r) => r.email)).toEqual(["other@demo.example", "otherclient@demo.example"]);
    const [member] = await sql<{ display_name: string }>(
      `select pm.display_name from project_member pm join user u on u.id = pm.user_id where u.email = 'brand.new@example.com'`,
    );
    expect(member?.display_name).toBe("Someone");
    actAs("otherclient");
    expect((await call(getDecision, { decisionId: demo.pendant })).status).toBe(404);
  });

  it("lists all three on the project page the same way: invited, not joined yet", async () => {
    const people = await listProjectPeople(FERNLEAF_PROJECT);
    const invited = people.filter((p) => ["brand.new@example.com", "otherclient@demo.example", "other@demo.example"].includes(p.email));
    expect(invited.map(({ name, role, joined }) => ({ name, role, joined }))).toEqual(Array(3).fill({ name: "Someone", role: "client", joined: false }));
  });

  it("answers 409 for someone already on the project, and for the studio's own staff, without writing", async () => {
    actAs("designer");
    expect(await postInvite({ name: "Noor", email: "client@demo.example" })).toMatchObject({ ok: false, status: 409 });
    expect(await postInvite({ name: "Rafe", email: "owner@demo.example" })).toMatchObject({ ok: false, status: 409 });
  });

  it("refuses another studio's designer posting the form with this project's id (404)", async () => {
    actAs("other");
    expect(await postInvite({ name: "Sneaky", email: "sneaky@example.com" })).toMatchObject({ ok: false, status: 404 });
  });
});

describe("answering an invitation", () => {
  it("only the invited person sees it; anyone else's accept is a 404 and changes nothing", async () => {
    const [invitation] = await listPendingInvitations(await person("otherclient"));
    expect(invitation).toMatchObject({ projectName: "Marrow Street terrace", studioName: "Fernleaf Interiors", role: "client", blocked: null });
    expect(await listPendingInvitations(await person("client"))).toEqual([]);
    for (const who of ["client", "stone", "designer"] as const) {
      expect(await status(answerInvitation(await person(who), invitation?.id ?? "", "accept"))).toBe(404);
    }
    actAs("client2");
    const form = new FormData();
    form.set("invitationId", invitation?.id ?? "");
    form.set("answer", "accept");
    expect(await answerInvitationAction(idle, form)).toMatchObject({ ok: false, status: 404 });
    expect(await sql(`select id from project_invitation where id = ?`, [invitation?.id ?? ""])).toHaveLength(1);
  });

  it("staff of another studio are told why they can't accept (only them), and may decline", async () => {
    const other = await person("other");
    const [invitation] = await listPendingInvitations(other);
    expect(invitation?.blocked).toBe(STAFF_CANNOT_JOIN);
    await expect(answerInvitation(other, invitation?.id ?? "", "accept")).rejects.toMatchObject({ status: 409, message: STAFF_CANNOT_JOIN });
    await answerInvitation(other, invitation?.id ?? "", "decline");
    expect(await listPendingInvitations(other)).toEqual([]);
    expect((await person("other")).projects).toEqual([]);
  });

  it("accepting makes them a member under the studio's name for them; both answers are in the activity log", async () => {
    actAs("designer");
    await postInvite({ name: "W. Alcott (from Fernleaf)", email: "otherclient@demo.example" });
    const wren = await person("otherclient");
    const [invitation] = await listPendingInvitations(wren);
    await answerInvitation(wren, invitation?.id ?? "", "accept");
    expect((await person("otherclient")).projects.map((p) => p.projectId)).toContain(FERNLEAF_PROJECT);
    expect(await listPendingInvitations(wren)).toEqual([]);
    const [member] = await sql<{ display_name: string; supplier_id: string | null }>(
      `select display_name, supplier_id from project_member where project_id = ? and user_id = ?`,
      [FERNLEAF_PROJECT, wren.userId],
    );
    expect(member).toMatchObject({ display_name: "W. Alcott (from Fernleaf)", supplier_id: null });
    const actions = (await listAuditForProject("demo-studio-fernleaf", FERNLEAF_PROJECT)).map((e) => e.action);
    expect(actions).toEqual(expect.arrayContaining(["invitation.accepted", "invitation.declined"]));
  });

  it("a supplier's invitation makes a contact of that supplier, never a client", async () => {
    actAs("other");
    const reply = await postInvite({ projectId: "demo-project-quarry", who: "supplier:demo-supplier-northwall-stone", name: "Ridgeline desk", email: "stone@demo.example" });
    expect(answerShown(reply)).toEqual(SENT);
    const stone = await person("stone");
    const [invitation] = await listPendingInvitations(stone);
    expect(invitation).toMatchObject({ role: "supplier", supplierName: "Cobble & Slate" });
    await answerInvitation(stone, invitation?.id ?? "", "accept");
    expect((await person("stone")).projects.find((p) => p.projectId === "demo-project-quarry")).toMatchObject({
      role: "supplier",
      supplierId: "demo-supplier-northwall-stone",
    });
  });
});

describe("the invite form: supplier and client can't be mixed, and nothing typed is lost", () => {
  it("keeps the supplier chosen and every typed field after a bad e-mail, then joins them as that supplier's contact", async () => {
    actAs("designer");
    const typed = { who: "supplier:demo-supplier-tiles", name: "Kiln Lane orders", email: "orders@kiln" };
    const refused = await postInvite(typed);
    expect(refused).toMatchObject({ ok: false, status: 400, values: typed });
    expect(Object.keys((refused.ok ? {} : refused.fieldErrors) ?? {})).toEqual(["email"]);
    expect(answerShown(await postInvite({ ...typed, email: "orders@kiln-lane.example" }, refused))).toEqual(SENT);
    const [row] = await sql<{ role: string; supplier_id: string }>(
      `select pm.role, pm.supplier_id from project_member pm join user u on u.id = pm.user_id where u.email = 'orders@kiln-lane.example'`,
    );
    expect(row).toEqual({ role: "supplier", supplier_id: "demo-supplier-tiles" });
  });

  it.each([
    ["another studio's supplier", "supplier:demo-supplier-northwall-stone"],
    ["no supplier", "supplier:"],
    ["a role that doesn't exist", "owner"],
  ])("refuses %s on the “They are” field, changing nothing", async (_label, who) => {
    actAs("designer");
    const email = `mixed.${who.length}@example.com`;
    const refused = await postInvite({ who, name: "Mixed", email });
    expect(refused).toMatchObject({ ok: false, status: 400, values: { who, name: "Mixed", email } });
    expect(Object.keys((refused.ok ? {} : refused.fieldErrors) ?? {})).toContain("who");
    expect(await sql(`select id from user where email = ?`, [email])).toEqual([]);
  });

  it("refuses an archived supplier (offered nowhere new)", async () => {
    await sql(`update supplier set archived_at = ? where id = 'demo-supplier-appliances'`, [Date.now()]);
    actAs("designer");
    const refused = await postInvite({ who: "supplier:demo-supplier-appliances", name: "Hearthline", email: "new.desk@hearthline.example" });
    expect(refused).toMatchObject({ ok: false, status: 400, fieldErrors: { who: ["Choose one of your studio's suppliers."] } });
    await sql(`update supplier set archived_at = null where id = 'demo-supplier-appliances'`);
  });

  it("refuses a client carrying a supplier, whoever calls", async () => {
    const designer = await person("designer");
    await expect(inviteToProject(designer, FERNLEAF_PROJECT, { email: "c@example.com", name: "C", role: "client", supplierId: "demo-supplier-tiles" })).rejects.toMatchObject({ status: 400 });
  });
});

describe("names: what one studio typed for a person is never shown to another", () => {
  // Northwall's record of this person: the account name "Wren Alcott" (db/seed/demo.ts).
  const OTHER_STUDIOS_NAME = "Wren Alcott";

  beforeAll(async () => {
    actAs("otherclient");
    const reply = await call(choose, { decisionId: demo.pendant }, { body: { optionId: demo.option("kp-brass"), comment: "" } });
    if (reply.status !== 200) throw new Error(`choice failed: ${JSON.stringify(reply.body)}`);
  });

  it("shows Fernleaf's name for them on the decision, the people list and the activity log", async () => {
    actAs("designer");
    const decision = JSON.stringify((await call(getDecision, { decisionId: demo.pendant })).body);
    expect(decision).toContain("W. Alcott (from Fernleaf)");
    expect(decision).not.toContain(OTHER_STUDIOS_NAME);
    const people = JSON.stringify(await listProjectPeople(FERNLEAF_PROJECT));
    expect(people).toContain("W. Alcott (from Fernleaf)");
    expect(people).not.toContain(OTHER_STUDIOS_NAME);
    const activity = JSON.stringify(await listAuditForProject("demo-studio-fernleaf", FERNLEAF_PROJECT));
    expect(activity).not.toContain(OTHER_STUDIOS_NAME);
  });

  it("names them the same way in the e-mail to the designers", async () => {
    const mail = (await mailTo("designer@demo.example", new Date(Date.now() - 60_000))).find((m) => m.subject.includes("W. Alcott"));
    expect(mail?.text).toContain("W. Alcott (from Fernleaf)");
    expect(mail?.text).not.toContain(OTHER_STUDIOS_NAME);
  });
});
