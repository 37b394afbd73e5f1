import type { Lab } from "./types";

// CIEDE2000 (CIE 142-2001) following the implementation notes of Sharma, Wu & Dalal (2005),
// Color Res. Appl. 30(1):21–30, with kL = kC = kH = 1. Worked with hue vectors rather than
// angles, so a call costs at most one atan2, one sin and one exp (none for warm hues), and
// allocates nothing: the index and the board checks call it hundreds of thousands of times.

const POW25_7 = 6103515625; // 25^7
const TWO_PI = 2 * Math.PI;
const DEG = Math.PI / 180;
const COS_30 = Math.cos(30 * DEG);
const SIN_30 = Math.sin(30 * DEG);
const COS_6 = Math.cos(6 * DEG);
const SIN_6 = Math.sin(6 * DEG);
const COS_63 = Math.cos(63 * DEG);
const SIN_63 = Math.sin(63 * DEG);
const HUE_275 = 275 * DEG;
const HUE_25 = 25 * DEG;
const THETA_30 = 30 * DEG;
const NEGLIGIBLE_EXPONENT = 40;
// Hues from 0° up to 275° − 25°·√40 ≈ 116.9° have R_T below double precision; 115° leaves margin.
const COS_WARM_EDGE = Math.cos(115 * DEG);

function computeHue(b: number, aPrime: number): number {
  if (aPrime === 0 && b === 0) return 0;
  const h = Math.atan2(b, aPrime);
  return h < 0 ? h + TWO_PI : h;
}

// Beyond about 154° apart (cos Δh' < −0.9) the vector forms below lose precision, and at exactly
// 180° the formula's branch rules decide the mean hue, so those pairs take the angle route.
const OPPOSITE_COS = -0.9;

/** Mean hue, its cosine/sine and the signed ΔH' by the explicit angle rules in Sharma et al. (2005). */
function computeHueTermsByAngle(b1: number, a1p: number, b2: number, a2p: number, cProduct: number, out: Float64Array): void {
  const h1p = computeHue(b1, a1p);
  const h2p = computeHue(b2, a2p);
  let dhp = 0;
  let hBar = h1p + h2p;
  if (cProduct !== 0) {
    const hDiff = h2p - h1p;
    if (hDiff > Math.PI) dhp = hDiff - TWO_PI;
    else if (hDiff < -Math.PI) dhp = hDiff + TWO_PI;
    else dhp = hDiff;
    if (Math.abs(hDiff) > Math.PI) hBar += hBar < TWO_PI ? TWO_PI : -TWO_PI;
    hBar /= 2;
  }
  out[0] = hBar;
  out[1] = Math.cos(hBar);
  out[2] = Math.sin(hBar);
  out[3] = 2 * Math.sqrt(cProduct) * Math.sin(dhp / 2);
}

// Scratch for the rare angle route; module-level so the hot path allocates nothing.
const hueTerms = new Float64Array(4);

/** CIEDE2000 on raw coordinates; the form the index uses so it can read from typed arrays. */
export function computeDeltaE2000(L1: number, a1: number, b1: number, L2: number, a2: number, b2: number): number {
  const cBar = (Math.sqrt(a1 * a1 + b1 * b1) + Math.sqrt(a2 * a2 + b2 * b2)) / 2;
  const cBar2 = cBar * cBar;
  const cBar7 = cBar2 * cBar2 * cBar2 * cBar;
  const g = 1.5 - 0.5 * Math.sqrt(cBar7 / (cBar7 + POW25_7)); // this is 1 + G
  const a1p = g * a1;
  const a2p = g * a2;
  const c1p = Math.sqrt(a1p * a1p + b1 * b1);
  const c2p = Math.sqrt(a2p * a2p + b2 * b2);
  const cProduct = c1p * c2p;
  const dot = a1p * a2p + b1 * b2;

  // Hue terms from the (a', b) vectors instead of angles: the mean hue h̄' is the direction of
  // the sum of the two unit hue vectors, and ΔH' = 2√(C1'C2')·sin(Δh'/2) = cross / √((C1'C2' + dot)/2).
  // Same values as Sharma et al.'s angle rules whenever |Δh'| < 180°, with one atan2 instead of
  // two and no sin/cos of h̄'.
  let hBar: number;
  let cosH: number;
  let sinH: number;
  let dHp: number;
  if (cProduct !== 0 && dot > OPPOSITE_COS * cProduct) {
    const ux = a1p / c1p + a2p / c2p;
    const uy = b1 / c1p + b2 / c2p;
    const norm = Math.sqrt(ux * ux + uy * uy);
    cosH = ux / norm;
    sinH = uy / norm;
    // The angle itself only feeds R_T, which is negligible for h̄' in [0°, ~117°] (see below).
    hBar = sinH >= 0 && cosH > COS_WARM_EDGE ? 0 : Math.atan2(uy, ux);
    if (hBar < 0) hBar += TWO_PI;
    dHp = (a1p * b2 - b1 * a2p) / Math.sqrt((cProduct + dot) / 2);
  } else {
    computeHueTermsByAngle(b1, a1p, b2, a2p, cProduct, hueTerms);
    hBar = hueTerms[0] ?? 0;
    cosH = hueTerms[1] ?? 1;
    sinH = hueTerms[2] ?? 0;
    dHp = hueTerms[3] ?? 0;
  }

  const dLp = L2 - L1;
  const dCp = c2p - c1p;

  const lMinus50 = (L1 + L2) / 2 - 50;
  const lSq = lMinus50 * lMinus50;
  const sL = 1 + (0.015 * lSq) / Math.sqrt(20 + lSq);
  const cBarP = (c1p + c2p) / 2;
  const sC = 1 + 0.045 * cBarP;

  // cos/sin of 2h̄', 3h̄', 4h̄' by the double- and triple-angle identities.
  const c2 = cosH * cosH - sinH * sinH;
  const s2 = 2 * sinH * cosH;
  const c3 = cosH * c2 - sinH * s2;
  const s3 = sinH * c2 + cosH * s2;
  const c4 = c2 * c2 - s2 * s2;
  const s4 = 2 * s2 * c2;
  const t =
    1 -
    0.17 * (cosH * COS_30 + sinH * SIN_30) +
    0.24 * c2 +
    0.32 * (c3 * COS_6 - s3 * SIN_6) -
    0.2 * (c4 * COS_63 + s4 * SIN_63);
  const sH = 1 + 0.015 * cBarP * t;

  // The blue-region rotation term R_T. Far from 275° its Gaussian is below e^-40 ≈ 4e-18, so
  // R_T's contribution sits under double precision; skipping exp and sin there saves a third of
  // the time for the warm hues most finishes have.
  const hueOffset = (hBar - HUE_275) / HUE_25;
  const offsetSq = hueOffset * hueOffset;
  let rT = 0;
  if (offsetSq < NEGLIGIBLE_EXPONENT) {
    const cBarP2 = cBarP * cBarP;
    const cBarP7 = cBarP2 * cBarP2 * cBarP2 * cBarP;
    rT = -2 * Math.sqrt(cBarP7 / (cBarP7 + POW25_7)) * Math.sin(2 * THETA_30 * Math.exp(-offsetSq));
  }

  const l = dLp / sL;
  const c = dCp / sC;
  const h = dHp / sH;
  return Math.sqrt(l * l + c * c + h * h + rT * c * h);
}

/** CIEDE2000 colour difference between two CIELAB colours, on the coordinates as given (no white-point conversion). */
export function deltaE2000(x: Lab, y: Lab): number {
  return computeDeltaE2000(x[0], x[1], x[2], y[0], y[1], y[2]);
}
