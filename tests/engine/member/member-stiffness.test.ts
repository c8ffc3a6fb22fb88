import { describe, expect, it } from 'vitest';
import { memberStiffness } from '../../../src/engine/member/member-stiffness.js';

describe('memberStiffness', () => {
  it('multiplies each section property by its modulus', () => {
    // IPE 200 in S355 (EN 10365 and EN 1993-1-1 3.2.6, from memory): A = 28.5 cm^2, Iz = 1943 cm^4, Iy = 142.4 cm^4, J = 6.98 cm^4.
    const stiffness = memberStiffness(
      { area: 28.5e-4, secondMomentZ: 1943e-8, secondMomentY: 142.4e-8, torsionConstant: 6.98e-8 },
      { elasticModulus: 210e9, shearModulus: 81e9 },
    );
    expect(stiffness.axial).toBeCloseTo(210e9 * 28.5e-4, 0);
    expect(stiffness.bendingZ).toBeCloseTo(210e9 * 1943e-8, 3);
    expect(stiffness.bendingY).toBeCloseTo(210e9 * 142.4e-8, 3);
    expect(stiffness.torsional).toBeCloseTo(81e9 * 6.98e-8, 6);
  });
});
