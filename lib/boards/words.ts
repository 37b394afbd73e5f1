import type { AccessStandard, Verdict } from "@/lib/colour";

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

/**
 * The access standards a studio may follow, in the settings' words. Figures as quoted by access
 * consultants' pages (DOMAIN.md); the standards themselves are paywalled, so check current editions.
 */
export const ACCESS_STANDARD_WORDS: Record<AccessStandard, { label: string; rule: string; hint: string }> = {
  as1428: {
    label: "AS 1428.1 (Australia)",
    rule: "Luminance contrast of at least 30 %, by the Bowman–Sapolinski formula.",
    hint: "The Australian access standard's measure. Judges the pair by how its two LRVs compare, so dark pairs need fewer points apart than light ones.",
  },
  bs8300: {
    label: "BS 8300-2 (United Kingdom)",
    rule: "At least 30 LRV points apart.",
    hint: "The UK design standard's rule of thumb (20 points may do above about 200 lux). Use it for UK work, or where a specification asks for it.",
  },
  both: {
    label: "Both",
    rule: "Both rules must pass; each verdict says which one failed.",
    hint: "The stricter of the two for every pair, for work that has to satisfy either reader.",
  },
};

/** On the settings page, beside the choice: the check is guidance and local rules decide. */
export const ACCESS_STANDARD_CAUTION =
  "These checks are guidance only. Follow the access standard that applies where the building is, and the building's certifier or access consultant; in a private home they are advice, not a requirement. Confirm with the suppliers' measured LRVs.";
