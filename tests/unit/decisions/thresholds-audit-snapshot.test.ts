import { describe, expect, it } from "vitest";
import { describeAudit } from "@/lib/decisions/audit-words";
import { readSnapshot } from "@/lib/decisions/snapshot";
import { readStudioThresholds } from "@/lib/decisions/thresholds";

describe("readStudioThresholds", () => {
  it("reads flat and nested settings, and ignores unknown or invalid ones", () => {
    expect(readStudioThresholds({ "match.noticeable": 2.5, "access.margin": 3 })).toEqual({ match: { noticeable: 2.5 }, access: { margin: 3 } });
    expect(readStudioThresholds({ contrast: { clear: 12 } } as Record<string, unknown>)).toEqual({ contrast: { clear: 12 } });
    expect(readStudioThresholds({ "colour.hue": 3 })).toBeUndefined();
    // noticeable above nearMiss breaks the order the engine needs: fall back to the defaults.
    expect(readStudioThresholds({ "match.noticeable": 9 })).toBeUndefined();
    expect(readStudioThresholds(null)).toBeUndefined();
  });
});

describe("describeAudit", () => {
  it("says each decision step in plain words", () => {
    expect(describeAudit("decision.approved", { title: "Benchtop", option: "Saltbush Limestone" })).toBe(
      "approved “Saltbush Limestone” for “Benchtop”, which locked it",
    );
    expect(describeAudit("option.chosen", { title: "Pendant", option: "Opal", comment: "Softer light" })).toBe("picked “Opal” for “Pendant”, saying “Softer light”");
    expect(describeAudit("board.item.added", { title: "Kitchen" })).toBe("board item added “Kitchen”");
  });
});

describe("readSnapshot", () => {
  it("reads the demo's short snapshots and refuses garbage", () => {
    expect(readSnapshot({ option: "Graphite Porcelain Slab", priceCents: 216000, allowanceCents: 250000, lines: [{ finish: "Graphite", code: "RS-PS-415", quantity: 2, unit: "m²" }] })).toMatchObject({
      option: "Graphite Porcelain Slab",
      lines: [{ finish: "Graphite", quantity: 2 }],
    });
    expect(readSnapshot("nonsense")).toBeNull();
  });
});
