import { parse } from "csv-parse/sync";
import { describe, expect, it } from "vitest";
import { cautionTitles } from "@/lib/spec/caution-notes";
import { neutraliseCell } from "@/lib/csv-cell";
import { csvFileName, csvHeader, specLinesCsv } from "@/lib/spec/csv";
import type { SpecLineContent } from "@/lib/spec/types";
import { sampleLines } from "./fixtures";

const awkward: SpecLineContent = {
  ...(sampleLines()[0] as SpecLineContent),
  lineKey: "fixed:x-awkward",
  item: 'Island "waterfall" end, left',
  location: "Line one\nline two",
  productCode: "=HYPERLINK(\"http://example.invalid\")",
  sortOrder: 2,
};

/** Parsed back with csv-parse, a separate RFC 4180 reader, with the BOM stripped as a spreadsheet would. */
function readBack(csv: string) {
  return parse(csv, { bom: true, columns: true, skip_empty_lines: true }) as Record<string, string>[];
}

describe("revision CSV", () => {
  const lines = [...sampleLines(), awkward];
  const csv = specLinesCsv("B", lines.map((l, i) => ({ ...l, orderedOn: i === 0 ? "2026-11-21" : null, expectedOn: null })));

  it("starts with a UTF-8 byte-order mark and a header row, and ends rows with CRLF (RFC 4180)", () => {
    expect(csv.charCodeAt(0)).toBe(0xfeff);
    expect(csv.slice(1, csv.indexOf("\r\n"))).toBe(csvHeader.join(","));
  });

  it("reads back to the same lines, field by field", () => {
    const rows = readBack(csv);
    expect(rows).toHaveLength(lines.length);
    rows.forEach((row, i) => {
      const line = lines[i] as SpecLineContent;
      expect(row["Revision"]).toBe("B");
      expect(row["Line reference"]).toBe(line.lineKey);
      expect(row["Room"]).toBe(line.room);
      expect(row["Item"]).toBe(line.item);
      expect(row["Location"]).toBe(line.location ?? "");
      expect(row["Finish"]).toBe(line.finishName);
      expect(row["Supplier"]).toBe(line.supplierName ?? "");
      expect(Number(row["Quantity"])).toBe(line.quantity);
      expect(row["Unit"]).toBe(line.unit);
      expect(Number(row["Lead time (days)"])).toBe(line.leadTimeDays);
      expect(row["Order by"]).toBe(line.orderByDate ?? "");
      expect(row["Cautions"]).toBe(cautionTitles(line.cautions).join("; "));
    });
    expect(rows[0]?.["Ordered on"]).toBe("2026-11-21");
    expect(rows[0]?.["Unit"]).toBe("m²");
  });

  it("keeps quotes, commas and line breaks inside one cell", () => {
    const row = readBack(csv)[2];
    expect(row?.["Item"]).toBe('Island "waterfall" end, left');
    expect(row?.["Location"]).toBe("Line one\nline two");
  });

  it("stops a cell from running as a spreadsheet formula (OWASP, CSV injection)", () => {
    expect(readBack(csv)[2]?.["Product code"]).toBe("'=HYPERLINK(\"http://example.invalid\")");
    expect(neutraliseCell("+61 2 5550 0000")).toBe("'+61 2 5550 0000");
    expect(neutraliseCell("@home")).toBe("'@home");
    expect(neutraliseCell("RS-LM-204")).toBe("RS-LM-204");
  });

  it("names the file safely", () => {
    expect(csvFileName("Marrow Street terrace", "B")).toBe("marrow-street-terrace-revision-b.csv");
    expect(csvFileName("Kiln Lane Tiles & Bathware", "AA", "Café \"Ōtautahi\"/..\\x")).toBe("kiln-lane-tiles-bathware-revision-aa-cafe-otautahi-x.csv");
    expect(csvFileName("***", "A")).toBe("project-revision-a.csv");
  });
});
