/**
 * Stresses at the critical points of a cross-section from its internal forces, with the sign
 * conventions of analysis/result.ts.
 *
 * Normal stress. The strain is eps = eps0 - kz y - ky z with kz = v'' and ky = w'' (both bending planes
 * of result.ts: EIz v'' = Mz for a symmetric section, and a sagging Mz stretches the fibre at -y). The
 * moments are the resultants Mz = -integral(sigma y dA) and My = -integral(sigma z dA), so
 *   Mz = E (kz Iz + ky Iyz),  My = E (kz Iyz + ky Iy)
 * and solving for the curvatures gives the unsymmetric-bending formula
 *   sigma = N/A - [(Mz Iy - My Iyz) y + (My Iz - Mz Iyz) z] / (Iy Iz - Iyz^2),
 * which is sigma = N/A - Mz y / Iz - My z / Iy when Iyz = 0 (the symmetric form of Shigley 10th ed.,
 * sec. 3-10, from memory; the general form is derived above).
 */

import type { SectionProperties, StressPoint } from '../sections/section-properties.js';
import type { SectionForces } from './section-forces.js';

/** A normal stress or a shear stress together with where on the section it acts. */
export interface LocatedStress {
  readonly value: number;
  readonly location: string;
}

/** A plane stress state at one point of the section: normal sigma and shear tau, Pa. */
export interface PointStressState {
  readonly normal: number;
  readonly shear: number;
  readonly location: string;
}

/** The section's own stress points, or the corners of its bounding box when it lists none. */
export function stressPointsOf(section: SectionProperties): readonly StressPoint[] {
  if (section.stressPoints.length > 0) return section.stressPoints;
  const top = section.fibreDistanceTop;
  const bottom = -section.fibreDistanceBottom;
  const right = section.fibreDistancePositiveZ;
  const left = -section.fibreDistanceNegativeZ;
  return [
    { y: top, z: right, label: 'top corner, +z' },
    { y: top, z: left, label: 'top corner, -z' },
    { y: bottom, z: right, label: 'bottom corner, +z' },
    { y: bottom, z: left, label: 'bottom corner, -z' },
  ];
}

/** Iyz counts only when it is not round-off against sqrt(Iy Iz). */
export function productMomentOf(section: SectionProperties): number {
  const scale = Math.sqrt(section.secondMomentY * section.secondMomentZ);
  return Math.abs(section.productMoment) > 1e-9 * scale ? section.productMoment : 0;
}

/** sigma_b = perMomentZ * Mz + perMomentY * My at (y, z), by the formula derived above. */
export function bendingStressCoefficients(
  section: SectionProperties,
  y: number,
  z: number,
): { readonly perMomentZ: number; readonly perMomentY: number } {
  const iz = section.secondMomentZ;
  const iy = section.secondMomentY;
  const iyz = productMomentOf(section);
  const determinant = iy * iz - iyz * iyz;
  return {
    perMomentZ: -(iy * y - iyz * z) / determinant,
    perMomentY: -(iz * z - iyz * y) / determinant,
  };
}

/** Largest fibre distance of a section that bends about its resultant axis (round, tube), m. */
export function resultantFibreDistance(section: SectionProperties): number {
  return Math.max(section.fibreDistanceTop, section.fibreDistanceBottom);
}

/** sqrt(Mz^2 + My^2) c / I for round and tube sections (Shigley 10th ed., sec. 7-4, from memory). */
export function resultantBendingStress(section: SectionProperties, forces: SectionForces): number {
  return (Math.hypot(forces.momentZ, forces.momentY) * resultantFibreDistance(section)) / section.secondMomentZ;
}

/** Bending stress (without N/A) at every critical point of the section, signed: tension positive. */
export function bendingStresses(section: SectionProperties, forces: SectionForces): LocatedStress[] {
  if (section.bendingCombination === 'resultant') {
    const magnitude = resultantBendingStress(section, forces);
    return [
      { value: magnitude, location: 'extreme fibre, tension side' },
      { value: -magnitude, location: 'extreme fibre, compression side' },
    ];
  }
  return stressPointsOf(section).map((point) => {
    const { perMomentZ, perMomentY } = bendingStressCoefficients(section, point.y, point.z);
    return { value: perMomentZ * forces.momentZ + perMomentY * forces.momentY, location: point.label };
  });
}

/** N / A plus bending at every critical point, signed: tension positive. */
export function normalStresses(section: SectionProperties, forces: SectionForces): LocatedStress[] {
  const axial = forces.axial / section.area;
  return bendingStresses(section, forces).map((stress) => ({ value: axial + stress.value, location: stress.location }));
}

/** A shear stress per force that the section's Q and b give: finite and positive. */
function usable(value: number): boolean {
  return Number.isFinite(value) && value > 0;
}

/**
 * tau = V Q / (I b) per newton of shear along y and along z, 1/m^2 (Shigley 10th ed., eq. 3-30, from
 * memory: the elementary beam-theory value). A section without Q or b falls back to the average 1 / A.
 */
export function transverseShearPerForce(section: SectionProperties): {
  readonly alongY: number;
  readonly alongZ: number;
  readonly elementary: boolean;
} {
  const alongY = section.shearFirstMomentY / (section.secondMomentZ * section.shearWidthY);
  const alongZ = section.shearFirstMomentZ / (section.secondMomentY * section.shearWidthZ);
  return {
    alongY: usable(alongY) ? alongY : 1 / section.area,
    alongZ: usable(alongZ) ? alongZ : 1 / section.area,
    elementary: usable(alongY) && usable(alongZ),
  };
}

/**
 * Largest transverse shear stress, Pa. Round and tube sections: the resultant V = sqrt(Vy^2 + Vz^2)
 * (the section looks the same in every direction). Other sections: the larger of the two directions,
 * whose peaks lie in different plates (web and flanges) or on different lines.
 */
export function transverseShearStress(section: SectionProperties, forces: SectionForces): LocatedStress {
  const perForce = transverseShearPerForce(section);
  if (section.bendingCombination === 'resultant') {
    return { value: perForce.alongY * Math.hypot(forces.shearY, forces.shearZ), location: 'neutral axis' };
  }
  const alongY = perForce.alongY * Math.abs(forces.shearY);
  const alongZ = perForce.alongZ * Math.abs(forces.shearZ);
  return alongZ > alongY
    ? { value: alongZ, location: 'neutral axis, shear along z' }
    : { value: alongY, location: 'neutral axis, shear along y' };
}

/** Average shear stress of the resultant shear force, V / A, Pa. */
export function averageShearStress(section: SectionProperties, forces: SectionForces): number {
  return Math.hypot(forces.shearY, forces.shearZ) / section.area;
}

/** Largest torsional shear stress |T| * torsionalShearPerTorque, Pa. */
export function torsionalShearStress(section: SectionProperties, forces: SectionForces): number {
  return Math.abs(forces.torque) * section.torsionalShearPerTorque;
}

/**
 * The plane stress states where normal and shear stresses combine worst (conservative):
 * - each extreme fibre point: N/A plus bending, with the largest torsional shear (transverse shear is
 *   zero at an extreme fibre);
 * - the neutral axis: N/A alone, with torsional plus transverse shear added as if they acted in the
 *   same direction.
 */
export function combinedStressStates(section: SectionProperties, forces: SectionForces): PointStressState[] {
  const torsional = torsionalShearStress(section, forces);
  const fibres = normalStresses(section, forces).map((stress) => ({
    normal: stress.value,
    shear: torsional,
    location: stress.location,
  }));
  const transverse = transverseShearStress(section, forces);
  return [
    ...fibres,
    { normal: forces.axial / section.area, shear: torsional + transverse.value, location: transverse.location },
  ];
}
