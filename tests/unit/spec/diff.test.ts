import { describe, expect, it } from "vitest";
import { diffLines, hasChanges, linesForSupplier, visibleChanges } from "@/lib/spec/diff";
import type { SpecLineContent } from "@/lib/spec/types";
import { sampleLines } from "./fixtures";

const [benchtop, cooktop] = sampleLines() as [SpecLineContent, SpecLineContent];
const downlights: SpecLineContent = {
  ...cooktop,
  lineKey: "fixed:x-downlights",
  item: "Downlights",
  finishName: "Downlight, warm white",
  supplierId: "s-lighting",
  supplierName: "Lanternfield Lighting",
  quantity: 8,
  cautions: ["electrical-work"],
  sortOrder: 2,
};

describe("comparing two revisions line by line", () => {
  it("finds nothing between a revision and itself", () => {
    const diff = diffLines([benchtop, cooktop], [benchtop, cooktop]);
    expect(diff).toEqual({ added: [], removed: [], changed: [], unchanged: 2 });
    expect(hasChanges(diff)).toBe(false);
  });

  it("names added and removed lines by key", () => {
    const diff = diffLines([benchtop, cooktop], [benchtop, downlights]);
    expect(diff.added.map((l) => l.lineKey)).toEqual(["fixed:x-downlights"]);
    expect(diff.removed.map((l) => l.lineKey)).toEqual(["fixed:x-cooktop"]);
    expect(diff.unchanged).toBe(1);
  });

  it("says which fields of a kept line changed, with before and after", () => {
    const varied = { ...benchtop, finishId: "f-porcelain", finishName: "Chalk Porcelain Slab", productCode: "RS-PS-402", quantity: 7, cautions: [] };
    const [change] = diffLines([benchtop], [varied]).changed;
    expect(change?.changes.map((c) => c.field).sort()).toEqual(["cautions", "finishId", "finishName", "productCode", "quantity"]);
    expect(change?.changes.find((c) => c.field === "quantity")).toEqual({ field: "quantity", before: 6.5, after: 7 });
    // The id change is implied by the name change, so people see the name only.
    expect(visibleChanges(change?.changes ?? []).map((c) => c.field)).not.toContain("finishId");
  });

  it("ignores the order of a line's cautions and its place in the list", () => {
    const reordered = { ...cooktop, cautions: [...cooktop.cautions].reverse(), sortOrder: 9 };
    expect(hasChanges(diffLines([cooktop], [reordered]))).toBe(false);
  });

  it("shows a supplier a line moved to another supplier as removed, and the other as added", () => {
    const moved = { ...benchtop, supplierId: "s-other", supplierName: "Another Stone Co." };
    const stone = diffLines(linesForSupplier([benchtop], "s-stone"), linesForSupplier([moved], "s-stone"));
    const other = diffLines(linesForSupplier([benchtop], "s-other"), linesForSupplier([moved], "s-other"));
    expect(stone.removed.map((l) => l.lineKey)).toEqual([benchtop.lineKey]);
    expect(other.added.map((l) => l.lineKey)).toEqual([benchtop.lineKey]);
  });
});
