import { deltaE2000 } from "./delta-e-2000";
import { computeContrastRatio, lightReflectance, luminanceContrast } from "./luminance";
import { explainAccess, explainContrast, explainMatch } from "./pair-reasons";
import type { Finding, Verdict } from "./pair-reasons";
import { defaultThresholds, mergeThresholds } from "./thresholds";
import type { ThresholdOverrides } from "./thresholds";
import type { Lab } from "./types";

export type { Verdict } from "./pair-reasons";

/** A finish as far as colour goes: its Lab, and the supplier's measured LRV when there is one. */
export type FinishColour = { lab: Lab; lrv?: number };
export type PairIntent = "match" | "contrast";
export type LrvSource = "published" | "computed";

export type AssessPairInput = {
  a: FinishColour;
  b: FinishColour;
  intent: PairIntent;
  /** Where people with low vision must tell the two apart (door/wall, step nosing, grab rail, floor/wall). */
  accessRelevant: boolean;
  thresholds?: ThresholdOverrides;
};

export type PairAssessment = {
  deltaE: number;
  /** WCAG 2.x ratio from the same LRVs as below, so a published LRV feeds both. */
  contrastRatio: number;
  lrvA: number;
  lrvB: number;
  lrvSource: { a: LrvSource; b: LrvSource };
  lrvDifference: number;
  luminanceContrast: number;
  verdict: Verdict;
  /** Which check set the verdict. */
  decidedBy: PairIntent | "access";
  reason: string;
};

const RANK: Record<Verdict, number> = { pass: 0, borderline: 1, fail: 2 };

function pickLrv(finish: FinishColour): [number, LrvSource] {
  const published = finish.lrv;
  if (published === undefined) return [lightReflectance(finish.lab), "computed"];
  if (!(published >= 0 && published <= 100)) {
    throw new RangeError(`A published LRV runs from 0 to 100 (got ${String(published)}).`);
  }
  return [published, "published"];
}

/**
 * Judges a pair of finishes the way a designer would: does an intended match read as one colour,
 * does an intended contrast read as deliberate, and, where access matters, is there enough
 * light–dark difference by the studio's access standard (`thresholds.accessStandard`, AS 1428.1 unless
 * told). The worst finding sets the verdict; on a tie the access finding speaks, and an access
 * pair's reason always names the standard and its result.
 */
export function assessPair(input: AssessPairInput): PairAssessment {
  const t = input.thresholds ? mergeThresholds(input.thresholds) : defaultThresholds;
  const { a, b } = input;
  const deltaE = deltaE2000(a.lab, b.lab);
  const [lrvA, sourceA] = pickLrv(a);
  const [lrvB, sourceB] = pickLrv(b);
  const lrvDifference = Math.abs(lrvA - lrvB);
  const lc = luminanceContrast(lrvA, lrvB);

  let decidedBy: PairAssessment["decidedBy"] = input.intent;
  let finding: Finding =
    input.intent === "match"
      ? explainMatch(a.lab, b.lab, deltaE, t.match)
      : explainContrast(deltaE, t.match.noticeable, t.contrast);
  if (input.accessRelevant) {
    const access = explainAccess(lc, lrvDifference, t.access, t.accessStandard);
    if (RANK[access.verdict] >= RANK[finding.verdict]) {
      finding = access;
      decidedBy = "access";
    } else {
      // The colour finding is worse, but the standard's result is still said: every access pair names it.
      finding = { verdict: finding.verdict, reason: `${finding.reason} ${access.reason}` };
    }
  }

  return {
    deltaE,
    contrastRatio: computeContrastRatio(lrvA / 100, lrvB / 100),
    lrvA,
    lrvB,
    lrvSource: { a: sourceA, b: sourceB },
    lrvDifference,
    luminanceContrast: lc,
    verdict: finding.verdict,
    decidedBy,
    reason: finding.reason,
  };
}
