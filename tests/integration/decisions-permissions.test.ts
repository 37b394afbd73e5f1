import { beforeAll, describe, expect, it } from "vitest";
import { POST as approve } from "@/app/api/decisions/[decisionId]/approve/route";
import { POST as choose } from "@/app/api/decisions/[decisionId]/choice/route";
import { GET as getDecision, PATCH as patchDecision } from "@/app/api/decisions/[decisionId]/route";
import { POST as send } from "@/app/api/decisions/[decisionId]/send/route";
import { POST as approveVariation } from "@/app/api/decisions/[decisionId]/variations/[variationId]/approve/route";
import { POST as decline } from "@/app/api/decisions/[decisionId]/variations/[variationId]/decline/route";
import { POST as price } from "@/app/api/decisions/[decisionId]/variations/[variationId]/price/route";
import { POST as withdraw } from "@/app/api/decisions/[decisionId]/variations/[variationId]/withdraw/route";
import { POST as requestVariation } from "@/app/api/decisions/[decisionId]/variations/route";
import { GET as listDecisions, POST as createDecision } from "@/app/api/projects/[projectId]/decisions/route";
import { inviteToProject } from "@/db/queries/project-invite";
import { getActor, getUserByEmail } from "@/db/queries/users";
import { actAsUser, call, demo, newDecisionBody, type Reply } from "@/tests/support/decision-calls";
import { actAs, demoUserId, type Persona } from "@/tests/support/session";

// The permission table of PRODUCT.md: staff of the project's studio create, edit and price;
// the project's clients choose, approve and ask for changes; suppliers are refused (403);
// anyone who may not see the project gets 404; signed-out callers 401. As in the permission
// matrix (tests/support/permission-expectations.ts), the role is checked first: a client-only
// step refuses any studio's staff with 403, then visibility answers 404.
const refusals: [Persona, number][] = [
  ["anonymous", 401],
  ["stone", 403],
  ["other", 404],
];
const clientStepRefusals: [Persona, number][] = [
  ["anonymous", 401],
  ["stone", 403],
  ["other", 403],
];
const staff: Persona[] = ["owner", "designer"];
const clients: Persona[] = ["client", "client2"];

async function as(persona: Persona, work: () => Promise<Reply>) {
  actAs(persona);
  return work();
}

const version = async (decisionId: string) => {
  actAs("designer");
  return (await call(getDecision, { decisionId })).body.version as number;
};

function expectNoDecisionData(reply: Reply) {
  expect(Object.keys(reply.body)).toEqual(expect.arrayContaining(["error"]));
  expect(JSON.stringify(reply.body)).not.toMatch(/priceCents|allowanceCents|options/);
}

let outsiderClient = "";
beforeAll(async () => {
  // A client of another studio's project: must never see this project's decisions.
  const other = await getActor(demoUserId("other"));
  if (!other) throw new Error("no other designer");
  await inviteToProject(other, demo.otherProject, { email: "quarry.client@example.com", name: "Quarry Client", role: "client" });
  outsiderClient = (await getUserByEmail("quarry.client@example.com"))?.id ?? "";
});

describe("reading decisions", () => {
  it("gives the seeded project's running total as worked by hand (see tests/unit/decisions/budget.test.ts)", async () => {
    const reply = await as("client", () => call(listDecisions, { projectId: demo.project }));
    expect(reply.body.budget).toMatchObject({ allowanceCents: 3600000, runningCents: 3510000, differenceCents: -90000 });
  });

  it.each([...refusals, ["owner", 200], ["designer", 200], ["client", 200], ["client2", 200]] as [Persona, number][])(
    "GET /api/projects/:id/decisions as %s → %i",
    async (persona, status) => {
      const reply = await as(persona, () => call(listDecisions, { projectId: demo.project }));
      expect(reply.status).toBe(status);
      if (status === 200) expect((reply.body.items as unknown[]).length).toBe(6);
      else expectNoDecisionData(reply);
    },
  );

  it.each([...refusals, ["owner", 200], ["designer", 200], ["client", 200], ["client2", 200]] as [Persona, number][])(
    "GET /api/decisions/:id as %s → %i",
    async (persona, status) => {
      const reply = await as(persona, () => call(getDecision, { decisionId: demo.pendant }));
      expect(reply.status).toBe(status);
      if (status === 200) expect((reply.body.options as unknown[]).length).toBe(2);
      else expectNoDecisionData(reply);
    },
  );

  it("another project's client sees neither the list nor a decision, and can't pick or approve (404)", async () => {
    actAsUser(outsiderClient);
    const list = await call(listDecisions, { projectId: demo.project });
    expect(list.status).toBe(404);
    expectNoDecisionData(list);
    const one = await call(getDecision, { decisionId: demo.pendant });
    expect(one.status).toBe(404);
    expectNoDecisionData(one);
    expect((await call(choose, { decisionId: demo.pendant }, { body: { optionId: demo.option("kp-opal") } })).status).toBe(404);
    expect((await call(approve, { decisionId: demo.pendant }, { body: { optionId: demo.option("kp-opal"), confirm: true } })).status).toBe(404);
  });

  it("checks access before the body: an outsider with an empty body is refused, not told what's missing", async () => {
    expect((await as("other", () => call(createDecision, { projectId: demo.project }, { body: {} }))).status).toBe(404);
    expect((await as("client", () => call(patchDecision, { decisionId: demo.pendant }, { method: "PATCH", body: {} }))).status).toBe(403);
    expect((await as("designer", () => call(choose, { decisionId: demo.pendant }, { body: {} }))).status).toBe(403);
    expect((await as("designer", () => call(createDecision, { projectId: demo.project }, { body: {} }))).status).toBe(400);
  });

  it("answers 404 for a decision that doesn't exist", async () => {
    actAs("designer");
    expect((await call(getDecision, { decisionId: "no-such-decision" })).status).toBe(404);
  });
});

describe("designer steps", () => {
  it.each([...refusals, ["client", 403], ["client2", 403], ["owner", 201], ["designer", 201]] as [Persona, number][])(
    "POST /api/projects/:id/decisions as %s → %i",
    async (persona, status) => {
      const reply = await as(persona, () => call(createDecision, { projectId: demo.project }, { body: newDecisionBody() }));
      expect(reply.status).toBe(status);
    },
  );

  it.each([...refusals, ["client", 403], ["client2", 403], ["owner", 200], ["designer", 200]] as [Persona, number][])(
    "PATCH /api/decisions/:id as %s → %i",
    async (persona, status) => {
      const current = await version(demo.splashback);
      const body = {
        room: demo.room("kitchen"),
        title: "Splashback",
        allowanceCents: 320000,
        dueDate: "2026-12-22",
        version: current,
        options: [
          { id: demo.option("ks-stone"), label: "Limestone to match the benchtop", priceCents: 412000, lines: [{ finishId: demo.finish("saltbush"), quantity: 2.4, unit: "m²" }] },
          { id: demo.option("ks-zellige"), label: "White glazed handmade tile", priceCents: 265000, lines: [{ finishId: demo.finish("tile-zellige-white"), quantity: 2.4, unit: "m²" }] },
          { id: demo.option("ks-green"), label: "Deep green glazed handmade tile", priceCents: 265000, lines: [{ finishId: demo.finish("tile-zellige-green"), quantity: 2.4, unit: "m²" }] },
        ],
      };
      const reply = await as(persona, () => call(patchDecision, { decisionId: demo.splashback }, { method: "PATCH", body }));
      expect(reply.status).toBe(status);
    },
  );

  it.each([...refusals, ["client", 403], ["client2", 403], ["owner", 200], ["designer", 200]] as [Persona, number][])(
    "POST /api/decisions/:id/send as %s → %i",
    async (persona, status) => {
      expect((await as(persona, () => call(send, { decisionId: demo.pendant }, { body: {} }))).status).toBe(status);
    },
  );
});

describe("client steps", () => {
  it.each([...clientStepRefusals, ["owner", 403], ["designer", 403], ["client", 200], ["client2", 200]] as [Persona, number][])(
    "POST /api/decisions/:id/choice as %s → %i",
    async (persona, status) => {
      const body = { optionId: demo.option("kp-opal"), comment: `${persona} likes the opal` };
      expect((await as(persona, () => call(choose, { decisionId: demo.pendant }, { body }))).status).toBe(status);
    },
  );

  it.each([...clientStepRefusals, ["owner", 403], ["designer", 403]] as [Persona, number][])("POST /api/decisions/:id/approve as %s → %i", async (persona, status) => {
    const body = { optionId: demo.option("kp-opal"), confirm: true };
    expect((await as(persona, () => call(approve, { decisionId: demo.pendant }, { body }))).status).toBe(status);
  });

  it("either client may approve, and both see who did", async () => {
    const first = await as("client", () => call(approve, { decisionId: demo.splashback }, { body: { optionId: demo.option("ks-zellige"), confirm: true } }));
    expect(first.status).toBe(200);
    const second = await as("client2", () => call(approve, { decisionId: demo.ensuiteFloor }, { body: { optionId: demo.option("ef-terrazzo"), confirm: true } }));
    expect(second.status).toBe(200);
    for (const persona of clients) {
      const view = await as(persona, () => call(getDecision, { decisionId: demo.splashback }));
      const approvals = view.body.approvals as { by: { name: string } }[];
      expect(approvals.map((a) => a.by.name)).toEqual(["Noor Haddad"]);
    }
    for (const persona of staff) {
      const view = await as(persona, () => call(getDecision, { decisionId: demo.ensuiteFloor }));
      expect((view.body.approvals as { by: { name: string } }[])[0]?.by.name).toBe("Callum Haddad");
    }
  });
});

describe("variation steps", () => {
  const variationOf = (reply: Reply) => (reply.body.variation as { id: string }).id;

  it.each([...refusals, ["client", 201], ["designer", 201], ["client2", 201], ["owner", 201]] as [Persona, number][])(
    "POST /api/decisions/:id/variations as %s → %i (each then withdrawn)",
    async (persona, status) => {
      const reply = await as(persona, () => call(requestVariation, { decisionId: demo.laundry }, { body: { reason: `${persona} would like a thicker edge` } }));
      expect(reply.status).toBe(status);
      if (status === 201) {
        const withdrawn = await as(persona, () => call(withdraw, { decisionId: demo.laundry, variationId: variationOf(reply) }, { body: {} }));
        expect(withdrawn.status).toBe(200);
      }
    },
  );

  const kb = { decisionId: demo.benchtop, variationId: "demo-variation-kb" };
  const priceBody = { priceDeltaCents: 46200, timeImpactDays: 3 };

  it.each([...refusals, ["client", 403], ["client2", 403], ["designer", 200], ["owner", 200]] as [Persona, number][])(
    "POST …/variations/:id/price as %s → %i",
    async (persona, status) => {
      expect((await as(persona, () => call(price, kb, { body: priceBody }))).status).toBe(status);
    },
  );

  it.each([...clientStepRefusals, ["owner", 403], ["designer", 403]] as [Persona, number][])("POST …/variations/:id/decline as %s → %i", async (persona, status) => {
    expect((await as(persona, () => call(decline, kb, { body: {} }))).status).toBe(status);
  });

  it.each([...clientStepRefusals, ["owner", 403], ["designer", 403], ["client2", 200], ["client", 409]] as [Persona, number][])(
    "POST …/variations/:id/approve as %s → %i (the second client finds it already approved)",
    async (persona, status) => {
      expect((await as(persona, () => call(approveVariation, kb, { body: { confirm: true } }))).status).toBe(status);
    },
  );

  it("a client can't withdraw a variation someone else asked for", async () => {
    const asked = await as("client", () => call(requestVariation, { decisionId: demo.laundry }, { body: { reason: "Undermount sink instead" } }));
    expect(asked.status).toBe(201);
    const ids = { decisionId: demo.laundry, variationId: variationOf(asked) };
    expect((await as("client2", () => call(withdraw, ids, { body: {} }))).status).toBe(403);
    expect((await as("stone", () => call(withdraw, ids, { body: {} }))).status).toBe(403);
    expect((await as("other", () => call(withdraw, ids, { body: {} }))).status).toBe(404);
    expect((await as("designer", () => call(withdraw, ids, { body: {} }))).status).toBe(200);
  });

  it("a variation id under the wrong decision is 404", async () => {
    const reply = await as("designer", () => call(price, { decisionId: demo.laundry, variationId: "demo-variation-kb" }, { body: priceBody }));
    expect(reply.status).toBe(404);
  });
});
