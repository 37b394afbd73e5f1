import { describe, expect, it } from "vitest";
import { buildSpecLines, lineKeyFor, type LineSource } from "@/lib/spec/build-lines";
import { cautionNotes, cautionsAcross } from "@/lib/spec/caution-notes";
import { isLate, lineStatus } from "@/lib/spec/status";

describe("line status", () => {
  const base = { orderByDate: "2027-01-18", today: "2026-12-01", installDate: "2027-04-12" };
  it("is not ordered before its order-by date, and late after it", () => {
    expect(lineStatus({ ...base, order: null })).toBe("not-ordered");
    expect(lineStatus({ ...base, order: null, today: "2027-01-18" })).toBe("not-ordered");
    expect(lineStatus({ ...base, order: null, today: "2027-01-19" })).toBe("order-overdue");
    expect(isLate("order-overdue")).toBe(true);
  });
  it("is ordered, then expected, and late if it lands after the install date", () => {
    expect(lineStatus({ ...base, order: { orderedOn: "2026-12-01", expectedOn: null } })).toBe("ordered");
    expect(lineStatus({ ...base, order: { orderedOn: "2026-12-01", expectedOn: "2027-04-12" } })).toBe("expected");
    expect(lineStatus({ ...base, order: { orderedOn: "2026-12-01", expectedOn: "2027-04-13" } })).toBe("arrives-late");
  });
  it("is never late without dates to be late against", () => {
    expect(lineStatus({ ...base, orderByDate: null, order: null, today: "2030-01-01" })).toBe("not-ordered");
  });
});

const finish = (id: string, supplier: string | null, lead = 21): LineSource["finish"] => ({
  id, name: `Finish ${id}`, productCode: `C-${id}`, leadTimeDays: lead, cautions: ["natural-stone-silica", "natural-stone-silica"], supplierId: supplier, supplierName: supplier,
});

describe("building the specification's lines", () => {
  const sources: LineSource[] = [
    { kind: "fixed", sourceId: "oven", position: 0, room: { name: "Kitchen", sortOrder: 0 }, item: "Wall oven", location: null, finish: finish("oven", "appl", 84), quantity: 1, unit: "each" },
    { kind: "decision", sourceId: "cab", position: 1, room: { name: "Kitchen", sortOrder: 0 }, item: "Cabinet colour", location: "Tall", finish: finish("chalk", "join", 56), quantity: 11, unit: "m²" },
    { kind: "decision", sourceId: "cab", position: 0, room: { name: "Kitchen", sortOrder: 0 }, item: "Cabinet colour", location: "Base", finish: finish("oat", "join", 56), quantity: 14, unit: "m²" },
    { kind: "decision", sourceId: "lb", position: 0, room: { name: "Laundry", sortOrder: 1 }, item: "Laundry benchtop", location: null, finish: finish("chalk-slab", "stone"), quantity: 2, unit: "m²" },
  ];
  const lines = buildSpecLines(sources, "2027-04-12");

  it("keys lines by their decision (and position) or fixed item, stable across revisions", () => {
    expect(lineKeyFor({ kind: "decision", sourceId: "d1", position: 0 })).toBe("decision:d1");
    expect(lineKeyFor({ kind: "decision", sourceId: "d1", position: 1 })).toBe("decision:d1:2");
    expect(lineKeyFor({ kind: "fixed", sourceId: "f1", position: 0 })).toBe("fixed:f1");
  });

  it("orders by room, then item, then key, whatever order the rows came in", () => {
    expect(lines.map((l) => l.lineKey)).toEqual(["decision:cab", "decision:cab:2", "fixed:oven", "decision:lb"]);
    expect(lines.map((l) => l.sortOrder)).toEqual([0, 1, 2, 3]);
    expect(buildSpecLines([...sources].reverse(), "2027-04-12")).toEqual(lines);
  });

  it("works out order-by dates from the install date and each finish's lead time", () => {
    expect(lines.find((l) => l.lineKey === "fixed:oven")?.orderByDate).toBe("2027-01-18");
    expect(lines.find((l) => l.lineKey === "decision:lb")?.orderByDate).toBe("2027-03-22");
    expect(buildSpecLines(sources, null).every((l) => l.orderByDate === null)).toBe(true);
  });

  it("carries each finish's cautions once, with their plain texts", () => {
    expect(lines[0]?.cautions).toEqual(["natural-stone-silica"]);
    expect(cautionNotes(["natural-stone-silica", "not-a-caution"]).map((c) => c.title)).toEqual(["Cutting natural stone"]);
    expect(cautionsAcross([{ cautions: ["gas-work"] }, { cautions: ["engineered-stone", "gas-work"] }]).map((c) => c.key)).toEqual(["engineered-stone", "gas-work"]);
  });
});
