import { deltaE2000 as referenceDeltaE2000, Lab as ColorjsLab } from "colorjs.io/fn";
import { afterEach, describe, expect, it } from "vitest";
import { GET as getBoard } from "@/app/api/boards/[boardId]/route";
import { GET as listBoards } from "@/app/api/projects/[projectId]/boards/route";
import { assessPair, defaultThresholds, mergeThresholds, paintUnderLight, toHex, underLight } from "@/lib/colour";
import type { Lab, ThresholdOverrides } from "@/lib/colour";
import type { BoardView } from "@/lib/boards/types";
import { actAs } from "@/tests/support/session";
import { BOARD, callRoute, PROJECT, sql } from "./boards-support";

type Stored = { item_id: string; lab_l: number; lab_a: number; lab_b: number; lrv: number };

async function storedColours(): Promise<Map<string, { lab: Lab; lrv: number }>> {
  const rows = await sql<Stored>(
    "select i.id as item_id, f.lab_l, f.lab_a, f.lab_b, f.lrv from board_item i join finish f on f.id = i.finish_id where i.board_id = ?",
    [BOARD],
  );
  return new Map(rows.map((r) => [r.item_id, { lab: [r.lab_l, r.lab_a, r.lab_b] as Lab, lrv: r.lrv }]));
}

async function view(query = ""): Promise<BoardView> {
  actAs("designer");
  const res = await callRoute(getBoard, `/api/boards/${BOARD}${query}`, { boardId: BOARD });
  expect(res.status).toBe(200);
  return res.body as unknown as BoardView;
}

/** The checks of the JSON against lib/colour run here on the stored colours, pair by pair. */
async function expectChecksEqualEngine(board: BoardView, cct: number | null, thresholds?: ThresholdOverrides) {
  const colours = await storedColours();
  expect(board.checks).toHaveLength(board.pairs.length);
  for (const check of board.checks) {
    const a = colours.get(check.itemAId);
    const b = colours.get(check.itemBId);
    if (!a || !b) throw new Error("check names an item that is not on the board");
    const seen = (lab: Lab) => (cct === null ? lab : underLight(lab, cct));
    const expected = assessPair({
      a: { lab: seen(a.lab), lrv: a.lrv },
      b: { lab: seen(b.lab), lrv: b.lrv },
      intent: check.intent,
      accessRelevant: check.accessRelevant,
      thresholds,
    });
    expect(check.deltaE).toBeCloseTo(expected.deltaE, 10);
    expect(check.contrastRatio).toBeCloseTo(expected.contrastRatio, 10);
    expect(check.luminanceContrast).toBeCloseTo(expected.luminanceContrast, 10);
    expect([check.lrvA, check.lrvB, check.lrvDifference]).toEqual([expected.lrvA, expected.lrvB, expected.lrvDifference]);
    expect([check.verdict, check.decidedBy, check.reason]).toEqual([expected.verdict, expected.decidedBy, expected.reason]);
  }
}

afterEach(async () => {
  await sql("update studio set check_settings = null where id = 'demo-studio-fernleaf'");
});

describe("the checks in the board JSON", () => {
  it("equal lib/colour's assessPair on the stored colours and LRVs, in daylight", async () => {
    const board = await view();
    expect(board.light.cct).toBe(6504);
    expect(board.checks.length).toBe(6);
    await expectChecksEqualEngine(board, null);
  });

  it("agree with outside references: colorjs.io's CIEDE2000, WCAG 2.1's ratio and the AS 1428.1 formula", async () => {
    const board = await view();
    const colours = await storedColours();
    for (const check of board.checks) {
      const a = colours.get(check.itemAId);
      const b = colours.get(check.itemBId);
      if (!a || !b) throw new Error("missing item");
      // [reference library: colorjs.io 0.7.1 deltaE2000] It works in its own `lab` space, so the
      // coordinates go in as they are (as in tests/unit/colour): the formula is compared, not a conversion.
      const reference = referenceDeltaE2000(
        { space: ColorjsLab, coords: [...a.lab], alpha: 1 },
        { space: ColorjsLab, coords: [...b.lab], alpha: 1 },
      );
      expect(check.deltaE).toBeCloseTo(reference, 4);
      // WCAG 2.1 "contrast ratio": (L1 + 0.05) / (L2 + 0.05), L the relative luminance (LRV / 100).
      const [hi, lo] = [Math.max(a.lrv, b.lrv) / 100, Math.min(a.lrv, b.lrv) / 100];
      expect(check.contrastRatio).toBeCloseTo((hi + 0.05) / (lo + 0.05), 10);
      // Bowman–Sapolinski as quoted for AS 1428.1: C = 125 × (Y2 − Y1) / (Y1 + Y2 + 25).
      expect(check.luminanceContrast).toBeCloseTo((125 * (hi * 100 - lo * 100)) / (hi * 100 + lo * 100 + 25), 10);
    }
  });

  it("come worst first", async () => {
    const rank = { fail: 0, borderline: 1, pass: 2 } as const;
    const ranks = (await view()).checks.map((c) => rank[c.verdict]);
    expect(ranks).toEqual([...ranks].sort((x, y) => x - y));
  });

  it("use the studio's own thresholds, nested or dotted, over the defaults", async () => {
    const strict = { match: { imperceptible: 0.2, noticeable: 0.3, nearMiss: 0.4 }, access: { minLuminanceContrast: 60 } };
    await sql("update studio set check_settings = ? where id = 'demo-studio-fernleaf'", [JSON.stringify(strict)]);
    const nested = await view();
    expect(nested.settingsIgnored).toBe(false);
    await expectChecksEqualEngine(nested, null, mergeThresholds(strict));
    await sql("update studio set check_settings = ? where id = 'demo-studio-fernleaf'", [JSON.stringify({ "access.minLuminanceContrast": 60 })]);
    await expectChecksEqualEngine(await view(), null, { access: { minLuminanceContrast: 60 } });
  });

  it("fall back to the defaults, and say so, when the studio's settings contradict each other", async () => {
    await sql("update studio set check_settings = ? where id = 'demo-studio-fernleaf'", [JSON.stringify({ match: { imperceptible: 3, noticeable: 1 } })]);
    const board = await view();
    expect(board.settingsIgnored).toBe(true);
    await expectChecksEqualEngine(board, null, defaultThresholds);
  });
});

describe("under another light", () => {
  // An eye adapted to the lamp sees the daylight CIELAB (lib/colour/under-light.ts), so nothing changes.
  it.each([2700, 3000, 4000])("at %i K give the daylight checks, with no verdict changed", async (cct) => {
    const daylight = await view();
    const lamp = await view(`?cct=${cct}`);
    expect(lamp.light.cct).toBe(cct);
    await expectChecksEqualEngine(lamp, cct);
    const byPair = new Map(daylight.checks.map((c) => [c.pairId, c]));
    for (const check of lamp.checks) {
      const before = byPair.get(check.pairId);
      expect([check.verdict, check.deltaE, check.lrvA, check.lrvB]).toEqual([before?.verdict, before?.deltaE, before?.lrvA, before?.lrvB]);
      expect(check.daylight?.verdict).toBe(before?.verdict);
      expect(check.changed).toBe(false);
    }
  });

  it("paints every swatch as an adapted eye sees it and keeps the daylight colour beside it", async () => {
    const colours = await storedColours();
    const warm = await view("?cct=2700");
    for (const item of warm.items) {
      const stored = colours.get(item.id);
      if (!stored) throw new Error("missing item");
      expect(item.finish.hex).toBe(toHex(stored.lab));
      expect(item.finish.tint).toBe(paintUnderLight(stored.lab, 2700));
      expect(item.finish.tint).not.toBe(item.finish.hex);
    }
    expect((await view("?cct=daylight")).items.every((i) => i.finish.tint === i.finish.hex)).toBe(true);
  });
});

describe("the board list", () => {
  it("lists every room with its boards and the daylight verdict counts", async () => {
    actAs("designer");
    const res = await callRoute(listBoards, `/api/projects/${PROJECT}/boards`, { projectId: PROJECT });
    const body = res.body as unknown as { rooms: { name: string; boards: { id: string; itemCount: number; pairCount: number; counts: Record<string, number> }[] }[] };
    expect(body.rooms.map((r) => r.name)).toEqual(["Kitchen", "Laundry", "Ensuite"]);
    const kitchen = body.rooms[0]?.boards.find((b) => b.id === BOARD);
    const counts = (await view()).counts;
    expect(kitchen).toMatchObject({ itemCount: 10, pairCount: 6, counts });
  });
});
