/**
 * Builds SectionProperties from what a shape computes: adds the fibre distances, principal axes,
 * section moduli and radii of gyration, moves the stress points to the centroid, and refuses any
 * value that is not a finite number of the right sign.
 */

import { EngineError } from '../engine-error.js';
import type { ShearCut } from './composite-region.js';
import { principalAxes } from './principal-axes.js';
import type { KnownSectionProperties, SectionProperties, StressPoint } from './section-properties.js';

/** What a shape works out itself. Coordinates are from the bottom-left corner of the bounding box. */
export type SectionCore = Pick<
  SectionProperties,
  | 'shape'
  | 'depth'
  | 'width'
  | 'area'
  | 'centroidY'
  | 'centroidZ'
  | 'secondMomentZ'
  | 'secondMomentY'
  | 'productMoment'
  | 'plasticModulusZ'
  | 'plasticModulusY'
  | 'torsionConstant'
  | 'torsionalShearPerTorque'
  | 'warpingConstant'
  | 'closed'
  | 'bendingCombination'
  | 'thickestElement'
  | 'known'
> & {
  /** The governing cuts for shear along y and along z. */
  readonly shearY: ShearCut;
  readonly shearZ: ShearCut;
  /** Outline points where biaxial bending can peak, in bounding-box coordinates. */
  readonly outlinePoints: readonly StressPoint[];
  /** Only where the bounding box and centroid do not give them (custom sections). */
  readonly fibreDistances?: {
    readonly top: number;
    readonly bottom: number;
    readonly positiveZ: number;
    readonly negativeZ: number;
  };
};

export const ALL_KNOWN: KnownSectionProperties = {
  bendingStressZ: true,
  bendingStressY: true,
  plasticModulusZ: true,
  plasticModulusY: true,
  shearStressY: true,
  shearStressZ: true,
  torsionalShearStress: true,
  warpingConstant: true,
  thickestElement: true,
  productMoment: true,
};

/** Turns -0 into 0. */
function clean(value: number): number {
  return value === 0 ? 0 : value;
}

const POSITIVE_FIELDS = [
  'depth',
  'width',
  'area',
  'secondMomentZ',
  'secondMomentY',
  'secondMomentMajor',
  'secondMomentMinor',
  'fibreDistanceTop',
  'fibreDistanceBottom',
  'fibreDistancePositiveZ',
  'fibreDistanceNegativeZ',
  'sectionModulusZ',
  'sectionModulusY',
  'plasticModulusZ',
  'plasticModulusY',
  'radiusOfGyrationZ',
  'radiusOfGyrationY',
  'radiusOfGyrationMinor',
  'torsionConstant',
  'torsionalShearPerTorque',
  'shearFirstMomentY',
  'shearWidthY',
  'shearFirstMomentZ',
  'shearWidthZ',
  'thickestElement',
] as const;

function requireRepresentable(properties: SectionProperties): void {
  const fail = (field: string, value: number): never => {
    throw new EngineError(
      'impossible-geometry',
      `The section's ${field} is not a finite positive number in double precision (${value}); the dimensions are out of range.`,
      ['section'],
      { field, value },
    );
  };
  for (const field of POSITIVE_FIELDS) {
    const value = properties[field];
    if (!Number.isFinite(value) || value <= 0) fail(field, value);
  }
  for (const field of ['centroidY', 'centroidZ', 'productMoment', 'principalAngle', 'warpingConstant'] as const) {
    const value = properties[field];
    if (!Number.isFinite(value)) fail(field, value);
  }
  if (properties.warpingConstant < 0) fail('warpingConstant', properties.warpingConstant);
  for (const point of properties.stressPoints) {
    if (!Number.isFinite(point.y) || !Number.isFinite(point.z)) fail('stressPoints', Number.NaN);
  }
}

export function assembleSectionProperties(core: SectionCore): SectionProperties {
  const fibres = core.fibreDistances ?? {
    top: core.depth - core.centroidY,
    bottom: core.centroidY,
    positiveZ: core.width - core.centroidZ,
    negativeZ: core.centroidZ,
  };
  const principal = principalAxes(core.secondMomentZ, core.secondMomentY, core.productMoment);
  const properties: SectionProperties = {
    shape: core.shape,
    depth: core.depth,
    width: core.width,
    area: core.area,
    centroidY: clean(core.centroidY),
    centroidZ: clean(core.centroidZ),
    secondMomentZ: core.secondMomentZ,
    secondMomentY: core.secondMomentY,
    productMoment: clean(core.productMoment),
    secondMomentMajor: principal.secondMomentMajor,
    secondMomentMinor: principal.secondMomentMinor,
    principalAngle: principal.principalAngle,
    fibreDistanceTop: fibres.top,
    fibreDistanceBottom: fibres.bottom,
    fibreDistancePositiveZ: fibres.positiveZ,
    fibreDistanceNegativeZ: fibres.negativeZ,
    sectionModulusZ: core.secondMomentZ / Math.max(fibres.top, fibres.bottom),
    sectionModulusY: core.secondMomentY / Math.max(fibres.positiveZ, fibres.negativeZ),
    plasticModulusZ: core.plasticModulusZ,
    plasticModulusY: core.plasticModulusY,
    radiusOfGyrationZ: Math.sqrt(core.secondMomentZ / core.area),
    radiusOfGyrationY: Math.sqrt(core.secondMomentY / core.area),
    radiusOfGyrationMinor: Math.sqrt(principal.secondMomentMinor / core.area),
    torsionConstant: core.torsionConstant,
    torsionalShearPerTorque: core.torsionalShearPerTorque,
    shearFirstMomentY: core.shearY.firstMoment,
    shearWidthY: core.shearY.width,
    shearFirstMomentZ: core.shearZ.firstMoment,
    shearWidthZ: core.shearZ.width,
    warpingConstant: clean(core.warpingConstant),
    closed: core.closed,
    bendingCombination: core.bendingCombination,
    stressPoints: core.outlinePoints.map((point) => ({
      y: clean(point.y - core.centroidY),
      z: clean(point.z - core.centroidZ),
      label: point.label,
    })),
    thickestElement: core.thickestElement,
    known: core.known ?? ALL_KNOWN,
  };
  requireRepresentable(properties);
  return properties;
}
