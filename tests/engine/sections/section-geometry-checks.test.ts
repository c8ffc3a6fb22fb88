import { describe, expect, it } from 'vitest';
import { EngineError } from '../../../src/engine/engine-error.js';
import {
  impossibleGeometry,
  requireAtMost,
  requireBelow,
  requireFlangedDimensions,
  requireNonNegative,
  requirePositive,
} from '../../../src/engine/sections/section-geometry-checks.js';

const caught = (action: () => unknown): EngineError => {
  try {
    action();
  } catch (error) {
    if (error instanceof EngineError) return error;
    throw error;
  }
  throw new Error('expected an EngineError');
};

describe('section geometry checks', () => {
  it('name the field under section in the path', () => {
    const error = impossibleGeometry('wallThickness', 'too thick');
    expect(error.kind).toBe('impossible-geometry');
    expect(error.path).toEqual(['section', 'wallThickness']);
  });

  it('refuse zero, negative, NaN and infinite dimensions', () => {
    for (const value of [0, -1, Number.NaN, Infinity]) {
      expect(caught(() => requirePositive(value, 'depth')).path).toEqual(['section', 'depth']);
    }
    expect(() => requirePositive(1e-9, 'depth')).not.toThrow();
  });

  it('let radii be zero or absent but not negative', () => {
    expect(requireNonNegative(undefined, 'rootRadius')).toBe(0);
    expect(requireNonNegative(0, 'rootRadius')).toBe(0);
    expect(caught(() => requireNonNegative(-0.001, 'rootRadius')).path).toEqual(['section', 'rootRadius']);
  });

  it('check the plates of a flanged section and give its root radius', () => {
    const plates = { depth: 0.2, flangeWidth: 0.1, webThickness: 0.0056, flangeThickness: 0.0085 };
    expect(requireFlangedDimensions(plates)).toBe(0);
    expect(requireFlangedDimensions({ ...plates, rootRadius: 0.012 })).toBe(0.012);
    expect(caught(() => requireFlangedDimensions({ ...plates, flangeThickness: 0 })).path).toEqual(['section', 'flangeThickness']);
  });

  it('compare strictly or inclusively', () => {
    expect(() => requireBelow(1, 1, 'flangeThickness', 'half the depth')).toThrow(EngineError);
    expect(() => requireAtMost(1, 1, 'rootRadius', 'the room')).not.toThrow();
    expect(() => requireAtMost(1.0001, 1, 'rootRadius', 'the room')).toThrow(EngineError);
  });
});
