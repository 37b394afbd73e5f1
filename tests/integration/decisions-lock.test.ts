import { describe, expect, it } from "vitest";
import { POST as approve } from "@/app/api/decisions/[decisionId]/approve/route";
import { POST as choose } from "@/app/api/decisions/[decisionId]/choice/route";
import { GET as getDecision, PATCH as patchDecision } from "@/app/api/decisions/[decisionId]/route";
import { POST as send } from "@/app/api/decisions/[decisionId]/send/route";
import { POST as requestVariation } from "@/app/api/decisions/[decisionId]/variations/route";
import { listAuditForProject } from "@/db/queries/audit";
import { call, demo, type Reply } from "@/tests/support/decision-calls";
import { actAs, type Persona } from "@/tests/support/session";

type View = { status: string; version: number; lockedOptionId: string | null; choices: { comment: string | null }[]; approvals: { by: { name: string } }[] };

async function view(decisionId: string): Promise<View> {
  actAs("designer");
  const reply = await call(getDecision, { decisionId });
  expect(reply.status).toBe(200);
  return reply.body as unknown as View;
}

const auditCount = async () => (await listAuditForProject("demo-studio-fernleaf", demo.project, 10_000)).length;

/** Starts a call as `persona`; the session is read synchronously, so calls can overlap. */
function startAs(persona: Persona, work: () => Promise<Reply>) {
  actAs(persona);
  return work();
}

describe("locked means locked", () => {
  const editBody = (version: number) => ({
    room: demo.room("kitchen"),
    title: "Benchtop (edited)",
    allowanceCents: 1,
    dueDate: "2027-01-30",
    version,
    options: [
      { label: "A", priceCents: 1, lines: [{ finishId: demo.finish("saltbush"), quantity: 1, unit: "m²" }] },
      { label: "B", priceCents: 2, lines: [{ finishId: demo.finish("porcelain-chalk"), quantity: 1, unit: "m²" }] },
    ],
  });

  it("refuses every write to a locked decision with 409 and a plain message, changing nothing", async () => {
    const before = await view(demo.benchtop);
    const audits = await auditCount();
    expect(before.status).toBe("locked");
    const attempts: [Persona, () => Promise<Reply>][] = [
      ["designer", () => call(patchDecision, { decisionId: demo.benchtop }, { method: "PATCH", body: editBody(before.version) })],
      ["owner", () => call(patchDecision, { decisionId: demo.benchtop }, { method: "PATCH", body: editBody(before.version) })],
      ["designer", () => call(send, { decisionId: demo.benchtop }, { body: {} })],
      ["client", () => call(choose, { decisionId: demo.benchtop }, { body: { optionId: demo.option("kb-porcelain") } })],
      ["client2", () => call(approve, { decisionId: demo.benchtop }, { body: { optionId: demo.option("kb-quartzite"), confirm: true } })],
      ["client", () => call(approve, { decisionId: demo.benchtop }, { body: { optionId: demo.option("kb-limestone"), confirm: true } })],
    ];
    for (const [persona, attempt] of attempts) {
      actAs(persona);
      const reply = await attempt();
      expect(reply.status).toBe(409);
      expect(reply.body.error).toMatch(/approved and locked/);
    }
    expect(await view(demo.benchtop)).toEqual(before);
    expect(await auditCount()).toBe(audits);
  });

  it("answers 409 for a variation on a decision that isn't locked yet (edit it instead)", async () => {
    actAs("client");
    const reply = await call(requestVariation, { decisionId: demo.pendant }, { body: { reason: "Could we see a third pendant?" } });
    expect(reply.status).toBe(409);
  });
});

describe("concurrent approvals", () => {
  it("two clients approving at once: one 200, one 409, one approval", async () => {
    const [a, b] = await Promise.all([
      startAs("client", () => call(approve, { decisionId: demo.pendant }, { body: { optionId: demo.option("kp-opal"), confirm: true } })),
      startAs("client2", () => call(approve, { decisionId: demo.pendant }, { body: { optionId: demo.option("kp-brass"), confirm: true } })),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const after = await view(demo.pendant);
    expect(after.status).toBe("locked");
    expect(after.approvals).toHaveLength(1);
    const winner = a.status === 200 ? "kp-opal" : "kp-brass";
    expect(after.lockedOptionId).toBe(demo.option(winner));
  });

  it("fifty approvals racing with choices: exactly one approval and one lock, no choice lost", async () => {
    const before = await view(demo.splashback);
    const audits = (await listAuditForProject("demo-studio-fernleaf", demo.project, 10_000)).filter((e) => e.action === "decision.approved").length;
    const option = demo.option("ks-green");
    const approving: Promise<Reply>[] = [];
    const choosing: Promise<Reply>[] = [];
    for (let i = 0; i < 50; i++) {
      const persona: Persona = i % 2 ? "client" : "client2";
      approving.push(startAs(persona, () => call(approve, { decisionId: demo.splashback }, { body: { optionId: option, confirm: true } })));
      if (i % 5 === 0) choosing.push(startAs(persona, () => call(choose, { decisionId: demo.splashback }, { body: { optionId: option, comment: `pick ${i}` } })));
    }
    const [approved, chosen] = await Promise.all([Promise.all(approving), Promise.all(choosing)]);
    expect(approved.filter((r) => r.status === 200)).toHaveLength(1);
    expect(approved.filter((r) => r.status === 409)).toHaveLength(49);
    expect(chosen.every((r) => r.status === 200 || r.status === 409)).toBe(true);
    const choicesOk = chosen.filter((r) => r.status === 200).length;

    const after = await view(demo.splashback);
    expect(after.status).toBe("locked");
    expect(after.lockedOptionId).toBe(option);
    expect(after.approvals).toHaveLength(1);
    // Every choice that was answered 200 is still in the history; the winner adds at most one pick.
    const added = after.choices.length - before.choices.length;
    expect(added - choicesOk).toBeGreaterThanOrEqual(0);
    expect(added - choicesOk).toBeLessThanOrEqual(1);
    expect(after.choices.filter((c) => c.comment?.startsWith("pick ")).length).toBe(choicesOk);
    const approvedAudits = (await listAuditForProject("demo-studio-fernleaf", demo.project, 10_000)).filter((e) => e.action === "decision.approved").length;
    expect(approvedAudits - audits).toBe(1);
  }, 60_000);
});

describe("stale requests", () => {
  it("a designer's edit based on an older version is 409", async () => {
    const current = await view(demo.ensuiteFloor);
    actAs("client");
    expect((await call(choose, { decisionId: demo.ensuiteFloor }, { body: { optionId: demo.option("ef-porcelain") } })).status).toBe(200);
    actAs("designer");
    const reply = await call(
      patchDecision,
      { decisionId: demo.ensuiteFloor },
      {
        method: "PATCH",
        body: {
          room: "Ensuite",
          title: "Floor tile",
          allowanceCents: 180000,
          dueDate: "2027-01-15",
          version: current.version,
          options: [
            { label: "Porcelain", priceCents: 154000, lines: [{ finishId: demo.finish("tile-porcelain-600"), quantity: 7.5, unit: "m²" }] },
            { label: "Terrazzo", priceCents: 198000, lines: [{ finishId: demo.finish("floor-terrazzo-mist"), quantity: 7.5, unit: "m²" }] },
          ],
        },
      },
    );
    expect(reply.status).toBe(409);
    expect(reply.body.error).toMatch(/changed since you opened it/);
  });

  it("an approval of what the client saw before the designer changed it is 409", async () => {
    const seen = await view(demo.cabinets);
    actAs("client2");
    expect((await call(choose, { decisionId: demo.cabinets }, { body: { optionId: demo.option("kc-sage"), version: seen.version } })).status).toBe(200);
    actAs("client");
    const reply = await call(approve, { decisionId: demo.cabinets }, { body: { optionId: demo.option("kc-oat"), confirm: true, version: seen.version } });
    expect(reply.status).toBe(409);
    expect((await view(demo.cabinets)).status).toBe("chosen");
  });
});
