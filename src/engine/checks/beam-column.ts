/**
 * Beam-columns: the compressive force together with bending, checked as a load factor. Both checks
 * scale every load by lambda and find the first lambda at which the extreme fibre reaches its
 * strength; the capacity is lambda times the compressive force and the safety factor is lambda. A
 * load at or above the Euler load therefore gives a finite factor below 1, never an infinite stress.
 *
 * - amplification: N/A + sum over the bending axes of sigma_b / (1 - N / P_e), P_e the Euler load
 *   about that axis (Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., ch. 1, the amplification
 *   factor of a beam-column, from memory; AISC 360-16 Appendix 8, B1 with Cm = 1, from memory). The
 *   largest compression and the largest moments are taken together wherever they occur (conservative).
 * - secant formula for a load with eccentricity e: sigma = P/A [1 + (e c / r^2) sec((K L / (2 r))
 *   sqrt(P / (E A)))] (Shigley 10th ed., eq. 4-50, from memory), about each axis, the worse one.
 *
 * A brittle material is also checked on the tension side, where bending less N/A reaches Sut.
 */

import type { CheckContext, CheckFindings } from './check-context.js';
import type { FailureCheck, NotApplicableCheck } from './check-outcome.js';
import { eulerLoad, bucklesAboutMinorAxis, type ColumnAxis } from './column-buckling.js';
import { largestMagnitudeOn, type Peak } from './critical-positions.js';
import { failureCheck, safetyRatio } from './failure-check.js';

/**
 * The smallest lambda in (0, upper) where a convex g with g(0) < 0 reaches 0, by bisection to machine
 * precision; null when g stays negative all the way to upper.
 */
export function firstLoadFactorReaching(g: (lambda: number) => number, upper: number): number | null {
  const atUpper = g(upper);
  if (!(atUpper >= 0)) return null;
  let lo = 0;
  let hi = upper;
  for (let i = 0; i < 200; i++) {
    const mid = 0.5 * (lo + hi);
    if (mid <= lo || mid >= hi) break;
    if (g(mid) >= 0) hi = mid;
    else lo = mid;
  }
  return 0.5 * (lo + hi);
}

/** A bending stress (at the applied loads, Pa) and the Euler load (N) that amplifies it. */
interface AmplifiedTerm {
  readonly bendingStress: number;
  readonly eulerLoad: number;
}

function amplifiedTerms(context: CheckContext, axes: readonly ColumnAxis[]): AmplifiedTerm[] {
  const { section, analysis } = context.input;
  const load = (name: ColumnAxis['axis']) => eulerLoad(context, axes.find((axis) => axis.axis === name) ?? (axes[0] as ColumnAxis));
  if (bucklesAboutMinorAxis(section)) {
    const { bendingTension, bendingCompression } = context.peaks;
    return [{ bendingStress: Math.max(bendingTension.value, bendingCompression.value), eulerLoad: load('minor') }];
  }
  if (section.bendingCombination === 'resultant') {
    return [{ bendingStress: context.peaks.bendingTension.value, eulerLoad: Math.min(load('z'), load('y')) }];
  }
  const momentZ = largestMagnitudeOn(analysis, 'momentZ', 0, analysis.length).value;
  const momentY = largestMagnitudeOn(analysis, 'momentY', 0, analysis.length).value;
  return [
    {
      bendingStress: (momentZ * Math.max(section.fibreDistanceTop, section.fibreDistanceBottom)) / section.secondMomentZ,
      eulerLoad: load('z'),
    },
    {
      bendingStress: (momentY * Math.max(section.fibreDistancePositiveZ, section.fibreDistanceNegativeZ)) / section.secondMomentY,
      eulerLoad: load('y'),
    },
  ];
}

/** Sum of lambda sigma_b / (1 - lambda P / P_e); +Infinity at and beyond the Euler load. */
function amplifiedBending(terms: readonly AmplifiedTerm[], force: number, lambda: number): number {
  let sum = 0;
  for (const term of terms) {
    if (term.bendingStress === 0) continue;
    const remaining = 1 - (lambda * force) / term.eulerLoad;
    sum += remaining > 0 ? (lambda * term.bendingStress) / remaining : Number.POSITIVE_INFINITY;
  }
  return sum;
}

/** The lower of the compression-side and tension-side load factors; at most the Euler load factor. */
function loadFactor(
  context: CheckContext,
  upper: number,
  compressionSide: (lambda: number) => number,
  tensionSide: (lambda: number) => number,
): { readonly factor: number; readonly side: 'compression' | 'tension' } {
  const { strengths } = context;
  const compression = firstLoadFactorReaching((lambda) => compressionSide(lambda) - strengths.compression.value, upper) ?? upper;
  const tension = firstLoadFactorReaching((lambda) => tensionSide(lambda) - strengths.tension.value, upper);
  return tension !== null && tension < compression ? { factor: tension, side: 'tension' } : { factor: compression, side: 'compression' };
}

function amplificationCheck(context: CheckContext, compression: Peak, axes: readonly ColumnAxis[]): FailureCheck {
  const force = compression.value * context.input.section.area;
  const terms = amplifiedTerms(context, axes);
  const axial = compression.value;
  const upper = Math.min(...terms.map((term) => term.eulerLoad)) / force;
  const { factor, side } = loadFactor(
    context,
    upper,
    (lambda) => lambda * axial + amplifiedBending(terms, force, lambda),
    (lambda) => amplifiedBending(terms, force, lambda) - lambda * axial,
  );
  return failureCheck({
    mode: 'beam-column',
    quantity: 'force',
    demand: force,
    capacity: factor * force,
    requiredSafetyFactor: context.criteria.requiredSafetyFactor['beam-column'],
    position: compression.position,
    location: `extreme fibre, ${side} side`,
    basis: `loads scaled until N/A + sigma_b / (1 - N / P_e) reaches ${side === 'compression' ? context.strengths.compression.symbol : context.strengths.tension.symbol} (moment amplification, Timoshenko & Gere 2nd ed., ch. 1, from memory)`,
  });
}

/** Distance to the farthest fibre from the buckling axis; for the minor principal axis, the bounding-box corner. */
function fibreDistanceFor(context: CheckContext, axis: ColumnAxis): number {
  const { section } = context.input;
  const alongY = Math.max(section.fibreDistanceTop, section.fibreDistanceBottom);
  const alongZ = Math.max(section.fibreDistancePositiveZ, section.fibreDistanceNegativeZ);
  if (axis.axis === 'z') return alongY;
  if (axis.axis === 'y') return alongZ;
  return Math.hypot(alongY, alongZ);
}

function secantCheck(context: CheckContext, compression: Peak, axes: readonly ColumnAxis[], eccentricity: number): FailureCheck {
  const { section, material } = context.input;
  const force = compression.value * section.area;
  let worst: { factor: number; side: 'compression' | 'tension'; axis: ColumnAxis } | null = null;
  for (const axis of axes) {
    const r = axis.radiusOfGyration;
    const eccentricityRatio = (eccentricity * fibreDistanceFor(context, axis)) / r ** 2;
    const secantTerm = (lambda: number) => {
      const argument = (axis.effectiveLength / (2 * r)) * Math.sqrt((lambda * force) / (material.elasticModulus * section.area));
      return argument < Math.PI / 2 ? eccentricityRatio / Math.cos(argument) : Number.POSITIVE_INFINITY;
    };
    const axial = (lambda: number) => (lambda * force) / section.area;
    const { factor, side } = loadFactor(
      context,
      eulerLoad(context, axis) / force,
      (lambda) => axial(lambda) * (1 + secantTerm(lambda)),
      (lambda) => axial(lambda) * (secantTerm(lambda) - 1),
    );
    if (worst === null || factor < worst.factor) worst = { factor, side, axis };
  }
  const governing = worst as NonNullable<typeof worst>;
  return failureCheck({
    mode: 'eccentric-column',
    quantity: 'force',
    demand: force,
    capacity: governing.factor * force,
    requiredSafetyFactor: context.criteria.requiredSafetyFactor['eccentric-column'],
    position: compression.position,
    location: `about the ${governing.axis.axis} axis, ${governing.side} side`,
    basis: `secant formula P/A [1 + (e c / r^2) sec((K L / 2 r) sqrt(P / (E A)))] = ${governing.side === 'compression' ? context.strengths.compression.symbol : context.strengths.tension.symbol} with e = ${eccentricity} m (Shigley 10th ed., eq. 4-50, from memory)`,
  });
}

export function beamColumnChecks(context: CheckContext, compression: Peak): CheckFindings {
  const { buckling = {} } = context.input;
  const checks: FailureCheck[] = [];
  const notApplicable: NotApplicableCheck[] = [];
  const axes = context.columnAxes;
  const force = compression.value * context.input.section.area;
  const noCompression = axes.some((axis) => safetyRatio(eulerLoad(context, axis), force) === null);
  if (buckling.amplification === false) {
    notApplicable.push({ mode: 'beam-column', reason: 'moment amplification switched off (buckling.amplification: false)' });
  } else if (noCompression) {
    notApplicable.push({ mode: 'beam-column', reason: 'no compressive axial force anywhere along the member' });
  } else {
    checks.push(amplificationCheck(context, compression, axes));
  }
  const eccentricity = buckling.eccentricity ?? 0;
  if (!(eccentricity > 0)) {
    notApplicable.push({ mode: 'eccentric-column', reason: 'no load eccentricity given (buckling.eccentricity)' });
  } else if (noCompression) {
    notApplicable.push({ mode: 'eccentric-column', reason: 'no compressive axial force anywhere along the member' });
  } else {
    checks.push(secantCheck(context, compression, axes, eccentricity));
  }
  return { checks, notApplicable };
}
