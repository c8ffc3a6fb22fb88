import { describe, expect, it } from 'vitest';
import { EngineError } from '../../../src/engine/engine-error.js';
import { ALL_KNOWN, assembleSectionProperties } from '../../../src/engine/sections/section-assembly.js';
import type { SectionCore } from '../../../src/engine/sections/section-assembly.js';

// A 2 x 4 rectangle (depth 4 along y) described by hand.
const core: SectionCore = {
  shape: 'rectangle',
  depth: 4,
  width: 2,
  area: 8,
  centroidY: 2,
  centroidZ: 1,
  secondMomentZ: (2 * 4 ** 3) / 12,
  secondMomentY: (4 * 2 ** 3) / 12,
  productMoment: -0,
  plasticModulusZ: 8,
  plasticModulusY: 4,
  torsionConstant: 1,
  torsionalShearPerTorque: 1,
  shearY: { firstMoment: 4, width: 2 },
  shearZ: { firstMoment: 2, width: 4 },
  warpingConstant: 0,
  closed: false,
  bendingCombination: 'points',
  outlinePoints: [
    { y: 4, z: 2, label: 'top corner' },
    { y: 2, z: 1, label: 'centre' },
  ],
  thickestElement: 2,
};

describe('assembleSectionProperties', () => {
  const p = assembleSectionProperties(core);

  it('adds fibre distances, moduli and radii from the bounding box and centroid', () => {
    expect(p.fibreDistanceTop).toBe(2);
    expect(p.fibreDistanceNegativeZ).toBe(1);
    expect(p.sectionModulusZ).toBeCloseTo(32 / 3 / 2, 14);
    expect(p.radiusOfGyrationZ).toBeCloseTo(4 / Math.sqrt(12), 14);
    expect(p.radiusOfGyrationMinor).toBeCloseTo(2 / Math.sqrt(12), 14);
    expect(p.known).toBe(ALL_KNOWN);
  });

  it('moves the stress points to the centroid and writes no -0', () => {
    expect(p.stressPoints[0]).toEqual({ y: 2, z: 1, label: 'top corner' });
    expect(Object.is(p.stressPoints[1]?.y, 0)).toBe(true);
    expect(Object.is(p.productMoment, 0)).toBe(true);
  });

  it('refuses values that overflow or vanish', () => {
    expect(() => assembleSectionProperties({ ...core, secondMomentZ: Infinity })).toThrow(EngineError);
    expect(() => assembleSectionProperties({ ...core, area: 0 })).toThrow(EngineError);
    expect(() => assembleSectionProperties({ ...core, torsionConstant: Number.NaN })).toThrow(EngineError);
  });
});
