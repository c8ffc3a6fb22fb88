/**
 * Lateral-torsional buckling resistance of a beam from its elastic critical moment, by the general
 * case of EN 1993-1-1:2005, 6.3.2.2 (from memory):
 *   lambdaBar_LT = sqrt(W fy / M_cr)                                         (6.56)
 *   Phi_LT = 0.5 [1 + alpha_LT (lambdaBar_LT - 0.2) + lambdaBar_LT^2]
 *   chi_LT = 1 / (Phi_LT + sqrt(Phi_LT^2 - lambdaBar_LT^2)),  chi_LT <= 1      (6.56)
 *   M_b = chi_LT W fy                                                        (6.55, without gamma_M1)
 * W is the plastic modulus of a class 1 or 2 section, the elastic modulus of a class 3 section and the
 * effective modulus of a class 4 section (6.3.2.2(1)); the caller chooses it. At lambdaBar <= 0.2 the
 * formula gives chi >= 1 and the cap makes it 1: that is the whole plateau here. The rolled-section
 * method of 6.3.2.3 (plateau 0.4, beta 0.75, Table 6.5 curves, the factor f) is NOT used.
 * The partial factor gamma_M1 is left to the caller's required safety factor.
 */

/** Buckling curves of EN 1993-1-1:2005 Table 6.3 (a0 is not used for lateral-torsional buckling). */
export type LateralTorsionalCurve = 'a' | 'b' | 'c' | 'd';

/** alpha_LT, EN 1993-1-1:2005 Table 6.3 (from memory). */
export const LATERAL_TORSIONAL_IMPERFECTION_FACTORS: Readonly<Record<LateralTorsionalCurve, number>> = {
  a: 0.21,
  b: 0.34,
  c: 0.49,
  d: 0.76,
};

/** The plateau end of 6.3.2.2: chi_LT = 1 at and below it. */
export const LATERAL_TORSIONAL_PLATEAU_SLENDERNESS = 0.2;

/** Rolled or welded I-section, or any other cross-section, as Table 6.4 distinguishes them. */
export type SectionFabrication = 'rolled' | 'welded' | 'other';

export interface CurveSelectionInput {
  readonly fabrication: SectionFabrication;
  /** Overall depth h, m. */
  readonly depth: number;
  /** Flange width b, m. */
  readonly width: number;
}

/**
 * The curve for the general case, EN 1993-1-1:2005 Table 6.4 (from memory): rolled I h/b <= 2 a,
 * > 2 b; welded I h/b <= 2 c, > 2 d; other cross-sections d.
 *
 * @example ltbCurve({ fabrication: 'welded', depth: 0.45, width: 0.18 }) // 'd'
 */
export function ltbCurve(input: CurveSelectionInput): LateralTorsionalCurve {
  if (input.fabrication === 'other') return 'd';
  const slender = input.depth / input.width > 2;
  if (input.fabrication === 'rolled') return slender ? 'b' : 'a';
  return slender ? 'd' : 'c';
}

function requirePositive(value: number, name: string): void {
  if (!(Number.isFinite(value) && value > 0)) throw new RangeError(`${name} must be a positive finite number, got ${value}`);
}

/** lambdaBar_LT = sqrt(W fy / M_cr), EN 1993-1-1:2005 6.3.2.2(1) (from memory). SI: m^3, Pa, N*m. */
export function relativeSlenderness(sectionModulus: number, yieldStrength: number, criticalMoment: number): number {
  requirePositive(sectionModulus, 'sectionModulus');
  requirePositive(yieldStrength, 'yieldStrength');
  requirePositive(criticalMoment, 'criticalMoment');
  return Math.sqrt((sectionModulus * yieldStrength) / criticalMoment);
}

/**
 * chi_LT of the general case (formula in the header), 1 for lambdaBar <= 0.2.
 *
 * @example reductionFactor(1, 'b') // 0.5970
 */
export function reductionFactor(lambdaBar: number, curve: LateralTorsionalCurve): number {
  if (!(Number.isFinite(lambdaBar) && lambdaBar >= 0)) throw new RangeError(`lambdaBar must be a finite number >= 0, got ${lambdaBar}`);
  if (lambdaBar <= LATERAL_TORSIONAL_PLATEAU_SLENDERNESS) return 1;
  const alpha = LATERAL_TORSIONAL_IMPERFECTION_FACTORS[curve];
  const phi = 0.5 * (1 + alpha * (lambdaBar - LATERAL_TORSIONAL_PLATEAU_SLENDERNESS) + lambdaBar ** 2);
  return Math.min(1, 1 / (phi + Math.sqrt(phi ** 2 - lambdaBar ** 2)));
}

export interface LateralTorsionalResistanceInput {
  /** W_y about the strong axis (plastic, elastic or effective by the section's class), m^3. */
  readonly sectionModulus: number;
  /** fy, Pa. */
  readonly yieldStrength: number;
  /** Elastic critical moment M_cr, N*m. */
  readonly criticalMoment: number;
  readonly curve: LateralTorsionalCurve;
}

export interface LateralTorsionalResistance {
  readonly lambdaBar: number;
  readonly chi: number;
  /** chi_LT W fy, N*m, before any partial or safety factor. */
  readonly resistance: number;
}

/** M_b = chi_LT W fy (EN 1993-1-1:2005 eq. 6.55 with gamma_M1 = 1, from memory). */
export function lateralTorsionalResistance(input: LateralTorsionalResistanceInput): LateralTorsionalResistance {
  const lambdaBar = relativeSlenderness(input.sectionModulus, input.yieldStrength, input.criticalMoment);
  const chi = reductionFactor(lambdaBar, input.curve);
  return { lambdaBar, chi, resistance: chi * input.sectionModulus * input.yieldStrength };
}
