import { describe, expect, it } from "vitest";
import { neutraliseCell, restoreCell } from "@/lib/csv-cell";

// Source: OWASP, "CSV Injection" (cells beginning = + - @, tab, carriage return are run as formulas);
// the look-alikes fold to those characters under NFKC (Unicode Standard Annex #15, UnicodeData.txt
// compatibility mappings: U+FF1D → U+003D, U+FF0B → U+002B, U+FF0D → U+002D, U+FF20 → U+0040,
// U+FE66 → U+003D, U+FE62 → U+002B, U+FE63 → U+002D, U+FE6B → U+0040).
describe("CSV cells a spreadsheet could run", () => {
  it.each(["=SUM(A1)", "+61 2 5550 0000", "-5% gloss", "@home", "\tx", "\r=1"])("neutralises the ASCII formula start %j", (cell) => {
    expect(neutraliseCell(cell)).toBe(`'${cell}`);
  });

  it.each(["\uFF1DHYPERLINK(1)", "\uFF0B1", "\uFF0D1", "\uFF20x", "\uFE66x", "\uFE62x", "\uFE63x", "\uFE6Bx", "\u22121"])(
    "neutralises the Unicode form %j",
    (cell) => {
      expect(neutraliseCell(cell)).toBe(`'${cell}`);
    },
  );

  it.each(["\u200B=1+1", "\uFEFF=1", "\u2060@x", "\u00A0=1", "\u202E=1", "\u0000=1"])("neutralises a cell led by an invisible character %j", (cell) => {
    expect(neutraliseCell(cell)).toBe(`'${cell}`);
  });

  it("leaves ordinary text and codes alone", () => {
    for (const cell of ["Saltbush", "RS-LM-204", "20 mm slab", "Ōtaki grey", "", "'quoted"]) expect(neutraliseCell(cell)).toBe(cell);
  });

  it("reads back what it wrote, and only that", () => {
    for (const cell of ["=SUM(A1)", "\uFF1Dx", "\u200B=1", "plain"]) expect(restoreCell(neutraliseCell(cell))).toBe(cell);
    expect(restoreCell("'plain")).toBe("'plain");
  });
});
