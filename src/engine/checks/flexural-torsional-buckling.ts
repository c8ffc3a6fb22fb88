/**
 * Elastic flexural, torsional and flexural-torsional buckling of a pin-ended column under a
 * centroidal axial load, for any open section, with the shear centre off the centroid.
 *
 * Principal axes 1 (major) and 2 (minor) through the centroid; a1, a2 the shear centre's coordinates
 * along axis 1 and along axis 2. With sine modes u (along 1) and v (along 2) of the shear centre and
 * a twist phi about it, the centroid moves by (u + a2 phi, v - a1 phi), so
 * det [[P2 - P, 0, P a2], [0, P1 - P, -P a1], [P a2, -P a1, r0^2 (Pt - P)]] = 0
 * (Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., §5.3, eq. 5-22 type; AISC 360-16
 * Commentary to E4; both from memory), that is
 *   r0^2 (P - P1)(P - P2)(P - Pt) - P^2 (P - P2) a1^2 - P^2 (P - P1) a2^2 = 0,
 * where P1 = pi^2 E I1 / (K1 L)^2 buckles about axis 1 (deflection along 2). So an offset along
 * axis 1 couples twist with buckling ABOUT axis 1: for a channel (offset along z) the strong-axis
 * load Pz, for a tee (offset along y) Py, for an equal angle (offset along its axis of symmetry,
 * the major axis) P_major; the other flexural load stays uncoupled.
 *   Pt = (G J + pi^2 E Iw / (Kt L)^2) / r0^2,  r0^2 = (I1 + I2) / A + a1^2 + a2^2
 * (Timoshenko & Gere, 2nd ed., §5.2, torsional buckling, from memory).
 *
 * The matrix above is K - P M with K = diag(P2, P1, r0^2 Pt) and M positive definite (its Schur
 * complement is r0^2 - a1^2 - a2^2 = (I1 + I2) / A > 0), so the three roots are real and positive,
 * and by the Rayleigh quotient the smallest is at most min(P1, P2, Pt).
 * Solved in closed form: with no offset the roots are P1, P2, Pt; with one offset the cubic factors
 * into the uncoupled flexural load and a quadratic; with two, the smallest root by bisection in a
 * proven bracket (exact to the last digits), beside all three roots by Viete's trigonometric form.
 *
 * The inelastic regime takes the Johnson parabola to the elastic critical stress, as the flexural
 * check does (column-buckling.ts).
 *
 * @example singlySymmetricCriticalLoad(1893431, 229403, -0.0303009, 2.73349e-3) // 2.197e5 N: the channel 100 x 50 x 3, 1 m
 */

import { EngineError } from '../engine-error.js';
import type { SectionProperties } from '../sections/section-properties.js';

/** Which of the modes the smallest critical load belongs to. */
export type ColumnBucklingMode = 'flexural-major' | 'flexural-minor' | 'torsional' | 'flexural-torsional';

export interface FlexuralTorsionalInput {
  /** m^2 */
  readonly area: number;
  /** Principal second moments about axes 1 (major) and 2 (minor), m^4. */
  readonly secondMomentMajor: number;
  readonly secondMomentMinor: number;
  /** Shear centre minus centroid along axis 1 (major) and along axis 2 (minor), m. */
  readonly shearCentreMajor: number;
  readonly shearCentreMinor: number;
  /** Saint-Venant J, m^4, and warping constant Iw about the shear centre, m^6. */
  readonly torsionConstant: number;
  readonly warpingConstant: number;
  /** Pa */
  readonly elasticModulus: number;
  readonly shearModulus: number;
  /** K L for buckling about axis 1, about axis 2, and for twist, m. */
  readonly effectiveLengthMajor: number;
  readonly effectiveLengthMinor: number;
  readonly effectiveLengthTorsional: number;
}

export interface FlexuralTorsionalResult {
  /** Euler loads about the major and the minor principal axis, N. */
  readonly criticalLoadMajor: number;
  readonly criticalLoadMinor: number;
  /** Pure torsional buckling load about the shear centre, N. */
  readonly criticalLoadTorsional: number;
  /** The smallest root of the cubic: the column's elastic critical load, N. */
  readonly criticalLoad: number;
  readonly governing: ColumnBucklingMode;
  /** r0^2 = (I1 + I2) / A + a1^2 + a2^2, m^2. */
  readonly polarRadiusOfGyrationSquared: number;
  /** The shear centre's coordinates a1, a2 along the principal axes, m, as used. */
  readonly shearCentreMajor: number;
  readonly shearCentreMinor: number;
}

/** Offsets below this fraction of sqrt((I1 + I2) / A) count as zero: the section is symmetric about that axis. */
export const SHEAR_CENTRE_OFFSET_TOLERANCE = 1e-9;

/** The coefficients [c3, c2, c1, c0] of the cubic in P (expanded from the form above). */
export function flexuralTorsionalCubic(
  loadMajor: number,
  loadMinor: number,
  loadTorsional: number,
  shearCentreMajor: number,
  shearCentreMinor: number,
  polarRadiusOfGyrationSquared: number,
): readonly [number, number, number, number] {
  const r0s = polarRadiusOfGyrationSquared;
  const a1s = shearCentreMajor ** 2;
  const a2s = shearCentreMinor ** 2;
  return [
    r0s - a1s - a2s,
    -r0s * (loadMajor + loadMinor + loadTorsional) + a1s * loadMinor + a2s * loadMajor,
    r0s * (loadMajor * loadMinor + loadMajor * loadTorsional + loadMinor * loadTorsional),
    -r0s * loadMajor * loadMinor * loadTorsional,
  ];
}

/** Viete's trigonometric form: the largest root of x^3 + b x^2 + c x + d with three real roots. */
function largestRealRoot(c3: number, c2: number, c1: number, c0: number): number {
  // Monic x^3 + b x^2 + c x + d, then x = t - b / 3 gives t^3 + p t + q = 0.
  const b = c2 / c3;
  const c = c1 / c3;
  const d = c0 / c3;
  const shift = -b / 3;
  const p = c - (b * b) / 3;
  const q = (2 * b * b * b) / 27 - (b * c) / 3 + d;
  // Three real roots need p <= 0; p = 0 (to rounding) is a triple root.
  if (p >= 0) return shift + Math.cbrt(-q);
  const cosine = Math.min(1, Math.max(-1, ((3 * q) / (2 * p)) * Math.sqrt(-3 / p)));
  // t = 2 sqrt(-p/3) cos(acos(cosine) / 3): with the roots positive the shift and this term are both
  // >= 0 for the largest root, so nothing cancels.
  return shift + 2 * Math.sqrt(-p / 3) * Math.cos(Math.acos(cosine) / 3);
}

/**
 * The three roots of the cubic, ascending, N, in closed form (Viete's trigonometric form for three
 * real roots, Numerical Recipes 3rd ed., §5.6, from memory; no iteration), to about 1e-12, and only
 * about 1e-8 (1e-7 at worst seen) where two roots nearly coincide (the roots of the expanded
 * coefficients are ill-conditioned there). Each comes from where it is best conditioned: the smallest
 * as the largest root of the reversed cubic in y = m / P (m = min(P1, P2, Pt)), the largest as the largest
 * root in x = P / max(P1, P2, Pt), the middle one from the product of the roots, r0^2 P1 P2 Pt / rp^2
 * (f(0) over the leading coefficient rp^2 = r0^2 - a1^2 - a2^2 = (I1 + I2) / A).
 */
export function flexuralTorsionalCubicRoots(
  loadMajor: number,
  loadMinor: number,
  loadTorsional: number,
  shearCentreMajor: number,
  shearCentreMinor: number,
  polarRadiusOfGyrationSquared: number,
): readonly [number, number, number] {
  const least = Math.min(loadMajor, loadMinor, loadTorsional);
  const most = Math.max(loadMajor, loadMinor, loadTorsional);
  const inLeast = flexuralTorsionalCubic(
    loadMajor / least,
    loadMinor / least,
    loadTorsional / least,
    shearCentreMajor,
    shearCentreMinor,
    polarRadiusOfGyrationSquared,
  );
  const inMost = flexuralTorsionalCubic(
    loadMajor / most,
    loadMinor / most,
    loadTorsional / most,
    shearCentreMajor,
    shearCentreMinor,
    polarRadiusOfGyrationSquared,
  );
  // Reversed: c0 y^3 + c1 y^2 + c2 y + c3 = 0 has the roots least / P.
  const smallest = least / largestRealRoot(inLeast[3], inLeast[2], inLeast[1], inLeast[0]);
  const largest = most * largestRealRoot(inMost[0], inMost[1], inMost[2], inMost[3]);
  const productOfRoots =
    (polarRadiusOfGyrationSquared * loadMajor * loadMinor * loadTorsional) /
    (polarRadiusOfGyrationSquared - shearCentreMajor ** 2 - shearCentreMinor ** 2);
  const middle = Math.min(largest, Math.max(smallest, productOfRoots / (smallest * largest)));
  return [smallest, middle, largest];
}

/**
 * The smallest root alone, by bisection of the cubic in its factored form on (0, m], m = min(P1, P2, Pt).
 * The bracket holds: f(0) = -r0^2 P1 P2 Pt < 0, and at m one product vanishes and the rest is >= 0
 * (f(P1) = P1^2 a1^2 (P2 - P1), f(P2) = P2^2 a2^2 (P1 - P2), f(Pt) = Pt^2 [a1^2 (P2 - Pt) + a2^2 (P1 - Pt)]).
 * It holds one root only: the largest root is at least max(P1, P2, Pt) >= m (Rayleigh quotient), and a
 * second root below m would make f(m) < 0. The interval is halved until it cannot shrink (about 60
 * steps). The factored form carries the factor (P - Pi) exactly, so the root keeps its digits where
 * two roots nearly meet (weak coupling and P1 close to P2), where the closed form through the
 * expanded coefficients keeps about 1e-8 (flexuralTorsionalCubicRoots).
 */
export function smallestFlexuralTorsionalRoot(
  loadMajor: number,
  loadMinor: number,
  loadTorsional: number,
  shearCentreMajor: number,
  shearCentreMinor: number,
  polarRadiusOfGyrationSquared: number,
): number {
  const a1s = shearCentreMajor ** 2;
  const a2s = shearCentreMinor ** 2;
  const cubic = (p: number) =>
    polarRadiusOfGyrationSquared * (p - loadMajor) * (p - loadMinor) * (p - loadTorsional) -
    p * p * (p - loadMinor) * a1s -
    p * p * (p - loadMajor) * a2s;
  let below = 0;
  let above = Math.min(loadMajor, loadMinor, loadTorsional);
  for (;;) {
    const middle = (below + above) / 2;
    if (middle <= below || middle >= above) return above;
    if (cubic(middle) < 0) below = middle;
    else above = middle;
  }
}

/**
 * Singly symmetric closed form: the coupled load of the flexural load P_s about the axis on which
 * the shear centre lies (offset a) and Pt,
 *   P_FT = (P_s + Pt) / (2 H) [1 - sqrt(1 - 4 P_s Pt H / (P_s + Pt)^2)],  H = 1 - a^2 / r0^2
 * (AISC 360-16, eq. E4-3 / E4-8 form in loads; Timoshenko & Gere, 2nd ed., §5.3; from memory),
 * evaluated as 2 P_s Pt / ((P_s + Pt)(1 + sqrt(...))), the same number without the cancellation.
 */
export function singlySymmetricCriticalLoad(
  symmetricAxisLoad: number,
  torsionalLoad: number,
  shearCentreOffset: number,
  polarRadiusOfGyrationSquared: number,
): number {
  const h = 1 - shearCentreOffset ** 2 / polarRadiusOfGyrationSquared;
  const sum = symmetricAxisLoad + torsionalLoad;
  const discriminant = Math.max(0, 1 - (4 * symmetricAxisLoad * torsionalLoad * h) / sum ** 2);
  return (2 * symmetricAxisLoad * torsionalLoad) / (sum * (1 + Math.sqrt(discriminant)));
}

function invalidInput(field: string, message: string, value?: number): EngineError {
  return new EngineError('not-applicable', message, ['buckling', field], value === undefined ? {} : { value });
}

const POSITIVE_INPUTS = [
  'area',
  'secondMomentMajor',
  'secondMomentMinor',
  'elasticModulus',
  'shearModulus',
  'effectiveLengthMajor',
  'effectiveLengthMinor',
  'effectiveLengthTorsional',
] as const;

/** P1, P2, Pt and the smallest root, with the mode it belongs to. */
export function flexuralTorsionalCriticalLoads(input: FlexuralTorsionalInput): FlexuralTorsionalResult {
  for (const field of POSITIVE_INPUTS) {
    const value = input[field];
    if (!Number.isFinite(value) || value <= 0) {
      throw invalidInput(field, `${field} must be a finite number greater than zero for the buckling loads (got ${value}).`, value);
    }
  }
  for (const field of ['torsionConstant', 'warpingConstant'] as const) {
    const value = input[field];
    if (!Number.isFinite(value) || value < 0) {
      throw invalidInput(field, `${field} must be a finite number of at least zero for the buckling loads (got ${value}).`, value);
    }
  }
  if (input.torsionConstant === 0 && input.warpingConstant === 0) {
    throw invalidInput('torsionConstant', 'A section with neither torsion nor warping stiffness has no torsional buckling load.');
  }
  if (!Number.isFinite(input.shearCentreMajor) || !Number.isFinite(input.shearCentreMinor)) {
    throw invalidInput('shearCentre', 'The shear centre offsets must be finite numbers.');
  }
  const e = input.elasticModulus;
  // Euler P = pi^2 E I / (K L)^2 (Timoshenko & Gere, 2nd ed., §2.1; Shigley 10th ed., eq. 4-43; from memory).
  const loadMajor = (Math.PI ** 2 * e * input.secondMomentMajor) / input.effectiveLengthMajor ** 2;
  const loadMinor = (Math.PI ** 2 * e * input.secondMomentMinor) / input.effectiveLengthMinor ** 2;
  const polarAboutCentroid = (input.secondMomentMajor + input.secondMomentMinor) / input.area;
  const tolerance = SHEAR_CENTRE_OFFSET_TOLERANCE * Math.sqrt(polarAboutCentroid);
  const a1 = Math.abs(input.shearCentreMajor) <= tolerance ? 0 : input.shearCentreMajor;
  const a2 = Math.abs(input.shearCentreMinor) <= tolerance ? 0 : input.shearCentreMinor;
  const r0s = polarAboutCentroid + a1 ** 2 + a2 ** 2;
  const loadTorsional =
    (input.shearModulus * input.torsionConstant + (Math.PI ** 2 * e * input.warpingConstant) / input.effectiveLengthTorsional ** 2) / r0s;

  const loads = { criticalLoadMajor: loadMajor, criticalLoadMinor: loadMinor, criticalLoadTorsional: loadTorsional };
  const common = { ...loads, polarRadiusOfGyrationSquared: r0s, shearCentreMajor: a1, shearCentreMinor: a2 };
  if (a1 === 0 && a2 === 0) {
    // Uncoupled: the cubic's roots are P1, P2 and Pt themselves.
    const smallest = Math.min(loadMajor, loadMinor, loadTorsional);
    const governing: ColumnBucklingMode =
      smallest === loadTorsional ? 'torsional' : smallest === loadMinor ? 'flexural-minor' : 'flexural-major';
    return { ...common, criticalLoad: smallest, governing };
  }
  if (a2 === 0 || a1 === 0) {
    // One offset: the cubic factors into the uncoupled flexural load and the closed-form pair.
    const coupledLoad = a2 === 0 ? loadMajor : loadMinor;
    const uncoupledLoad = a2 === 0 ? loadMinor : loadMajor;
    const coupled = singlySymmetricCriticalLoad(coupledLoad, loadTorsional, a2 === 0 ? a1 : a2, r0s);
    if (uncoupledLoad < coupled) {
      return { ...common, criticalLoad: uncoupledLoad, governing: a2 === 0 ? 'flexural-minor' : 'flexural-major' };
    }
    return { ...common, criticalLoad: coupled, governing: 'flexural-torsional' };
  }
  // Bisection rather than the trigonometric form: it keeps every digit where two roots nearly meet.
  const smallest = smallestFlexuralTorsionalRoot(loadMajor, loadMinor, loadTorsional, a1, a2, r0s);
  return { ...common, criticalLoad: smallest, governing: 'flexural-torsional' };
}

export interface ColumnLengths {
  /** K L for buckling about z (bending in the x-y plane), about y, and for twist, m. */
  readonly effectiveLengthZ: number;
  readonly effectiveLengthY: number;
  readonly effectiveLengthTorsional: number;
}

/**
 * From the section, its shear centre (offsets from the centroid along y and z) and the lengths about
 * z and y: the principal values. When the major axis is z (principalAngle 0) or y (pi/2) each takes
 * its own length; for inclined principal axes (angles) both take the larger, as the flexural check
 * does for the minor axis (column-buckling.ts).
 */
export function columnFlexuralTorsionalBuckling(
  section: Pick<SectionProperties, 'area' | 'secondMomentMajor' | 'secondMomentMinor' | 'principalAngle' | 'torsionConstant'>,
  shearCentre: { readonly offsetY: number; readonly offsetZ: number; readonly warpingConstant: number },
  material: { readonly elasticModulus: number; readonly shearModulus: number },
  lengths: ColumnLengths,
): FlexuralTorsionalResult {
  const theta = section.principalAngle;
  // Axis 1 runs at theta from +z towards +y, axis 2 at theta + pi/2.
  const cos = Math.cos(theta);
  const sin = Math.sin(theta);
  const alongMajor = shearCentre.offsetZ * cos + shearCentre.offsetY * sin;
  const alongMinor = -shearCentre.offsetZ * sin + shearCentre.offsetY * cos;
  const larger = Math.max(lengths.effectiveLengthZ, lengths.effectiveLengthY);
  // principalAxes returns exactly 0 or pi/2 when y and z are principal (no product moment).
  const majorIsZ = theta === 0;
  const majorIsY = theta === Math.PI / 2;
  return flexuralTorsionalCriticalLoads({
    area: section.area,
    secondMomentMajor: section.secondMomentMajor,
    secondMomentMinor: section.secondMomentMinor,
    shearCentreMajor: alongMajor,
    shearCentreMinor: alongMinor,
    torsionConstant: section.torsionConstant,
    warpingConstant: shearCentre.warpingConstant,
    elasticModulus: material.elasticModulus,
    shearModulus: material.shearModulus,
    effectiveLengthMajor: majorIsZ ? lengths.effectiveLengthZ : majorIsY ? lengths.effectiveLengthY : larger,
    effectiveLengthMinor: majorIsZ ? lengths.effectiveLengthY : majorIsY ? lengths.effectiveLengthZ : larger,
    effectiveLengthTorsional: lengths.effectiveLengthTorsional,
  });
}

/**
 * Critical stress from an elastic one: sigma_e itself up to Sy / 2, Johnson's parabola above,
 *   sigma_cr = Sy (1 - Sy / (4 sigma_e)),
 * which is Shigley's sigma_cr = Sy - (Sy (K L / r) / (2 pi))^2 / E with sigma_e = pi^2 E / (K L / r)^2
 * (Shigley 10th ed., §4-14, eqs. 4-44 and 4-46 as cited in column-buckling.ts, from memory), so it
 * meets the flexural check at every slenderness and extends it to any elastic mode.
 */
export function inelasticCriticalStress(elasticStress: number, yieldStrength: number): number {
  return elasticStress <= yieldStrength / 2 ? elasticStress : yieldStrength * (1 - yieldStrength / (4 * elasticStress));
}

export interface ColumnCapacities {
  /** Smallest flexural load (elastic, then through the Johnson parabola), N. */
  readonly flexuralElastic: number;
  readonly flexural: number;
  /** The governing load of all modes (elastic, then through the Johnson parabola), N. */
  readonly governingElastic: number;
  readonly governing: number;
  readonly governingMode: ColumnBucklingMode;
}

/** The flexural-only capacity beside the capacity with torsional modes, both through Johnson. */
export function columnCapacities(result: FlexuralTorsionalResult, area: number, yieldStrength: number): ColumnCapacities {
  const flexuralElastic = Math.min(result.criticalLoadMajor, result.criticalLoadMinor);
  return {
    flexuralElastic,
    flexural: inelasticCriticalStress(flexuralElastic / area, yieldStrength) * area,
    governingElastic: result.criticalLoad,
    governing: inelasticCriticalStress(result.criticalLoad / area, yieldStrength) * area,
    governingMode: result.governing,
  };
}
