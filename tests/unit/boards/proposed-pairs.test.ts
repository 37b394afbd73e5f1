import { describe, expect, it } from "vitest";
import { readPlacement } from "@/lib/boards/labels";
import { MAX_PROPOSALS, pairKey, proposePairs } from "@/lib/boards/proposed-pairs";

// Which surfaces meet, and which meetings matter for access, is [common practice] as set out in
// PRODUCT.md and DOMAIN.md (floor against wall or kickboard, benchtop and step edges).

describe("reading labels", () => {
  it.each([
    ["Benchtop", "benchtop"],
    ["Island benchtop", "benchtop"],
    ["Vanity top, ensuite", "benchtop"],
    ["Base cabinets", "base-cabinets"],
    ["Tall cabinets", "tall-cabinets"],
    ["Pantry doors", "tall-cabinets"],
    ["Wall cabinets", "wall-cabinets"],
    ["Island feature panel", "island-panel"],
    ["Splashback", "splashback"],
    ["Floor", "floor"],
    ["Floor tiles", "floor"],
    ["Kickboard", "kickboard"],
    ["Plinth", "kickboard"],
    ["Wall", "wall"],
    ["Wall paint", "wall"],
    ["Step edge", "step-edge"],
    ["Pendant", "pendant"],
    ["Handles, brass", "handles"],
    ["Tapware", "tapware"],
    ["Sink", "sink"],
  ])("%s reads as %s", (label, kind) => {
    expect(readPlacement(label)).toBe(kind);
  });

  it("says nothing for words it does not know", () => {
    expect(readPlacement("Mood image")).toBeNull();
  });
});

describe("proposing pairs from labels", () => {
  const items = [
    { id: "b", label: "Benchtop" },
    { id: "c", label: "Base cabinets" },
    { id: "s", label: "Splashback" },
    { id: "f", label: "Floor" },
    { id: "k", label: "Kickboard" },
    { id: "w", label: "Wall" },
  ];

  it("proposes the usual meetings with their usual intent and access flag", () => {
    const proposals = proposePairs(items, []);
    const find = (x: string, y: string) => proposals.find((p) => pairKey(p.itemAId, p.itemBId) === pairKey(x, y));
    expect(find("b", "c")).toMatchObject({ intent: "contrast", accessRelevant: false });
    expect(find("s", "b")).toMatchObject({ intent: "match", accessRelevant: false });
    expect(find("f", "k")).toMatchObject({ intent: "contrast", accessRelevant: true });
    expect(find("f", "w")).toMatchObject({ intent: "contrast", accessRelevant: true });
    expect(find("b", "f")).toMatchObject({ accessRelevant: true });
    expect(proposals.every((p) => p.why.length > 0)).toBe(true);
  });

  it("leaves out pairs already marked, either way round", () => {
    const proposals = proposePairs(items, [{ itemAId: "c", itemBId: "b" }]);
    expect(proposals.some((p) => pairKey(p.itemAId, p.itemBId) === pairKey("b", "c"))).toBe(false);
  });

  it("never pairs a swatch with itself and stops at a sensible number", () => {
    const many = Array.from({ length: 30 }, (_, i) => ({ id: `i${i}`, label: i % 2 ? "Floor" : "Wall" }));
    const proposals = proposePairs(many, []);
    expect(proposals).toHaveLength(MAX_PROPOSALS);
    expect(proposals.every((p) => p.itemAId !== p.itemBId)).toBe(true);
  });
});
