import { describe, expect, it } from 'vitest';
import { EngineError } from '../../../src/engine/engine-error.js';
import { failureCheck } from '../../../src/engine/checks/failure-check.js';

const spec = {
  mode: 'bending' as const,
  quantity: 'stress' as const,
  capacity: 300e6,
  requiredSafetyFactor: 1.5,
  position: 2,
  location: 'bottom fibre',
  basis: 'test',
};

describe('failureCheck', () => {
  it('gives safetyFactor = capacity / demand and utilization = demand * required / capacity', () => {
    const check = failureCheck({ ...spec, demand: 100e6 });
    expect(check.safetyFactor).toBe(3);
    expect(check.utilization).toBe(0.5);
    expect(check.passes).toBe(true);
    expect(check.position).toBe(2);
  });

  it('fails when the utilization exceeds 1 (safety factor below the required one)', () => {
    const check = failureCheck({ ...spec, demand: 250e6 });
    expect(check.safetyFactor).toBeCloseTo(1.2, 12);
    expect(check.utilization).toBeCloseTo(1.25, 12);
    expect(check.passes).toBe(false);
  });

  it('reports a zero demand with utilization 0, a null safety factor and no position', () => {
    const check = failureCheck({ ...spec, demand: 0 });
    expect(check.safetyFactor).toBeNull();
    expect(check.utilization).toBe(0);
    expect(check.passes).toBe(true);
    expect(check.position).toBeNull();
    expect(check.location).toBeNull();
  });

  it('counts a subnormal demand, whose safety factor would overflow, as zero', () => {
    const check = failureCheck({ ...spec, demand: 5e-324 });
    expect(check.demand).toBe(0);
    expect(check.safetyFactor).toBeNull();
  });

  it('refuses a capacity that is not positive and finite instead of dividing by it', () => {
    expect(() => failureCheck({ ...spec, capacity: 0, demand: 1 })).toThrow(EngineError);
    expect(() => failureCheck({ ...spec, capacity: Number.POSITIVE_INFINITY, demand: 1 })).toThrow(EngineError);
    expect(() => failureCheck({ ...spec, demand: Number.NaN })).toThrow(EngineError);
  });
});
