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
 * With zg = zj = 0 and k = kw = 1 it is exactly the doubly symmetric formula of
 * lateral-torsional-buckling.ts: C1 (pi / L) sqrt(E I G J) sqrt(1 + pi^2 E Iw / (G J L^2)).
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

/** An I with unequal flanges, the compression flange taken on top; fillets and welds ignored. */
export interface MonosymmetricIPlates {
  readonly depth: number;
  readonly webThickness: number;
  readonly compressionFlangeWidth: number;
  readonly compressionFlangeThickness: number;
  readonly tensionFlangeWidth: number;
  readonly tensionFlangeThickness: number;
}

/** hs (distance between the flanges' mid-planes) and each flange's own minor-axis second moment t b^3 / 12. */
function flangeProperties(section: MonosymmetricIPlates) {
  const compression = (section.compressionFlangeThickness * section.compressionFlangeWidth ** 3) / 12;
  const tension = (section.tensionFlangeThickness * section.tensionFlangeWidth ** 3) / 12;
  const flangeDistance = section.depth - section.compressionFlangeThickness / 2 - section.tensionFlangeThickness / 2;
  return { compression, tension, flangeDistance };
}

/**
 * Depth of the shear centre below the outer face of the compression flange, m: thin-walled, the
 * flanges share hs in inverse proportion to their minor second moments, e = hs I_t / (I_c + I_t) below
 * the compression flange's mid-plane (Timoshenko & Gere 2nd ed., ch. 5; Trahair; from memory).
 */
export function monosymmetricIShearCentreDepth(section: MonosymmetricIPlates): number {
  const { compression, tension, flangeDistance } = flangeProperties(section);
  return section.compressionFlangeThickness / 2 + (flangeDistance * tension) / (compression + tension);
}

/** Iw = hs^2 I_c I_t / (I_c + I_t) of an I with unequal flanges, web neglected (Trahair; from memory), m^6. */
export function monosymmetricIWarpingConstant(section: MonosymmetricIPlates): number {
  const { compression, tension, flangeDistance } = flangeProperties(section);
  return (flangeDistance ** 2 * compression * tension) / (compression + tension);
}

/** zj of an I with unequal flanges by the defining integral over its three plates (header), m. */
export function monosymmetricIMonosymmetryParameter(section: MonosymmetricIPlates): number {
  const tensionTop = section.tensionFlangeThickness;
  const compressionBottom = section.depth - section.compressionFlangeThickness;
  return monosymmetryOfPlates(
    [
      { width: section.tensionFlangeWidth, bottom: 0, top: tensionTop },
      { width: section.webThickness, bottom: tensionTop, top: compressionBottom },
      { width: section.compressionFlangeWidth, bottom: compressionBottom, top: section.depth },
    ],
    section.depth - monosymmetricIShearCentreDepth(section),
  );
}

/**
 * zj ~ 0.4 hs (2 rho - 1), rho = I_c / (I_c + I_t): the thin-walled approximation for an I with
 * unequal flanges (ENV 1993-1-1:1992 Annex F, F.1.4, for the larger flange in compression; from
 * memory, clause number uncertain).
 */
export function monosymmetryParameterApproximation(section: MonosymmetricIPlates): number {
  const { compression, tension, flangeDistance } = flangeProperties(section);
  return 0.4 * flangeDistance * ((2 * compression) / (compression + tension) - 1);
}

/**
 * zj = beta_x / 2 with beta_x = 0.9 hs (2 rho - 1) [1 - (I_minor / I_major)^2] (Kitipornchai & Trahair,
 * J. Struct. Div. ASCE 106(ST5), 1980; Trahair, Flexural-Torsional Buckling of Structures; from
 * memory). The section's two second moments are given: this module computes no section properties.
 */
export function monosymmetryParameterKitipornchaiTrahair(
  section: MonosymmetricIPlates,
  secondMomentMinor: number,
  secondMomentMajor: number,
): number {
  const { compression, tension, flangeDistance } = flangeProperties(section);
  const rho = compression / (compression + tension);
  return 0.45 * flangeDistance * (2 * rho - 1) * (1 - (secondMomentMinor / secondMomentMajor) ** 2);
}

export interface SingleAngleMajorAxisInput {
  readonly elasticModulus: number;
  /** A, m^2. */
  readonly area: number;
  /** r_z about the MINOR principal axis, m. */
  readonly minorPrincipalRadiusOfGyration: number;
  /** Leg thickness t, m. */
  readonly thickness: number;
  readonly unbracedLength: number;
  /** Cb; AISC 360-16 F10.2 caps it at 1.5 for single angles (from memory). */
  readonly momentGradientFactor: number;
  /**
   * beta_w, m: 0 for an equal-leg angle; for unequal legs tabulated in the AISC Manual, positive
   * with the short leg in compression, negative with the long leg in compression (from memory).
   */
  readonly asymmetryCoefficient: number;
}

/**
 * A single angle bent about its MAJOR principal axis, elastic:
 *   M_cr = (9 E A r_z t Cb / (8 L)) [ sqrt(1 + (4.4 beta_w r_z / (L t))^2) + 4.4 beta_w r_z / (L t) ]
 * (AISC 360-16 eq. F10-4, from memory; it takes E / G = 2.6). For an equal leg angle it is
 * (pi / L) sqrt(E I_z G J) with the thin-walled I_z = A r_z^2 and J = A t^2 / 3. Bending about a
 * geometric axis (AISC F10-5) is not covered here.
 */
export function singleAngleMajorAxisCriticalMoment(input: SingleAngleMajorAxisInput): number {
  const { elasticModulus: e, area, minorPrincipalRadiusOfGyration: rz, thickness: t, unbracedLength: l } = input;
  const asymmetry = (4.4 * input.asymmetryCoefficient * rz) / (l * t);
  return ((9 * e * area * rz * t * input.momentGradientFactor) / (8 * l)) * (Math.sqrt(1 + asymmetry ** 2) + asymmetry);
}
