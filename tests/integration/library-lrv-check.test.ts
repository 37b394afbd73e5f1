import { parse } from "csv-parse/sync";
import { describe, expect, it } from "vitest";
import { GET as exportCsv } from "@/app/api/finishes/export/route";
import { call, runSql } from "@/tests/support/library";

// LRV = CIE Y × 100 [published: LRV explainers quoting BS 8493; ASTM E1477]; Y from L* by the CIE
// L* definition inverted [published: CIE 15:2004]. Flagged when more than 10 points apart
// [common practice: a house rule, lib/colour/lrv-check.ts].
describe("the library CSV flags a published LRV its own colour contradicts", () => {
  async function rows() {
    const res = await call("designer", exportCsv, "/api/finishes/export");
    expect(res.status).toBe(200);
    const [header, ...body] = parse(res.bytes.toString("utf8"), { bom: true }) as string[][];
    const col = (header ?? []).indexOf("lrv_check");
    expect(col).toBeGreaterThan(0);
    const byId = new Map(body.map((r) => [r[(header ?? []).indexOf("id")] ?? "", r[col] ?? ""]));
    return byId;
  }

  it("says so for the demo's Oat: published 48 against L* 89.7 (about 76)", async () => {
    const notes = await rows();
    expect(notes.get("demo-finish-cab-oat")).toMatch(/^The published LRV 48 is 28 points below the 76 this finish's own colour implies \(CIE Y × 100, L\* 89\.7\)\./);
  });

  it("leaves the cell empty when they agree, or when the LRV was computed from the colour", async () => {
    await runSql("update finish set lrv = 75 where id = 'demo-finish-cab-oat'");
    const notes = await rows();
    expect(notes.get("demo-finish-cab-oat")).toBe("");
    // Walnut has no published LRV in the demo: its LRV is computed, so there is nothing to contradict.
    expect(notes.get("demo-finish-cab-walnut")).toBe("");
  });
});
