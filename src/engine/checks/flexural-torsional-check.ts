/**
 * A column that can twist: flexural-torsional buckling of open sections in compression, and the
 * slenderness of their plates (local buckling). The elastic loads come from the cubic of Timoshenko &
 * Gere (2nd ed., sec. 5.3, from memory; flexural-torsional-buckling.ts) with the shear centre of
 * shear-centre.ts; the inelastic range takes the same Johnson parabola as flexural buckling. Plates are
 * classed by EN 1993-1-1:2005 Table 5.2 (from memory; outstand-slenderness.ts): a class 4 (slender)
 * plate buckles locally before the section yields, which this service does not evaluate (no effective
 * widths), so such a member is left not verified.
 */

import { shearCentreOf } from '../sections/shear-centre.js';
import type { CheckContext, CheckFindings } from './check-context.js';
import type { UncheckedMode } from './check-outcome.js';
import { failureCheck } from './failure-check.js';
import { columnCapacities, columnFlexuralTorsionalBuckling } from './flexural-torsional-buckling.js';
import { fourSignificantText } from './number-texts.js';
import { governingElementSlenderness } from './outstand-slenderness.js';
import { steelEquivalentYieldStrength } from './structural-steel.js';

/** Open shapes whose shear centre lies off the centroid: compression twists them as it bends them. */
const OFF_CENTRE_SHAPES = new Set(['channel', 'tee', 'angle']);
/** Shapes made of plates (or a thin wall) that can buckle locally. */
const PLATED_SHAPES = new Set(['i-section', 'channel', 'tee', 'angle', 'box', 'tube']);

export function flexuralTorsionalChecks(context: CheckContext): CheckFindings {
  const { section, dimensions, material } = context.input;
  const mode = 'flexural-torsional-buckling' as const;
  const compressiveForce = context.peaks.axialCompression.value * section.area;
  if (!(compressiveForce > 0)) return { checks: [], notApplicable: [{ mode, reason: 'no compressive axial force anywhere along the member' }] };
  if (section.closed) return { checks: [], notApplicable: [{ mode, reason: 'closed section: its torsional stiffness keeps twisting out of its buckling' }] };
  if (section.shape === 'rectangle' || section.shape === 'round') return { checks: [], notApplicable: [{ mode, reason: 'solid section with its shear centre at the centroid: it buckles by bending' }] };
  const shearCentre = dimensions === undefined ? null : shearCentreOf(dimensions, section);
  if (shearCentre === null) {
    return {
      checks: [],
      notApplicable: [],
      unchecked: [{ mode, reason: 'an open section whose shear centre is not known (a custom section): torsional and flexural-torsional buckling cannot be evaluated; give closed: true for a closed section, or use a shape' }],
    };
  }
  const lengthAbout = (axis: 'z' | 'y' | 'minor') => context.columnAxes.find((column) => column.axis === axis)?.effectiveLength;
  const larger = Math.max(...context.columnAxes.map((column) => column.effectiveLength));
  const result = columnFlexuralTorsionalBuckling(section, shearCentre, material, {
    effectiveLengthZ: lengthAbout('z') ?? larger,
    effectiveLengthY: lengthAbout('y') ?? larger,
    // Twist is held where bending is (forks at the supports): the longer bending length stands for it.
    effectiveLengthTorsional: larger,
  });
  const capacities = columnCapacities(result, section.area, context.strengths.compression.value);
  if (!OFF_CENTRE_SHAPES.has(section.shape) && capacities.governingMode !== 'torsional') {
    return { checks: [], notApplicable: [{ mode, reason: `doubly symmetric: the torsional load ${fourSignificantText(result.criticalLoadTorsional)} N exceeds the flexural ones, so the buckling check governs` }] };
  }
  const check = failureCheck({
    mode,
    quantity: 'force',
    demand: compressiveForce,
    capacity: capacities.governing,
    requiredSafetyFactor: context.criteria.requiredSafetyFactor[mode],
    position: context.peaks.axialCompression.position,
    location: `${capacities.governingMode} (P_t = ${fourSignificantText(result.criticalLoadTorsional)} N, P_FT = ${fourSignificantText(result.criticalLoad)} N elastic)`,
    basis:
      'largest compressive force against the lowest of the flexural, torsional and flexural-torsional loads, the smallest root of r0^2 (P - P1)(P - P2)(P - Pt) - P^2 (P - P2) a1^2 - P^2 (P - P1) a2^2 = 0 (Timoshenko & Gere 2nd ed. sec. 5.3; AISC 360-16 Commentary E4; from memory), with Johnson\'s parabola above Sy / 2 (Shigley 10th ed. eq. 4-49, from memory); K_t L taken as the longer bending length',
  });
  return { checks: [check], notApplicable: [] };
}

export function localBucklingChecks(context: CheckContext): CheckFindings {
  const { section, dimensions, material } = context.input;
  const mode = 'local-buckling' as const;
  // Shear, from torque or from transverse force, is compression on the diagonal: a thin wall buckles under
  // it too (a thin tube in torsion), so it is classed as a plate in compression.
  const sheared = context.peaks.torsionalShear.value > 0 || context.peaks.transverseShear.value > 0;
  const compressed = context.peaks.axialCompression.value > 0 || (sheared && (section.shape === 'tube' || section.shape === 'box'));
  const bent = context.peaks.bendingCompression.value > 0;
  if (!compressed && !bent && !sheared) return { checks: [], notApplicable: [{ mode, reason: 'nothing along the member is in compression or shear' }] };
  if (section.shape === 'rectangle' || section.shape === 'round') return { checks: [], notApplicable: [{ mode, reason: 'solid section' }] };
  if (dimensions === undefined || !PLATED_SHAPES.has(dimensions.shape)) {
    return { checks: [], notApplicable: [], unchecked: [{ mode, reason: 'the plates of a custom section are not known, so their slenderness (local buckling) cannot be classed' }] };
  }
  // EN 1993-1-1's limits are written for steel (E = 210 GPa); another material's plates are classed at the yield strength that gives them the same slenderness.
  const worst = governingElementSlenderness(dimensions, steelEquivalentYieldStrength(material), compressed ? 'compression' : 'bending-about-z');
  if (worst === null || !worst.slender) {
    return { checks: [], notApplicable: [{ mode, reason: `every plate is within the class 3 limits of EN 1993-1-1:2005 Table 5.2 (from memory)${worst === null ? '' : `: ${worst.element}, c/t = ${fourSignificantText(worst.ratio)} <= ${fourSignificantText(worst.limitClass3)}`}` }] };
  }
  const gap: UncheckedMode = {
    mode,
    reason: `${worst.element}: c/t = ${fourSignificantText(worst.ratio)} beyond the class 3 limit ${fourSignificantText(worst.limitClass3)} of EN 1993-1-1:2005 Table 5.2 (from memory): a slender (class 4) plate buckles locally before the section yields, and its effective width (EN 1993-1-5) is not evaluated here`,
  };
  return { checks: [], notApplicable: [], unchecked: [gap] };
}
