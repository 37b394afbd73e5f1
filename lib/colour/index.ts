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
export { defaultThresholds, mergeThresholds } from "./thresholds";
export type { ThresholdOverrides, Thresholds } from "./thresholds";
export { LIGHTS, underLight } from "./under-light";
export type { LightPreset } from "./under-light";
export { createColourIndex } from "./colour-index";
export type { ColourIndex, IndexEntry, IndexHit } from "./colour-index";
