import { describe, expect, it } from 'vitest';
import { equilibriumResidual, equilibriumScales } from '../../../src/engine/analysis/equilibrium.js';
import type { SupportReaction } from '../../../src/engine/analysis/result.js';
import { distributedLoad, memberModel, pinnedAt, pointLoad, rollerAt } from '../member/model-builders.js';

const reaction = (position: number, actions: Partial<Omit<SupportReaction, 'position'>>): SupportReaction => ({
  position,
  fx: 0,
  fy: 0,
  fz: 0,
  mx: 0,
  my: 0,
  mz: 0,
  ...actions,
});

describe('equilibriumResidual', () => {
  it('is zero for the statics of a simple span under a triangular load', () => {
    // q rising from 0 to -3 over [0, 6]: W = -9 at x = 4, so R_A = 3 and R_B = 6 (statics).
    const model = memberModel(6, [pinnedAt(0), rollerAt(6)], [distributedLoad(0, 6, { qy: [0, -3] })]);
    const residual = equilibriumResidual(model, [reaction(0, { fy: 3 }), reaction(6, { fy: 6 })]);
    expect(residual.force).toBe(0);
    expect(residual.moment).toBe(0);
    // Scales: |loads| + |reactions| = 9 + 9 = 18 N, times the length 108 N*m.
    expect(residual.forceScale).toBe(18);
    expect(residual.momentScale).toBe(108);
  });

  it('measures a wrong reaction against the scale', () => {
    // A 10 N load at 2 m held by 9 N at 0: 1 N short (of 19 N), and 20 - 0 = 20 N*m of moment short.
    const model = memberModel(4, [pinnedAt(0)], [pointLoad(2, { fy: -10 })]);
    const residual = equilibriumResidual(model, [reaction(0, { fy: 9 })]);
    expect(residual.force).toBeCloseTo(1 / 19, 15);
    expect(residual.moment).toBeCloseTo(20 / (19 * 4), 15);
  });

  it('sums moments about x = 0 by the right-hand rule: r x F = (0, -x fz, x fy)', () => {
    // fz = 5 N at x = 2 gives my = -10 about the origin; a reaction couple my = +10 and fz = -5 at 0 balance it.
    const model = memberModel(4, [pinnedAt(0)], [pointLoad(2, { fz: 5 })]);
    const balanced = equilibriumResidual(model, [reaction(0, { fz: -5, my: 10 })]);
    expect(balanced.moment).toBe(0);
    const flipped = equilibriumResidual(model, [reaction(0, { fz: -5, my: -10 })]);
    expect(flipped.moment).toBeGreaterThan(0.1);
  });

  it('keeps a scale for a member loaded only by couples and is 0 with no loads at all', () => {
    const couples = memberModel(2, [pinnedAt(0)], [pointLoad(1, { mz: 4 })]);
    // Force scale = |mz| / L + |reaction mz| / L = 4.
    expect(equilibriumScales(couples, [reaction(0, { mz: -4 })]).forceScale).toBe(4);
    const empty = equilibriumResidual(memberModel(2, [pinnedAt(0)], []), [reaction(0, {})]);
    expect(empty).toEqual({ force: 0, moment: 0, forceScale: 0, momentScale: 0 });
  });
});
