import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseMember } from '../../../src/engine/analysis/analyse-member.js';
import { checkMember } from '../../../src/engine/checks/check-member.js';
import type { MemberCheckOutcome } from '../../../src/engine/checks/check-outcome.js';
import { EngineError } from '../../../src/engine/engine-error.js';
import type { Direction, LoadModel, MemberModel, SupportModel } from '../../../src/engine/member/model.js';
import type { Material } from '../../../src/engine/materials/material.js';
import type { SectionDimensions } from '../../../src/engine/sections/dimensions.js';
import { sectionProperties } from '../../../src/engine/sections/section-from-dimensions.js';
import { FIXED, modelOf, PIN, ROLLER, support } from './fixtures/analyses.js';
import { castIron, steel } from './fixtures/materials.js';

/**
 * The safe verdict (verdict.ts): whatever the member, checkMember never answers 'pass' while a mode is
 * left unchecked or a check fails, and never 'fail' unless a check fails. Random members: every section
 * shape with plausible dimensions (m), stable supports, point and distributed loads with some torque and
 * some axial compression, analysed by the engine. Inputs the engine refuses (EngineError) are skipped.
 */

const mm = (min: number, max: number) => fc.integer({ min, max }).map((value) => value / 1000);
const fraction = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

const dimensionsArbitrary: fc.Arbitrary<SectionDimensions> = fc.oneof(
  fc.record({ shape: fc.constant('rectangle' as const), width: mm(20, 150), depth: mm(20, 300) }),
  fc.record({ shape: fc.constant('round' as const), diameter: mm(15, 150) }),
  fc.record({ outerDiameter: mm(30, 250), wallRatio: fraction(0.02, 0.2) }).map(
    ({ outerDiameter, wallRatio }): SectionDimensions => ({ shape: 'tube', outerDiameter, wallThickness: Math.max(0.0015, outerDiameter * wallRatio) }),
  ),
  fc.record({ width: mm(40, 200), depth: mm(40, 300), wall: mm(2, 12) }).map(
    ({ width, depth, wall }): SectionDimensions => ({ shape: 'box', width, depth, wallThickness: wall }),
  ),
  // I: flanges at least 60 mm wide and 2 tf + 2 r at most 60 mm of a depth of at least 100 mm.
  fc.record({ depth: mm(100, 600), flangeWidth: mm(60, 300), webThickness: mm(3, 15), flangeThickness: mm(4, 20), rootRadius: mm(0, 10) }).map(
    (d): SectionDimensions => ({ shape: 'i-section', ...d }),
  ),
  fc.record({ depth: mm(60, 400), flangeWidth: mm(30, 120), webThickness: mm(3, 12), flangeThickness: mm(3, 14) }).map(
    (d): SectionDimensions => ({ shape: 'channel', ...d }),
  ),
  fc.record({ depth: mm(50, 250), flangeWidth: mm(50, 250), webThickness: mm(4, 15), flangeThickness: mm(4, 20) }).map(
    (d): SectionDimensions => ({ shape: 'tee', ...d }),
  ),
  fc.record({ legY: mm(40, 200), legZ: mm(40, 200), thickness: mm(4, 18) }).map((d): SectionDimensions => ({ shape: 'angle', ...d })),
  // Custom: properties an outline of w x h can hold (Iz <= A (h / 2)^2, J <= Iz + Iy).
  fc
    .record({ width: mm(30, 200), depth: mm(30, 300), fill: fraction(0.2, 0.9), kz: fraction(0.2, 0.95), ky: fraction(0.2, 0.95), kt: fraction(0.001, 0.9), closed: fc.boolean() })
    .map(({ width, depth, fill, kz, ky, kt, closed }): SectionDimensions => {
      const area = fill * width * depth;
      const secondMomentZ = kz * area * (depth / 2) ** 2;
      const secondMomentY = ky * area * (width / 2) ** 2;
      return { shape: 'custom', area, secondMomentZ, secondMomentY, torsionConstant: kt * Math.min(secondMomentZ, secondMomentY), depth, width, closed };
    }),
);

type SupportLayout = 'pinned-roller' | 'fixed' | 'fixed-roller' | 'bearings';

const LOCATING_BEARING: readonly Direction[] = ['ux', 'uy', 'uz'];
const FLOATING_BEARING: readonly Direction[] = ['uy', 'uz'];

/** Supports that hold the member in every direction (no mechanism under any load). */
function supportsOf(layout: SupportLayout, length: number): SupportModel[] {
  switch (layout) {
    case 'pinned-roller':
      return [support(0, PIN), support(length, ROLLER)];
    case 'fixed':
      return [support(0, FIXED)];
    case 'fixed-roller':
      return [support(0, FIXED), support(length, ROLLER)];
    case 'bearings':
      // A shaft: two bearings that let it turn, and a torsion restraint (a coupling) at its far end.
      return [support(0, LOCATING_BEARING), support(length * 0.8, FLOATING_BEARING), support(length, ['rx'])];
  }
}

/** A load as fractions of the length and signed magnitudes, placed once the length is known. */
interface LoadSpec {
  readonly point: boolean;
  readonly at: number;
  readonly span: number;
  readonly fy: number;
  readonly fz: number;
  readonly fx: number;
  readonly mx: number;
  readonly varying: boolean;
}

const loadSpecArbitrary: fc.Arbitrary<LoadSpec> = fc.record({
  point: fc.boolean(),
  at: fraction(0.05, 1),
  span: fraction(0.1, 1),
  fy: fc.integer({ min: -30, max: 10 }).map((k) => k * 1e3),
  fz: fc.oneof(fc.constant(0), fc.integer({ min: -10, max: 10 }).map((k) => k * 1e3)),
  // Some axial compression (negative fx), some tension, mostly none.
  fx: fc.oneof(fc.constant(0), fc.constant(0), fc.integer({ min: -100, max: 25 }).map((k) => k * 1e3)),
  // Some torque, N*m (N*m/m when distributed).
  mx: fc.oneof(fc.constant(0), fc.integer({ min: -1500, max: 1500 })),
  varying: fc.boolean(),
});

function loadOf(spec: LoadSpec, length: number): LoadModel {
  if (spec.point) {
    return { kind: 'point', position: spec.at * length, fx: spec.fx, fy: spec.fy, fz: spec.fz, mx: spec.mx, my: 0, mz: 0 };
  }
  // From (1 - at) 0.9 L to a fraction span of the rest: never empty. Totals fy, fz, fx, mx over the range.
  const start = (1 - spec.at) * 0.9;
  const from = start * length;
  const to = (start + spec.span * (1 - start)) * length;
  const perLength = 1 / (to - from);
  const q = (value: number): readonly [number, number] => (spec.varying ? [0, 2 * value * perLength] : [value * perLength, value * perLength]);
  return { kind: 'distributed', from, to, qx: q(spec.fx), qy: q(spec.fy), qz: q(spec.fz), mx: q(spec.mx) };
}

/** checkMember on an engine-analysed member, or null when the engine refuses the input. */
function outcomeOf(dimensions: SectionDimensions, material: Material, length: number, layout: SupportLayout, loads: readonly LoadSpec[]): MemberCheckOutcome | null {
  try {
    const section = sectionProperties(dimensions);
    const model: MemberModel = { ...modelOf(length, supportsOf(layout, length), section, material), loads: loads.map((spec) => loadOf(spec, length)) };
    return checkMember({ analysis: analyseMember(model), model, section, dimensions, material });
  } catch (error) {
    if (error instanceof EngineError) return null;
    throw error;
  }
}

describe('checkMember verdict (property)', () => {
  it('never passes with a gap or a failure, and fails only on a failed check', () => {
    fc.assert(
      fc.property(
        dimensionsArbitrary,
        fc.constantFrom(steel, castIron),
        fc.integer({ min: 10, max: 60 }).map((decimetres) => decimetres / 10),
        fc.constantFrom<SupportLayout>('pinned-roller', 'fixed', 'fixed-roller', 'bearings'),
        fc.array(loadSpecArbitrary, { minLength: 1, maxLength: 4 }),
        (dimensions, material, length, layout, loads) => {
          const outcome = outcomeOf(dimensions, material, length, layout, loads);
          fc.pre(outcome !== null);
          if (outcome === null) return;
          const failed = outcome.checks.filter((check) => !check.passes);
          for (const check of outcome.checks) expect(check.passes).toBe(check.utilization <= 1);
          // The three laws of the brief.
          if (outcome.verdict === 'pass') {
            expect(outcome.unchecked).toEqual([]);
            expect(failed).toEqual([]);
          }
          if (outcome.verdict === 'fail') expect(failed.length).toBeGreaterThan(0);
          // And the verdict is fully determined by them (verdict.ts).
          const expected = failed.length > 0 ? 'fail' : outcome.unchecked.length > 0 ? 'not-verified' : 'pass';
          expect(outcome.verdict).toBe(expected);
        },
      ),
      { numRuns: 60 },
    );
  });
});
