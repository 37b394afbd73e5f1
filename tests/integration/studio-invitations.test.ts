import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it, vi } from "vitest";
import * as staffRoute from "@/app/api/studio/staff/[userId]/route";
import { inviteDesignerAction, withdrawTeamInvitationAction } from "@/app/studio/team/actions";
import { answerStudioInvitationAction } from "@/app/welcome/actions";
import { INVITE_LIMITS, TOO_MANY_INVITATIONS } from "@/db/queries/invite-limits";
import { answerStudioInvitation, listMyStudioInvitations, listTeam, staffElsewhereReason, type TeamEntry } from "@/db/queries/studio-invitations";
import { getActor } from "@/db/queries/users";
import { PendingInvitations } from "@/components/invitations/pending-invitations";
import { TeamList } from "@/components/studio/team-list";
import { idle } from "@/lib/actions/result";
import { HttpError } from "@/lib/http";
import { call } from "@/tests/support/decision-calls";
import { mailTo, postInvite } from "@/tests/support/invite-calls";
import { actAs, demoUserId, type Persona } from "@/tests/support/session";
import { sql } from "./boards-support";

// Project rules (no outside source): the product brief for team invitations. Identical answers,
// audit entries and listings for new and existing addresses are the usual defence against
// account enumeration (common practice, as in OWASP's Authentication Cheat Sheet on generic
// responses). 404 for someone else's invitation, 409 for a refused accept, 429 for too many:
// RFC 9110 §15.5.5 / §15.5.10 and RFC 6585 §4.
vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

const FERNLEAF = "demo-studio-fernleaf";
const SENT = { ok: true, data: undefined };
// An account that belongs to no studio and no project: someone who signed up and declined everything.
const NOBODY = { id: "test-user-nobody", email: "nobody.here@example.com" };
const ADDRESSES = {
  fresh: "fresh.designer@example.com",
  client: "client@demo.example",
  otherStudio: "other@demo.example",
  nobody: NOBODY.email,
};

const formOf = (fields: Record<string, string>) => {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) form.set(k, v);
  return form;
};
const invite = (email: string, name = "Someone") => inviteDesignerAction(idle, formOf({ email, name }));
const withdraw = (entryId: string) => withdrawTeamInvitationAction(idle, formOf({ entryId }));
const status = (p: Promise<unknown>) => p.then(() => 200, (e: unknown) => (e instanceof HttpError ? e.status : 500));
const person = async (userId: string) => {
  const a = await getActor(userId);
  if (!a) throw new Error(`no user ${userId}`);
  return a;
};
const teamEntry = async (email: string): Promise<TeamEntry> => {
  const entry = (await listTeam(FERNLEAF)).find((e) => e.email === email);
  if (!entry) throw new Error(`${email} is not on the team list`);
  return entry;
};
/** The rendered row with its per-person parts (the entry's id, the address, the name typed) replaced: what a team page shows. */
const renderedRow = (entry: TeamEntry, viewer: Persona = "owner") =>
  renderToStaticMarkup(createElement(TeamList, { team: [entry], viewerId: demoUserId(viewer), owner: viewer === "owner" }))
    .replaceAll(entry.id, "<id>")
    .replaceAll(entry.email, "<email>")
    .replaceAll(entry.name, "<name>");
const mailCount = async (email: string) => (await mailTo(email, new Date(0))).length;
const inviteAudit = async (email: string) =>
  sql<{ action: string; entity_type: string; actor_id: string; project_id: string | null; detail: string }>(
    `select action, entity_type, actor_id, project_id, detail from audit_log where action = 'designer.invited' and json_extract(detail, '$.email') = ?`,
    [email],
  );

describe("inviting a designer: the owner learns nothing about the address", () => {
  it("answers a new address, a client's, another studio's owner and an account on nothing alike", async () => {
    await sql(`insert into user (id, email, name, password_hash, session_version) values (?, ?, 'Nobody Here', 'not-a-real-hash', 0)`, [NOBODY.id, NOBODY.email]);
    actAs("owner");
    const started = new Date();
    const answers = [];
    for (const email of Object.values(ADDRESSES)) answers.push(await invite(email));
    expect(answers).toEqual([SENT, SENT, SENT, SENT]);
    // Each address gets one e-mail: the new one a way in, the account holders an invitation to answer.
    const [fresh] = await mailTo(ADDRESSES.fresh, started);
    expect(fresh?.text).toContain("callbackUrl=%2Faccount");
    for (const email of [ADDRESSES.client, ADDRESSES.otherStudio, ADDRESSES.nobody]) {
      const mail = await mailTo(email, started);
      expect(mail).toHaveLength(1);
      expect(mail[0]?.subject).toBe("Fernleaf Interiors invited you to their team on Mottle");
      expect(mail[0]?.text).toContain("http://mottle.test/sign-in?");
      expect(mail[0]?.text).toContain("callbackUrl=%2Fwelcome");
      expect(mail[0]?.text).not.toContain("different e-mail address");
    }
  });

  it("writes the same audit entry for each, naming only the address typed", async () => {
    for (const email of Object.values(ADDRESSES)) {
      const rows = await inviteAudit(email);
      expect(rows.map(({ detail, ...r }) => ({ ...r, detail: JSON.parse(detail) as unknown }))).toEqual([
        { action: "designer.invited", entity_type: "studio_person", actor_id: demoUserId("owner"), project_id: null, detail: { email } },
      ]);
    }
  });

  it("lists all four the same way on the team page: invited, not joined yet, with only Withdraw", async () => {
    const entries = await Promise.all(Object.values(ADDRESSES).map(teamEntry));
    expect(entries.map(({ id: _id, email: _email, ...rest }) => rest)).toEqual(Array(4).fill({ userId: null, name: "Someone", role: "designer", joined: false }));
    const asOwner = entries.map((e) => renderedRow(e));
    expect(new Set(asOwner).size).toBe(1);
    expect(asOwner[0]).toContain("Invited, not joined yet");
    expect(asOwner[0]).toContain("Withdraw invitation");
    expect(asOwner[0]).not.toContain("Make owner");
    expect(new Set(entries.map((e) => renderedRow(e, "designer"))).size).toBe(1);
    // Only account holders' invitations are rows of their own; nobody with an account was put on the staff.
    const staff = await sql<{ user_id: string }>(`select user_id from studio_member where studio_id = ?`, [FERNLEAF]);
    expect(staff.map((s) => s.user_id)).not.toEqual(expect.arrayContaining([demoUserId("client")]));
    expect(staff.map((s) => s.user_id)).not.toContain(demoUserId("other"));
    expect(staff.map((s) => s.user_id)).not.toContain(NOBODY.id);
  });

  it("answers the staff controls' route alike (404) for either kind of entry, and project invitations alike (409)", async () => {
    actAs("owner");
    for (const email of Object.values(ADDRESSES)) {
      const entry = await teamEntry(email);
      expect((await call(staffRoute.PATCH, { userId: entry.id }, { method: "PATCH", body: { role: "owner" } })).status).toBe(404);
      expect((await call(staffRoute.DELETE, { userId: entry.id }, { method: "DELETE" })).status).toBe(404);
      expect(await postInvite({ name: "Someone", email })).toMatchObject({ ok: false, status: 409 });
    }
  });

  it("inviting again before they join sends the e-mail again, with the new name, alike", async () => {
    actAs("owner");
    const before = await Promise.all([ADDRESSES.fresh, ADDRESSES.client].map(mailCount));
    for (const email of [ADDRESSES.fresh, ADDRESSES.client]) expect(await invite(email, "Someone Else")).toEqual(SENT);
    expect(await Promise.all([ADDRESSES.fresh, ADDRESSES.client].map(mailCount))).toEqual(before.map((n) => n + 1));
    for (const email of [ADDRESSES.fresh, ADDRESSES.client]) {
      expect((await teamEntry(email)).name).toBe("Someone Else");
      expect(await inviteAudit(email)).toHaveLength(2);
    }
    expect(renderedRow(await teamEntry(ADDRESSES.fresh))).toBe(renderedRow(await teamEntry(ADDRESSES.client)));
  });
});

describe("answering a studio's invitation", () => {
  it("is only for the person it was sent to: anyone else is answered 404 and nothing changes", async () => {
    const [invitation] = await listMyStudioInvitations(await person(NOBODY.id));
    expect(invitation).toMatchObject({ studioName: "Fernleaf Interiors", role: "designer", blocked: null });
    for (const who of ["owner", "designer", "client", "other", "stone"] as const) {
      expect(await listMyStudioInvitations(await person(demoUserId(who))).then((l) => l.map((i) => i.id))).not.toContain(invitation?.id);
      expect(await status(answerStudioInvitation(await person(demoUserId(who)), invitation?.id ?? "", "accept"))).toBe(404);
      actAs(who);
      const form = formOf({ invitationId: invitation?.id ?? "", answer: "decline" });
      expect(await answerStudioInvitationAction(idle, form)).toMatchObject({ ok: false, status: 404 });
    }
    expect(await sql(`select id from studio_invitation where id = ?`, [invitation?.id ?? ""])).toHaveLength(1);
    actAs("anonymous");
    expect(await answerStudioInvitationAction(idle, formOf({ invitationId: invitation?.id ?? "", answer: "accept" }))).toMatchObject({ ok: false, status: 401 });
  });

  it("lets the invited person accept: they join with the invitation's role, at their very next request", async () => {
    const nobody = await person(NOBODY.id);
    expect(nobody.studio).toBeNull();
    const panel = renderToStaticMarkup(createElement(PendingInvitations, { invitations: [], studioInvitations: await listMyStudioInvitations(nobody) }));
    expect(panel).toContain("Fernleaf Interiors invited you to join their team as a designer");
    expect(panel).toContain(">Accept<");
    const [invitation] = await listMyStudioInvitations(nobody);
    expect(await answerStudioInvitation(nobody, invitation?.id ?? "", "accept")).toEqual({ studioId: FERNLEAF, role: "designer" });
    expect((await person(NOBODY.id)).studio).toEqual({ id: FERNLEAF, name: "Fernleaf Interiors", role: "designer" });
    expect(await listMyStudioInvitations(await person(NOBODY.id))).toEqual([]);
    const entry = await teamEntry(NOBODY.email);
    expect(entry).toMatchObject({ userId: NOBODY.id, joined: true, name: "Nobody Here" });
    expect(renderedRow(entry)).toContain("Make owner");
    const [audit] = await sql<{ action: string; actor_id: string }>(`select action, actor_id from audit_log where entity_id = ? and action like 'team_invitation.%'`, [invitation?.id ?? ""]);
    expect(audit).toEqual({ action: "team_invitation.accepted", actor_id: NOBODY.id });
  });

  it("refuses Accept for someone already on another studio's team, saying why only to them; Decline works", async () => {
    const other = await person(demoUserId("other"));
    const [invitation] = await listMyStudioInvitations(other);
    const reason = staffElsewhereReason("Northwall Design Co.");
    expect(invitation?.blocked).toBe(reason);
    const panel = renderToStaticMarkup(createElement(PendingInvitations, { invitations: [], studioInvitations: [invitation!] }));
    expect(panel).toContain("Northwall Design Co.");
    expect(panel).not.toContain(">Accept<");
    expect(panel).toContain(">Decline<");
    await expect(answerStudioInvitation(other, invitation?.id ?? "", "accept")).rejects.toMatchObject({ status: 409, message: reason });
    actAs("other");
    expect(await answerStudioInvitationAction(idle, formOf({ invitationId: invitation?.id ?? "", answer: "accept" }))).toMatchObject({ ok: false, status: 409, error: reason });
    expect((await person(demoUserId("other"))).studio?.name).toBe("Northwall Design Co.");
    // The inviting owner's page still shows the row as before, with no word of the reason.
    const row = renderedRow(await teamEntry(ADDRESSES.otherStudio));
    expect(row).not.toContain("Northwall");
    expect(row).toBe(renderedRow(await teamEntry(ADDRESSES.fresh)));
    await answerStudioInvitation(other, invitation?.id ?? "", "decline");
    expect(await listMyStudioInvitations(other)).toEqual([]);
    expect(await sql(`select action from audit_log where entity_id = ? and action = 'team_invitation.declined'`, [invitation?.id ?? ""])).toHaveLength(1);
  });
});

describe("withdrawing a team invitation", () => {
  it("refuses a designer (403) and another studio's owner (404), changing nothing", async () => {
    const entry = await teamEntry(ADDRESSES.client);
    actAs("designer");
    expect(await withdraw(entry.id)).toMatchObject({ ok: false, status: 403 });
    actAs("other");
    expect(await withdraw(entry.id)).toMatchObject({ ok: false, status: 404 });
    actAs("owner");
    expect(await withdraw("no-such-entry")).toMatchObject({ ok: false, status: 404 });
    expect(await withdraw(demoUserId("designer"))).toMatchObject({ ok: false, status: 409 });
    expect((await teamEntry(ADDRESSES.client)).id).toBe(entry.id);
  });

  it("withdraws either kind alike: the pending row goes, or the new designer's place on the staff", async () => {
    actAs("owner");
    const fresh = await teamEntry(ADDRESSES.fresh);
    const client = await teamEntry(ADDRESSES.client);
    expect([await withdraw(fresh.id), await withdraw(client.id)]).toEqual([SENT, SENT]);
    const emails = (await listTeam(FERNLEAF)).map((e) => e.email);
    expect(emails).not.toContain(ADDRESSES.fresh);
    expect(emails).not.toContain(ADDRESSES.client);
    expect(await sql(`select 1 from studio_member m join user u on u.id = m.user_id where u.email = ?`, [ADDRESSES.fresh])).toEqual([]);
    expect(await sql(`select 1 from studio_invitation where email = ?`, [ADDRESSES.client])).toEqual([]);
    const audits = await sql<{ entity_type: string; detail: string }>(
      `select entity_type, detail from audit_log where action = 'team_invitation.withdrawn' and entity_id in (?, ?) order by json_extract(detail, '$.email')`,
      [fresh.id, client.id],
    );
    expect(audits.map((a) => ({ type: a.entity_type, detail: JSON.parse(a.detail) as unknown }))).toEqual([
      { type: "studio_person", detail: { email: ADDRESSES.client } },
      { type: "studio_person", detail: { email: ADDRESSES.fresh } },
    ]);
    // The withdrawn invitation no longer waits on the invited person's own landing page either.
    expect(await listMyStudioInvitations(await person(demoUserId("client")))).toEqual([]);
  });
});

describe("invitation limits on team invitations", () => {
  const TOO_MANY = { ok: false, status: 429, error: TOO_MANY_INVITATIONS };
  const addressKey = (email: string) => `invite:address:${email}`;

  it(`refuses a new address and an account alike once the address has had ${INVITE_LIMITS.perAddress} today, writing nothing`, async () => {
    actAs("owner");
    const started = new Date();
    for (const email of ["limit.fresh@example.com", "client2@demo.example"]) {
      await sql(`insert or replace into sign_in_throttle (key, failures, window_started_at) values (?, ?, ?)`, [addressKey(email), INVITE_LIMITS.perAddress, Date.now()]);
      expect(await invite(email)).toMatchObject(TOO_MANY);
      expect(await mailTo(email, started)).toEqual([]);
      expect(await inviteAudit(email)).toEqual([]);
      expect((await listTeam(FERNLEAF)).map((e) => e.email)).not.toContain(email);
    }
    expect(await sql(`select id from user where email = 'limit.fresh@example.com'`)).toEqual([]);
  });

  it(`refuses both alike past the studio's ${INVITE_LIMITS.perStudio} a day, and counts both kinds against it`, async () => {
    const key = `invite:studio:${FERNLEAF}`;
    await sql(`insert or replace into sign_in_throttle (key, failures, window_started_at) values (?, ?, ?)`, [key, INVITE_LIMITS.perStudio - 2, Date.now()]);
    actAs("owner");
    expect(await invite("under.limit@example.com")).toEqual(SENT);
    expect(await invite("otherclient@demo.example")).toEqual(SENT);
    expect(await invite("over.limit@example.com")).toMatchObject(TOO_MANY);
    expect(await invite("joinery@demo.example")).toMatchObject(TOO_MANY);
    const [row] = await sql<{ failures: number }>(`select failures from sign_in_throttle where key = ?`, [key]);
    expect(row?.failures).toBe(INVITE_LIMITS.perStudio);
    await sql(`delete from sign_in_throttle where key = ?`, [key]);
  });
});
