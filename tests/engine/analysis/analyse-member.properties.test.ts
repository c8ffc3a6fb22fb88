/**
 * Laws every analysis must obey, on random members: global equilibrium, superposition, Maxwell-Betti
 * reciprocity, mirror symmetry, finite outputs and continuity of slope and deflection away from hinges.
 */

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseMember } from '../../../src/engine/analysis/analyse-member.js';
import { fieldAt, type Side } from '../../../src/engine/analysis/field-values.js';
import { DIAGRAM_FIELDS, type DiagramField, type MemberAnalysis } from '../../../src/engine/analysis/result.js';
import { sampleDiagrams } from '../../../src/engine/analysis/sample-diagrams.js';
import { EngineError } from '../../../src/engine/engine-error.js';
import {
  DIRECTIONS,
  type Direction,
  type LinearIntensity,
  type LoadModel,
  type MemberModel,
  type Restraint,
  type SupportModel,
} from '../../../src/engine/member/model.js';
import { DEMO_STIFFNESS, memberModel, pointLoad } from '../member/model-builders.js';

const RUNS = { numRuns: 120 };
const TOLERANCE = 1e-9;
/** 0 or 1e-3 to 1e4 of either sign (N, N/m, N*m): no subnormal numbers, whose products underflow. */
const magnitude = fc.oneof(
  fc.constant(0),
  fc.tuple(fc.boolean(), fc.double({ min: 1e-3, max: 1e4, noNaN: true })).map(([negative, v]) => (negative ? -v : v)),
);
/** A fraction in [0, 1] on a grid of 1e-6 (no subnormal positions). */
const unit = fc.integer({ min: 0, max: 1_000_000 }).map((k) => k / 1_000_000);

/** Spring stiffness per unit factor, so springs range from soft to stiff relative to the member. */
function springScale(direction: Direction, length: number): number {
  const s = DEMO_STIFFNESS;
  const scale: Record<Direction, number> = {
    ux: s.axial / length,
    rx: s.torsional / length,
    uy: s.bendingZ / length ** 3,
    uz: s.bendingY / length ** 3,
    rz: s.bendingZ / length,
    ry: s.bendingY / length,
  };
  return scale[direction];
}

const restraintChoice = fc.record({
  kind: fc.constantFrom('rigid', 'free', 'spring'),
  factor: fc.double({ min: 1, max: 1000, noNaN: true }),
});

/**
 * 2 to 6 supports on distinct points of a grid of L/50. The first holds ux and rx and the first two
 * hold uy and uz (rigidly or by springs), so every problem is stable; the rest is random.
 *
 * The grid and the spring range (1 to 1000 times the member's own stiffness) bound the conditioning:
 * rounding grows with (stiffest element / softest way the member can move), about 12 (L/h)^3 times
 * L^3/(EI) k_spring. Closer supports on softer springs lose digits in any displacement method in
 * double precision (1e-8 at L/100 and 0.1 EI/L^3); that is conditioning, not a law being broken.
 */
function supportsArbitrary(length: number): fc.Arbitrary<SupportModel[]> {
  return fc
    .uniqueArray(fc.integer({ min: 0, max: 50 }), { minLength: 2, maxLength: 6 })
    .chain((grid) =>
      fc.tuple(fc.constant(grid), fc.array(fc.array(restraintChoice, { minLength: 6, maxLength: 6 }), { minLength: grid.length, maxLength: grid.length })),
    )
    .map(([grid, choices]) =>
      grid.map((k, i) => {
        const restraints = {} as Record<Direction, Restraint>;
        DIRECTIONS.forEach((direction, d) => {
          const choice = choices[i]?.[d] as { kind: string; factor: number };
          const mustHold = (i === 0 && (direction === 'ux' || direction === 'rx')) || (i <= 1 && (direction === 'uy' || direction === 'uz'));
          const kind = choice.kind === 'free' && mustHold ? 'rigid' : choice.kind;
          restraints[direction] =
            kind === 'spring' ? { spring: choice.factor * springScale(direction, length) } : (kind as 'rigid' | 'free');
        });
        return { position: (k / 50) * length, restraints };
      }),
    );
}

function loadArbitrary(length: number): fc.Arbitrary<LoadModel> {
  const pair = fc.tuple(magnitude, magnitude) as fc.Arbitrary<LinearIntensity>;
  const point = fc
    .record({ t: unit, fx: magnitude, fy: magnitude, fz: magnitude, mx: magnitude, my: magnitude, mz: magnitude })
    .map(({ t, ...actions }) => pointLoad(t * length, actions));
  // Ranges of at least 5 % of the length: from = 0.95 a L, to = from + (0.05 + b (0.95 - 0.95 a)) L <= L.
  const distributed = fc.record({ a: unit, b: unit, qx: pair, qy: pair, qz: pair, mx: pair }).map(
    ({ a, b, ...intensities }): LoadModel => {
      const from = 0.95 * a * length;
      const to = Math.min(length, from + (0.05 + b * (0.95 - 0.95 * a)) * length);
      return { kind: 'distributed', from, to, ...intensities };
    },
  );
  return fc.oneof(point, distributed);
}

const lengthArbitrary = fc.double({ min: 1, max: 20, noNaN: true });

const memberArbitrary: fc.Arbitrary<MemberModel> = lengthArbitrary.chain((length) =>
  fc
    .tuple(supportsArbitrary(length), fc.array(loadArbitrary(length), { minLength: 1, maxLength: 6 }))
    .map(([supports, loads]) => memberModel(length, supports, loads)),
);

/** The same member under two load sets and under both together. */
const loadCasesArbitrary = lengthArbitrary.chain((length) =>
  fc.record({
    length: fc.constant(length),
    supports: supportsArbitrary(length),
    first: fc.array(loadArbitrary(length), { minLength: 1, maxLength: 4 }),
    second: fc.array(loadArbitrary(length), { minLength: 1, maxLength: 4 }),
  }),
);

/**
 * The scale rounding errors of a field are measured against: the largest internal force (moments
 * over the length) for force and moment fields, the largest displacement (rotations times the
 * length) for displacement and rotation fields, over all the given analyses. A field that should be
 * zero carries rounding noise of the size of its neighbours, not of itself.
 */
function fieldScale(field: DiagramField, ...analyses: MemberAnalysis[]): number {
  const largest = (a: MemberAnalysis, f: DiagramField) => Math.max(Math.abs(a.extremes[f].max.value), Math.abs(a.extremes[f].min.value));
  const forces = (a: MemberAnalysis) =>
    Math.max(largest(a, 'axial'), largest(a, 'shearY'), largest(a, 'shearZ'), ...(['momentZ', 'momentY', 'torque'] as const).map((f) => largest(a, f) / a.length));
  const motions = (a: MemberAnalysis) =>
    Math.max(largest(a, 'deflectionY'), largest(a, 'deflectionZ'), ...(['slopeZ', 'slopeY', 'twist'] as const).map((f) => largest(a, f) * a.length));
  const length = analyses[0]?.length as number;
  const scale: Record<DiagramField, (a: MemberAnalysis) => number> = {
    axial: forces,
    shearY: forces,
    shearZ: forces,
    momentZ: (a) => forces(a) * length,
    momentY: (a) => forces(a) * length,
    torque: (a) => forces(a) * length,
    deflectionY: motions,
    deflectionZ: motions,
    slopeZ: (a) => motions(a) / length,
    slopeY: (a) => motions(a) / length,
    twist: (a) => motions(a) / length,
  };
  return Math.max(...analyses.map(scale[field]));
}

/** Sums of forces and of moments about x = 0, computed here from the model and the reactions alone. */
function independentEquilibrium(model: MemberModel, analysis: MemberAnalysis): { force: number; moment: number } {
  const F = [0, 0, 0];
  const M = [0, 0, 0];
  let forceScale = 0;
  let momentScale = 0;
  const add = (x: number, f: number[], m: number[]): void => {
    for (let i = 0; i < 3; i++) {
      F[i] = (F[i] as number) + (f[i] as number);
      forceScale += Math.abs(f[i] as number);
      momentScale += Math.abs(m[i] as number);
    }
    // r x F with r = (x, 0, 0).
    M[0] = (M[0] as number) + (m[0] as number);
    M[1] = (M[1] as number) + (m[1] as number) - x * (f[2] as number);
    M[2] = (M[2] as number) + (m[2] as number) + x * (f[1] as number);
  };
  for (const load of model.loads) {
    if (load.kind === 'point') add(load.position, [load.fx, load.fy, load.fz], [load.mx, load.my, load.mz]);
    else {
      // A linear load is a uniform part plus a triangular part, each a point force at its centroid.
      const l = load.to - load.from;
      const uniform = (q: LinearIntensity) => q[0] * l;
      const triangle = (q: LinearIntensity) => ((q[1] - q[0]) * l) / 2;
      add(load.from + l / 2, [uniform(load.qx), uniform(load.qy), uniform(load.qz)], [uniform(load.mx), 0, 0]);
      add(load.from + (2 * l) / 3, [triangle(load.qx), triangle(load.qy), triangle(load.qz)], [triangle(load.mx), 0, 0]);
    }
  }
  for (const r of analysis.reactions) add(r.position, [r.fx, r.fy, r.fz], [r.mx, r.my, r.mz]);
  const length = model.length;
  // Forces are measured against the forces plus the moments over the length, moments against that times L.
  const ratio = (sum: number[], scale: number) => (scale > 0 ? Math.max(...sum.map(Math.abs)) / scale : 0);
  const scale = forceScale + momentScale / length;
  return { force: ratio(F, scale), moment: ratio(M, scale * length) };
}

describe('analyseMember on random members', () => {
  it('is in global equilibrium to 1e-9 of the load scale', () => {
    fc.assert(
      fc.property(memberArbitrary, (model) => {
        const analysis = analyseMember(model);
        expect(analysis.equilibrium.force).toBeLessThanOrEqual(TOLERANCE);
        expect(analysis.equilibrium.moment).toBeLessThanOrEqual(TOLERANCE);
        const own = independentEquilibrium(model, analysis);
        expect(own.force).toBeLessThanOrEqual(TOLERANCE);
        expect(own.moment).toBeLessThanOrEqual(TOLERANCE);
      }),
      RUNS,
    );
  });

  it('superposes: analyse(A + B) = analyse(A) + analyse(B), reactions and sampled fields', () => {
    fc.assert(
      fc.property(loadCasesArbitrary, ({ length, supports, first, second }) => {
        const a = analyseMember(memberModel(length, supports, first));
        const b = analyseMember(memberModel(length, supports, second));
        const ab = analyseMember(memberModel(length, supports, [...first, ...second]));
        const forceScale = a.equilibrium.forceScale + b.equilibrium.forceScale;
        ab.reactions.forEach((r, i) => {
          for (const c of ['fx', 'fy', 'fz', 'mx', 'my', 'mz'] as const) {
            const scale = c.startsWith('m') ? forceScale * length : forceScale;
            expect(Math.abs(r[c] - (a.reactions[i]?.[c] as number) - (b.reactions[i]?.[c] as number))).toBeLessThanOrEqual(
              TOLERANCE * scale,
            );
          }
        });
        const sampled = sampleDiagrams(ab, 41);
        for (const field of DIAGRAM_FIELDS) {
          let worst = 0;
          sampled.x.forEach((x, i) => {
            const side: Side = sampled.x[i + 1] === x ? 'left' : 'right';
            const expected = fieldAt(a, field, x, side) + fieldAt(b, field, x, side);
            worst = Math.max(worst, Math.abs((sampled.values[field][i] as number) - expected));
          });
          expect(worst).toBeLessThanOrEqual(TOLERANCE * fieldScale(field, a, b, ab));
        }
      }),
      RUNS,
    );
  });

  it('is reciprocal (Maxwell-Betti): P . u(at i, from Q at j) = Q . u(at j, from P at i)', () => {
    const actions = fc.record({ fy: magnitude, fz: magnitude, mx: magnitude, my: magnitude, mz: magnitude });
    fc.assert(
      fc.property(
        lengthArbitrary.chain((length) =>
          fc.record({ length: fc.constant(length), supports: supportsArbitrary(length), i: unit, j: unit, p: actions, q: actions }),
        ),
        ({ length, supports, i, j, p, q }) => {
          const xi = i * length;
          const xj = j * length;
          const fromP = analyseMember(memberModel(length, supports, [pointLoad(xi, p)]));
          const fromQ = analyseMember(memberModel(length, supports, [pointLoad(xj, q)]));
          // Right-hand motions: ry = -dw/dx (result.ts), rz = dv/dx, rx = twist.
          const motion = (a: MemberAnalysis, x: number) => ({
            fy: fieldAt(a, 'deflectionY', x),
            fz: fieldAt(a, 'deflectionZ', x),
            mx: fieldAt(a, 'twist', x),
            my: -fieldAt(a, 'slopeY', x),
            mz: fieldAt(a, 'slopeZ', x),
          });
          const field = { fy: 'deflectionY', fz: 'deflectionZ', mx: 'twist', my: 'slopeY', mz: 'slopeZ' } as const;
          // Each work is measured against the loads times the largest motions of the other analysis.
          const work = (load: typeof p, u: ReturnType<typeof motion>, other: MemberAnalysis) => {
            const keys = Object.keys(load) as (keyof typeof p)[];
            return {
              value: keys.reduce((sum, k) => sum + load[k] * u[k], 0),
              scale: keys.reduce((sum, k) => sum + Math.abs(load[k]) * fieldScale(field[k], other), 0),
            };
          };
          const pq = work(p, motion(fromQ, xi), fromQ);
          const qp = work(q, motion(fromP, xj), fromP);
          expect(Math.abs(pq.value - qp.value)).toBeLessThanOrEqual(TOLERANCE * (pq.scale + qp.scale));
        },
      ),
      RUNS,
    );
  });

  it('is mirror-symmetric: turning the member end for end (180 degrees about y) mirrors every result', () => {
    // The turn maps x -> L - x, y -> y, z -> -z; vectors (forces and moments) flip their x and z parts.
    const fieldSign: Record<DiagramField, number> = {
      axial: 1,
      shearY: -1,
      momentZ: 1,
      shearZ: 1,
      momentY: -1,
      torque: 1,
      deflectionY: 1,
      slopeZ: -1,
      deflectionZ: -1,
      slopeY: 1,
      twist: -1,
    };
    const negate = ([a, b]: LinearIntensity): LinearIntensity => [-b, -a];
    const reverse = ([a, b]: LinearIntensity): LinearIntensity => [b, a];
    const turned = (model: MemberModel): MemberModel => ({
      ...model,
      supports: model.supports.map((s) => ({ position: model.length - s.position, restraints: s.restraints })),
      loads: model.loads.map((load): LoadModel =>
        load.kind === 'point'
          ? { ...load, position: model.length - load.position, fx: -load.fx, fz: -load.fz, mx: -load.mx, mz: -load.mz }
          : {
              ...load,
              from: model.length - load.to,
              to: model.length - load.from,
              qx: negate(load.qx),
              qy: reverse(load.qy),
              qz: negate(load.qz),
              mx: negate(load.mx),
            },
      ),
    });
    fc.assert(
      fc.property(memberArbitrary, fc.array(unit, { minLength: 5, maxLength: 5 }), (model, probes) => {
        const a = analyseMember(model);
        const b = analyseMember(turned(model));
        const L = model.length;
        const { forceScale, momentScale } = a.equilibrium;
        a.reactions.forEach((r, i) => {
          const t = b.reactions[i] as typeof r;
          expect(Math.abs(t.fx + r.fx)).toBeLessThanOrEqual(TOLERANCE * forceScale);
          expect(Math.abs(t.fy - r.fy)).toBeLessThanOrEqual(TOLERANCE * forceScale);
          expect(Math.abs(t.fz + r.fz)).toBeLessThanOrEqual(TOLERANCE * forceScale);
          expect(Math.abs(t.mx + r.mx)).toBeLessThanOrEqual(TOLERANCE * momentScale);
          expect(Math.abs(t.my - r.my)).toBeLessThanOrEqual(TOLERANCE * momentScale);
          expect(Math.abs(t.mz + r.mz)).toBeLessThanOrEqual(TOLERANCE * momentScale);
        });
        for (const probe of probes) {
          const x = probe * L;
          for (const field of DIAGRAM_FIELDS) {
            const mirrored = fieldSign[field] * fieldAt(a, field, x, 'right');
            expect(Math.abs(fieldAt(b, field, L - x, 'left') - mirrored)).toBeLessThanOrEqual(
              TOLERANCE * fieldScale(field, a, b),
            );
          }
        }
      }),
      RUNS,
    );
  });

  it('gives finite outputs, continuous slope and deflection away from hinges, and no moment at hinges', () => {
    const withHinges = memberArbitrary.chain((model) =>
      fc.array(unit, { maxLength: 2 }).map((hinges) => ({ ...model, hinges: hinges.map((t) => ({ position: t * model.length })) })),
    );
    fc.assert(
      fc.property(withHinges, (model) => {
        let analysis: MemberAnalysis;
        try {
          analysis = analyseMember(model);
        } catch (error) {
          expect(error).toBeInstanceOf(EngineError);
          expect((error as EngineError).kind).toBe('unstable-member');
          return;
        }
        const numbers = [
          ...analysis.pieces.flatMap((piece) => DIAGRAM_FIELDS.flatMap((f) => piece.fields[f])),
          ...analysis.reactions.flatMap((r) => Object.values(r)),
          ...DIAGRAM_FIELDS.flatMap((f) => [analysis.extremes[f].max.value, analysis.extremes[f].min.value]),
          analysis.equilibrium.force,
          analysis.equilibrium.moment,
        ];
        expect(numbers.every(Number.isFinite)).toBe(true);
        const hingeAt = (x: number) => model.hinges.some((h) => Math.abs(h.position - x) <= 1e-9 * model.length);
        for (const x of analysis.nodes.slice(1, -1)) {
          const continuous: DiagramField[] = hingeAt(x) ? ['deflectionY', 'deflectionZ', 'twist'] : ['deflectionY', 'deflectionZ', 'slopeZ', 'slopeY', 'twist'];
          for (const field of continuous) {
            const jump = fieldAt(analysis, field, x, 'right') - fieldAt(analysis, field, x, 'left');
            expect(Math.abs(jump)).toBeLessThanOrEqual(TOLERANCE * fieldScale(field, analysis));
          }
          if (hingeAt(x)) {
            for (const field of ['momentZ', 'momentY'] as const) {
              for (const side of ['left', 'right'] as const) {
                expect(Math.abs(fieldAt(analysis, field, x, side))).toBeLessThanOrEqual(TOLERANCE * fieldScale(field, analysis));
              }
            }
          }
        }
      }),
      RUNS,
    );
  });
});
