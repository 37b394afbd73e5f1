import { describe, expect, it } from "vitest";
import { neutraliseCell as guardCell } from "@/lib/csv-cell";
import { readCsvHeader, readCsvRow } from "@/lib/validation/finish-csv";

const row = {
  name: "Dove Wall Paint",
  category: "Paint and walls",
  unit: "L",
  unit_price: "$1,068.50",
  lead_time_days: "3",
  colour: "",
  lrv: "62",
  cautions: "Children in the home; gas-work",
};

describe("readCsvHeader", () => {
  it.each([
    ["Unit price", "unit_price"],
    ["Lead time (days)", "lead_time_days"],
    ["  Product-Code ", "product_code"],
    ["Color", "colour"],
    ["Surface", "finish"],
    ["Colour notes", null],
  ])("%j → %j", (header, column) => expect(readCsvHeader(header)).toBe(column));
});

describe("readCsvRow", () => {
  it("reads a designer's row: category by its label, dollars with separators, cautions by title or key", () => {
    const result = readCsvRow(row);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.input).toMatchObject({
      name: "Dove Wall Paint",
      category: "paint",
      unitPriceCents: 106850,
      leadTimeDays: 3,
      lrv: 62,
      colour: { source: "computed" },
      cautions: ["child-safety", "gas-work"],
    });
  });

  it("lists every problem of a row, naming the column", () => {
    const result = readCsvRow({ ...row, name: "", category: "granite", unit_price: "cheap", lead_time_days: "soon", lrv: "", colour: "#12", cautions: "sharp edges" });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors.map((e) => e.split(":")[0]).sort()).toEqual(["category", "cautions", "colour", "lead_time_days", "name", "unit_price"]);
  });

  it("reads prices with the one money parser: 12,34 is refused with its reason (our rule; see tests/unit/pricing)", () => {
    const result = readCsvRow({ ...row, unit_price: "12,34" });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors).toEqual(['unit_price: "12,34" isn\'t an amount of dollars, like 680 or 680.50. Use a full stop for cents, like 12.34.']);
  });

  it("asks for a colour or an LRV when both are blank", () => {
    const result = readCsvRow({ ...row, lrv: "" });
    expect(result).toEqual({ ok: false, errors: ["colour: give the maker's colour (like #d9d2c3) or its LRV."] });
  });

  it("undoes the formula guard export adds [published: OWASP, CSV injection]", () => {
    expect(guardCell("=SUM(A1)")).toBe("'=SUM(A1)");
    expect(guardCell("-5% gloss")).toBe("'-5% gloss");
    expect(guardCell("Saltbush")).toBe("Saltbush");
    const result = readCsvRow({ ...row, name: guardCell("=Odd name") });
    expect(result.ok && result.input.name).toBe("=Odd name");
  });
});
