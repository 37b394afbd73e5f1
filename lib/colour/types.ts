/** CIELAB relative to the D65 white (not colorjs.io's D50 `lab`). */
export type Lab = readonly [L: number, a: number, b: number];

/** CIE XYZ relative to D65, scaled so the white has Y = 1. */
export type Xyz = readonly [X: number, Y: number, Z: number];
