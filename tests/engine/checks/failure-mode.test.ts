import { describe, expect, it } from 'vitest';
import { FAILURE_MODES, failureModeRank } from '../../../src/engine/checks/failure-mode.js';

describe('failure modes', () => {
  it('rank the simple stress modes before the combined and stability ones, then serviceability and pins, then the plate and fatigue modes', () => {
    expect(failureModeRank('tension')).toBe(0);
    expect(failureModeRank('bending')).toBeLessThan(failureModeRank('combined'));
    expect(failureModeRank('compression')).toBeLessThan(failureModeRank('buckling'));
    expect(failureModeRank('buckling')).toBeLessThan(failureModeRank('combined'));
    expect(failureModeRank('combined')).toBeLessThan(failureModeRank('deflection'));
    expect(failureModeRank('pin-bearing')).toBeLessThan(failureModeRank('pin-bending'));
    expect(failureModeRank('twist')).toBeLessThan(failureModeRank('pin-shear'));
    expect(failureModeRank('fatigue')).toBe(FAILURE_MODES.length - 1);
    expect(new Set(FAILURE_MODES).size).toBe(FAILURE_MODES.length);
  });
});
