import { mergeThresholds, type ThresholdOverrides } from "@/lib/colour";

const groups = ["match", "contrast", "access"] as const;

/**
 * A studio's check settings as stored (flat "group.name" keys, or nested groups) turned into
 * overrides for assessPair. Settings that don't validate are ignored rather than breaking a
 * client's screen: the defaults are the documented ones.
 */
export function readStudioThresholds(settings: Record<string, unknown> | null | undefined): ThresholdOverrides | undefined {
  if (!settings) return undefined;
  const out: Record<string, Record<string, number>> = {};
  for (const [key, value] of Object.entries(settings)) {
    if (typeof value === "number") {
      const [group, name] = key.split(".");
      if (group && name && (groups as readonly string[]).includes(group)) (out[group] ??= {})[name] = value;
    } else if (value && typeof value === "object" && (groups as readonly string[]).includes(key)) {
      for (const [name, v] of Object.entries(value)) if (typeof v === "number") (out[key] ??= {})[name] = v;
    }
  }
  if (Object.keys(out).length === 0) return undefined;
  try {
    mergeThresholds(out);
    return out;
  } catch {
    return undefined;
  }
}
