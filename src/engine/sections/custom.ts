/**
 * A section given by its properties rather than its outline. What is given is used as given; the
 * rest is derived where a sound derivation exists, else stood in for and marked in `known`
 * (KnownSectionProperties documents each stand-in):
 *
 * - radii of gyration sqrt(I / A) and principal values (the given axes are taken as principal);
 * - fibre distance for bending about z: Iz / sectionModulusZ if given, else depth / 2 (a section
 *   symmetric about z), else unknown (stand-in: the radius of gyration); the same about y with width.
 *   The section is treated as symmetric, with that distance on both sides (on the safe side when
 *   the least modulus is given for an unsymmetric section);
 * - plastic modulus: given, else the elastic modulus (a lower bound, since Wpl >= Wel);
 * - shear: a given shear area Av means tau max = V / Av, else the solid rectangle's 1.5 V / A;
 *   Q and b are the pair that gives that stress: b = Av / h, Q = I / h with h the depth (width);
 * - torsional shear: T / torsionalModulus if given, else T R / J with R the half diagonal;
 * - warping constant: given, else 0; thickest element: given, else min(depth, width) of those
 *   given, else sqrt(area); closed: given, else false.
 *
 * Input that no section can have is refused: Iz > A (depth/2)^2 (the most an area A can have within
 * that depth, half of it at each face), a least modulus whose fibre distance Iz / W exceeds the
 * depth or falls short of depth / 2, a shear area above the area, J above Iz + Iy (the polar moment
 * bounds J, Saint-Venant), each with 1 % allowance for rounded tabulated values.
 */

import type { CustomDimensions } from './dimensions.js';
import { assembleSectionProperties } from './section-assembly.js';
import { impossibleGeometry, requireNonNegative, requirePositive } from './section-geometry-checks.js';
import type { SectionProperties } from './section-properties.js';

/** Rounding allowance for tabulated values that are checked against each other. */
const ROUNDING = 0.01;

interface BendingAxis {
  /** Largest fibre distance, m, used on both sides. */
  readonly fibreDistance: number;
  /** Overall size along the fibre direction, m. */
  readonly size: number;
  readonly known: boolean;
}

function bendingAxis(
  area: number,
  secondMoment: number,
  size: number | undefined,
  modulus: number | undefined,
  sizeField: string,
  modulusField: string,
  momentField: string,
): BendingAxis {
  if (size !== undefined) requirePositive(size, sizeField);
  if (modulus !== undefined) requirePositive(modulus, modulusField);
  if (size !== undefined && secondMoment > (1 + ROUNDING) * area * (size / 2) ** 2) {
    throw impossibleGeometry(momentField, `${momentField} exceeds A (${sizeField} / 2)^2, the most an area of that size can have.`, {
      limit: area * (size / 2) ** 2,
    });
  }
  if (modulus !== undefined) {
    const distance = secondMoment / modulus;
    if (size !== undefined && (distance > (1 + ROUNDING) * size || distance < ((1 - ROUNDING) * size) / 2)) {
      throw impossibleGeometry(
        modulusField,
        `${momentField} / ${modulusField} (${distance}) must lie between ${sizeField} / 2 and ${sizeField}, the range of the largest fibre distance.`,
        { fibreDistance: distance, size },
      );
    }
    if (secondMoment > (1 + ROUNDING) * area * distance * distance) {
      throw impossibleGeometry(modulusField, `${modulusField} exceeds sqrt(area * ${momentField}), the most any section can have.`, {
        limit: Math.sqrt(area * secondMoment),
      });
    }
    return { fibreDistance: distance, size: size ?? 2 * distance, known: true };
  }
  if (size !== undefined) return { fibreDistance: size / 2, size, known: true };
  const radiusOfGyration = Math.sqrt(secondMoment / area);
  return { fibreDistance: radiusOfGyration, size: 2 * radiusOfGyration, known: false };
}

function shearAreaOf(area: number, given: number | undefined, field: string): { readonly shearArea: number; readonly known: boolean } {
  if (given === undefined) return { shearArea: area / 1.5, known: false };
  requirePositive(given, field);
  if (given > (1 + ROUNDING) * area) {
    throw impossibleGeometry(field, `${field} exceeds the area: no section carries shear on more than its area.`, { area });
  }
  return { shearArea: given, known: true };
}

export function customProperties(dimensions: CustomDimensions): SectionProperties {
  const { area, secondMomentZ, secondMomentY, torsionConstant } = dimensions;
  requirePositive(area, 'area');
  requirePositive(secondMomentZ, 'secondMomentZ');
  requirePositive(secondMomentY, 'secondMomentY');
  requirePositive(torsionConstant, 'torsionConstant');
  if (torsionConstant > (1 + ROUNDING) * (secondMomentZ + secondMomentY)) {
    throw impossibleGeometry('torsionConstant', 'torsionConstant exceeds secondMomentZ + secondMomentY, the polar moment that bounds it.', {
      limit: secondMomentZ + secondMomentY,
    });
  }
  const aboutZ = bendingAxis(area, secondMomentZ, dimensions.depth, dimensions.sectionModulusZ, 'depth', 'sectionModulusZ', 'secondMomentZ');
  const aboutY = bendingAxis(area, secondMomentY, dimensions.width, dimensions.sectionModulusY, 'width', 'sectionModulusY', 'secondMomentY');
  if (dimensions.plasticModulusZ !== undefined) requirePositive(dimensions.plasticModulusZ, 'plasticModulusZ');
  if (dimensions.plasticModulusY !== undefined) requirePositive(dimensions.plasticModulusY, 'plasticModulusY');
  if (dimensions.torsionalModulus !== undefined) requirePositive(dimensions.torsionalModulus, 'torsionalModulus');
  if (dimensions.thickestElement !== undefined) requirePositive(dimensions.thickestElement, 'thickestElement');
  const warpingConstant = requireNonNegative(dimensions.warpingConstant, 'warpingConstant');
  const shearY = shearAreaOf(area, dimensions.shearAreaY, 'shearAreaY');
  const shearZ = shearAreaOf(area, dimensions.shearAreaZ, 'shearAreaZ');

  const givenSizes = [dimensions.depth, dimensions.width].filter((size): size is number => size !== undefined);
  const thickestElement = dimensions.thickestElement ?? (givenSizes.length > 0 ? Math.min(...givenSizes) : Math.sqrt(area));
  const halfDiagonal = Math.hypot(aboutZ.fibreDistance, aboutY.fibreDistance);
  const cY = aboutZ.fibreDistance;
  const cZ = aboutY.fibreDistance;
  return assembleSectionProperties({
    shape: 'custom',
    depth: dimensions.depth ?? aboutZ.size,
    width: dimensions.width ?? aboutY.size,
    area,
    centroidY: cY,
    centroidZ: cZ,
    secondMomentZ,
    secondMomentY,
    productMoment: 0,
    plasticModulusZ: dimensions.plasticModulusZ ?? secondMomentZ / cY,
    plasticModulusY: dimensions.plasticModulusY ?? secondMomentY / cZ,
    torsionConstant,
    torsionalShearPerTorque: dimensions.torsionalModulus !== undefined ? 1 / dimensions.torsionalModulus : halfDiagonal / torsionConstant,
    shearY: { firstMoment: secondMomentZ / aboutZ.size, width: shearY.shearArea / aboutZ.size },
    shearZ: { firstMoment: secondMomentY / aboutY.size, width: shearZ.shearArea / aboutY.size },
    warpingConstant,
    closed: dimensions.closed ?? false,
    bendingCombination: 'points',
    outlinePoints: [
      { y: 2 * cY, z: 2 * cZ, label: 'extreme fibre corner, +y +z' },
      { y: 2 * cY, z: 0, label: 'extreme fibre corner, +y -z' },
      { y: 0, z: 2 * cZ, label: 'extreme fibre corner, -y +z' },
      { y: 0, z: 0, label: 'extreme fibre corner, -y -z' },
    ],
    thickestElement,
    fibreDistances: { top: cY, bottom: cY, positiveZ: cZ, negativeZ: cZ },
    known: {
      bendingStressZ: aboutZ.known,
      bendingStressY: aboutY.known,
      plasticModulusZ: dimensions.plasticModulusZ !== undefined,
      plasticModulusY: dimensions.plasticModulusY !== undefined,
      shearStressY: shearY.known,
      shearStressZ: shearZ.known,
      torsionalShearStress: dimensions.torsionalModulus !== undefined,
      warpingConstant: dimensions.warpingConstant !== undefined,
      thickestElement: dimensions.thickestElement !== undefined,
      productMoment: false,
    },
  });
}
