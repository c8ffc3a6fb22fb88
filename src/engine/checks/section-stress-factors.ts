/**
 * The constants of a section that its stresses multiply the internal forces by, worked out once per
 * check instead of at every position: the bending coefficients of each stress point, the shear
 * stress per unit shear force and per unit torque. The values are those of section-stresses.ts,
 * computed by the same functions, so a stress evaluated from them is the same number.
 */

import type { SectionProperties } from '../sections/section-properties.js';
import { bendingStressCoefficients, resultantFibreDistance, stressPointsOf, transverseShearPerForce } from './section-stresses.js';

export interface SectionStressFactors {
  readonly area: number;
  /** Round and tube sections bend about the resultant axis; the others at their stress points. */
  readonly resultant: boolean;
  /** sigma_b at fibre k = perMomentZ[k] Mz + perMomentY[k] My ('points' sections only). */
  readonly perMomentZ: Float64Array;
  readonly perMomentY: Float64Array;
  /** One label per fibre: the stress points, or the tension and compression side of a resultant section. */
  readonly fibreLabels: readonly string[];
  /** Resultant sections: sigma_b = sqrt(Mz^2 + My^2) fibreDistance / secondMomentZ. */
  readonly fibreDistance: number;
  readonly secondMomentZ: number;
  /** tau = V Q / (I b) per newton of shear along y and along z, 1/m^2. */
  readonly shearPerForceY: number;
  readonly shearPerForceZ: number;
  readonly torsionalShearPerTorque: number;
}

export const RESULTANT_FIBRE_LABELS = ['extreme fibre, tension side', 'extreme fibre, compression side'] as const;

/** The scan and the stress peaks of a check, and every check of a catalogue section, share its factors. */
const factorsOfSection = new WeakMap<SectionProperties, SectionStressFactors>();

export function sectionStressFactors(section: SectionProperties): SectionStressFactors {
  let factors = factorsOfSection.get(section);
  if (factors === undefined) {
    factors = factorsOf(section);
    factorsOfSection.set(section, factors);
  }
  return factors;
}

function factorsOf(section: SectionProperties): SectionStressFactors {
  const resultant = section.bendingCombination === 'resultant';
  const points = resultant ? [] : stressPointsOf(section);
  const perMomentZ = new Float64Array(points.length);
  const perMomentY = new Float64Array(points.length);
  points.forEach((point, index) => {
    const coefficients = bendingStressCoefficients(section, point.y, point.z);
    perMomentZ[index] = coefficients.perMomentZ;
    perMomentY[index] = coefficients.perMomentY;
  });
  const perForce = transverseShearPerForce(section);
  return {
    area: section.area,
    resultant,
    perMomentZ,
    perMomentY,
    fibreLabels: resultant ? RESULTANT_FIBRE_LABELS : points.map((point) => point.label),
    fibreDistance: resultantFibreDistance(section),
    secondMomentZ: section.secondMomentZ,
    shearPerForceY: perForce.alongY,
    shearPerForceZ: perForce.alongZ,
    torsionalShearPerTorque: section.torsionalShearPerTorque,
  };
}

/** The number of fibres fibreBendingStresses writes. */
export function fibreCount(factors: SectionStressFactors): number {
  return factors.fibreLabels.length;
}

/** Bending stress (without N/A) at every fibre into `out`, signed: tension positive (bendingStresses of section-stresses.ts). */
export function fibreBendingStresses(factors: SectionStressFactors, momentZ: number, momentY: number, out: Float64Array): void {
  if (factors.resultant) {
    const magnitude = (Math.hypot(momentZ, momentY) * factors.fibreDistance) / factors.secondMomentZ;
    out[0] = magnitude;
    out[1] = -magnitude;
    return;
  }
  const { perMomentZ, perMomentY } = factors;
  for (let k = 0; k < perMomentZ.length; k++) out[k] = (perMomentZ[k] as number) * momentZ + (perMomentY[k] as number) * momentY;
}
