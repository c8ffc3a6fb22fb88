import { describe, expect, it } from 'vitest';
import { brentMaximum } from '../../../src/engine/combinations/brent-maximum.js';

describe('brentMaximum', () => {
  it('finds the vertex of a parabola: 5 - (x - 0.3)^2 on [0, 1] has its maximum 5 at 0.3', () => {
    let calls = 0;
    const found = brentMaximum((x) => (calls++, 5 - (x - 0.3) ** 2), 0, 1, 1e-7);
    expect(found.value).toBe(5);
    expect(found.x).toBeCloseTo(0.3, 9);
    // Parabolic interpolation hits the vertex on its first parabola: three golden points, the vertex, two probes.
    expect(calls).toBe(6);
  });
  it('finds the kink of a piecewise-linear tent: 1 - |x - 0.62| peaks at 0.62', () => {
    const found = brentMaximum((x) => 1 - Math.abs(x - 0.62), 0, 1, 1e-9);
    expect(found.x).toBeCloseTo(0.62, 8);
    expect(found.value).toBeCloseTo(1, 8);
  });
  it('goes to the end of the bracket when the function rises to it: x^2 on [-1, 2]', () => {
    const found = brentMaximum((x) => x * x, 0.5, 2, 1e-9);
    expect(found.x).toBeCloseTo(2, 8);
  });
});
