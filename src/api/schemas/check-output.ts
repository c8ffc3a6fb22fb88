/** The checks part of a member-check response: every failure check, the governing one, buckling, stresses. */

import { FAILURE_MODES } from '../../engine/checks/failure-mode.js';
import { presentedQuantity } from './quantity.js';
import { z } from './zod.js';

const mode = z.enum(FAILURE_MODES).openapi({ description: 'The failure mode.' });

export const failureCheckOutput = z
  .object({
    mode,
    quantity: z.enum(['stress', 'force', 'moment', 'deflection', 'angle']).openapi({ description: 'What demand and capacity measure, so which unit of `units` they are in.' }),
    demand: z.number().openapi({ description: 'The largest load effect found (>= 0).' }),
    capacity: z.number().openapi({ description: 'The resistance it is compared with (> 0).' }),
    safetyFactor: z.number().optional().openapi({ description: 'capacity / demand; absent when the demand is zero.' }),
    requiredSafetyFactor: z.number().openapi({ description: 'The factor the criteria require for this mode.' }),
    utilization: z.number().openapi({ description: 'demand x requiredSafetyFactor / capacity; passes when <= 1; 0 with no demand.' }),
    passes: z.boolean().openapi({ description: 'utilization <= 1.' }),
    position: presentedQuantity('length', 'Where along the member the demand peaks; absent for a member-wide check or no demand.').optional(),
    location: z.string().optional().openapi({ description: 'Where on the section, or which part of the member.' }),
    basis: z.string().openapi({ description: 'The formula and its source, in one line.' }),
    combination: z.string().optional().openapi({ description: 'With load combinations, in the top-level checks: the combination in which this check is at its worst.' }),
    loadPosition: presentedQuantity('length', "With a moving load: where the train's reference point stood when this check was at its worst.").optional(),
  })
  .openapi('FailureCheck');

const bucklingAxis = z
  .object({
    axis: z.enum(['y', 'z', 'minor']).openapi({ description: "The axis bent about; 'minor' is the minor principal axis of an angle." }),
    regime: z.enum(['euler', 'johnson', 'none']).openapi({ description: "euler above the transition slenderness, johnson below; 'none' when nothing is in compression." }),
    slendernessRatio: z.number().openapi({ description: 'K L / r, dimensionless.' }),
    transitionSlendernessRatio: z.number().openapi({ description: 'sqrt(2 pi^2 E / Sy), dimensionless.' }),
    criticalStress: presentedQuantity('stress', 'Critical stress of the regime.'),
    criticalLoad: presentedQuantity('force', 'Critical load.'),
    effectiveLength: presentedQuantity('length', 'K L.'),
    effectiveLengthFactor: z.number().openapi({ description: 'K, dimensionless.' }),
    safetyFactor: z.number().optional().openapi({ description: 'criticalLoad / largest compressive force; absent with no compression.' }),
  })
  .openapi('BucklingAxis');

const stressExtreme = z.object({
  value: presentedQuantity('stress', 'The largest value (>= 0).'),
  position: presentedQuantity('length', 'Where along the member.').optional(),
  location: z.string().optional().openapi({ description: 'Where on the section.' }),
});

export const governingOutput = z
  .object({
    mode,
    utilization: z.number().openapi({ description: 'Its utilization: demand x required factor / capacity.' }),
    safetyFactor: z.number().openapi({ description: 'Its safety factor: capacity / demand.' }),
    position: presentedQuantity('length', 'Where it governs.').optional(),
    location: z.string().optional().openapi({ description: 'Where on the section, or which part of the member.' }),
  })
  .optional()
  .openapi({ description: 'The check with the highest utilization (on a tie, the simpler mode); absent when nothing has any demand.' });

/** The verdict rule, one place for every answer that carries a verdict. */
export const VERDICT_RULE =
  "pass: every check passes and every mode that can govern this member was checked. fail: a check fails. not-verified: nothing checked fails, but a mode that applies was not evaluated (listed in unchecked): the member is not shown to be adequate, and must be checked for that mode by other means.";

export const verdictOutput = z.enum(['pass', 'fail', 'not-verified']).openapi('Verdict', { description: VERDICT_RULE });

export const uncheckedOutput = z
  .array(z.object({ mode, reason: z.string().openapi({ description: 'Why the service could not evaluate it, and what would let it.' }) }))
  .openapi({ description: 'Modes that apply to this member but that the service did not evaluate: while any is listed the verdict is not-verified (or fail), never pass.' });

export const checksOutput = {
  checks: z.array(failureCheckOutput).openapi({ description: 'Every applicable failure check.' }),
  notApplicable: z.array(z.object({ mode, reason: z.string().openapi({ description: 'Why the mode does not apply to this member.' }) })).openapi({ description: 'Modes not checked for this member, and why.' }),
  unchecked: uncheckedOutput,
  governing: governingOutput,
  verdict: verdictOutput,
  buckling: z
    .object({ governing: bucklingAxis, axes: z.array(bucklingAxis).openapi({ description: 'Every principal axis checked.' }) })
    .openapi('Buckling', { description: 'Column buckling about each principal axis; governing is the axis with the lowest critical load.' }),
  lateralTorsionalBuckling: z
    .object({
      from: presentedQuantity('length', 'Start of the governing unbraced length.'),
      to: presentedQuantity('length', 'End of the governing unbraced length.'),
      unbracedLength: presentedQuantity('length', 'Unbraced length.'),
      effectiveLength: presentedQuantity('length', 'Effective length used in the formula.'),
      momentGradientFactor: z.number().openapi({ description: 'C1 (Cb), dimensionless.' }),
      criticalMoment: presentedQuantity('moment', 'Elastic critical moment M_cr, with the load height and C2 of the three-factor formula.'),
      relativeSlenderness: z.number().openapi({ description: 'lambda_LT = sqrt(W fy / M_cr), dimensionless.' }),
      reductionFactor: z.number().openapi({ description: 'chi_LT of EN 1993-1-1 6.3.2.2, dimensionless.' }),
      resistance: presentedQuantity('moment', 'M_b = chi_LT W fy, the capacity of the check.'),
      curve: z.enum(['a', 'b', 'c', 'd']).optional().openapi({ description: 'The imperfection curve of EN 1993-1-1 Table 6.4: rolled I-sections a or b, welded c or d, other sections d. Absent for a material other than steel, which is checked against the elastic M_cr with the factor against elastic instability.' }),
      loadHeight: presentedQuantity('length', "zg: the load's distance from the shear centre, positive where it destabilises (acting towards the shear centre, as gravity on the top flange), negative where it stabilises."),
    })
    .optional()
    .openapi({ description: 'Absent when lateral-torsional buckling does not apply.' }),
  stresses: z
    .object({
      axialTension: stressExtreme.openapi({ description: 'Largest N / A in tension.' }),
      axialCompression: stressExtreme.openapi({ description: 'Largest |N / A| in compression.' }),
      bendingTension: stressExtreme.openapi({ description: 'Largest fibre stress from bending alone, tension side.' }),
      bendingCompression: stressExtreme.openapi({ description: 'Largest fibre stress from bending alone, compression side (magnitude).' }),
      transverseShear: stressExtreme.openapi({ description: 'Largest transverse shear stress V Q / (I b).' }),
      averageShear: stressExtreme.openapi({ description: 'Largest average shear stress V / A, beside the peak.' }),
      torsionalShear: stressExtreme.openapi({ description: 'Largest torsional shear stress at the surface.' }),
      equivalent: stressExtreme.openapi({ description: 'Largest von Mises stress (ductile) or modified-Mohr equivalent (brittle).' }),
    })
    .openapi('Stresses', { description: 'The largest stresses along the member: axial, bending (tension and compression side), transverse shear V Q / (I b) with the average V / A beside it, torsional, and the equivalent (von Mises, or modified Mohr for brittle materials).' }),
  criteria: z
    .object({
      requiredSafetyFactor: z.record(z.string(), z.number()).openapi({ description: "The required safety factor of every mode, and of 'ultimate'." }),
      deflectionLimitRatio: z.number().openapi({ description: 'Span / allowed deflection.' }),
      cantileverDeflectionLimitRatio: z.number().openapi({ description: 'Cantilever or overhang length / allowed deflection.' }),
      allowedTwist: presentedQuantity('angle', 'Allowed twist.'),
      shearYieldRatio: z.number().openapi({ description: 'Shear yield strength / tensile yield strength used.' }),
      defaulted: z.array(z.string()).openapi({ description: 'The criteria taken from the defaults, which stand in for the governing code.' }),
    })
    .openapi('CriteriaUsed', { description: 'The criteria used, defaults filled in.' }),
};
