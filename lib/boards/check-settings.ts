import { DEFAULT_ACCESS_STANDARD, defaultThresholds, isAccessStandard, mergeThresholds, THRESHOLD_GROUPS } from "@/lib/colour";
import type { AccessStandard, ThresholdOverrides, Thresholds } from "@/lib/colour";

type Group = (typeof THRESHOLD_GROUPS)[number];
const groups: readonly string[] = THRESHOLD_GROUPS;

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

/**
 * A studio's stored check settings as threshold overrides. The column is loose JSON, so both
 * shapes are read: nested (`{ "match": { "noticeable": 1.5 } }`) and flat with dotted keys
 * (`{ "match.noticeable": 1.5 }`). Unknown keys and non-numbers are dropped.
 */
export function readCheckSettings(raw: unknown): ThresholdOverrides {
  if (!isRecord(raw)) return {};
  const out: Record<string, Record<string, number>> = {};
  const put = (group: string, key: string, value: unknown) => {
    if (!groups.includes(group as Group) || typeof value !== "number" || !Number.isFinite(value)) return;
    if (!Object.hasOwn(defaultThresholds[group as Group], key)) return;
    (out[group] ??= {})[key] = value;
  };
  for (const [key, value] of Object.entries(raw)) {
    if (isRecord(value)) for (const [inner, v] of Object.entries(value)) put(key, inner, v);
    else {
      const [group, inner, ...rest] = key.split(".");
      if (group && inner && rest.length === 0) put(group, inner, value);
    }
  }
  return out as ThresholdOverrides;
}

/** The studio's access standard as stored; anything unreadable is the default (AS 1428.1). */
export function readAccessStandard(raw: unknown): AccessStandard {
  return isAccessStandard(raw) ? raw : DEFAULT_ACCESS_STANDARD;
}

/**
 * The thresholds a studio's boards are judged by, with the access standard it chose
 * (studio.access_standard). Settings that contradict each other (say a "noticeable" below
 * "imperceptible") can't be used, so the checks fall back to the default numbers rather than fail
 * the whole board; `settingsIgnored` lets the screen say so. The standard is kept either way.
 */
export function resolveThresholds(raw: unknown, accessStandard?: unknown): { thresholds: Thresholds; settingsIgnored: boolean } {
  const overrides = readCheckSettings(raw);
  const standard = readAccessStandard(accessStandard);
  try {
    return { thresholds: mergeThresholds({ ...overrides, accessStandard: standard }), settingsIgnored: false };
  } catch (error) {
    if (error instanceof RangeError) return { thresholds: { ...defaultThresholds, accessStandard: standard }, settingsIgnored: true };
    throw error;
  }
}
