import { describe, expect, it } from "vitest";
import { applyChange, describeRequest } from "@/lib/boards/changes";
import type { BoardView } from "@/lib/boards/types";

const finish = { id: "f", name: "Oat", category: "cabinetry", productCode: null, surface: null, lab: [90, 1, 6] as const, hex: "#e8e1d3", tint: "#e8e1d3", lrv: 48, lrvSource: "published" as const, imageUrl: null, cautions: [], archived: false };
const view = {
  board: { id: "b", name: "B", version: 4, updatedAt: "" },
  items: [
    { id: "a", label: "Benchtop", x: 0, y: 0, width: 100, height: 100, sortOrder: 0, finish },
    { id: "c", label: "Base cabinets", x: 100, y: 0, width: 100, height: 100, sortOrder: 1, finish },
  ],
  pairs: [{ id: "p", itemAId: "a", itemBId: "c", intent: "contrast", accessRelevant: false }],
  checks: [{ pairId: "p", itemAId: "a", itemBId: "c" }],
  proposals: [{ itemAId: "c", itemBId: "a", intent: "contrast", accessRelevant: false, why: "" }],
} as unknown as BoardView;

describe("what the editor sends", () => {
  it("carries the version with every change, to the right route", () => {
    expect(describeRequest("b", 4, { kind: "move", itemId: "a", rect: { x: 20, y: 40, width: 100, height: 100 } })).toEqual({
      method: "PATCH",
      path: "/api/boards/b/items/a",
      body: { version: 4, x: 20, y: 40, width: 100, height: 100 },
    });
    expect(describeRequest("b", 4, { kind: "remove-pair", pairId: "p" })).toEqual({ method: "DELETE", path: "/api/boards/b/pairs/p", body: { version: 4 } });
    expect(describeRequest("b", 4, { kind: "reorder", itemIds: ["c", "a"] }).path).toBe("/api/boards/b/items/order");
  });
});

describe("what the editor shows before the server answers", () => {
  it("moves, relabels and restacks at once", () => {
    const moved = applyChange(view, { kind: "move", itemId: "a", rect: { x: 20, y: 40, width: 100, height: 100 } }, "t");
    expect(moved.items[0]).toMatchObject({ x: 20, y: 40 });
    expect(applyChange(view, { kind: "relabel", itemId: "c", label: "Drawers" }, "t").items[1]?.label).toBe("Drawers");
    expect(applyChange(view, { kind: "reorder", itemIds: ["c", "a"] }, "t").items.map((i) => i.id)).toEqual(["c", "a"]);
  });

  it("takes a removed swatch's pairs and checks with it", () => {
    const after = applyChange(view, { kind: "remove", itemId: "a" }, "t");
    expect([after.items.length, after.pairs.length, after.checks.length]).toEqual([1, 0, 0]);
  });

  it("adds a placed finish on top and drops a proposal once it is marked", () => {
    const placed = applyChange(view, { kind: "add", finish, label: "Wall", rect: { x: 0, y: 200, width: 100, height: 100 } }, "pending-1");
    expect(placed.items.at(-1)).toMatchObject({ id: "pending-1", sortOrder: 2, label: "Wall" });
    const paired = applyChange(view, { kind: "add-pair", itemAId: "a", itemBId: "c", intent: "match", accessRelevant: true }, "pending-2");
    expect(paired.proposals).toEqual([]);
    expect(paired.pairs.at(-1)).toMatchObject({ id: "pending-2", intent: "match" });
  });

  it("leaves the version alone: only the server's answer moves it", () => {
    expect(applyChange(view, { kind: "remove-pair", pairId: "p" }, "t").board.version).toBe(4);
  });
});
