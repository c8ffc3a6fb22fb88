import { describe, expect, it } from 'vitest';
import { principalAxes } from '../../../src/engine/sections/principal-axes.js';

/** I about an axis at theta from +z towards +y, by rotating the tensor (Mohr's circle). */
const aboutAxis = (iz: number, iy: number, iyz: number, theta: number) =>
  iz * Math.cos(theta) ** 2 + iy * Math.sin(theta) ** 2 - 2 * iyz * Math.sin(theta) * Math.cos(theta);

describe('principalAxes', () => {
  it('keeps the given axes when the product moment is zero', () => {
    expect(principalAxes(5, 2, 0)).toEqual({ secondMomentMajor: 5, secondMomentMinor: 2, principalAngle: 0 });
    const upright = principalAxes(2, 5, 0);
    expect(upright.secondMomentMajor).toBe(5);
    expect(upright.principalAngle).toBeCloseTo(Math.PI / 2, 15);
    expect(principalAxes(2, 5, -0).principalAngle).toBeCloseTo(Math.PI / 2, 15);
  });

  it('puts the major axis of an equal angle (Iz = Iy, Iyz < 0) at 45 degrees, I = Iz -+ Iyz', () => {
    // Equal legs along +y and +z: the major axis is the symmetry line through the heel.
    const axes = principalAxes(3, 3, -1);
    expect(axes.principalAngle).toBeCloseTo(Math.PI / 4, 15);
    expect(axes.secondMomentMajor).toBeCloseTo(4, 14);
    expect(axes.secondMomentMinor).toBeCloseTo(2, 14);
  });

  it('finds the extremes of I(theta) and keeps the invariants', () => {
    const [iz, iy, iyz] = [7, 3, 1.5];
    const axes = principalAxes(iz, iy, iyz);
    expect(aboutAxis(iz, iy, iyz, axes.principalAngle)).toBeCloseTo(axes.secondMomentMajor, 12);
    expect(aboutAxis(iz, iy, iyz, axes.principalAngle + Math.PI / 2)).toBeCloseTo(axes.secondMomentMinor, 12);
    expect(axes.secondMomentMajor + axes.secondMomentMinor).toBeCloseTo(iz + iy, 12);
    expect(axes.secondMomentMajor * axes.secondMomentMinor).toBeCloseTo(iz * iy - iyz * iyz, 12);
    for (let theta = -Math.PI / 2; theta <= Math.PI / 2; theta += 0.01) {
      expect(aboutAxis(iz, iy, iyz, theta)).toBeLessThanOrEqual(axes.secondMomentMajor + 1e-12);
      expect(aboutAxis(iz, iy, iyz, theta)).toBeGreaterThanOrEqual(axes.secondMomentMinor - 1e-12);
    }
  });

  it('gives angle 0, never -0, when every axis is principal', () => {
    const axes = principalAxes(2, 2, 0);
    expect(Object.is(axes.principalAngle, 0)).toBe(true);
    expect(Object.is(principalAxes(5, 2, 0).principalAngle, 0)).toBe(true);
  });
});
