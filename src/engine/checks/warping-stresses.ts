/**
 * Warping stresses of an I-section or channel under torque (non-uniform torsion). The member's own
 * analysis takes torque as uniform (Saint-Venant) torsion; an open section also warps wherever the
 * torque or the restraint changes, and the bimoment B adds normal stresses sigma_w = B omega_n / Iw at
 * the flange tips, the warping torque T_w shear stresses tau_w = T_w S_w / (Iw t) in the flanges
 * (AISC Design Guide 9, 2nd ed., ch. 4, from memory). B and T_w come from the exact solution of
 * E Iw phi'''' - G J phi'' = m_x (warping-torsion.ts).
 *
 * The check is an upper bound: the largest bending-and-axial fibre stress, the largest warping normal
 * stress, and the largest shear stresses are added wherever along the member each occurs, then
 * combined by von Mises. Restraints: a support that holds twist is a fork (warping free). A fully fixed
 * support may or may not hold warping (a welded end plate does, a bolted one hardly), and neither
 * reading is the safe one everywhere (holding warping raises the bimoment at the support, freeing it
 * raises it in the span, and a cantilever warps only if its root holds warping): both are solved and
 * the larger bimoment and warping torque taken.
 */

import { solveWarpingTorsion, type DistributedTorque, type PointTorque, type TwistRestraint } from '../analysis/warping-torsion.js';
import { channelWarpingStressFactors, iSectionWarpingStressFactors } from '../sections/warping-stress-factors.js';
import type { CheckContext, CheckFindings } from './check-context.js';
import { failureCheck } from './failure-check.js';
import { fourSignificantText } from './number-texts.js';

const WARPING_SHAPES = new Set(['i-section', 'channel']);

function unchecked(reason: string): CheckFindings {
  return { checks: [], notApplicable: [], unchecked: [{ mode: 'torsion', reason: `warping stresses of an open section under torque: ${reason}` }] };
}

export function warpingStressChecks(context: CheckContext): CheckFindings {
  const { section, dimensions, model, material } = context.input;
  if (!WARPING_SHAPES.has(section.shape) || context.peaks.torsionalShear.value <= 0) return { checks: [], notApplicable: [] };
  if (dimensions === undefined || (dimensions.shape !== 'i-section' && dimensions.shape !== 'channel')) return unchecked('the section\'s plate dimensions are not known');
  if (!(section.warpingConstant > 0)) return unchecked('the warping constant is not known');
  const forks: TwistRestraint[] = [];
  const withFixedEnds: TwistRestraint[] = [];
  for (const support of model.supports) {
    const rx = support.restraints.rx;
    if (rx === 'free') continue;
    if (rx !== 'rigid') return unchecked('a torsional spring at a support is not covered by the warping solution');
    const fixed = support.restraints.ry === 'rigid' && support.restraints.rz === 'rigid' && support.restraints.uz === 'rigid';
    forks.push({ position: support.position, kind: 'fork' });
    withFixedEnds.push({ position: support.position, kind: fixed ? 'fixed' : 'fork' });
  }
  const pointTorques: PointTorque[] = [];
  const distributedTorques: DistributedTorque[] = [];
  for (const load of model.loads) {
    if (load.kind === 'point') {
      if (load.mx !== 0) pointTorques.push({ position: load.position, torque: load.mx });
      continue;
    }
    if (load.mx[0] === 0 && load.mx[1] === 0) continue;
    if (load.mx[0] !== load.mx[1]) return unchecked('a distributed torque that varies along the member is not covered by the warping solution');
    distributedTorques.push({ from: load.from, to: load.to, torquePerLength: load.mx[0] });
  }
  const solve = (restraints: TwistRestraint[]) =>
    solveWarpingTorsion({
      length: model.length,
      torsionalRigidity: material.shearModulus * section.torsionConstant,
      warpingRigidity: material.elasticModulus * section.warpingConstant,
      restraints,
      pointTorques,
      distributedTorques,
    }).extremes;
  const solutions = withFixedEnds.some((restraint) => restraint.kind === 'fixed') ? [solve(forks), solve(withFixedEnds)] : [solve(forks)];
  const larger = (field: 'bimoment' | 'warpingTorque') =>
    solutions.reduce((best, solution) => (Math.abs(solution[field].value) > Math.abs(best.value) ? solution[field] : best), solutions[0]![field]);
  const plates = { depth: dimensions.depth, flangeWidth: dimensions.flangeWidth, flangeThickness: dimensions.flangeThickness, webThickness: dimensions.webThickness };
  const factors = dimensions.shape === 'i-section' ? iSectionWarpingStressFactors(plates) : channelWarpingStressFactors(plates);
  const bimoment = larger('bimoment');
  const warpingNormal = (Math.abs(bimoment.value) * factors.normalisedWarpingMax) / section.warpingConstant;
  const warpingShear = (Math.abs(larger('warpingTorque').value) * factors.warpingStaticalMomentMax) / (section.warpingConstant * factors.thicknessAtStaticalMomentMax);
  const { peaks } = context;
  const normal = Math.max(peaks.axialTension.value, peaks.axialCompression.value) + Math.max(peaks.bendingTension.value, peaks.bendingCompression.value) + warpingNormal;
  const shear = peaks.transverseShear.value + peaks.torsionalShear.value + warpingShear;
  const brittle = material.behaviour === 'brittle';
  return {
    checks: [
      failureCheck({
        mode: 'combined',
        quantity: 'stress',
        demand: Math.sqrt(normal ** 2 + 3 * shear ** 2),
        capacity: brittle ? context.strengths.tension.value : material.yieldStrength,
        requiredSafetyFactor: context.criteria.requiredSafetyFactor.combined,
        position: bimoment.position,
        location: `flange tips, with warping (sigma_w = ${fourSignificantText(warpingNormal / 1e6)} MPa, tau_w = ${fourSignificantText(warpingShear / 1e6)} MPa)`,
        basis:
          "von Mises sqrt(sigma^2 + 3 tau^2) of the largest axial-and-bending fibre stress plus the warping normal stress B omega_n / Iw, and the largest transverse, Saint-Venant and warping shear stresses, each taken where it peaks (an upper bound); B and T_w from the exact solution of E Iw phi'''' - G J phi'' = m_x (Timoshenko & Gere 2nd ed. ch. 5; AISC Design Guide 9, 2nd ed., ch. 4; from memory), the larger of fixed supports holding warping or not",
      }),
    ],
    notApplicable: [],
  };
}
