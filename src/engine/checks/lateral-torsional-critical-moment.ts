/**
 * Elastic critical moment of lateral-torsional buckling with load height and monosymmetry, the
 * three-factor formula (ENV 1993-1-1:1992 Annex F, eq. F.2; NCCI SN003, eq. for doubly symmetric
 * sections with C3 = 0; both from memory):
 *
 *   M_cr = C1 pi^2 E I / (k L)^2 { sqrt[ (k / kw)^2 Iw / I + (k L)^2 G J / (pi^2 E I) + (C2 zg - C3 zj)^2 ]
 *                                  - (C2 zg - C3 zj) }
 *
 * I is the minor-axis second moment (secondMomentY of an upright section: y up, bending about z).
 *
 * Sign convention (one vertical coordinate for both, measured positive towards the COMPRESSION
 * flange, i.e. upwards in a sagging span under gravity loads, the case the tabulated C2 and C3
 * are for):
 * - zg = (load point) - (shear centre): positive when a downward load is applied above the shear
 *   centre (top flange of a sagging span): destabilising, lowers M_cr; negative below it.
 * - zj = zs - (1 / 2 Iz_major) integral s (t^2 + s^2) dA (ENV Annex F / SN003 definition, from
 *   memory; Trahair's beta_x / 2): positive when the flange with the larger minor-axis second moment
 *   is in compression, which raises M_cr; 0 for a doubly symmetric section.
 * With zg = zj = 0 and k = kw = 1 it is exactly the doubly symmetric formula of Timoshenko & Gere
 * (2nd ed., ch. 6): C1 (pi / L) sqrt(E I G J) sqrt(1 + pi^2 E Iw / (G J L^2)).
 */

import type { TeeDimensions } from '../sections/dimensions.js';

export interface GeneralCriticalMomentInput {
  /** E, Pa. */
  readonly elasticModulus: number;
  /** G, Pa. */
  readonly shearModulus: number;
  /** Minor-axis second moment, m^4 (secondMomentY of an upright section). */
  readonly secondMomentY: number;
  /** J, m^4. */
  readonly torsionConstant: number;
  /** Iw, m^6. */
  readonly warpingConstant: number;
  /** L between lateral-torsional restraints (forks), m. */
  readonly unbracedLength: number;
  /** k: end rotation about the minor axis, 1 free (forks), 0.5 both fixed. Default 1. */
  readonly effectiveLengthFactor?: number;
  /** kw: end warping, 1 free, 0.5 both prevented. Default 1. */
  readonly warpingLengthFactor?: number;
  readonly factors: CriticalMomentFactors;
  /** zg, m, sign in the header. Default 0 (load through the shear centre). */
  readonly loadHeight?: number;
  /** zj, m, sign in the header. Default 0 (doubly symmetric section). */
  readonly monosymmetryParameter?: number;
}

/** C1 (moment diagram), C2 (load height) and C3 (monosymmetry) of the three-factor formula. */
export interface CriticalMomentFactors {
  readonly c1: number;
  readonly c2: number;
  readonly c3: number;
}

/** Elastic critical moment, N*m (formula in the header). */
export function generalCriticalMoment(input: GeneralCriticalMomentInput): number {
  const { elasticModulus: e, shearModulus: g, secondMomentY: i, factors } = input;
  const k = input.effectiveLengthFactor ?? 1;
  const kw = input.warpingLengthFactor ?? 1;
  const effectiveLength = k * input.unbracedLength;
  const eulerLoad = (Math.PI ** 2 * e * i) / effectiveLength ** 2;
  const offset = factors.c2 * (input.loadHeight ?? 0) - factors.c3 * (input.monosymmetryParameter ?? 0);
  const stiffnessTerm = (k / kw) ** 2 * (input.warpingConstant / i) + (g * input.torsionConstant) / eulerLoad;
  const root = Math.sqrt(stiffnessTerm + offset ** 2);
  // sqrt(a + c^2) - c = a / (sqrt(a + c^2) + c): the second form keeps its digits when c >> a.
  const bracket = offset > 0 ? stiffnessTerm / (root + offset) : root - offset;
  return factors.c1 * eulerLoad * bracket;
}

/** The standard cases of a simple span between forks (k = kw = 1). */
export type StandardLoading =
  | { readonly kind: 'uniform-load' }
  | { readonly kind: 'central-point-load' }
  /** End moments M and psi M, psi in [-1, 1]; negative psi bends the span in double curvature. */
  | { readonly kind: 'end-moments'; readonly endMomentRatio: number };

export interface TabulatedFactors extends CriticalMomentFactors {
  readonly source: string;
}

/** psi, C1, C3 for end moments, k = 1: ENV 1993-1-1:1992 Table F.1.1 (from memory). */
const END_MOMENT_TABLE: readonly (readonly [number, number, number])[] = [
  [-1, 2.752, 0],
  [-0.75, 2.927, 0.366],
  [-0.5, 2.704, 0.676],
  [-0.25, 2.281, 0.855],
  [0, 1.879, 0.939],
  [0.25, 1.563, 0.977],
  [0.5, 1.323, 0.992],
  [0.75, 1.141, 0.998],
  [1, 1, 1],
];

function interpolateEndMomentTable(psi: number): { readonly c1: number; readonly c3: number } {
  for (let index = 1; index < END_MOMENT_TABLE.length; index += 1) {
    const [psiHigh, c1High, c3High] = END_MOMENT_TABLE[index] as readonly [number, number, number];
    if (psi <= psiHigh) {
      const [psiLow, c1Low, c3Low] = END_MOMENT_TABLE[index - 1] as readonly [number, number, number];
      const share = (psi - psiLow) / (psiHigh - psiLow);
      return { c1: c1Low + share * (c1High - c1Low), c3: c3Low + share * (c3High - c3Low) };
    }
  }
  return { c1: 1, c3: 1 };
}

/**
 * C1, C2, C3 of the standard simple-span cases (k = kw = 1, forks at both ends):
 * - uniform load: C1 1.127, C2 0.454 (NCCI SN003 Table 3.2); C3 0.525 (ENV 1993-1-1:1992 Table F.1.2);
 * - central point load: C1 1.348, C2 0.630 (SN003 Table 3.2); C3 1.730 (ENV Table F.1.2);
 * - end moments, ratio psi: C1 and C3 interpolated linearly in ENV Table F.1.1, C2 = 0 (no transverse
 *   load).
 * All from memory. The ENV C3 values are the least reliable of the three (they were questioned after
 * the ENV was published); check a strongly monosymmetric section by another route.
 *
 * @example criticalMomentFactors({ kind: 'uniform-load' }).c2 // 0.454
 */
export function criticalMomentFactors(loading: StandardLoading): TabulatedFactors {
  switch (loading.kind) {
    case 'uniform-load':
      return { c1: 1.127, c2: 0.454, c3: 0.525, source: 'NCCI SN003 Table 3.2 (C1, C2); ENV 1993-1-1:1992 Table F.1.2 (C3); from memory' };
    case 'central-point-load':
      return { c1: 1.348, c2: 0.63, c3: 1.73, source: 'NCCI SN003 Table 3.2 (C1, C2); ENV 1993-1-1:1992 Table F.1.2 (C3); from memory' };
    case 'end-moments': {
      const psi = loading.endMomentRatio;
      if (!(psi >= -1 && psi <= 1)) throw new RangeError(`endMomentRatio must lie in [-1, 1], got ${psi}`);
      const { c1, c3 } = interpolateEndMomentTable(psi);
      return { c1, c2: 0, c3, source: 'ENV 1993-1-1:1992 Table F.1.1, k = 1, linear in psi; from memory' };
    }
  }
}

/** A plate of a section symmetric about its vertical axis: width w centred on that axis, from bottom to top (m). */
interface SymmetricPlate {
  readonly width: number;
  readonly bottom: number;
  readonly top: number;
}

/**
 * zj = zs - (1 / 2 I) integral s (t^2 + s^2) dA over rectangular plates, s measured up from the
 * centroid (compression at the top), t across; I the major-axis second moment about the centroid.
 * The integrals over a rectangle are exact; the shear centre height is the thin-walled one given.
 */
function monosymmetryOfPlates(plates: readonly SymmetricPlate[], shearCentreHeight: number): number {
  let area = 0;
  let firstMoment = 0;
  for (const plate of plates) {
    const plateArea = plate.width * (plate.top - plate.bottom);
    area += plateArea;
    firstMoment += plateArea * 0.5 * (plate.top + plate.bottom);
  }
  const centroid = firstMoment / area;
  let secondMoment = 0;
  let wagnerIntegral = 0;
  for (const plate of plates) {
    const low = plate.bottom - centroid;
    const high = plate.top - centroid;
    secondMoment += (plate.width * (high ** 3 - low ** 3)) / 3;
    wagnerIntegral += (plate.width * (high ** 4 - low ** 4)) / 4 + (plate.width ** 3 / 12) * ((high ** 2 - low ** 2) / 2);
  }
  return shearCentreHeight - centroid - wagnerIntegral / (2 * secondMoment);
}

export type TeePlates = Pick<TeeDimensions, 'depth' | 'flangeWidth' | 'webThickness' | 'flangeThickness'>;

/**
 * Shear centre of a tee, measured up from the tip of its stem, m: thin-walled, where the mid-lines of
 * flange and stem meet, at the flange's mid-thickness (Timoshenko & Gere 2nd ed., ch. 5; Trahair; from
 * memory). A load on the outer face of the flange therefore has |zg| = tf / 2.
 */
export function teeShearCentreHeight(tee: TeePlates): number {
  return tee.depth - tee.flangeThickness / 2;
}

/**
 * zj of a tee (sign in the header): positive with the flange in compression, the same magnitude
 * negative with the stem's tip in compression. Plates without root fillets; the shear centre as in
 * teeShearCentreHeight.
 */
export function teeMonosymmetryParameter(tee: TeePlates, flangeInCompression: boolean): number {
  const stemHeight = tee.depth - tee.flangeThickness;
  const zj = monosymmetryOfPlates(
    [
      { width: tee.webThickness, bottom: 0, top: stemHeight },
      { width: tee.flangeWidth, bottom: stemHeight, top: tee.depth },
    ],
    teeShearCentreHeight(tee),
  );
  return flangeInCompression ? zj : -zj;
}
