import { describe, expect, it } from "vitest";
import { GET as getBoard } from "@/app/api/boards/[boardId]/route";
import { POST as choose } from "@/app/api/decisions/[decisionId]/choice/route";
import { GET as getDecision } from "@/app/api/decisions/[decisionId]/route";
import { PATCH as patchFinish } from "@/app/api/finishes/[finishId]/route";
import { GET as listFinishes } from "@/app/api/finishes/route";
import { POST as createDecision } from "@/app/api/projects/[projectId]/decisions/route";
import { answerInvitation, listPendingInvitations } from "@/db/queries/invitations";
import { inviteToProject } from "@/db/queries/project-invite";
import { getActor } from "@/db/queries/users";
import { CHOICES_SHOWN } from "@/db/queries/decision-view";
import type { BoardView } from "@/lib/boards/types";
import type { DecisionView } from "@/lib/decisions/types";
import { readCaughtMail } from "@/lib/mail/caught";
import { call, demo, newDecisionBody } from "@/tests/support/decision-calls";
import { actAs, demoUserId } from "@/tests/support/session";
import { BOARD, sql } from "./boards-support";

// Project rules (no outside source): reads are cached until the next write (db/queries/read-cache.ts),
// so every check here is "what was just saved is what the next read shows", for the people and
// the screens the caches sit under.

describe("what was just saved is what the next read shows", () => {
  it("a board shows a finish renamed in the library since it was last read", async () => {
    actAs("designer");
    const before = (await call(getBoard, { boardId: BOARD })).body as unknown as BoardView;
    const item = before.items[0];
    if (!item) throw new Error("the demo board has swatches");
    expect((await call(patchFinish, { finishId: item.finish.id }, { method: "PATCH", body: { name: "Renamed for the cache test" } })).status).toBe(200);
    const after = (await call(getBoard, { boardId: BOARD })).body as unknown as BoardView;
    expect(after.items.find((i) => i.id === item.id)?.finish.name).toBe("Renamed for the cache test");
  });

  it("a page of the finish table shows an edit made since it was last read", async () => {
    actAs("designer");
    const list = async () => (await call(listFinishes, {}, { method: "GET" })).body as { items: { id: string; name: string }[] };
    const first = (await list()).items[0];
    if (!first) throw new Error("the demo library has finishes");
    await call(patchFinish, { finishId: first.id }, { method: "PATCH", body: { name: `${first.name} (edited)` } });
    expect((await list()).items.find((f) => f.id === first.id)?.name).toBe(`${first.name} (edited)`);
  });

  it("a person added to a project can open its decisions on their very next request", async () => {
    actAs("otherclient");
    expect((await call(getDecision, { decisionId: demo.pendant })).status).toBe(404);
    const designer = await getActor(demoUserId("designer"));
    if (!designer) throw new Error("the demo designer exists");
    await inviteToProject(designer, demo.project, { email: "otherclient@demo.example", name: "Other client", role: "client" });
    const invited = await getActor(demoUserId("otherclient"));
    const [invitation] = invited ? await listPendingInvitations(invited) : [];
    if (!invited || !invitation) throw new Error("the invitation is waiting for them");
    await answerInvitation(invited, invitation.id, "accept");
    expect((await call(getDecision, { decisionId: demo.pendant })).status).toBe(200);
  });
});

describe("a client's picks", () => {
  it("picking the same option again with nothing to say adds no history and no e-mail", async () => {
    actAs("designer");
    const created = await call(createDecision, { projectId: demo.project }, { body: newDecisionBody({ title: "Pantry shelf timber" }) });
    const decision = created.body as unknown as DecisionView;
    const optionId = decision.options[0]?.id ?? "";
    const started = new Date();
    actAs("client");
    expect((await call(choose, { decisionId: decision.id }, { body: { optionId } })).status).toBe(200);
    const again = await call(choose, { decisionId: decision.id }, { body: { optionId } });
    expect(again.status).toBe(200);
    expect((again.body as unknown as DecisionView).choices).toHaveLength(1);
    // With something to say, it is a new line of history.
    const commented = await call(choose, { decisionId: decision.id }, { body: { optionId, comment: "Still this one." } });
    expect((commented.body as unknown as DecisionView).choices).toHaveLength(2);
    const [row] = await sql<{ count: number }>("select count(*) as count from choice where decision_id = ?", [decision.id]);
    expect(row?.count).toBe(2);
    await new Promise((resolve) => setTimeout(resolve, 500));
    const mails = await readCaughtMail(process.env.MAIL_CATCHER_DIR ?? "", { to: "designer@demo.example" });
    expect(mails.filter((m) => m.subject.includes("Pantry shelf timber") && Date.parse(m.receivedAt) >= started.getTime())).toHaveLength(2);
  });

  it(`lists the newest ${CHOICES_SHOWN} picks and counts the rest; the newest is the current one`, async () => {
    actAs("designer");
    const created = await call(createDecision, { projectId: demo.project }, { body: newDecisionBody({ title: "Scullery shelf timber" }) });
    const decision = created.body as unknown as DecisionView;
    const [oak, walnut] = decision.options.map((o) => o.id);
    // 33 earlier picks, a second apart, alternating from oak; then two through the app.
    const start = Date.now() - 3_600_000;
    for (let n = 0; n < CHOICES_SHOWN + 3; n++) {
      await sql("insert into choice (id, decision_id, option_id, user_id, comment, created_at) values (?, ?, ?, ?, null, ?)", [
        `cache-test-pick-${n}`, decision.id, (n % 2 ? walnut : oak) ?? "", demoUserId("client"), start + n * 1000,
      ]);
    }
    actAs("client");
    await call(choose, { decisionId: decision.id }, { body: { optionId: oak } });
    const last = (await call(choose, { decisionId: decision.id }, { body: { optionId: walnut } })).body as unknown as DecisionView;
    expect(last.choices).toHaveLength(CHOICES_SHOWN);
    expect(last.earlierChoiceCount).toBe(5);
    expect(last.currentChoice?.optionId).toBe(walnut);
    expect(last.choices.map((c) => c.optionId).slice(0, 3)).toEqual([walnut, oak, oak]);
  });
});
