/**
 * Failure theories for a plane stress state (normal sigma, shear tau), each written as an equivalent
 * stress compared with one strength.
 */

import type { Material } from '../materials/material.js';
import type { SectionProperties } from '../sections/section-properties.js';
import type { SectionForces } from './section-forces.js';
import { combinedStressStates } from './section-stresses.js';

/** Von Mises stress sigma' = sqrt(sigma^2 + 3 tau^2), compared with Sy (Shigley 10th ed., eq. 5-15, from memory). */
export function vonMisesStress(normal: number, shear: number): number {
  return Math.sqrt(normal * normal + 3 * shear * shear);
}

/** Principal stresses sigmaA >= sigmaB of (sigma, tau) (Shigley 10th ed., eq. 3-13, from memory). */
export function principalStresses(normal: number, shear: number): { readonly major: number; readonly minor: number } {
  const centre = normal / 2;
  const radius = Math.hypot(centre, shear);
  return { major: centre + radius, minor: centre - radius };
}

/**
 * Modified-Mohr equivalent tensile stress Sut / n for a brittle material, compared with Sut
 * (Shigley 10th ed., eqs. 5-32a to 5-32c, from memory), with Sut and Suc both positive:
 * - sigmaA >= 0 and sigmaB >= -sigmaA: n = Sut / sigmaA;
 * - sigmaA >= 0 > sigmaB and sigmaB < -sigmaA: 1/n = (Suc - Sut) sigmaA / (Suc Sut) - sigmaB / Suc;
 * - 0 > sigmaA >= sigmaB: n = -Suc / sigmaB.
 */
export function modifiedMohrEquivalentStress(
  normal: number,
  shear: number,
  ultimateStrength: number,
  compressiveUltimateStrength: number,
): number {
  const { major, minor } = principalStresses(normal, shear);
  if (major >= 0) {
    if (minor >= -major) return major;
    return ((compressiveUltimateStrength - ultimateStrength) * major - ultimateStrength * minor) / compressiveUltimateStrength;
  }
  return (-minor * ultimateStrength) / compressiveUltimateStrength;
}

/** The largest equivalent stress over a section's combined stress states, Pa, and where it acts. */
export function equivalentStressAt(
  section: SectionProperties,
  material: Material,
  forces: SectionForces,
): { readonly value: number; readonly location: string | null } {
  let best = { value: 0, location: null as string | null };
  for (const state of combinedStressStates(section, forces)) {
    const value =
      material.behaviour === 'brittle'
        ? modifiedMohrEquivalentStress(state.normal, state.shear, material.ultimateStrength, material.compressiveUltimateStrength)
        : vonMisesStress(state.normal, state.shear);
    if (value > best.value) best = { value, location: state.location };
  }
  return best;
}
