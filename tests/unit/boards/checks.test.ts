import { describe, expect, it } from "vitest";
import { computeBoardChecks, countVerdicts } from "@/lib/boards/board-checks";
import { readCheckSettings, resolveThresholds } from "@/lib/boards/check-settings";
import { orderChecks } from "@/lib/boards/order-checks";
import { assessPair, defaultThresholds, parseColour, underLight } from "@/lib/colour";

describe("check ordering", () => {
  const check = (pairId: string, verdict: "pass" | "borderline" | "fail", decidedBy: "match" | "contrast" | "access", deltaE = 0, luminanceContrast = 0) => ({
    pairId,
    verdict,
    decidedBy,
    deltaE,
    luminanceContrast,
  });

  it("puts fails first, access findings before colour ones, and the furthest off first", () => {
    const ordered = orderChecks([
      check("p1", "pass", "contrast", 20),
      check("p2", "fail", "match", 2.5),
      check("p3", "borderline", "contrast", 7),
      check("p4", "fail", "access", 0, 12),
      check("p5", "fail", "match", 6),
      check("p6", "fail", "access", 0, 4),
    ]);
    expect(ordered.map((c) => c.pairId)).toEqual(["p6", "p4", "p5", "p2", "p3", "p1"]);
  });

  it("is stable on ties, by pair id", () => {
    expect(orderChecks([check("b", "pass", "match", 1), check("a", "pass", "match", 1)]).map((c) => c.pairId)).toEqual(["a", "b"]);
  });
});

describe("board checks", () => {
  const white = parseColour("#f2f0ea");
  const oat = parseColour("#e8e1d3");
  const ink = parseColour("#2c3a4b");
  const items = [
    { id: "w", lab: white, lrv: 88 },
    { id: "o", lab: oat, lrv: 48 },
    { id: "i", lab: ink, lrv: 5 },
  ];
  const pairs = [
    { id: "wo", itemAId: "w", itemBId: "o", intent: "match" as const, accessRelevant: false },
    { id: "wi", itemAId: "w", itemBId: "i", intent: "contrast" as const, accessRelevant: true },
  ];

  it("judge each pair with assessPair on the colours and stored LRVs", () => {
    const [first, second] = computeBoardChecks(items, pairs, 6504, defaultThresholds);
    const match = assessPair({ a: { lab: white, lrv: 88 }, b: { lab: oat, lrv: 48 }, intent: "match", accessRelevant: false });
    // Worst first: the failed match (two different whites) before the clear contrast.
    expect(first).toMatchObject({ pairId: "wo", verdict: match.verdict, deltaE: match.deltaE, lrvA: 88, lrvB: 48, daylight: null, changed: false });
    expect(second).toMatchObject({ pairId: "wi", verdict: "pass" });
  });

  // Without the lamp's spectrum an eye adapted to the lamp sees the daylight CIELAB (lib/colour/under-light.ts;
  // property-tested in tests/unit/colour/lamp-verdicts.test.ts), so the lamp's check is the daylight one.
  it("under a lamp give the daylight check, and say it did not change", () => {
    const [check] = computeBoardChecks(items, pairs.slice(0, 1), 2700, defaultThresholds);
    const [daylight] = computeBoardChecks(items, pairs.slice(0, 1), 6504, defaultThresholds);
    const adapted = assessPair({ a: { lab: underLight(white, 2700), lrv: 88 }, b: { lab: underLight(oat, 2700), lrv: 48 }, intent: "match", accessRelevant: false });
    expect(check?.deltaE).toBe(daylight?.deltaE);
    expect(check?.deltaE).toBeCloseTo(adapted.deltaE, 9);
    expect(check?.verdict).toBe(adapted.verdict);
    expect(check?.daylight).toEqual({ verdict: daylight?.verdict, deltaE: daylight?.deltaE, reason: daylight?.reason });
    expect(check?.changed).toBe(false);
  });

  it("count verdicts", () => {
    expect(countVerdicts(computeBoardChecks(items, pairs, 6504, defaultThresholds))).toEqual({ fail: 1, borderline: 0, pass: 1 });
  });
});

describe("studio check settings", () => {
  it("read nested and dotted keys and drop anything unknown", () => {
    expect(readCheckSettings({ match: { noticeable: 1.5, bogus: 3 }, "access.margin": 2, "x.y": 1, contrast: "loud" })).toEqual({
      match: { noticeable: 1.5 },
      access: { margin: 2 },
    });
    expect(readCheckSettings(null)).toEqual({});
    expect(readCheckSettings([1, 2])).toEqual({});
  });

  it("fall back to the defaults when the settings contradict each other", () => {
    expect(resolveThresholds({ contrast: { nearMiss: 20, clear: 10 } })).toEqual({ thresholds: defaultThresholds, settingsIgnored: true });
    expect(resolveThresholds({ contrast: { clear: 12 } }).thresholds.contrast.clear).toBe(12);
  });
});
