import { describe, expect, it } from "vitest";
import { GET as getBoard } from "@/app/api/boards/[boardId]/route";
import { POST as duplicate } from "@/app/api/boards/[boardId]/duplicate/route";
import { POST as reorder } from "@/app/api/boards/[boardId]/items/order/route";
import { DELETE as removeItem, PATCH as changeItem } from "@/app/api/boards/[boardId]/items/[itemId]/route";
import { POST as addItem } from "@/app/api/boards/[boardId]/items/route";
import { DELETE as removePair, PATCH as changePair } from "@/app/api/boards/[boardId]/pairs/[pairId]/route";
import { POST as addPair } from "@/app/api/boards/[boardId]/pairs/route";
import { POST as createBoard } from "@/app/api/projects/[projectId]/boards/route";
import { actAs } from "@/tests/support/session";
import { BOARD, callRoute, PROJECT, sql } from "./boards-support";

type View = { board: { version: number }; items: { id: string; x: number; y: number; label: string; sortOrder: number }[]; pairs: { id: string; itemAId: string; itemBId: string; intent: string }[] };

const read = async (boardId = BOARD) => {
  actAs("designer");
  return (await callRoute(getBoard, `/api/boards/${boardId}`, { boardId })).body as unknown as View;
};
const snapshot = async (boardId = BOARD) => ({
  board: await sql("select version, name from board where id = ?", [boardId]),
  items: await sql("select id, finish_id, label, x, y, width, height, sort_order from board_item where board_id = ? order by id", [boardId]),
  pairs: await sql("select id, item_a_id, item_b_id, intent, access_relevant from adjacency where board_id = ? order by id", [boardId]),
});
const item = (itemId: string, body: unknown, method = "PATCH") =>
  callRoute(method === "PATCH" ? changeItem : removeItem, `/api/boards/${BOARD}/items/${itemId}`, { boardId: BOARD, itemId }, { method, body });
const newItem = (body: Record<string, unknown>) => callRoute(addItem, `/api/boards/${BOARD}/items`, { boardId: BOARD }, { method: "POST", body });

describe("placing, moving and removing swatches", () => {
  it("places a finish and answers with the whole board at the next version", async () => {
    const { board } = await read();
    const res = await newItem({ version: board.version, finishId: "demo-finish-cab-ink", label: "Wall cabinets", x: 0, y: 640, width: 160, height: 160 });
    expect(res.status).toBe(201);
    const view = res.body as unknown as View & { createdId: string };
    expect(view.board.version).toBe(board.version + 1);
    const placed = view.items.find((i) => i.id === view.createdId);
    expect(placed).toMatchObject({ label: "Wall cabinets", x: 0, y: 640 });
    expect(placed?.sortOrder).toBe(Math.max(...view.items.map((i) => i.sortOrder)));
  });

  it("moves and relabels a swatch", async () => {
    const { board } = await read();
    const res = await item("demo-item-handles", { version: board.version, x: 980, y: 240, label: "Handles, brass" });
    expect(res.status).toBe(200);
    expect((res.body as unknown as View).items.find((i) => i.id === "demo-item-handles")).toMatchObject({ x: 980, y: 240, label: "Handles, brass" });
  });

  it.each([
    ["another studio's finish", { finishId: "demo-finish-northwall-limestone" }, "finishId"],
    ["a finish that does not exist", { finishId: "no-such-finish" }, "finishId"],
    ["a swatch hanging off the right edge", { x: 1100, width: 200 }, "width"],
    ["a swatch hanging off the bottom", { y: 700, height: 200 }, "height"],
    ["a negative position", { x: -20 }, "x"],
    ["a swatch too small to judge", { width: 10 }, "width"],
    ["no label", { label: " " }, "label"],
  ])("refuses %s with 400 and saves nothing", async (_what, patch, field) => {
    const before = await snapshot();
    const { board } = await read();
    const res = await newItem({ version: board.version, finishId: "demo-finish-cab-ink", label: "Wall", x: 0, y: 600, width: 100, height: 100, ...patch });
    expect(res.status).toBe(400);
    expect(res.body.fieldErrors).toHaveProperty(field);
    expect(await snapshot()).toEqual(before);
  });

  it("refuses an archived finish", async () => {
    await sql("update finish set archived_at = 1 where id = 'demo-finish-cab-walnut'");
    const { board } = await read();
    const res = await newItem({ version: board.version, finishId: "demo-finish-cab-walnut", label: "Wall", x: 0, y: 600, width: 100, height: 100 });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(/archived/);
    await sql("update finish set archived_at = null where id = 'demo-finish-cab-walnut'");
  });

  it("refuses a move that would push the swatch off the board, keeping it where it was", async () => {
    const before = await snapshot();
    const { board } = await read();
    // The benchtop is 360 wide: x = 900 puts its right edge at 1260.
    const res = await item("demo-item-benchtop", { version: board.version, x: 900 });
    expect(res.status).toBe(400);
    expect(await snapshot()).toEqual(before);
  });

  it("removes a swatch together with the pairs it was in", async () => {
    const { board } = await read();
    const res = await item("demo-item-island", { version: board.version }, "DELETE");
    expect(res.status).toBe(200);
    const view = res.body as unknown as View;
    expect(view.items.some((i) => i.id === "demo-item-island")).toBe(false);
    expect(view.pairs.some((p) => p.itemAId === "demo-item-island" || p.itemBId === "demo-item-island")).toBe(false);
    expect(await sql("select id from adjacency where id = 'demo-pair-island-floor'")).toEqual([]);
  });

  it("reorders the stack only when the list names every swatch once", async () => {
    const { board, items } = await read();
    const ids = items.map((i) => i.id);
    const short = await callRoute(reorder, `/api/boards/${BOARD}/items/order`, { boardId: BOARD }, { method: "POST", body: { version: board.version, itemIds: ids.slice(1) } });
    expect(short.status).toBe(400);
    const reversed = [...ids].reverse();
    const res = await callRoute(reorder, `/api/boards/${BOARD}/items/order`, { boardId: BOARD }, { method: "POST", body: { version: board.version, itemIds: reversed } });
    expect(res.status).toBe(200);
    expect((res.body as unknown as View).items.map((i) => i.id)).toEqual(reversed);
  });
});

describe("pairs", () => {
  it("adds, changes and removes a pair", async () => {
    let { board } = await read();
    const added = await callRoute(addPair, `/api/boards/${BOARD}/pairs`, { boardId: BOARD }, {
      method: "POST",
      body: { version: board.version, itemAId: "demo-item-tap", itemBId: "demo-item-splash", intent: "contrast", accessRelevant: false },
    });
    expect(added.status).toBe(201);
    const pairId = added.body.createdId as string;
    board = (added.body as unknown as View).board;
    const changed = await callRoute(changePair, "", { boardId: BOARD, pairId }, { method: "PATCH", body: { version: board.version, intent: "match", accessRelevant: true } });
    expect(changed.status).toBe(200);
    expect((changed.body as unknown as View).pairs.find((p) => p.id === pairId)?.intent).toBe("match");
    board = (changed.body as unknown as View).board;
    const removed = await callRoute(removePair, `/api/boards/${BOARD}/pairs/${pairId}?version=${board.version}`, { boardId: BOARD, pairId }, { method: "DELETE" });
    expect(removed.status).toBe(200);
    expect((removed.body as unknown as View).pairs.some((p) => p.id === pairId)).toBe(false);
  });

  it("refuses a pair across two boards, a swatch paired with itself, and a pair marked twice", async () => {
    actAs("designer");
    const { board } = await read();
    const copy = await callRoute(duplicate, `/api/boards/${BOARD}/duplicate`, { boardId: BOARD }, { method: "POST", body: { version: board.version } });
    const otherItem = (await read(copy.body.id as string)).items[0]?.id as string;
    const before = await snapshot();
    const pair = (body: Record<string, unknown>) =>
      callRoute(addPair, `/api/boards/${BOARD}/pairs`, { boardId: BOARD }, { method: "POST", body: { version: board.version, intent: "match", accessRelevant: false, ...body } });
    const across = await pair({ itemAId: "demo-item-benchtop", itemBId: otherItem });
    expect(across.status).toBe(400);
    expect(across.body.fieldErrors).toHaveProperty("itemBId");
    expect((await pair({ itemAId: "demo-item-benchtop", itemBId: "demo-item-benchtop" })).status).toBe(400);
    // benchtop–base is in the seed; marked the other way round it is still the same pair.
    expect((await pair({ itemAId: "demo-item-base", itemBId: "demo-item-benchtop" })).status).toBe(409);
    expect(await snapshot()).toEqual(before);
  });
});

describe("versions: two tabs never lose each other's work", () => {
  it("answers 409 to a write based on a stale version and saves none of it", async () => {
    const tabA = await read();
    const tabB = await read();
    const first = await item("demo-item-pendant", { version: tabA.board.version, y: 20 });
    expect(first.status).toBe(200);
    const before = await snapshot();
    const stale = await item("demo-item-tap", { version: tabB.board.version, x: 0 });
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatch(/changed in another tab/);
    expect(await snapshot()).toEqual(before);
    // Tab B reloads and tries again; tab A's move is still there.
    const reloaded = await read();
    expect((await item("demo-item-tap", { version: reloaded.board.version, x: 0 })).status).toBe(200);
    expect((await read()).items.find((i) => i.id === "demo-item-pendant")?.y).toBe(20);
  });

  it("lets exactly one of two simultaneous writes on the same version through", async () => {
    const { board } = await read();
    const results = await Promise.all([
      item("demo-item-pendant", { version: board.version, x: 960 }),
      item("demo-item-pendant", { version: board.version, x: 1000 }),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
    expect((await read()).board.version).toBe(board.version + 1);
  });

  it("answers 409 to a stale duplicate, pair or removal too", async () => {
    const { board } = await read();
    await item("demo-item-pendant", { version: board.version, x: 980 });
    const stale = board.version;
    expect((await callRoute(duplicate, "", { boardId: BOARD }, { method: "POST", body: { version: stale } })).status).toBe(409);
    expect((await item("demo-item-tap", { version: stale }, "DELETE")).status).toBe(409);
    const pair = await callRoute(addPair, "", { boardId: BOARD }, { method: "POST", body: { version: stale, itemAId: "demo-item-tap", itemBId: "demo-item-kick", intent: "match" } });
    expect(pair.status).toBe(409);
  });
});

describe("boards per room", () => {
  it("duplicates a board with every swatch and pair under new ids, leaving the original as it was", async () => {
    const original = await read();
    const before = await snapshot();
    const res = await callRoute(duplicate, "", { boardId: BOARD }, { method: "POST", body: { version: original.board.version, name: "Kitchen: darker base" } });
    expect(res.status).toBe(201);
    const copy = await read(res.body.id as string);
    expect(copy.items).toHaveLength(original.items.length);
    expect(copy.pairs).toHaveLength(original.pairs.length);
    expect(copy.items.some((i) => original.items.some((o) => o.id === i.id))).toBe(false);
    expect(copy.items.map((i) => [i.label, i.x, i.y])).toEqual(original.items.map((i) => [i.label, i.x, i.y]));
    const copyIds = new Set(copy.items.map((i) => i.id));
    expect(copy.pairs.every((p) => copyIds.has(p.itemAId) && copyIds.has(p.itemBId))).toBe(true);
    expect(await snapshot()).toEqual(before);
  });

  it("creates a board only in one of the project's own rooms", async () => {
    actAs("designer");
    const make = (body: unknown) => callRoute(createBoard, `/api/projects/${PROJECT}/boards`, { projectId: PROJECT }, { method: "POST", body });
    const foreign = await make({ roomId: "demo-room-quarry-kitchen", name: "Laundry scheme" });
    expect(foreign.status).toBe(400);
    expect(foreign.body.fieldErrors).toHaveProperty("roomId");
    expect((await make({ roomId: "demo-room-laundry" })).status).toBe(400);
    const ok = await make({ roomId: "demo-room-laundry", name: "Laundry: pale scheme" });
    expect(ok.status).toBe(201);
    expect(await sql("select name, version from board where id = ?", [ok.body.id as string])).toEqual([{ name: "Laundry: pale scheme", version: 1 }]);
  });

  it("answers 400 to a body that is not JSON and to an unknown light", async () => {
    actAs("designer");
    const res = await changeItem(new Request(`http://test/api/boards/${BOARD}/items/demo-item-tap`, { method: "PATCH", headers: { "content-type": "application/json", origin: "http://mottle.test" }, body: "{oops" }), {
      params: Promise.resolve({ boardId: BOARD, itemId: "demo-item-tap" }),
    });
    expect(res.status).toBe(400);
    const light = await callRoute(getBoard, `/api/boards/${BOARD}?cct=5000`, { boardId: BOARD });
    expect(light.status).toBe(400);
    expect(light.body.fieldErrors).toHaveProperty("cct");
  });
});
