// Colour engine: pure TypeScript, safe on server and client. Photo analysis (sharp) lives in
// ./photo and is deliberately not re-exported here.
export type { Lab } from "./types";
export { ColourInputError } from "./errors";
export { SCREEN_COLOUR_CAUTION } from "./caution";
export { parseColour } from "./parse-colour";
export { toHex } from "./to-hex";
export { deltaE2000 } from "./delta-e-2000";
export { contrastRatio, lightReflectance, luminanceContrast } from "./luminance";
export { assessPair } from "./assess-pair";
export type { AssessPairInput, FinishColour, LrvSource, PairAssessment, PairIntent, Verdict } from "./assess-pair";
export { ACCESS_STANDARDS, DEFAULT_ACCESS_STANDARD, defaultThresholds, isAccessStandard, mergeThresholds, THRESHOLD_GROUPS } from "./thresholds";
export type { AccessStandard, ThresholdOverrides, Thresholds } from "./thresholds";
export { atLeast, atMost, formatAgainst, formatThreshold } from "./figures";
export type { Boundary } from "./figures";
export { showPairFigures } from "./pair-figures";
export type { PairFigures } from "./pair-figures";
export { checkPublishedLrv, LRV_DISAGREEMENT_POINTS } from "./lrv-check";
export type { LrvCheck } from "./lrv-check";
export { DAYLIGHT_CCT, LAMP_ADAPTATION, LIGHTS, paintUnderLight, underLight } from "./under-light";
export { computeLightXy } from "./white-point";
export type { LightPreset } from "./under-light";
export { createColourIndex } from "./colour-index";
export type { ColourIndex, IndexEntry, IndexHit } from "./colour-index";
