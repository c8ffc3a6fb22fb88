/**
 * Closed-form beam, bar and shaft cases through the whole analysis, plus mechanisms. Handbook case
 * numbers are quoted from memory (no copy at hand); every formula is also derived beside it.
 */

import { describe, expect, it } from 'vitest';
import { analyseMember } from '../../../src/engine/analysis/analyse-member.js';
import { fieldAt } from '../../../src/engine/analysis/field-values.js';
import { EngineError } from '../../../src/engine/engine-error.js';
import type { MemberModel } from '../../../src/engine/member/model.js';
import {
  DEMO_STIFFNESS,
  distributedLoad,
  fixedAt,
  memberModel,
  pinnedAt,
  pointLoad,
  rollerAt,
  supportAt,
} from '../member/model-builders.js';

const EIz = DEMO_STIFFNESS.bendingZ;
const EIy = DEMO_STIFFNESS.bendingY;
const EA = DEMO_STIFFNESS.axial;
const GJ = DEMO_STIFFNESS.torsional;
const L = 6;
const w = 10e3;
const P = 12e3;

function expectClose(actual: number, expected: number, scale = Math.abs(expected)): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(1e-9 * scale);
}

function mechanismOf(model: MemberModel): { error: EngineError } {
  try {
    analyseMember(model);
  } catch (error) {
    if (error instanceof EngineError) return { error };
    throw error;
  }
  throw new Error('expected the member to be unstable');
}

describe('analyseMember: vertical plane closed forms', () => {
  it('simple span, uniform load: R = wL/2, M = wL^2/8, deflection 5wL^4/(384EI), end slope wL^3/(24EI)', () => {
    // Roark 8th ed. Table 8.1 case 2e with a full-length uniform load; AISC Manual Table 3-23 case 1.
    const a = analyseMember(memberModel(L, [pinnedAt(0), rollerAt(L)], [distributedLoad(0, L, { qy: -w })]));
    expectClose(a.reactions[0]?.fy as number, (w * L) / 2);
    expectClose(a.reactions[1]?.fy as number, (w * L) / 2);
    expectClose(a.extremes.momentZ.max.value, (w * L * L) / 8);
    expectClose(a.extremes.momentZ.max.position, L / 2);
    expectClose(a.extremes.deflectionY.min.value, (-5 * w * L ** 4) / (384 * EIz));
    expectClose(a.extremes.deflectionY.min.position, L / 2);
    expectClose(fieldAt(a, 'slopeZ', 0), (-w * L ** 3) / (24 * EIz));
    expectClose(a.extremes.shearY.min.value, (-w * L) / 2);
    expect(a.extremes.momentZ.min).toEqual({ value: 0, position: 0 });
  });

  it('cantilever, tip load: deflection PL^3/(3EI), slope PL^2/(2EI), root moment -PL', () => {
    // AISC Table 3-23 case 22; Roark Table 8.1 case 1a with the load at the free end.
    const a = analyseMember(memberModel(L, [fixedAt(0)], [pointLoad(L, { fy: -P })]));
    expectClose(a.reactions[0]?.fy as number, P);
    // Moments of the load and reaction about x = 0: mz - P L = 0.
    expectClose(a.reactions[0]?.mz as number, P * L);
    expectClose(fieldAt(a, 'momentZ', 0), -P * L);
    expectClose(fieldAt(a, 'deflectionY', L), (-P * L ** 3) / (3 * EIz));
    expectClose(fieldAt(a, 'slopeZ', L), (-P * L ** 2) / (2 * EIz));
    expectClose(a.extremes.deflectionY.min.value, (-P * L ** 3) / (3 * EIz));
  });

  it('fixed both ends, uniform load: -wL^2/12 at the ends, wL^2/24 at mid-span, deflection wL^4/(384EI)', () => {
    // AISC Table 3-23 case 15; Roark Table 8.1 case 2d.
    const a = analyseMember(memberModel(L, [fixedAt(0), fixedAt(L)], [distributedLoad(0, L, { qy: -w })]));
    expectClose(fieldAt(a, 'momentZ', 0), (-w * L * L) / 12);
    expectClose(fieldAt(a, 'momentZ', L), (-w * L * L) / 12);
    expectClose(a.extremes.momentZ.max.value, (w * L * L) / 24);
    expectClose(a.extremes.deflectionY.min.value, (-w * L ** 4) / (384 * EIz));
    // The left clamp turns the member counter-clockwise (+z) against the load, the right one clockwise.
    expectClose(a.reactions[0]?.mz as number, (w * L * L) / 12);
    expectClose(a.reactions[1]?.mz as number, (-w * L * L) / 12);
    expectClose(a.reactions[0]?.fy as number, (w * L) / 2);
  });

  it('fixed both ends, point load at a: M_A = -Pab^2/L^2, M_B = -Pa^2b/L^2, R_A = Pb^2(3a + b)/L^3', () => {
    // AISC Table 3-23 case 18; Roark Table 8.1 case 1d. The load sits inside the single element.
    const a0 = 2;
    const b0 = L - a0;
    const a = analyseMember(memberModel(L, [fixedAt(0), fixedAt(L)], [pointLoad(a0, { fy: -P })]));
    expectClose(fieldAt(a, 'momentZ', 0), (-P * a0 * b0 * b0) / L ** 2);
    expectClose(fieldAt(a, 'momentZ', L), (-P * a0 * a0 * b0) / L ** 2);
    expectClose(a.reactions[0]?.fy as number, (P * b0 * b0 * (3 * a0 + b0)) / L ** 3);
    expectClose(a.reactions[1]?.fy as number, (P * a0 * a0 * (a0 + 3 * b0)) / L ** 3);
    // Deflection under the load: P a^3 b^3 / (3 EI L^3) (same case).
    expectClose(fieldAt(a, 'deflectionY', a0), (-P * a0 ** 3 * b0 ** 3) / (3 * EIz * L ** 3));
  });

  it('propped cantilever, uniform load: R = 5wL/8 and 3wL/8, M = -wL^2/8 at the wall, 9wL^2/128 in the span', () => {
    // AISC Table 3-23 case 12; the positive maximum is 3L/8 from the roller.
    const a = analyseMember(memberModel(L, [fixedAt(0), rollerAt(L)], [distributedLoad(0, L, { qy: -w })]));
    expectClose(a.reactions[0]?.fy as number, (5 * w * L) / 8);
    expectClose(a.reactions[1]?.fy as number, (3 * w * L) / 8);
    expectClose(a.extremes.momentZ.min.value, (-w * L * L) / 8);
    expect(a.extremes.momentZ.min.position).toBe(0);
    expectClose(a.extremes.momentZ.max.value, (9 * w * L * L) / 128);
    expectClose(a.extremes.momentZ.max.position, (5 * L) / 8);
  });

  it('two equal continuous spans, uniform load: end reactions 3wL/8, middle 10wL/8, -wL^2/8 over it', () => {
    // AISC Table 3-23 case 29.
    const a = analyseMember(
      memberModel(2 * L, [pinnedAt(0), rollerAt(L), rollerAt(2 * L)], [distributedLoad(0, 2 * L, { qy: -w })]),
    );
    expectClose(a.reactions[0]?.fy as number, (3 * w * L) / 8);
    expectClose(a.reactions[1]?.fy as number, (10 * w * L) / 8);
    expectClose(a.reactions[2]?.fy as number, (3 * w * L) / 8);
    expectClose(a.extremes.momentZ.min.value, (-w * L * L) / 8);
    expectClose(a.extremes.momentZ.min.position, L);
  });

  it('simple span, point moment: reactions mz/L, a jump of -mz in M, end slope mz(2L^2 - 6aL + 3a^2)/(6EIL)', () => {
    // Roark Table 8.1 case 3e. Statics: sum of moments about 0 gives R_B = -mz/L; the slope at A is
    // the virtual work of M with the unit couple's moment x/L - 1.
    const mz = 9e3;
    const a0 = 2;
    const a = analyseMember(memberModel(L, [pinnedAt(0), rollerAt(L)], [pointLoad(a0, { mz })]));
    expectClose(a.reactions[0]?.fy as number, mz / L);
    expectClose(a.reactions[1]?.fy as number, -mz / L);
    expectClose(fieldAt(a, 'momentZ', a0, 'left'), (mz * a0) / L);
    expectClose(fieldAt(a, 'momentZ', a0, 'right'), (-mz * (L - a0)) / L);
    expectClose(fieldAt(a, 'slopeZ', 0), (mz * (2 * L * L - 6 * a0 * L + 3 * a0 * a0)) / (6 * EIz * L));
  });

  it('simple span, load rising linearly to W total: R = W/3 and 2W/3, M_max = 2WL/(9 sqrt 3) at L/sqrt 3', () => {
    // AISC Table 3-23 case 2. Integrating EI v'''' = -w x / L: v = -w x (7L^4 - 10L^2 x^2 + 3x^4) / (360 EI L),
    // whose slope vanishes at x = L sqrt(1 - sqrt(8/15)).
    const a = analyseMember(memberModel(L, [pinnedAt(0), rollerAt(L)], [distributedLoad(0, L, { qy: [0, -w] })]));
    const W = (w * L) / 2;
    expectClose(a.reactions[0]?.fy as number, W / 3);
    expectClose(a.reactions[1]?.fy as number, (2 * W) / 3);
    expectClose(a.extremes.momentZ.max.value, (2 * W * L) / (9 * Math.sqrt(3)));
    expectClose(a.extremes.momentZ.max.position, L / Math.sqrt(3));
    const xMax = L * Math.sqrt(1 - Math.sqrt(8 / 15));
    const vMax = (-w * xMax * (7 * L ** 4 - 10 * L * L * xMax * xMax + 3 * xMax ** 4)) / (360 * EIz * L);
    expectClose(a.extremes.deflectionY.min.value, vMax);
    expect(Math.abs(a.extremes.deflectionY.min.position - xMax)).toBeLessThanOrEqual(1e-7 * L);
  });

  it('a spring support adds its settlement: mid-span deflection PL^3/(48EI) + (P/2)/(2k)', () => {
    // Statically determinate: each support takes P/2; the spring settles (P/2)/k, half of which shows at mid-span.
    const k = 2e6;
    const a = analyseMember(
      memberModel(L, [pinnedAt(0), supportAt(L, { uy: { spring: k }, uz: 'rigid' })], [pointLoad(L / 2, { fy: -P })]),
    );
    expectClose(a.reactions[1]?.fy as number, P / 2);
    expectClose(fieldAt(a, 'deflectionY', L), -P / 2 / k);
    expectClose(fieldAt(a, 'deflectionY', L / 2), -(P * L ** 3) / (48 * EIz) - P / 2 / k / 2);
  });

  it('a rotational spring at a cantilever root adds P L^2 / k_r to the tip deflection', () => {
    // The root moment P L turns the spring by P L / k_r, which swings the tip by L times that.
    const kr = 5e6;
    const root = supportAt(0, { ux: 'rigid', uy: 'rigid', uz: 'rigid', rx: 'rigid', ry: 'rigid', rz: { spring: kr } });
    const a = analyseMember(memberModel(L, [root], [pointLoad(L, { fy: -P })]));
    expectClose(fieldAt(a, 'deflectionY', L), (-P * L ** 3) / (3 * EIz) - (P * L * L) / kr);
    expectClose(a.reactions[0]?.mz as number, P * L);
  });

  it('a Gerber beam (fixed, hinge at 2 m, roller) is stable and statically determinate', () => {
    // The 4 m drop-in span rests on the hinge and the roller: 2w each. The 2 m cantilever then carries
    // its own 2w plus 2w at its tip: root moment -(w 2^2/2 + 2w 2) = -6w; deflection at the hinge
    // w a^4/(8EI) + 2w a^3/(3EI) = 22w/(3EI) (AISC Table 3-23 cases 19 and 22 added).
    const a = analyseMember(
      memberModel(L, [fixedAt(0), rollerAt(L)], [distributedLoad(0, L, { qy: -w })], { hinges: [2] }),
    );
    expectClose(a.reactions[0]?.fy as number, 4 * w);
    expectClose(a.reactions[1]?.fy as number, 2 * w);
    expectClose(a.reactions[0]?.mz as number, 6 * w);
    expectClose(fieldAt(a, 'momentZ', 0), -6 * w);
    expect(Math.abs(fieldAt(a, 'momentZ', 2, 'left'))).toBeLessThanOrEqual(1e-9 * 6 * w);
    expect(Math.abs(fieldAt(a, 'momentZ', 2, 'right'))).toBeLessThanOrEqual(1e-9 * 6 * w);
    expectClose(a.extremes.momentZ.max.value, (w * 4 * 4) / 8);
    expectClose(a.extremes.momentZ.max.position, 4);
    const hingeDeflection = (-22 * w) / (3 * EIz);
    expectClose(fieldAt(a, 'deflectionY', 2, 'left'), hingeDeflection);
    expectClose(fieldAt(a, 'deflectionY', 2, 'right'), hingeDeflection);
    // The slope jumps at the hinge: left, the cantilever's -(w a^3/6 + 2w a^2/2)/EI = -(16w/3)/EI;
    // right, the drop-in span turns rigidly by the hinge drop over 4 m plus its own -w 4^3/(24EI).
    expectClose(fieldAt(a, 'slopeZ', 2, 'left'), (-16 * w) / (3 * EIz));
    expectClose(fieldAt(a, 'slopeZ', 2, 'right'), -hingeDeflection / 4 - (w * 64) / (24 * EIz));
  });
});

describe('analyseMember: horizontal plane, axial bar and shaft', () => {
  it('the horizontal plane mirrors the vertical one: simple span under qz', () => {
    // As the vertical case with z for y: fz = wL/2, momentY = wL^2/8 (fibre at -z in tension).
    const a = analyseMember(memberModel(L, [pinnedAt(0), rollerAt(L)], [distributedLoad(0, L, { qz: -w })]));
    expectClose(a.reactions[0]?.fz as number, (w * L) / 2);
    expectClose(a.extremes.momentY.max.value, (w * L * L) / 8);
    expectClose(a.extremes.deflectionZ.min.value, (-5 * w * L ** 4) / (384 * EIy));
    expectClose(fieldAt(a, 'slopeY', 0), (-w * L ** 3) / (24 * EIy));
    expect(a.extremes.momentZ.max.value).toBe(0);
  });

  it('fixed both ends under qz: the right-hand reaction my is minus the vertical case mz', () => {
    // Vertical: mz(0) = wL^2/12 for qy = -w. In the x-z frame the clamp couple is the same, and
    // my = -(frame couple) because the frame's rotation dw/dx is -ry.
    const a = analyseMember(memberModel(L, [fixedAt(0), fixedAt(L)], [distributedLoad(0, L, { qz: -w })]));
    expectClose(a.reactions[0]?.my as number, (-w * L * L) / 12);
    expectClose(a.reactions[1]?.my as number, (w * L * L) / 12);
    expectClose(fieldAt(a, 'momentY', 0), (-w * L * L) / 12);
  });

  it('a tip moment my on a cantilever: momentY = -my, slopeY = -my L/EIy, deflectionZ = -my L^2/(2EIy)', () => {
    // A right-hand my > 0 at the tip turns it by ry = my L / EIy, so dw/dx = -ry and w = -my L^2/(2 EIy).
    const my = 4e3;
    const a = analyseMember(memberModel(L, [fixedAt(0)], [pointLoad(L, { my })]));
    expectClose(fieldAt(a, 'momentY', L / 2), -my);
    expectClose(fieldAt(a, 'slopeY', L), (-my * L) / EIy);
    expectClose(fieldAt(a, 'deflectionZ', L), (-my * L * L) / (2 * EIy));
    expectClose(a.reactions[0]?.my as number, -my);
    // The vertical twin: a counter-clockwise mz bends the tip up.
    const b = analyseMember(memberModel(L, [fixedAt(0)], [pointLoad(L, { mz: my })]));
    expectClose(fieldAt(b, 'momentZ', L / 2), my);
    expectClose(fieldAt(b, 'deflectionY', L), (my * L * L) / (2 * EIz));
    expectClose(b.reactions[0]?.mz as number, -my);
  });

  it('a rotational spring on ry at a cantilever root: my = P L and P L^2 / k more tip deflection', () => {
    // Sum of moments about the root: my - L fz = 0. The spring turns by ry = -P L / k (dw/dx = -ry),
    // which swings the tip by P L^2 / k towards +z, the way the load pushes.
    const k = 3e5;
    const root = supportAt(0, { ux: 'rigid', uy: 'rigid', uz: 'rigid', rx: 'rigid', ry: { spring: k }, rz: 'rigid' });
    const a = analyseMember(memberModel(L, [root], [pointLoad(L, { fz: P })]));
    expectClose(a.reactions[0]?.my as number, P * L);
    expectClose(a.reactions[0]?.fz as number, -P);
    expectClose(fieldAt(a, 'deflectionZ', L), (P * L ** 3) / (3 * EIy) + (P * L * L) / k);
    expectClose(fieldAt(a, 'slopeY', 0), (P * L) / k);
  });

  it('a bar fixed at both ends with an axial load at a: reactions -P(L - a)/L and -Pa/L', () => {
    // Compatibility: N_left a / EA + N_right (L - a) / EA = 0 with N_left - N_right = P.
    const a0 = 2;
    const a = analyseMember(memberModel(L, [fixedAt(0), fixedAt(L)], [pointLoad(a0, { fx: P })]));
    expectClose(a.reactions[0]?.fx as number, (-P * (L - a0)) / L);
    expectClose(a.reactions[1]?.fx as number, (-P * a0) / L);
    expectClose(fieldAt(a, 'axial', 1), (P * (L - a0)) / L);
    expectClose(fieldAt(a, 'axial', 4), (-P * a0) / L);
    // Mid-span load: halves.
    const half = analyseMember(memberModel(L, [fixedAt(0), fixedAt(L)], [pointLoad(L / 2, { fx: P })]));
    expectClose(half.reactions[0]?.fx as number, -P / 2);
    expectClose(half.reactions[1]?.fx as number, -P / 2);
  });

  it('an axial spring at the far end takes P k / (k + EA/L) of an end load', () => {
    // The bar (stiffness EA/L) and the spring carry the end load in parallel, in proportion to stiffness.
    const k = 2e7;
    const a = analyseMember(
      memberModel(L, [fixedAt(0), supportAt(L, { ux: { spring: k }, uy: 'rigid', uz: 'rigid' })], [pointLoad(L, { fx: P })]),
    );
    expectClose(a.reactions[1]?.fx as number, (-P * k) / (k + EA / L));
    expectClose(a.reactions[0]?.fx as number, (-P * (EA / L)) / (k + EA / L));
    expectClose(fieldAt(a, 'axial', L / 2), (P * (EA / L)) / (k + EA / L));
  });

  it('a bar under a uniform axial load towards its wall: N = -q (L - x), no bending', () => {
    // qx = -q pushes every slice towards the wall at 0: dN/dx = -qx = q and N(L) = 0, so N = -q (L - x).
    const q = 3e3;
    const a = analyseMember(memberModel(L, [fixedAt(0)], [distributedLoad(0, L, { qx: -q })]));
    expectClose(fieldAt(a, 'axial', 0), -q * L);
    expectClose(fieldAt(a, 'axial', 2), -q * (L - 2));
    expectClose(a.reactions[0]?.fx as number, q * L);
    expect(a.extremes.shearY.max.value).toBe(0);
  });

  it('a shaft fixed at both ends with a torque at a: reactions -T(L - a)/L and -Ta/L, twist Ta(L - a)/(GJ L)', () => {
    // The torsional twin of the axial bar: compatibility of the two twists.
    const T = 800;
    const a0 = 1.5;
    const a = analyseMember(memberModel(L, [fixedAt(0), fixedAt(L)], [pointLoad(a0, { mx: T })]));
    expectClose(a.reactions[0]?.mx as number, (-T * (L - a0)) / L);
    expectClose(a.reactions[1]?.mx as number, (-T * a0) / L);
    expectClose(fieldAt(a, 'torque', 1), (T * (L - a0)) / L);
    expectClose(fieldAt(a, 'twist', a0), (T * a0 * (L - a0)) / (GJ * L));
    expectClose(a.extremes.twist.max.value, (T * a0 * (L - a0)) / (GJ * L));
  });

  it('a cantilever shaft under a uniform torque: twist m L^2 / (2 GJ) at the tip', () => {
    // T(x) = m (L - x); twist = integral of T / GJ = m (L x - x^2/2) / GJ.
    const m = 100;
    const a = analyseMember(memberModel(L, [fixedAt(0)], [distributedLoad(0, L, { mx: m })]));
    expectClose(fieldAt(a, 'torque', 0), m * L);
    expectClose(fieldAt(a, 'twist', L), (m * L * L) / (2 * GJ));
    expectClose(a.reactions[0]?.mx as number, -m * L);
  });

  it('an axial load on rollers-only supports needs no ux restraint when it is absent', () => {
    // Rollers hold uy and uz only; without axial loads the axial problem is empty, not a mechanism.
    const a = analyseMember(memberModel(L, [rollerAt(0), rollerAt(L)], [pointLoad(3, { fy: -P })]));
    expect(a.extremes.axial.max.value).toBe(0);
    expect(a.reactions.every((r) => r.fx === 0)).toBe(true);
  });
});

describe('analyseMember: mechanisms', () => {
  it('rollers only under an axial load: unstable in ux', () => {
    const { error } = mechanismOf(memberModel(L, [rollerAt(0), rollerAt(L)], [pointLoad(3, { fx: P })]));
    expect(error.kind).toBe('unstable-member');
    expect(error.path).toEqual(['member', 'supports']);
    // The whole member slides: every node moves alike, the first is reported.
    expect(error.details).toEqual({ direction: 'ux', position: 0 });
  });

  it('a single pin under a transverse load: unstable in uy, largest at the far end', () => {
    const { error } = mechanismOf(memberModel(L, [pinnedAt(0)], [pointLoad(3, { fy: -P })]));
    expect(error.details).toEqual({ direction: 'uy', position: L });
  });

  it('a hinge inside a simple span: unstable in uy at the hinge', () => {
    const { error } = mechanismOf(
      memberModel(L, [pinnedAt(0), rollerAt(L)], [pointLoad(3, { fy: -P })], { hinges: [2.5] }),
    );
    expect(error.details).toEqual({ direction: 'uy', position: 2.5 });
  });

  it('a hinge at the root of a cantilever releases the wall: unstable', () => {
    const { error } = mechanismOf(memberModel(L, [fixedAt(0)], [pointLoad(L, { fy: -P })], { hinges: [0] }));
    expect(error.details).toEqual({ direction: 'uy', position: L });
  });

  it('two hinges in a propped cantilever: unstable', () => {
    const { error } = mechanismOf(
      memberModel(L, [fixedAt(0), rollerAt(L)], [distributedLoad(0, L, { qy: -w })], { hinges: [2, 4] }),
    );
    expect(error.details).toMatchObject({ direction: 'uy' });
  });

  it('a member held only in y under a z load: unstable in uz', () => {
    const yOnly = (x: number) => supportAt(x, { ux: 'rigid', uy: 'rigid', rx: 'rigid' });
    const { error } = mechanismOf(memberModel(L, [yOnly(0), yOnly(L)], [pointLoad(3, { fz: P })]));
    expect(error.details).toMatchObject({ direction: 'uz' });
  });

  it('a torque with no twist restraint: unstable in rx', () => {
    const { error } = mechanismOf(memberModel(L, [rollerAt(0), rollerAt(L)], [pointLoad(3, { mx: 100 })]));
    expect(error.details).toEqual({ direction: 'rx', position: 0 });
  });

  it('a point moment exactly at a hinge cannot be carried', () => {
    const { error } = mechanismOf(
      memberModel(L, [fixedAt(0), rollerAt(L)], [pointLoad(1, { fy: -P }), pointLoad(2, { mz: 500 })], { hinges: [2] }),
    );
    expect(error.path).toEqual(['loads', 1, 'mz']);
    expect(error.details).toEqual({ direction: 'rz', position: 2 });
  });

  it('a hinge beside a support of a stable Gerber beam is fine, and its moment is zero', () => {
    const a = analyseMember(
      memberModel(L, [fixedAt(0), rollerAt(L)], [pointLoad(5, { fy: -P })], { hinges: [L - 0.5] }),
    );
    expect(Math.abs(fieldAt(a, 'momentZ', L - 0.5))).toBeLessThanOrEqual(1e-9 * P * L);
    // The drop-in span [5.5, 6] carries nothing; the load at 5 sits on the cantilever: R = P, M = -5P.
    expectClose(a.reactions[0]?.fy as number, P);
    expectClose(a.reactions[0]?.mz as number, 5 * P);
    expect(a.reactions[1]?.fy).toBe(0);
  });
});
