import { describe, expect, it } from 'vitest';
import { EngineError } from '../../../src/engine/engine-error.js';
import { boxProperties } from '../../../src/engine/sections/box.js';

const near = (actual: number, expected: number, relative = 1e-12) =>
  expect(Math.abs(actual / expected - 1)).toBeLessThan(relative);

const pathOf = (action: () => unknown) => {
  try {
    action();
  } catch (error) {
    if (error instanceof EngineError && error.kind === 'impossible-geometry') return error.path;
  }
  return undefined;
};

describe('a box with sharp corners is the difference of two rectangles', () => {
  // 150 deep x 100 wide x 6 wall (m): outer minus the 138 x 88 hole.
  const [h, b, t] = [0.15, 0.1, 0.006];
  const p = boxProperties({ shape: 'box', width: b, depth: h, wallThickness: t, outerCornerRadius: 0 });
  const [hi, bi] = [h - 2 * t, b - 2 * t];

  it('has A, I and Wpl of the outer less the inner rectangle', () => {
    near(p.area, b * h - bi * hi);
    near(p.secondMomentZ, (b * h ** 3 - bi * hi ** 3) / 12);
    near(p.secondMomentY, (h * b ** 3 - hi * bi ** 3) / 12);
    near(p.plasticModulusZ, (b * h * h - bi * hi * hi) / 4);
    near(p.plasticModulusY, (h * b * b - hi * bi * bi) / 4);
    near(p.sectionModulusZ, p.secondMomentZ / (h / 2));
  });

  it('has the EN 10219-2 Annex B torsion with Rc = 0: Bredt 4 Ah^2 t / p plus t^3 p / 3', () => {
    const enclosed = (b - t) * (h - t);
    const perimeter = 2 * (b - t + h - t);
    near(p.torsionConstant, (4 * enclosed ** 2 * t) / perimeter + (t ** 3 * perimeter) / 3);
    // Wt = It / (t + K / t), K = 2 Ah t / p.
    near(1 / p.torsionalShearPerTorque, p.torsionConstant / (t + (2 * enclosed) / perimeter));
  });

  it('cuts both webs at the neutral axis: Q = Wpl / 2, b = 2 t', () => {
    near(p.shearFirstMomentY, p.plasticModulusZ / 2, 1e-10);
    near(p.shearWidthY, 2 * t, 1e-10);
    near(p.shearFirstMomentZ, p.plasticModulusY / 2, 1e-10);
  });

  it('has its four corners as stress points', () => {
    expect(p.stressPoints).toHaveLength(4);
    for (const point of p.stressPoints) {
      expect(Math.abs(point.y)).toBeCloseTo(h / 2, 15);
      expect(Math.abs(point.z)).toBeCloseTo(b / 2, 15);
    }
  });
});

describe('SHS 100 x 100 x 5 cold formed, ro = 2 t = 10 mm, ri = t = 5 mm', () => {
  const p = boxProperties({ shape: 'box', width: 0.1, depth: 0.1, wallThickness: 0.005, outerCornerRadius: 0.01 });

  it('has the area 2 t (b + h - 2 t) - (4 - pi)(ro^2 - ri^2) (EN 10219-2 Annex B; from memory)', () => {
    // 2 * 5 * 190 - 0.858407 * (100 - 25) = 1835.62 mm^2.
    near(p.area, (1900 - (4 - Math.PI) * 75) / 1e6);
  });

  it('matches EN 10219-2 tabulated values (from memory): A 18.4 cm^2, I 271 cm^4, Wel 54.2 cm^3, Wpl 64.6 cm^3, It 441 cm^4', () => {
    near(p.area, 18.4e-4, 0.01);
    near(p.secondMomentZ, 271e-8, 0.01);
    near(p.secondMomentY, 271e-8, 0.01);
    near(p.sectionModulusZ, 54.2e-6, 0.01);
    near(p.plasticModulusZ, 64.6e-6, 0.01);
    near(p.torsionConstant, 441e-8, 0.01);
  });

  it('has EN 10219-2 Annex B torsion by hand: Rc = 7.5, Ah = 8976.7, p = 367.12, K = 244.5 (mm)', () => {
    const rc = 7.5;
    const enclosed = 95 * 95 - rc * rc * (4 - Math.PI);
    const perimeter = 4 * 95 - 2 * rc * (4 - Math.PI);
    const k = (2 * enclosed * 5) / perimeter;
    near(p.torsionConstant, (125 * perimeter) / 3 / 1e12 + (2 * k * enclosed) / 1e12);
    near(1 / p.torsionalShearPerTorque, ((125 * perimeter) / 3 + 2 * k * enclosed) / (5 + k / 5) / 1e9);
  });

  it('is closed, square (every axis principal) and has stress points on the corner arcs', () => {
    expect(p.closed).toBe(true);
    expect(p.principalAngle).toBe(0);
    expect(p.productMoment).toBe(0);
    expect(p.stressPoints).toHaveLength(28);
    // Each point lies on a corner arc: 10 mm from the arc centre at (+-40, +-40) mm.
    for (const point of p.stressPoints) {
      near(Math.hypot(Math.abs(point.y) - 0.04, Math.abs(point.z) - 0.04), 0.01, 1e-12);
    }
    expect(p.thickestElement).toBe(0.005);
  });
});

describe('boxProperties refuses impossible geometry', () => {
  const base = { shape: 'box' as const, width: 0.1, depth: 0.2, wallThickness: 0.005, outerCornerRadius: 0.01 };

  it('names the field at fault', () => {
    expect(pathOf(() => boxProperties({ ...base, wallThickness: 0.05 }))).toEqual(['section', 'wallThickness']);
    expect(pathOf(() => boxProperties({ ...base, wallThickness: 0 }))).toEqual(['section', 'wallThickness']);
    expect(pathOf(() => boxProperties({ ...base, outerCornerRadius: 0.06 }))).toEqual(['section', 'outerCornerRadius']);
    expect(pathOf(() => boxProperties({ ...base, outerCornerRadius: -0.001 }))).toEqual(['section', 'outerCornerRadius']);
    expect(pathOf(() => boxProperties({ ...base, width: 0 }))).toEqual(['section', 'width']);
  });

  it('accepts an absent corner radius as sharp corners', () => {
    const { outerCornerRadius: _unused, ...sharp } = base;
    expect(boxProperties(sharp).area).toBeCloseTo(0.1 * 0.2 - 0.09 * 0.19, 15);
  });
});
