import { describe, expect, it } from "vitest";
import { GET as getBoard } from "@/app/api/boards/[boardId]/route";
import { GET as findFinishes } from "@/app/api/boards/[boardId]/finishes/route";
import { createColourIndex } from "@/lib/colour";
import type { BoardView, FinderHit } from "@/lib/boards/types";
import { actAs } from "@/tests/support/session";
import { BOARD, callRoute, sql } from "./boards-support";

const find = async (query: string) => {
  actAs("designer");
  const res = await callRoute(findFinishes, `/api/boards/${BOARD}/finishes${query}`, { boardId: BOARD });
  return res as { status: number; body: { items: FinderHit[]; total: number; error?: string; fieldErrors?: Record<string, string[]> } };
};

describe("the board's finish picker", () => {
  it("finds the studio's finishes by words in the name, code, surface or supplier", async () => {
    const all = await find("");
    const byName = await find("?q=basalt");
    expect(byName.body.items.map((f) => f.name)).toEqual(["Night Basalt"]);
    expect((await find("?q=TJ-PU-077")).body.items.map((f) => f.name)).toEqual(["Ink Blue Polyurethane"]);
    const bySupplier = (await find("?q=tallowwood")).body.items;
    expect(bySupplier.length).toBeGreaterThan(0);
    expect(bySupplier.every((f) => f.supplierName === "Tallowwood Joinery")).toBe(true);
    // A LIKE wildcard typed by the designer is a literal, not "match everything": "%" finds the
    // gloss levels ("matt 10% gloss") and nothing else.
    const percent = (await find("?q=%25")).body;
    expect(percent.total).toBeLessThan(all.body.total);
    expect(percent.items.every((f) => [f.name, f.productCode, f.surface, f.supplierName].some((t) => t?.includes("%")))).toBe(true);
  });

  it("never offers another studio's finishes or archived ones", async () => {
    expect((await find("?q=Harbour")).body.items).toEqual([]);
    await sql("update finish set archived_at = 1 where id = 'demo-finish-basalt-night'");
    expect((await find("?q=basalt")).body.items).toEqual([]);
    await sql("update finish set archived_at = null where id = 'demo-finish-basalt-night'");
  });

  it("filters by category and says how many there are in all", async () => {
    const { body } = await find("?category=flooring");
    expect(body.items.length).toBeGreaterThan(0);
    expect(body.items.every((f) => f.category === "flooring")).toBe(true);
    const all = await find("");
    expect(all.body.items).toHaveLength(40);
    expect(all.body.total).toBeGreaterThan(40);
    expect((await find("?category=marble")).status).toBe(400);
  });

  it("lists similar colours by CIEDE2000, nearest first, as lib/colour's index does", async () => {
    const { body } = await find("?near=demo-finish-saltbush");
    expect(body.items.length).toBe(12);
    expect(body.items.some((f) => f.id === "demo-finish-saltbush")).toBe(false);
    const rows = await sql<{ id: string; lab_l: number; lab_a: number; lab_b: number }>(
      "select id, lab_l, lab_a, lab_b from finish where studio_id = 'demo-studio-fernleaf' and archived_at is null",
    );
    const index = createColourIndex(rows.map((r) => ({ id: r.id, lab: [r.lab_l, r.lab_a, r.lab_b] as const })));
    const target = rows.find((r) => r.id === "demo-finish-saltbush");
    if (!target) throw new Error("seed changed");
    const expected = index.nearest([target.lab_l, target.lab_a, target.lab_b], 13).filter((h) => h.id !== "demo-finish-saltbush");
    expect(body.items.map((f) => [f.id, f.deltaE])).toEqual(expected.map((h) => [h.id, h.deltaE]));
  });

  it("refuses similar colours to another studio's finish", async () => {
    const res = await find("?near=demo-finish-northwall-limestone");
    expect(res.status).toBe(400);
    expect(res.body.fieldErrors).toHaveProperty("near");
  });
});

describe("photos on the board", () => {
  it("link a finish's uploaded photo through the library's authenticated route, 400 px wide", async () => {
    await sql(
      "insert into image (id, studio_id, storage_key, width, height, bytes) values ('it-image-saltbush', 'demo-studio-fernleaf', 'it-saltbush', 1600, 1600, 1000)",
    );
    await sql("update finish set image_id = 'it-image-saltbush' where id = 'demo-finish-saltbush'");
    actAs("client");
    const { body } = await callRoute(getBoard, `/api/boards/${BOARD}`, { boardId: BOARD });
    const items = (body as unknown as BoardView).items;
    expect(items.find((i) => i.id === "demo-item-benchtop")?.finish.imageUrl).toBe("/api/uploads/it-image-saltbush/400");
    expect(items.find((i) => i.id === "demo-item-base")?.finish.imageUrl).toBeNull();
  });
});
