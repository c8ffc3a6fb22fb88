import { describe, expect, it } from 'vitest';
import { EngineError } from '../../../src/engine/engine-error.js';
import { rectangleProperties } from '../../../src/engine/sections/rectangle.js';

const near = (actual: number, expected: number, relative = 1e-12) =>
  expect(Math.abs(actual / expected - 1)).toBeLessThan(relative);

describe('rectangleProperties, 50 wide x 100 deep (mm)', () => {
  const b = 0.05;
  const h = 0.1;
  const p = rectangleProperties({ shape: 'rectangle', width: b, depth: h });

  it('has the closed forms of Roark 8th ed., Table A.1, rectangle (from memory)', () => {
    near(p.area, 5e-3);
    near(p.secondMomentZ, (0.05 * 0.1 ** 3) / 12); // 4.1667e-6 m^4
    near(p.secondMomentY, (0.1 * 0.05 ** 3) / 12); // 1.0417e-6 m^4
    near(p.sectionModulusZ, (0.05 * 0.1 ** 2) / 6);
    near(p.sectionModulusY, (0.1 * 0.05 ** 2) / 6);
    near(p.radiusOfGyrationZ, h / Math.sqrt(12));
    near(p.radiusOfGyrationMinor, b / Math.sqrt(12));
    expect(p.centroidY).toBe(h / 2);
    expect(p.fibreDistanceTop).toBe(h / 2);
    expect(p.productMoment).toBe(0);
  });

  it('has plastic moduli b h^2 / 4 and h b^2 / 4, 1.5 times the elastic ones', () => {
    near(p.plasticModulusZ, 1.5 * p.sectionModulusZ);
    near(p.plasticModulusY, 1.5 * p.sectionModulusY);
  });

  it('peaks in shear at 1.5 V / A both ways', () => {
    near((p.shearFirstMomentY / (p.secondMomentZ * p.shearWidthY)) * p.area, 1.5);
    near((p.shearFirstMomentZ / (p.secondMomentY * p.shearWidthZ)) * p.area, 1.5);
  });

  it('has J and tau from the exact series: k1 = 0.229, k2 = 0.246 at a / b = 2 (Timoshenko & Goodier, from memory)', () => {
    expect(Math.abs(p.torsionConstant / (h * b ** 3) - 0.229)).toBeLessThan(0.0006);
    expect(Math.abs(1 / (p.torsionalShearPerTorque * h * b * b) - 0.246)).toBeLessThan(0.0006);
  });

  it('is a solid that may buckle laterally, with stress points at its corners', () => {
    expect(p.closed).toBe(false);
    expect(p.bendingCombination).toBe('points');
    expect(p.warpingConstant).toBe(0);
    expect(p.thickestElement).toBe(b);
    expect(p.stressPoints.map((point) => [point.y, point.z])).toEqual([
      [h / 2, b / 2],
      [h / 2, -b / 2],
      [-h / 2, b / 2],
      [-h / 2, -b / 2],
    ]);
  });
});

describe('rectangleProperties refuses impossible geometry', () => {
  it('names the field', () => {
    for (const [width, depth, field] of [
      [0, 0.1, 'width'],
      [0.1, -0.1, 'depth'],
      [Number.NaN, 0.1, 'width'],
    ] as const) {
      try {
        rectangleProperties({ shape: 'rectangle', width, depth });
        expect.unreachable();
      } catch (error) {
        expect(error).toBeInstanceOf(EngineError);
        expect((error as EngineError).path).toEqual(['section', field]);
      }
    }
  });
});
