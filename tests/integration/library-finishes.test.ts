import { describe, expect, it } from "vitest";
import { DELETE as deleteOne, GET as getOne, PATCH as patchOne } from "@/app/api/finishes/[finishId]/route";
import { GET as list, POST as create } from "@/app/api/finishes/route";
import { lightReflectance, parseColour } from "@/lib/colour";
import type { Persona } from "@/tests/support/session";
import { call, countRows } from "@/tests/support/library";

type Item = { id: string; name: string; category: string; supplierName: string | null; unitPriceCents: number; lrv: number; lrvSource: string; colourSource: string; archived: boolean; hex: string };
type Page = { items: Item[]; total: number; page: number; pageSize: number };

const listAs = async (persona: Persona, query = "") => call(persona, list, `/api/finishes${query}`);
const page = async (query: string) => (await listAs("designer", query)).body as unknown as Page;
const finishId = (key: string) => `demo-finish-${key}`;
const one = (persona: Persona, id: string, init: { method?: string; json?: unknown } = {}) =>
  call(persona, init.method === "PATCH" ? patchOne : init.method === "DELETE" ? deleteOne : getOne, `/api/finishes/${id}`, { ...init, params: { finishId: id } });

const newFinish = {
  name: "Harbour Fog Terrazzo",
  category: "tile",
  supplierId: "demo-supplier-tiles",
  productCode: "KL-TZ-900",
  surface: "honed",
  format: "600 × 600 mm",
  unit: "m²",
  unitPriceCents: 14500,
  leadTimeDays: 35,
  cautions: ["slip-wet-areas"],
  colour: { source: "published", value: "#cfcac0" },
};

describe("GET /api/finishes", () => {
  it.each<[Persona, number]>([
    ["owner", 200],
    ["designer", 200],
    ["other", 200],
    ["client", 403],
    ["stone", 403],
    ["anonymous", 401],
  ])("answers %s with %i", async (persona, status) => {
    const res = await listAs(persona);
    expect(res.status).toBe(status);
    if (status !== 200) expect(typeof res.body.error).toBe("string");
  });

  it("shows each studio only its own library", async () => {
    const ours = (await listAs("designer", "?pageSize=200")).body as unknown as Page;
    expect(ours.total).toBe(await countRows("finish", "studio_id = 'demo-studio-fernleaf' and archived_at is null"));
    expect(ours.items.some((f) => f.name === "Harbour Limestone")).toBe(false);
    const theirs = (await listAs("other")).body as unknown as Page;
    expect(theirs.items.map((f) => f.name)).toEqual(["Harbour Limestone"]);
  });

  it("filters by category, supplier and text (name, code, finish or supplier name)", async () => {
    const stone = await page("?category=stone");
    expect(stone.total).toBeGreaterThan(0);
    expect(stone.items.every((f) => f.category === "stone")).toBe(true);
    const tiles = await page("?supplier=demo-supplier-tiles");
    expect(tiles.items.every((f) => f.supplierName === "Kiln Lane Tiles & Bathware")).toBe(true);
    const noSupplier = await page("?supplier=none");
    expect(noSupplier.items.every((f) => f.supplierName === null && f.category === "paint")).toBe(true);
    expect((await page("?q=rs-mb-11")).items.map((f) => f.name)).toEqual(["Cloudline Marble", "Cloudline Marble"]);
    expect((await page("?q=ridgeline")).total).toBe(stone.total);
    expect((await page("?q=leathered")).items.map((f) => f.name)).toEqual(["Night Basalt"]);
    // % and _ are literal characters in a search, not wildcards: "%" finds only the "10% gloss" finishes.
    const percent = await page("?q=%25");
    expect(percent.total).toBe(5);
    expect((await page("?q=_")).total).toBe(0);
  });

  it("sorts and pages without repeating or losing a finish", async () => {
    const all = await page("?pageSize=200&sort=price&dir=desc");
    const prices = all.items.map((f) => f.unitPriceCents);
    expect(prices).toEqual([...prices].sort((a, b) => b - a));
    const first = await page("?pageSize=25&page=1&sort=name");
    const second = await page("?pageSize=25&page=2&sort=name");
    const third = await page("?pageSize=25&page=3&sort=name");
    const ids = [...first.items, ...second.items, ...third.items].map((f) => f.id);
    expect(new Set(ids).size).toBe(first.total);
    const names = [...first.items, ...second.items].map((f) => f.name.toLowerCase());
    expect(names).toEqual([...names].sort());
  });

  it("answers 400 with field errors for a bad query", async () => {
    const res = await listAs("designer", "?category=marble&page=0");
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fieldErrors as object).sort()).toEqual(["category", "page"]);
  });
});

describe("POST /api/finishes", () => {
  it("creates a finish with a computed LRV when the maker publishes none", async () => {
    const res = await call("designer", create, "/api/finishes", { json: newFinish });
    expect(res.status).toBe(201);
    const lab = parseColour("#cfcac0");
    expect(res.body).toMatchObject({ name: "Harbour Fog Terrazzo", colourSource: "published", lrvSource: "computed", hex: "#cfcac0", supplierName: "Kiln Lane Tiles & Bathware" });
    // LRV = CIE Y × 100 of the colour [published: BS 8493 as quoted in DOMAIN.md], to one decimal.
    expect(res.body.lrv).toBeCloseTo(lightReflectance(lab), 1);
    expect(await countRows("audit_log", `action = 'finish.created' and entity_id = '${String(res.body.id)}'`)).toBe(1);
  });

  it("keeps the maker's published LRV over the computed one", async () => {
    const res = await call("owner", create, "/api/finishes", { json: { ...newFinish, productCode: "KL-TZ-901", lrv: 58 } });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ lrv: 58, lrvSource: "published" });
  });

  it("makes an LRV-only finish a neutral grey of that LRV", async () => {
    const res = await call("designer", create, "/api/finishes", { json: { ...newFinish, productCode: "KL-TZ-902", colour: { source: "computed" }, lrv: 40 } });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ colourSource: "computed", lrv: 40, lrvSource: "published" });
    const [, a, b] = res.body.lab as number[];
    expect([a, b]).toEqual([0, 0]);
  });

  it("answers 400 with a plain message for each bad field, and writes nothing", async () => {
    const before = await countRows("finish");
    const res = await call("designer", create, "/api/finishes", {
      json: { ...newFinish, name: "", unit: "", unitPriceCents: "lots", leadTimeDays: -3, colour: { source: "published", value: "greige" }, lrv: 140 },
    });
    expect(res.status).toBe(400);
    const errors = res.body.fieldErrors as Record<string, string[]>;
    expect(Object.keys(errors).sort()).toEqual(["colour.value", "leadTimeDays", "lrv", "name", "unit", "unitPriceCents"]);
    expect(errors.unitPriceCents?.[0]).toMatch(/price per unit in dollars/);
    expect(await countRows("finish")).toBe(before);
  });

  it("refuses another studio's supplier", async () => {
    const res = await call("designer", create, "/api/finishes", { json: { ...newFinish, supplierId: "demo-supplier-northwall-stone" } });
    expect(res.status).toBe(400);
    expect(res.body.fieldErrors).toEqual({ supplierId: ["Choose one of your studio's suppliers."] });
  });

  it("answers 415 for a body that isn't declared JSON (RFC 9110 §15.5.16)", async () => {
    const res = await call("designer", create, "/api/finishes", { text: "name=x" });
    expect(res.status).toBe(415);
    expect(res.body.error).toMatch(/as JSON/);
  });

  it.each<[Persona, number]>([
    ["client", 403],
    ["stone", 403],
    ["anonymous", 401],
  ])("refuses %s with %i", async (persona, status) => {
    const before = await countRows("finish");
    expect((await call(persona, create, "/api/finishes", { json: newFinish })).status).toBe(status);
    expect(await countRows("finish")).toBe(before);
  });

  it("lets another studio's designer add to their own library only", async () => {
    const res = await call("other", create, "/api/finishes", { json: { ...newFinish, supplierId: "demo-supplier-northwall-stone" } });
    expect(res.status).toBe(201);
    expect(await countRows("finish", `id = '${String(res.body.id)}' and studio_id = 'demo-studio-northwall'`)).toBe(1);
  });
});

describe("GET /api/finishes/:id", () => {
  it.each<[Persona, number]>([
    ["owner", 200],
    ["designer", 200],
    ["other", 404],
    ["client", 403],
    ["stone", 403],
    ["anonymous", 401],
  ])("answers %s with %i for one of our finishes", async (persona, status) => {
    expect((await one(persona, finishId("saltbush"))).status).toBe(status);
  });

  it("says where a finish is used", async () => {
    const res = await one("designer", finishId("saltbush"));
    const where = `finish_id = '${finishId("saltbush")}'`;
    expect(res.body.usage).toEqual({
      boardItems: await countRows("board_item", where),
      optionLines: await countRows("option_line", where),
      fixedItems: await countRows("fixed_item", where),
      specLines: await countRows("spec_line", where),
    });
    // The demo puts the benchtop stone on a board, in options and in revision A.
    expect(res.body.usage).toMatchObject({ specLines: 1 });
    expect((res.body.usage as { boardItems: number }).boardItems).toBeGreaterThan(0);
    expect(res.body.cautions).toEqual(["natural-stone-silica"]);
  });
});

describe("PATCH /api/finishes/:id", () => {
  it("lets the owner edit too", async () => {
    const res = await one("owner", finishId("basalt-night"), { method: "PATCH", json: { careNotes: "Seal before use." } });
    expect(res.status).toBe(200);
    expect(res.body.careNotes).toBe("Seal before use.");
  });

  it("changes the fields given and leaves the rest", async () => {
    const res = await one("designer", finishId("basalt-night"), { method: "PATCH", json: { unitPriceCents: 76000, leadTimeDays: 28 } });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ unitPriceCents: 76000, leadTimeDays: 28, name: "Night Basalt", cautions: ["natural-stone-silica"], lrv: 6, lrvSource: "published" });
  });

  it("keeps a published LRV when the colour changes, and computes one when it is cleared", async () => {
    const id = finishId("saltbush");
    const recoloured = await one("designer", id, { method: "PATCH", json: { colour: { source: "published", value: "lab(80 2 9)" } } });
    expect(recoloured.body).toMatchObject({ lrv: 64, lrvSource: "published", lab: [80, 2, 9] });
    const cleared = await one("designer", id, { method: "PATCH", json: { lrv: null } });
    expect(cleared.body.lrvSource).toBe("computed");
    expect(cleared.body.lrv).toBeCloseTo(lightReflectance([80, 2, 9]), 1);
  });

  it("archives and restores: archived finishes leave the table but stay readable", async () => {
    const id = finishId("cloudline");
    expect((await one("designer", id, { method: "PATCH", json: { archived: true } })).body.archived).toBe(true);
    expect((await page("?q=cloudline")).items.map((f) => f.id)).toEqual([finishId("cloudline-honed")]);
    expect((await page("?q=cloudline&status=archived")).items.map((f) => f.id)).toEqual([id]);
    expect(await countRows("audit_log", `action = 'finish.archived' and entity_id = '${id}'`)).toBe(1);
    expect((await one("designer", id, { method: "PATCH", json: { archived: false } })).body.archived).toBe(false);
    expect((await page("?q=cloudline")).total).toBe(2);
  });

  it("answers 400 for bad fields and changes nothing", async () => {
    const res = await one("designer", finishId("basalt-night"), { method: "PATCH", json: { name: "", cautions: ["nope"] } });
    expect(res.status).toBe(400);
    expect((await one("designer", finishId("basalt-night"))).body.name).toBe("Night Basalt");
  });

  it.each<[Persona, number]>([
    ["other", 404],
    ["client", 403],
    ["stone", 403],
    ["anonymous", 401],
  ])("refuses %s with %i and changes nothing", async (persona, status) => {
    const res = await one(persona, finishId("quartzite-fog"), { method: "PATCH", json: { name: "Taken over" } });
    expect(res.status).toBe(status);
    expect((await one("designer", finishId("quartzite-fog"))).body.name).toBe("Fog Quartzite");
  });
});

describe("DELETE /api/finishes/:id", () => {
  it("never removes a finish used by a specification: 409 with a plain message", async () => {
    const res = await one("designer", finishId("porcelain-graphite"), { method: "DELETE" });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatch(/issued specification.*Archive/);
    expect(await countRows("finish", `id = '${finishId("porcelain-graphite")}'`)).toBe(1);
  });

  it("keeps a finish on a sample board or a decision: 409", async () => {
    const res = await one("owner", finishId("cab-oat"), { method: "DELETE" });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatch(/sample board/);
  });

  it.each<[Persona, number]>([
    ["other", 404],
    ["client", 403],
    ["stone", 403],
    ["anonymous", 401],
  ])("refuses %s with %i", async (persona, status) => {
    expect((await one(persona, finishId("paint-greige"), { method: "DELETE" })).status).toBe(status);
    expect(await countRows("finish", `id = '${finishId("paint-greige")}'`)).toBe(1);
  });

  it("removes a finish nothing uses", async () => {
    const res = await one("designer", finishId("paint-greige"), { method: "DELETE" });
    expect(res.status).toBe(204);
    expect(await countRows("finish", `id = '${finishId("paint-greige")}'`)).toBe(0);
    expect((await one("designer", finishId("paint-greige"))).status).toBe(404);
  });
});
