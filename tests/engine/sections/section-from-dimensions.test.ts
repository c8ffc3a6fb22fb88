import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { SectionDimensions } from '../../../src/engine/sections/dimensions.js';
import { sectionProperties } from '../../../src/engine/sections/section-from-dimensions.js';
import type { SectionProperties } from '../../../src/engine/sections/section-properties.js';

const size = fc.double({ min: 1e-3, max: 2, noNaN: true });
const fraction = (min: number, max: number) => fc.double({ min, max, noNaN: true });

/** Valid dimensions of every shape computed from its outline, built from sizes and fractions. */
const shapes: fc.Arbitrary<SectionDimensions> = fc.oneof(
  fc.record({ shape: fc.constant('rectangle' as const), width: size, depth: size }),
  fc.record({ shape: fc.constant('round' as const), diameter: size }),
  fc.tuple(size, fraction(1e-3, 0.499)).map(([D, f]) => ({ shape: 'tube' as const, outerDiameter: D, wallThickness: D * f })),
  fc.tuple(size, size, fraction(5e-3, 0.49), fraction(0, 1)).map(([b, h, f, g]) => {
    const t = Math.min(b, h) * f;
    return { shape: 'box' as const, width: b, depth: h, wallThickness: t, outerCornerRadius: (Math.min(b, h) / 2) * g };
  }),
  fc.tuple(size, fraction(0.2, 1.5), fraction(0.01, 0.45), fraction(0.01, 0.9), fraction(0, 1)).map(([h, u, v, w, g]) => {
    const b = h * u;
    const tf = h * v;
    const tw = b * w;
    const r = Math.min((b - tw) / 2, (h - 2 * tf) / 2) * g;
    return { shape: 'i-section' as const, depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf, rootRadius: r };
  }),
  fc.tuple(size, fraction(0.2, 1.5), fraction(0.01, 0.45), fraction(0.01, 0.9), fraction(0, 1)).map(([h, u, v, w, g]) => {
    const b = h * u;
    const tf = h * v;
    const tw = b * w;
    const r = Math.min(b - tw, (h - 2 * tf) / 2) * g;
    return { shape: 'channel' as const, depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf, rootRadius: r };
  }),
  fc.tuple(size, fraction(0.2, 3), fraction(0.02, 0.9), fraction(0.01, 0.9), fraction(0, 1)).map(([h, u, v, w, g]) => {
    const b = h * u;
    const tf = h * v;
    const tw = b * w;
    const r = Math.min((b - tw) / 2, h - tf) * g;
    return { shape: 'tee' as const, depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf, rootRadius: r };
  }),
  fc.tuple(size, size, fraction(0.01, 0.9), fraction(0, 1)).map(([legY, legZ, v, g]) => {
    const t = Math.min(legY, legZ) * v;
    return { shape: 'angle' as const, legY, legZ, thickness: t, rootRadius: (Math.min(legY, legZ) - t) * g };
  }),
);

function scaled(dimensions: SectionDimensions, k: number): SectionDimensions {
  const result: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(dimensions)) result[key] = typeof value === 'number' ? value * k : value;
  return result as unknown as SectionDimensions;
}

const numericFields = (p: SectionProperties): number[] => [
  ...Object.values(p).filter((value): value is number => typeof value === 'number'),
  ...p.stressPoints.flatMap((point) => [point.y, point.z]),
];

const relative = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b), Number.MIN_VALUE);

describe('sectionProperties dispatches on the shape', () => {
  it('returns the properties of the shape it was given', () => {
    const cases: SectionDimensions[] = [
      { shape: 'rectangle', width: 0.05, depth: 0.1 },
      { shape: 'round', diameter: 0.02 },
      { shape: 'tube', outerDiameter: 0.1, wallThickness: 0.005 },
      { shape: 'box', width: 0.1, depth: 0.1, wallThickness: 0.005, outerCornerRadius: 0.01 },
      { shape: 'i-section', depth: 0.2, flangeWidth: 0.1, webThickness: 0.0056, flangeThickness: 0.0085, rootRadius: 0.012 },
      { shape: 'channel', depth: 0.2, flangeWidth: 0.08, webThickness: 0.006, flangeThickness: 0.011 },
      { shape: 'tee', depth: 0.1, flangeWidth: 0.1, webThickness: 0.01, flangeThickness: 0.01 },
      { shape: 'angle', legY: 0.1, legZ: 0.1, thickness: 0.01 },
      { shape: 'custom', area: 1e-3, secondMomentZ: 1e-6, secondMomentY: 2e-7, torsionConstant: 1e-8 },
    ];
    for (const dimensions of cases) expect(sectionProperties(dimensions).shape).toBe(dimensions.shape);
    // Round: pi d^2 / 4.
    expect(sectionProperties({ shape: 'round', diameter: 0.02 }).area).toBeCloseTo(3.14159265e-4, 12);
  });
});

describe('laws every computed section keeps (fast-check)', () => {
  it('gives finite positive values, no -0, and stress points inside the bounding box', () => {
    fc.assert(
      fc.property(shapes, (dimensions) => {
        const p = sectionProperties(dimensions);
        for (const value of numericFields(p)) {
          expect(Number.isFinite(value)).toBe(true);
          expect(Object.is(value, -0)).toBe(false);
        }
        for (const value of [p.area, p.secondMomentZ, p.secondMomentY, p.secondMomentMinor, p.torsionConstant, p.plasticModulusZ, p.plasticModulusY, p.shearFirstMomentY, p.shearWidthY, p.shearFirstMomentZ, p.shearWidthZ, p.torsionalShearPerTorque, p.thickestElement]) {
          expect(value).toBeGreaterThan(0);
        }
        expect(p.warpingConstant).toBeGreaterThanOrEqual(0);
        expect(p.fibreDistanceTop + p.fibreDistanceBottom).toBeCloseTo(p.depth, 12);
        for (const point of p.stressPoints) {
          expect(point.y).toBeLessThanOrEqual(p.fibreDistanceTop * (1 + 1e-12));
          expect(point.y).toBeGreaterThanOrEqual(-p.fibreDistanceBottom * (1 + 1e-12));
          expect(point.z).toBeLessThanOrEqual(p.fibreDistancePositiveZ * (1 + 1e-12));
          expect(point.z).toBeGreaterThanOrEqual(-p.fibreDistanceNegativeZ * (1 + 1e-12));
        }
      }),
    );
  });

  it('keeps Mohr\'s invariants, Wpl >= Wel, J <= Iz + Iy and the area within the bounding box', () => {
    fc.assert(
      fc.property(shapes, (dimensions) => {
        const p = sectionProperties(dimensions);
        expect(relative(p.secondMomentMajor + p.secondMomentMinor, p.secondMomentZ + p.secondMomentY)).toBeLessThan(1e-12);
        // The plastic modulus is never below the elastic one (the plastic moment bounds the first yield moment).
        expect(p.plasticModulusZ).toBeGreaterThanOrEqual(p.sectionModulusZ * (1 - 1e-9));
        expect(p.plasticModulusY).toBeGreaterThanOrEqual(p.sectionModulusY * (1 - 1e-9));
        // Saint-Venant: J never exceeds the polar moment (equal only for circles).
        expect(p.torsionConstant).toBeLessThanOrEqual((p.secondMomentZ + p.secondMomentY) * (1 + 1e-9));
        expect(p.area).toBeLessThanOrEqual(p.depth * p.width * (1 + 1e-12));
      }),
    );
  });

  it('scales area by k^2, I and J by k^4, Iw by k^6 when every dimension scales by k', () => {
    fc.assert(
      fc.property(shapes, fc.double({ min: 0.01, max: 100, noNaN: true }), (dimensions, k) => {
        const p = sectionProperties(dimensions);
        const q = sectionProperties(scaled(dimensions, k));
        const tolerance = 1e-9;
        expect(relative(q.area, p.area * k ** 2)).toBeLessThan(tolerance);
        expect(relative(q.centroidY, p.centroidY * k)).toBeLessThan(tolerance);
        for (const field of ['secondMomentZ', 'secondMomentY', 'secondMomentMajor', 'secondMomentMinor', 'torsionConstant'] as const) {
          expect(relative(q[field], p[field] * k ** 4)).toBeLessThan(tolerance);
        }
        for (const field of ['sectionModulusZ', 'sectionModulusY', 'plasticModulusZ', 'plasticModulusY'] as const) {
          expect(relative(q[field], p[field] * k ** 3)).toBeLessThan(tolerance);
        }
        // Where Q / b peaks inside a fillet the peak is flat, so the cut (and Q and b apart) is found
        // only to about the square root of the search tolerance; Q / b itself to the full tolerance.
        expect(relative(q.shearFirstMomentY / q.shearWidthY, (p.shearFirstMomentY / p.shearWidthY) * k ** 2)).toBeLessThan(tolerance);
        expect(relative(q.shearFirstMomentZ / q.shearWidthZ, (p.shearFirstMomentZ / p.shearWidthZ) * k ** 2)).toBeLessThan(tolerance);
        expect(relative(q.shearWidthY, p.shearWidthY * k)).toBeLessThan(1e-6);
        expect(relative(q.torsionalShearPerTorque, p.torsionalShearPerTorque / k ** 3)).toBeLessThan(tolerance);
        if (p.warpingConstant > 0) expect(relative(q.warpingConstant, p.warpingConstant * k ** 6)).toBeLessThan(tolerance);
        expect(Math.abs(q.principalAngle - p.principalAngle)).toBeLessThan(1e-9);
      }),
    );
  });
});
