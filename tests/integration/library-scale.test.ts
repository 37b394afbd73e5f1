import { createClient } from "@libsql/client";
import { beforeAll, describe, expect, it } from "vitest";
import { GET as similar } from "@/app/api/finishes/[finishId]/similar/route";
import { GET as list } from "@/app/api/finishes/route";
import { call } from "@/tests/support/library";

const STUDIO = "demo-studio-fernleaf";
const categories = ["stone", "cabinetry", "flooring", "tile", "tapware", "hardware", "lighting", "appliances", "paint"];
const suppliers = ["stone", "joinery", "flooring", "tiles", "lighting", "appliances"];

/** 10,000 more finishes with varied names, suppliers and colours (a fixed sequence, so every run is the same). */
async function growLibrary(count: number) {
  const client = createClient({ url: process.env.DATABASE_URL ?? "" });
  let seed = 42;
  const random = () => ((seed = (seed * 1103515245 + 12345) >>> 0) / 2 ** 32);
  const statements = Array.from({ length: count }, (_, i) => ({
    sql: `insert into finish (id, studio_id, supplier_id, name, category, product_code, surface, unit, unit_price_cents, lead_time_days,
          cautions, lab_l, lab_a, lab_b, colour_source, lrv, lrv_source) values (?, ?, ?, ?, ?, ?, 'matt', 'm²', ?, ?, '[]', ?, ?, ?, 'published', ?, 'computed')`,
    args: [
      `scale-${i}`, STUDIO, `demo-supplier-${suppliers[i % suppliers.length]}`, `Scale finish ${i} ${random() < 0.1 ? "walnut" : "plain"}`,
      categories[i % categories.length] ?? "paint", `SC-${String(i).padStart(5, "0")}`, Math.floor(random() * 200_000), Math.floor(random() * 120),
      5 + random() * 90, (random() - 0.5) * 40, (random() - 0.5) * 60, random() * 100,
    ],
  }));
  await client.batch(statements, "write");
  client.close();
}


describe("the library at 10,000 finishes", () => {
  beforeAll(async () => {
    await growLibrary(10_000);
  }, 60_000);

  // Correctness at size only: speed is measured by `npm run bench`, never by a timed test.
  type Item = { id: string; name: string; category: string; supplierName: string | null; productCode: string | null; unitPriceCents: number; lrv: number };
  const page = async (query: string) => {
    const res = await call("designer", list, `/api/finishes${query}`);
    expect(res.status).toBe(200);
    return res.body as { items: Item[]; total: number };
  };
  const ordered = (values: number[], dir: 1 | -1) => values.every((v, i) => i === 0 || dir * (v - (values[i - 1] ?? 0)) >= 0);

  it("pages through them all by name without repeats", async () => {
    const first = await page("?page=1");
    const deep = await page("?page=150");
    expect(first.items).toHaveLength(50);
    expect(deep.items).toHaveLength(50);
    const names = [...first.items, ...deep.items].map((f) => f.name.toLowerCase());
    expect(names).toEqual([...names].sort());
    expect(new Set([...first.items, ...deep.items].map((f) => f.id)).size).toBe(100);
  });

  it("filters a category and sorts it by price, or the whole library by LRV", async () => {
    const tiles = await page("?category=tile&sort=price&dir=desc");
    expect(tiles.total).toBeGreaterThan(1_000);
    expect(tiles.items.every((f) => f.category === "tile")).toBe(true);
    expect(ordered(tiles.items.map((f) => f.unitPriceCents), -1)).toBe(true);
    const byLrv = await page("?sort=lrv&dir=desc&page=40");
    expect(byLrv.items).toHaveLength(50);
    expect(ordered(byLrv.items.map((f) => f.lrv), -1)).toBe(true);
  });

  it("matches text in codes and names within a supplier", async () => {
    // SC-09990 … SC-09999: ten codes start with "SC-0999".
    expect((await page("?q=SC-0999")).items.map((f) => f.productCode).sort()).toEqual(Array.from({ length: 10 }, (_, i) => `SC-0999${i}`));
    const walnutTiles = await page("?supplier=demo-supplier-tiles&q=walnut");
    expect(walnutTiles.total).toBeGreaterThan(0);
    expect(walnutTiles.items.every((f) => f.supplierName === "Kiln Lane Tiles & Bathware" && /walnut/i.test(f.name))).toBe(true);
  });

  it("counts them all", async () => {
    const res = await call("designer", list, "/api/finishes?pageSize=1");
    expect(res.body.total).toBeGreaterThan(10_000);
  });

  it("finds similar colours among them, nearest first", async () => {
    const first = await call("designer", similar, "/api/finishes/scale-7/similar?maxDeltaE=3", { params: { finishId: "scale-7" } });
    expect(first.status).toBe(200);
    const items = first.body.items as { deltaE: number }[];
    expect(items.length).toBeGreaterThan(0);
    expect(items.every((h, i) => h.deltaE <= 3 && (i === 0 || (items[i - 1]?.deltaE ?? 0) <= h.deltaE))).toBe(true);
  });
});
