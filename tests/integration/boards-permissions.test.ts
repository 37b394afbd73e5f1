import { beforeAll, describe, expect, it } from "vitest";
import { GET as getBoard } from "@/app/api/boards/[boardId]/route";
import { POST as duplicate } from "@/app/api/boards/[boardId]/duplicate/route";
import { GET as findFinishes } from "@/app/api/boards/[boardId]/finishes/route";
import { PATCH as changeItem } from "@/app/api/boards/[boardId]/items/[itemId]/route";
import { POST as addItem } from "@/app/api/boards/[boardId]/items/route";
import { POST as addPair } from "@/app/api/boards/[boardId]/pairs/route";
import { GET as listBoards, POST as createBoard } from "@/app/api/projects/[projectId]/boards/route";
import { actAs, sessionStub, type Persona } from "@/tests/support/session";
import { BOARD, callRoute, PROJECT, sql } from "./boards-support";

// The seed has no client of another project, so this file adds one: a client of the other
// studio's Quarry Lane project, who must not see the Marrow Street boards.
const OUTSIDE_CLIENT = "it-user-quarry-client";
beforeAll(async () => {
  await sql("insert into user (id, email, name) values (?, ?, ?)", [OUTSIDE_CLIENT, "quarry-client@test.example", "Quarry client"]);
  await sql("insert into project_member (id, project_id, user_id, role) values (?, ?, ?, 'client')", [
    "it-member-quarry-client",
    "demo-project-quarry",
    OUTSIDE_CLIENT,
  ]);
});

type Who = Persona | "outside-client";
function become(who: Who) {
  if (who === "outside-client") {
    sessionStub.current = { user: { id: OUTSIDE_CLIENT }, expires: new Date(Date.now() + 3_600_000).toISOString() };
  } else actAs(who);
}

const version = async () => Number((await sql<{ version: number }>("select version from board where id = ?", [BOARD]))[0]?.version);

describe("reading boards: staff and the project's clients read, nobody else", () => {
  // Expected statuses follow the permission table in PRODUCT.md: suppliers see only locked lines.
  it.each<[Who, number]>([
    ["owner", 200],
    ["designer", 200],
    ["client", 200],
    ["client2", 200],
    ["other", 404],
    ["outside-client", 404],
    ["stone", 403],
    ["joinery", 403],
    ["anonymous", 401],
  ])("GET /api/boards/:id as %s → %i", async (who, status) => {
    become(who);
    const res = await callRoute(getBoard, `/api/boards/${BOARD}`, { boardId: BOARD });
    expect(res.status).toBe(status);
    if (status === 200) expect(res.body.items).toHaveLength(10);
    else expect(res.body.error).toEqual(expect.any(String));
  });

  it.each<[Who, number]>([
    ["owner", 200],
    ["designer", 200],
    ["client", 200],
    ["other", 404],
    ["outside-client", 404],
    ["stone", 403],
    ["anonymous", 401],
  ])("GET /api/projects/:id/boards as %s → %i", async (who, status) => {
    become(who);
    const res = await callRoute(listBoards, `/api/projects/${PROJECT}/boards`, { projectId: PROJECT });
    expect(res.status).toBe(status);
  });

  it("tells the client the board is read-only and proposes nothing to them", async () => {
    become("client");
    const { body } = await callRoute(getBoard, `/api/boards/${BOARD}`, { boardId: BOARD });
    expect(body.access).toBe("read");
    expect(body.proposals).toEqual([]);
    become("designer");
    expect((await callRoute(getBoard, `/api/boards/${BOARD}`, { boardId: BOARD })).body.access).toBe("edit");
  });

  it("answers 404 for a board that does not exist", async () => {
    become("designer");
    expect((await callRoute(getBoard, "/api/boards/nope", { boardId: "nope" })).status).toBe(404);
  });
});

describe("writing boards: studio staff only", () => {
  it.each<[Who, number]>([
    ["client", 403],
    ["client2", 403],
    ["stone", 403],
    ["other", 404],
    ["outside-client", 403],
    ["anonymous", 401],
  ])("as %s every write is refused with %i and nothing changes", async (who, status) => {
    const before = await version();
    const items = await sql("select count(*) as n from board_item");
    become(who);
    const results = await Promise.all([
      callRoute(changeItem, `/api/boards/${BOARD}/items/demo-item-tap`, { boardId: BOARD, itemId: "demo-item-tap" }, { method: "PATCH", body: { version: before, x: 20 } }),
      callRoute(addItem, `/api/boards/${BOARD}/items`, { boardId: BOARD }, {
        method: "POST",
        body: { version: before, finishId: "demo-finish-cab-ink", label: "Wall", x: 0, y: 600, width: 100, height: 100 },
      }),
      callRoute(addPair, `/api/boards/${BOARD}/pairs`, { boardId: BOARD }, {
        method: "POST",
        body: { version: before, itemAId: "demo-item-tap", itemBId: "demo-item-splash", intent: "contrast", accessRelevant: false },
      }),
      callRoute(duplicate, `/api/boards/${BOARD}/duplicate`, { boardId: BOARD }, { method: "POST", body: { version: before } }),
      callRoute(createBoard, `/api/projects/${PROJECT}/boards`, { projectId: PROJECT }, { method: "POST", body: { roomId: "demo-room-kitchen", name: "Sneaky" } }),
      callRoute(findFinishes, `/api/boards/${BOARD}/finishes?q=oak`, { boardId: BOARD }),
    ]);
    // The other studio's designer gets 404 everywhere: the project is not theirs to know of.
    for (const res of results) expect(res.status).toBe(status);
    expect(await version()).toBe(before);
    expect(await sql("select count(*) as n from board_item")).toEqual(items);
  });

  it.each<Who>(["owner", "designer"])("as %s a write is accepted", async (who) => {
    become(who);
    const before = await version();
    const res = await callRoute(changeItem, `/api/boards/${BOARD}/items/demo-item-tap`, { boardId: BOARD, itemId: "demo-item-tap" }, {
      method: "PATCH",
      body: { version: before, x: 1040 },
    });
    expect(res.status).toBe(200);
    expect((res.body.board as { version: number }).version).toBe(before + 1);
  });
});
