/**
 * The access standard a studio's low-vision check follows (studio.access_standard):
 * - "as1428": AS 1428.1 luminance contrast (Bowman–Sapolinski) of at least `minLuminanceContrast` %;
 * - "bs8300": BS 8300-2 difference of at least `minLrvDifference` LRV points;
 * - "both": both rules, so the stricter one decides.
 */
export const ACCESS_STANDARDS = ["as1428", "bs8300", "both"] as const;
export type AccessStandard = (typeof ACCESS_STANDARDS)[number];

/** The column's default, and the rule for a studio that has not chosen: Mottle's studios are Australian. */
export const DEFAULT_ACCESS_STANDARD: AccessStandard = "as1428";

export function isAccessStandard(value: unknown): value is AccessStandard {
  return typeof value === "string" && (ACCESS_STANDARDS as readonly string[]).includes(value);
}

/**
 * Every number assessPair judges by, and the access standard it follows. A studio may override any
 * number with mergeThresholds; each default names where it comes from, so an override can be
 * argued on the same footing.
 */
const numericDefaults = {
  match: {
    /** ΔE00 at or below this reads as the same colour. [common practice: ΔE00 ≈ 1 is the commonly quoted just-noticeable difference] */
    imperceptible: 1,
    /** ΔE00 above this is noticeable side by side, so an intended match fails. [common practice] */
    noticeable: 2,
    /** Up to this ΔE00 a failed match looks like a mistake rather than a second colour. [memory: house rule of thumb] */
    nearMiss: 3,
  },
  contrast: {
    /** An intended contrast below this ΔE00 is a near miss: it looks like a failed match, not a choice. [memory: no published figure; designers' rule of thumb] */
    nearMiss: 5,
    /** From this ΔE00 up an intended contrast reads clearly across a room; between nearMiss and this it is subtle. [memory: house rule of thumb] */
    clear: 10,
  },
  access: {
    /** Minimum luminance contrast, percent, Bowman–Sapolinski formula, when the studio follows AS 1428.1. [published: AS 1428.1, as quoted by access consultants] */
    minLuminanceContrast: 30,
    /** Minimum difference in LRV points, when the studio follows BS 8300-2. [published: BS 8300-2:2018, as quoted] */
    minLrvDifference: 30,
    /** Within this many points above a minimum we call it borderline, as LRVs vary by batch, sheen and meter. [memory: measured LRVs commonly differ by a few points] */
    margin: 5,
  },
} as const;

type Group = keyof typeof numericDefaults;
/** The groups of numbers, for readers of a studio's loose settings JSON. */
export const THRESHOLD_GROUPS = Object.keys(numericDefaults) as readonly Group[];

export type Thresholds = {
  readonly [G in Group]: { readonly [K in keyof (typeof numericDefaults)[G]]: number };
} & { readonly accessStandard: AccessStandard };

export const defaultThresholds: Thresholds = { ...numericDefaults, accessStandard: DEFAULT_ACCESS_STANDARD };

export type ThresholdOverrides = {
  readonly [G in Group]?: { readonly [K in keyof Thresholds[G]]?: number };
} & { readonly accessStandard?: AccessStandard };

function checkThresholds(t: Thresholds): void {
  if (!isAccessStandard(t.accessStandard)) {
    throw new RangeError(`The access standard must be one of ${ACCESS_STANDARDS.join(", ")} (got ${String(t.accessStandard)}).`);
  }
  for (const group of THRESHOLD_GROUPS) {
    const values = t[group];
    for (const [name, value] of Object.entries(values as Record<string, number>)) {
      if (typeof value !== "number" || !Number.isFinite(value) || value < 0) {
        throw new RangeError(`Threshold ${group}.${name} must be a number of 0 or more (got ${String(value)}).`);
      }
    }
  }
  const { match, contrast } = t;
  if (!(match.imperceptible <= match.noticeable && match.noticeable <= match.nearMiss)) {
    throw new RangeError("Match thresholds must run imperceptible ≤ noticeable ≤ nearMiss.");
  }
  if (!(contrast.nearMiss <= contrast.clear)) {
    throw new RangeError("Contrast thresholds must run nearMiss ≤ clear.");
  }
}

/** Studio overrides on top of the defaults; unknown keys are ignored, bad values throw RangeError. */
export function mergeThresholds(overrides: ThresholdOverrides = {}, base: Thresholds = defaultThresholds): Thresholds {
  const merged: Thresholds = {
    match: { ...base.match, ...pickKnown(base.match, overrides.match) },
    contrast: { ...base.contrast, ...pickKnown(base.contrast, overrides.contrast) },
    access: { ...base.access, ...pickKnown(base.access, overrides.access) },
    accessStandard: overrides.accessStandard ?? base.accessStandard,
  };
  checkThresholds(merged);
  return merged;
}

function pickKnown<T extends object>(base: T, patch: Partial<Record<keyof T, number>> | undefined): Partial<T> {
  const out: Partial<Record<keyof T, number>> = {};
  if (!patch) return out as Partial<T>;
  for (const key of Object.keys(base) as (keyof T)[]) {
    const value = patch[key];
    if (value !== undefined) out[key] = value;
  }
  return out as Partial<T>;
}
