import type { Verdict } from "@/lib/colour";

/** Plain names for verdicts; the badge tone only supports the words, never replaces them. */
export const VERDICT_WORDS: Record<Verdict, string> = {
  pass: "Works as meant",
  borderline: "Look closely",
  fail: "Problem",
};

export const VERDICT_TONE: Record<Verdict, "ok" | "caution" | "problem"> = {
  pass: "ok",
  borderline: "caution",
  fail: "problem",
};

export const INTENT_WORDS = { match: "Meant to match", contrast: "Meant to contrast" } as const;

/** Shown wherever luminance contrast is: it is guidance, and the certifier decides. */
export const ACCESS_GUIDANCE =
  "Luminance-contrast results are guidance only. The local access standard and the building's certifier decide what is required.";

/** Why the LRVs and luminance contrast do not move when the light does. */
export const LRV_UNDER_LIGHT_NOTE =
  "LRVs are measured in daylight and belong to the surface, so they stay the same under every light; the light changes how the colours read.";
