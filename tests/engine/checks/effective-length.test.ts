import { describe, expect, it } from 'vitest';
import {
  effectiveLengthFactorFor,
  effectiveLengthFactorFromSupports,
  resolveEffectiveLengthFactor,
} from '../../../src/engine/checks/effective-length.js';
import { FIXED, modelOf, PIN, ROLLER, support } from './fixtures/analyses.js';
import { steel } from './fixtures/materials.js';
import { rectangle } from './fixtures/sections.js';

const section = rectangle(0.1, 0.2);
const model = (supports: Parameters<typeof modelOf>[1]) => modelOf(3, supports, section, steel);

describe('effectiveLengthFactorFor', () => {
  it('gives the theoretical K: 0.5, 0.7, 1.0, 2.0 (AISC 360-16 Commentary Table C-A-7.1, from memory)', () => {
    expect(effectiveLengthFactorFor('fixed-fixed')).toBe(0.5);
    expect(effectiveLengthFactorFor('fixed-pinned')).toBe(0.7);
    expect(effectiveLengthFactorFor('pinned-pinned')).toBe(1.0);
    expect(effectiveLengthFactorFor('fixed-free')).toBe(2.0);
  });

  it('gives the recommended design K: 0.65, 0.80, 1.0, 2.1 (same table, from memory)', () => {
    expect(effectiveLengthFactorFor('fixed-fixed', true)).toBe(0.65);
    expect(effectiveLengthFactorFor('fixed-pinned', true)).toBe(0.8);
    expect(effectiveLengthFactorFor('pinned-pinned', true)).toBe(1.0);
    expect(effectiveLengthFactorFor('fixed-free', true)).toBe(2.1);
  });
});

describe('effectiveLengthFactorFromSupports', () => {
  it('reads the idealised end conditions from supports at the two ends', () => {
    expect(effectiveLengthFactorFromSupports(model([support(0, PIN), support(3, ROLLER)]), 'z').factor).toBe(1);
    expect(effectiveLengthFactorFromSupports(model([support(0, FIXED), support(3, ROLLER)]), 'z').factor).toBe(0.7);
    expect(effectiveLengthFactorFromSupports(model([support(0, FIXED), support(3, FIXED)]), 'y').factor).toBe(0.5);
    const flagpole = effectiveLengthFactorFromSupports(model([support(0, FIXED)]), 'z');
    expect(flagpole.factor).toBe(2);
    expect(flagpole.basis).toContain('fixed-free');
    expect(effectiveLengthFactorFromSupports(model([support(0, FIXED)]), 'z', true).factor).toBe(2.1);
  });

  it('reads each plane from its own directions: uy and rz about z, uz and ry about y', () => {
    // Fixed against rz only at the base, pinned about y: K = 0.7 about z, 1.0 about y.
    const supports = [support(0, ['ux', 'uy', 'uz', 'rx', 'rz']), support(3, ROLLER)];
    expect(effectiveLengthFactorFromSupports(model(supports), 'z').factor).toBe(0.7);
    expect(effectiveLengthFactorFromSupports(model(supports), 'y').factor).toBe(1);
  });

  it('takes a spring as free in translation', () => {
    const spring = { ...support(3, []), restraints: { ...support(3, []).restraints, uy: { spring: 1e6 } } };
    expect(effectiveLengthFactorFromSupports(model([support(0, FIXED), spring]), 'z').factor).toBe(2);
  });

  it('covers supports in between conservatively: K = 1 when both ends are held, K = 2 with a free end', () => {
    expect(effectiveLengthFactorFromSupports(model([support(0, FIXED), support(1.5, ROLLER), support(3, ROLLER)]), 'z').factor).toBe(1);
    expect(effectiveLengthFactorFromSupports(model([support(0, PIN), support(2, ROLLER)]), 'z').factor).toBe(2);
  });
});

describe('resolveEffectiveLengthFactor', () => {
  const pinned = model([support(0, FIXED)]);
  it('prefers the per-axis factor, then the common factor, then the end conditions, then the supports', () => {
    expect(resolveEffectiveLengthFactor({ effectiveLengthFactorZ: 0.9, effectiveLengthFactor: 1.2 }, pinned, 'z').factor).toBe(0.9);
    expect(resolveEffectiveLengthFactor({ effectiveLengthFactorZ: 0.9, effectiveLengthFactor: 1.2 }, pinned, 'y').factor).toBe(1.2);
    expect(resolveEffectiveLengthFactor({ endConditions: 'fixed-pinned', recommendedDesignValues: true }, pinned, 'y').factor).toBe(0.8);
    expect(resolveEffectiveLengthFactor({}, pinned, 'y').factor).toBe(2);
  });
});
