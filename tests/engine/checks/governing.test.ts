import { describe, expect, it } from 'vitest';
import { checkMember } from '../../../src/engine/checks/check-member.js';
import { failureCheck } from '../../../src/engine/checks/failure-check.js';
import type { FailureMode } from '../../../src/engine/checks/failure-mode.js';
import { governingFailure } from '../../../src/engine/checks/governing.js';
import { uniformMoment } from './fixtures/analyses.js';
import { inputOf } from './fixtures/inputs.js';
import { steel } from './fixtures/materials.js';
import { rectangle, round } from './fixtures/sections.js';

const check = (mode: FailureMode, demand: number) =>
  failureCheck({ mode, quantity: 'stress', demand, capacity: 100, requiredSafetyFactor: 1, position: 1, location: null, basis: 'test' });

describe('governingFailure', () => {
  it('picks the highest utilization', () => {
    expect(governingFailure([check('bending', 40), check('shear', 70), check('combined', 60)])?.mode).toBe('shear');
  });

  it('breaks a tie within 1e-9 by the order of FAILURE_MODES, simpler modes first', () => {
    expect(governingFailure([check('combined', 50), check('bending', 50 * (1 - 1e-12))])?.mode).toBe('bending');
    expect(governingFailure([check('combined', 50 * (1 + 1e-6)), check('bending', 50)])?.mode).toBe('combined');
    expect(governingFailure([check('twist', 50), check('deflection', 50)])?.mode).toBe('deflection');
  });

  it('is null when no check has any demand', () => {
    expect(governingFailure([check('bending', 0), check('shear', 0)])).toBeNull();
    expect(governingFailure([])).toBeNull();
  });
});

describe('the tie rule through checkMember', () => {
  it('names pure bending as bending, not combined, though von Mises gives the same stress', () => {
    // Uniform moment, no shear or torsion: von Mises = |sigma| at the fibres, so combined ties with bending.
    const section = rectangle(0.1, 0.2);
    const outcome = checkMember(inputOf({ analysis: uniformMoment(1.5, 150e3, steel.elasticModulus * section.secondMomentZ), section, material: steel }));
    const bending = outcome.checks.find((c) => c.mode === 'bending');
    const combined = outcome.checks.find((c) => c.mode === 'combined');
    expect(combined?.utilization).toBeCloseTo(bending?.utilization ?? 0, 12);
    expect(outcome.governing?.mode).toBe('bending');
  });

  it('names combined once torsion adds to the bending stress', () => {
    const shaft = round(0.04);
    const analysis = uniformMoment(0.5, 1000, steel.elasticModulus * shaft.secondMomentZ, { torque: [800] });
    const outcome = checkMember(inputOf({ analysis, section: shaft, material: steel }));
    expect(outcome.governing?.mode).toBe('combined');
    expect(outcome.governing?.utilization).toBeCloseTo((193.62e6 * 1.5) / 355e6, 3);
  });
});
