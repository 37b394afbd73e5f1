import { assessPair, mergeThresholds, showPairFigures, type Lab, type PairAssessment, type PairFigures, type PairIntent, type ThresholdOverrides, type Thresholds, type Verdict } from "@/lib/colour";

export type CheckFinish = {
  id: string;
  name: string;
  lab: Lab;
  lrv: number;
  lrvSource: "published" | "photo" | "computed";
};

export type BoardPair = { aLabel: string; bLabel: string; a: CheckFinish; b: CheckFinish; intent: "match" | "contrast"; accessRelevant: boolean };

export type OptionCheck = {
  verdict: Verdict;
  /** "Benchtop and Base cabinets" or "Oat Matt and Chalk White". */
  between: string;
  reason: string;
  deltaE: number;
  luminanceContrast: number;
  lrvDifference: number;
  /** The same figures as shown, rounded so none contradicts the verdict (showPairFigures). */
  figures: PairFigures;
};

export type OptionChecks = {
  source: "board" | "finishes" | "none";
  /** How many pairs were checked. */
  checked: number;
  /** The ones worth a client's attention, worst first (never more than `SHOWN_LIMIT`). */
  shown: OptionCheck[];
};

export const SHOWN_LIMIT = 3;
const RANK: Record<Verdict, number> = { pass: 0, borderline: 1, fail: 2 };

/** Only a maker's published LRV outranks the one computed from the colour (PRODUCT.md). */
const colourOf = (f: CheckFinish) => ({ lab: f.lab, ...(f.lrvSource === "published" ? { lrv: f.lrv } : {}) });

function toCheck(between: string, a: PairAssessment, intent: PairIntent, t: Thresholds, reason = a.reason): OptionCheck {
  return {
    verdict: a.verdict,
    between,
    reason,
    deltaE: a.deltaE,
    luminanceContrast: a.luminanceContrast,
    lrvDifference: a.lrvDifference,
    figures: showPairFigures(a, intent, t),
  };
}

function worstFirst(checks: OptionCheck[]): OptionCheck[] {
  // Ties: the pair closest in colour first, since near misses are the likeliest accidents.
  return [...checks].sort((x, y) => RANK[y.verdict] - RANK[x.verdict] || x.deltaE - y.deltaE);
}

function pickShown(checks: OptionCheck[]): OptionCheck[] {
  return worstFirst(checks).filter((c) => c.verdict !== "pass").slice(0, SHOWN_LIMIT);
}

/** An option shown on a sample board: every marked pair on the board, judged against its intent. */
export function checkBoardPairs(pairs: readonly BoardPair[], thresholds?: ThresholdOverrides): OptionChecks {
  const t = mergeThresholds(thresholds);
  const checks = pairs.map((p) =>
    toCheck(
      `${p.aLabel} and ${p.bLabel}`,
      assessPair({ a: colourOf(p.a), b: colourOf(p.b), intent: p.intent, accessRelevant: p.accessRelevant, thresholds: t }),
      p.intent,
      t,
    ),
  );
  return { source: "board", checked: checks.length, shown: pickShown(checks) };
}

export const NEITHER_MATCH_NOR_CONTRAST =
  "These two finishes are close but not the same: side by side they may look like a mistake rather than a choice.";

/**
 * An option without a board: its finishes compared with each other. Nobody has said whether they
 * are meant to match or contrast, so a pair is fine if it works either way, and only a pair that
 * is neither (a near miss) is called out as a problem.
 */
export function checkFinishesTogether(finishes: readonly CheckFinish[], thresholds?: ThresholdOverrides): OptionChecks {
  const unique = finishes.filter((f, i) => finishes.findIndex((g) => g.id === f.id) === i);
  if (unique.length < 2) return { source: "none", checked: 0, shown: [] };
  const t = mergeThresholds(thresholds);
  const checks: OptionCheck[] = [];
  for (let i = 0; i < unique.length; i++) {
    for (let j = i + 1; j < unique.length; j++) {
      const a = unique[i];
      const b = unique[j];
      if (!a || !b) continue;
      const input = { a: colourOf(a), b: colourOf(b), accessRelevant: false, thresholds: t };
      const asMatch = assessPair({ ...input, intent: "match" });
      const asContrast = assessPair({ ...input, intent: "contrast" });
      const asMatchWins = RANK[asMatch.verdict] <= RANK[asContrast.verdict];
      const [best, intent] = asMatchWins ? ([asMatch, "match"] as const) : ([asContrast, "contrast"] as const);
      const between = `${a.name} and ${b.name}`;
      checks.push(toCheck(between, best, intent, t, best.verdict === "fail" ? NEITHER_MATCH_NOR_CONTRAST : best.reason));
    }
  }
  return { source: "finishes", checked: checks.length, shown: pickShown(checks) };
}
