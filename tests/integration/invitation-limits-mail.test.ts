import { createServer } from "node:net";
import { afterEach, describe, expect, it, vi } from "vitest";
import { POST as send } from "@/app/api/decisions/[decisionId]/send/route";
import { INVITE_LIMITS, TOO_MANY_INVITATIONS } from "@/db/queries/invite-limits";
import { listProjectPeople } from "@/db/queries/projects";
import { env } from "@/lib/env";
import { call, demo } from "@/tests/support/decision-calls";
import { answerShown, FERNLEAF_PROJECT, mailTo, NORTHWALL_PROJECT, postInvite } from "@/tests/support/invite-calls";
import { actAs } from "@/tests/support/session";
import { sql } from "./boards-support";

// Project rules (no outside source): the brief's limits (50 invitations per studio and 5 per
// address a day) and truthful answers when the mail server is down. 429 for "too many" is
// RFC 6585 §4; 502 for a failed upstream (the mail server) follows RFC 9110 §15.6.3.
vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

const workingSmtp = env.SMTP_URL;
afterEach(() => {
  Object.assign(env, { SMTP_URL: workingSmtp });
});

/** A port nothing listens on: bound, then released. */
async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const address = server.address();
  await new Promise<void>((resolve) => server.close(() => resolve()));
  if (!address || typeof address === "string") throw new Error("no port");
  return address.port;
}
const mailServerDown = async () => Object.assign(env, { SMTP_URL: `smtp://127.0.0.1:${await closedPort()}` });
const TOO_MANY = { ok: false, status: 429, error: TOO_MANY_INVITATIONS };

describe("limits on invitations", () => {
  it(`refuses a ${INVITE_LIMITS.perAddress + 1}th invitation to one address in a day, across studios, sending nothing`, async () => {
    const started = new Date();
    actAs("designer");
    for (let i = 0; i < INVITE_LIMITS.perAddress - 1; i++) expect(answerShown(await postInvite({ name: "Target", email: "target@example.com" }))).toMatchObject({ ok: true });
    actAs("other");
    expect(answerShown(await postInvite({ projectId: NORTHWALL_PROJECT, name: "Target", email: "target@example.com" }))).toMatchObject({ ok: true });
    expect(await postInvite({ projectId: NORTHWALL_PROJECT, name: "Target", email: "TARGET@example.com" })).toMatchObject(TOO_MANY);
    actAs("designer");
    expect(await postInvite({ name: "Target", email: "target@example.com" })).toMatchObject(TOO_MANY);
    expect(await mailTo("target@example.com", started)).toHaveLength(INVITE_LIMITS.perAddress);
  });

  it(`refuses a studio's ${INVITE_LIMITS.perStudio + 1}th invitation in a day, and allows it again once the day is over`, async () => {
    const key = "invite:studio:demo-studio-fernleaf";
    await sql(`insert or replace into sign_in_throttle (key, failures, window_started_at) values (?, ?, ?)`, [key, INVITE_LIMITS.perStudio, Date.now()]);
    actAs("designer");
    expect(await postInvite({ name: "One more", email: "one.more@example.com" })).toMatchObject(TOO_MANY);
    expect(await sql(`select id from user where email = 'one.more@example.com'`)).toEqual([]);
    await sql(`update sign_in_throttle set window_started_at = ? where key = ?`, [Date.now() - INVITE_LIMITS.windowMs - 1, key]);
    expect(answerShown(await postInvite({ name: "One more", email: "one.more@example.com" }))).toEqual({ ok: true, data: undefined });
  });

  it("doesn't count a refused invitation (already on the project)", async () => {
    actAs("designer");
    const [before] = await sql<{ failures: number }>(`select failures from sign_in_throttle where key = 'invite:studio:demo-studio-fernleaf'`);
    expect(await postInvite({ name: "Noor", email: "client@demo.example" })).toMatchObject({ status: 409 });
    const [after] = await sql<{ failures: number }>(`select failures from sign_in_throttle where key = 'invite:studio:demo-studio-fernleaf'`);
    expect(after?.failures).toBe(before?.failures);
  });
});

describe("when the mail server is down", () => {
  it("keeps the invitation and says so, in the same words for a new address and an existing account", async () => {
    await mailServerDown();
    actAs("designer");
    const fresh = await postInvite({ name: "Fresh", email: "fresh.down@example.com" });
    const existing = await postInvite({ name: "Wren", email: "otherclient@demo.example" });
    expect(fresh).toMatchObject({ ok: false, status: 502 });
    expect(answerShown(existing)).toEqual(answerShown(fresh));
    const error = fresh.ok ? "" : fresh.error;
    expect(error).toMatch(/^Invitation saved, but the invitation e-mail could not be sent/);
    expect(error).not.toMatch(/Nothing was changed/);
    const people = (await listProjectPeople(FERNLEAF_PROJECT)).map((p) => p.email);
    expect(people).toEqual(expect.arrayContaining(["fresh.down@example.com", "otherclient@demo.example"]));
  });

  it("sends it when asked again once the mail server is back", async () => {
    const started = new Date();
    actAs("designer");
    expect(answerShown(await postInvite({ name: "Fresh", email: "fresh.down@example.com" }))).toEqual({ ok: true, data: undefined });
    expect(answerShown(await postInvite({ name: "Wren", email: "otherclient@demo.example" }))).toEqual({ ok: true, data: undefined });
    expect(await mailTo("fresh.down@example.com", started)).toHaveLength(1);
  });

  it("“Send to client” answers 502 naming who wasn't e-mailed, and the decision stays sent", async () => {
    await mailServerDown();
    actAs("designer");
    const sentBefore = await sql(`select id from audit_log where action = 'decision.sent' and entity_id = ?`, [demo.splashback]);
    const reply = await call(send, { decisionId: demo.splashback }, { body: {} });
    expect(reply.status).toBe(502);
    expect(reply.body).toMatchObject({ sent: false, delivered: [] });
    expect(reply.body.failed).toEqual(expect.arrayContaining(["client@demo.example", "client2@demo.example"]));
    expect(String(reply.body.error)).toMatch(/^Marked as sent, but the e-mail could not be sent/);
    const sent = await sql(`select id from audit_log where action = 'decision.sent' and entity_id = ?`, [demo.splashback]);
    // The seed's own history already records the first send; this one adds exactly one more.
    expect(sent).toHaveLength(sentBefore.length + 1);
  });

  it("“Send to client” answers 200 once every client was e-mailed", async () => {
    actAs("designer");
    const reply = await call(send, { decisionId: demo.splashback }, { body: {} });
    expect(reply).toMatchObject({ status: 200, body: { sent: true } });
    expect(reply.body.delivered).toEqual(expect.arrayContaining(["client@demo.example", "client2@demo.example"]));
  });
});
