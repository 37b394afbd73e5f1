import { parse } from "csv-parse/sync";
import { describe, expect, it } from "vitest";
import { GET as exportCsv } from "@/app/api/finishes/export/route";
import { POST as importCsv } from "@/app/api/finishes/import/route";
import type { Persona } from "@/tests/support/session";
import { call, countRows } from "@/tests/support/library";

const header = "Name,Category,Supplier,Product code,Finish,Format,Unit,Unit price,Lead time (days),Colour,LRV,Cautions,Care notes";
const good = [
  'Ash Grey Terrazzo,tile,Kiln Lane Tiles & Bathware,KL-TZ-410,"honed, P3",600 × 600 mm,m²,"$1,145.00",35,#bdb9b1,,Slip resistance in wet areas,Seal before grouting',
  "Dove Wall Paint,Paint and walls,,MX-AC-31,low sheen,4 L,L,68.5,3,,62,,",
  "Raw Brass Knob,hardware,tallowwood joinery,TJ-HW-031,raw brass,each,each,29,14,lab(62 6 38),,child-safety,",
];
const bad = [
  ",tile,,,,,m²,10,5,#ffffff,,,", // no name
  "Mystery Slab,marble,,,,,m²,10,5,#ffffff,,,", // unknown category
  "Cheap Slab,stone,Nobody Stone Co,,,,m²,ten dollars,5,#ffffff,,,", // unknown supplier, bad price
  "Glow Tile,tile,,,,,m²,10,5,not-a-colour,120,asbestos,", // bad colour, LRV, caution
  "Blank Tile,tile,,,,,m²,10,5,,,,", // neither colour nor LRV
  "Saltbush again,stone,Ridgeline Stoneworks,RS-LM-204,,,m²,10,5,#d9d2c3,,,", // already in the library
];

const importAs = (persona: Persona, text: string, dryRun: boolean) =>
  call(persona, importCsv, `/api/finishes/import${dryRun ? "?dryRun=1" : ""}`, { method: "POST", text });

type Report = { dryRun: boolean; total: number; valid: number; imported: number; rejected: { line: number; name: string; errors: string[] }[] };

describe("POST /api/finishes/import", () => {
  it("a dry run lists every rejected row with its line and reasons, and writes nothing", async () => {
    const before = await countRows("finish");
    const res = await importAs("designer", [header, ...good, ...bad].join("\n"), true);
    expect(res.status).toBe(200);
    const report = res.body as unknown as Report;
    expect(report).toMatchObject({ dryRun: true, total: 9, valid: 3, imported: 0 });
    expect(report.rejected.map((r) => r.line)).toEqual([5, 6, 7, 8, 9, 10]);
    const reasons = (line: number) => report.rejected.find((r) => r.line === line)?.errors.join(" | ") ?? "";
    expect(reasons(5)).toMatch(/^name: Enter the finish's name\.$/);
    expect(reasons(6)).toBe('category: "marble" isn\'t a category. Use one of: stone, cabinetry, flooring, tile, tapware, hardware, lighting, appliances, paint.');
    expect(reasons(7)).toMatch(/unit_price: "ten dollars" isn't an amount of dollars/);
    expect(reasons(7)).toMatch(/supplier: there is no supplier called "Nobody Stone Co"/);
    expect(reasons(8)).toMatch(/lrv: LRV runs from 0 to 100/);
    expect(reasons(8)).toMatch(/cautions: "asbestos" isn't in the list/);
    expect(reasons(8)).toMatch(/colour: Enter a colour as #RRGGBB/);
    expect(reasons(9)).toBe("colour: give the maker's colour (like #d9d2c3) or its LRV.");
    expect(reasons(10)).toBe("product_code: RS-LM-204 from Ridgeline Stoneworks is already in the library.");
    expect(await countRows("finish")).toBe(before);
  });

  it("imports nothing when any row is bad (400 with the same list)", async () => {
    const before = await countRows("finish");
    const res = await importAs("designer", [header, ...good, bad[1]].join("\n"), false);
    expect(res.status).toBe(400);
    expect(res.body.error).toBe("1 row needs fixing, so nothing was imported.");
    expect((res.body as unknown as Report).rejected.map((r) => r.line)).toEqual([5]);
    expect(await countRows("finish")).toBe(before);
  });

  it("imports a clean file in one go, matching suppliers, categories and cautions by name", async () => {
    const before = await countRows("finish", "studio_id = 'demo-studio-fernleaf'");
    const res = await importAs("owner", [header, ...good].join("\n"), false);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ imported: 3, rejected: [] });
    expect(await countRows("finish", "studio_id = 'demo-studio-fernleaf'")).toBe(before + 3);
    expect(await countRows("finish", "product_code = 'KL-TZ-410' and supplier_id = 'demo-supplier-tiles' and unit_price_cents = 114500 and cautions = '[\"slip-wet-areas\"]' and lrv_source = 'computed'")).toBe(1);
    expect(await countRows("finish", "product_code = 'MX-AC-31' and category = 'paint' and lrv = 62 and lrv_source = 'published' and colour_source = 'computed' and lab_a = 0")).toBe(1);
    expect(await countRows("finish", "product_code = 'TJ-HW-031' and supplier_id = 'demo-supplier-joinery' and lab_l = 62")).toBe(1);
    expect(await countRows("audit_log", "action = 'finish.imported'")).toBe(1);
    // The same file again: every row is now a duplicate.
    const again = await importAs("owner", [header, ...good].join("\n"), true);
    expect((again.body as unknown as Report).rejected.map((r) => r.line)).toEqual([2, 3, 4]);
  });

  it("answers 400 for a file that isn't CSV or lacks required columns", async () => {
    expect((await importAs("designer", 'name,category\n"unclosed,stone', true)).status).toBe(400);
    const missing = await importAs("designer", "name,colour\nX,#fff", true);
    expect(missing.status).toBe(400);
    expect(missing.body.error).toMatch(/needs these columns: category, unit, unit_price, lead_time_days/);
    expect((await importAs("designer", "", true)).status).toBe(400);
  });

  it("takes the file as multipart too", async () => {
    const form = new FormData();
    form.set("file", new File([[header, "Mist Wall Paint,paint,,MX-AC-77,matt,4 L,L,70,3,#dcdcd8,,,"].join("\n")], "library.csv", { type: "text/csv" }));
    const res = await call("designer", importCsv, "/api/finishes/import?dryRun=1", { method: "POST", form });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ total: 1, valid: 1 });
  });

  it.each<[Persona, number]>([
    ["client", 403],
    ["stone", 403],
    ["anonymous", 401],
  ])("refuses %s with %i", async (persona, status) => {
    const before = await countRows("finish");
    expect((await importAs(persona, [header, ...good].join("\n"), false)).status).toBe(status);
    expect(await countRows("finish")).toBe(before);
  });

  it("lets another studio import into its own library, matching only its own suppliers", async () => {
    const res = await importAs("other", [header, good[1], good[0]].join("\n"), true);
    expect((res.body as unknown as Report).rejected.map((r) => r.errors[0])).toEqual([
      'supplier: there is no supplier called "Kiln Lane Tiles & Bathware" in your studio. Add it first, or leave the cell blank.',
    ]);
  });
});

describe("GET /api/finishes/export", () => {
  it("gives the whole library as CSV the import reads back", async () => {
    const res = await call("designer", exportCsv, "/api/finishes/export");
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename="finishes-\d{4}-\d{2}-\d{2}\.csv"$/);
    const rows = parse(res.bytes.toString("utf8"), { columns: true }) as Record<string, string>[];
    expect(rows.length).toBe(await countRows("finish", "studio_id = 'demo-studio-fernleaf'"));
    const saltbush = rows.find((r) => r.product_code === "RS-LM-204");
    expect(saltbush).toMatchObject({ name: "Saltbush Limestone", category: "stone", supplier: "Ridgeline Stoneworks", unit_price: "680.00", lead_time_days: "21", lrv: "64", lrv_source: "published", cautions: "natural-stone-silica", hex: "#d9d2c3" });
    expect(rows.some((r) => r.name === "Harbour Limestone")).toBe(false);
    // Read back: every exported row is recognised (as a duplicate of itself, so nothing is added).
    const again = await importAs("designer", res.bytes.toString("utf8"), true);
    const report = again.body as unknown as Report;
    expect(report.total).toBe(rows.length);
    const codes = rows.filter((r) => r.product_code).length;
    expect(report.rejected.filter((r) => r.errors.every((e) => /already in the library/.test(e)))).toHaveLength(codes);
  });

  it("defuses cells a spreadsheet would run as formulas [published: OWASP, CSV injection]", async () => {
    const imported = await importAs("designer", [header, '"=HYPERLINK(""http://x"")",paint,,,,,L,1,1,#ffffff,,,'].join("\n"), false);
    expect(imported.status).toBe(201);
    const res = await call("designer", exportCsv, "/api/finishes/export");
    const rows = parse(res.bytes.toString("utf8"), { columns: true }) as Record<string, string>[];
    expect(rows.find((r) => r.name?.includes("HYPERLINK"))?.name).toBe("'=HYPERLINK(\"http://x\")");
  });

  it.each<[Persona, number]>([
    ["client", 403],
    ["stone", 403],
    ["anonymous", 401],
  ])("refuses %s with %i", async (persona, status) => {
    expect((await call(persona, exportCsv, "/api/finishes/export")).status).toBe(status);
  });

  it("gives the owner the same file", async () => {
    const res = await call("owner", exportCsv, "/api/finishes/export");
    expect(res.status).toBe(200);
    expect(res.bytes.toString("utf8").split("\n")[0]).toMatch(/^name,category,supplier,product_code,finish,format,unit,unit_price,lead_time_days,colour,lrv,cautions,care_notes,hex,lrv_used,lrv_source,colour_source,archived,id/);
  });

  it("gives another studio only its own finishes", async () => {
    const res = await call("other", exportCsv, "/api/finishes/export");
    const rows = parse(res.bytes.toString("utf8"), { columns: true }) as Record<string, string>[];
    expect(rows.map((r) => r.name)).toEqual(["Harbour Limestone"]);
  });
});
