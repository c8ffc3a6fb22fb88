import { describe, expect, it } from 'vitest';
import { EngineError } from '../../../src/engine/engine-error.js';
import { channelShearCentreDistance } from '../../../src/engine/sections/shear-centre.js';
import { channelWarpingStressFactors, iSectionWarpingStressFactors } from '../../../src/engine/sections/warping-stress-factors.js';

const near = (actual: number, expected: number, relative = 1e-12) =>
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(relative * Math.abs(expected));

describe('an IPE 200 (h 200, b 100, tf 8.5, tw 5.6 mm)', () => {
  const f = iSectionWarpingStressFactors({ depth: 0.2, flangeWidth: 0.1, flangeThickness: 0.0085, webThickness: 0.0056 });
  // h_s = 0.1915 m. omega_n = h_s b/4 = 4.7875e-3 m^2; S_w = h_s b^2 tf/16 = 0.1915 x 0.01 x 0.0085/16 = 1.01734375e-6 m^4;
  // Iw = tf b^3 h_s^2/24 = 0.0085 x 1e-3 x 0.03667225/24 = 1.29880885e-8 m^6 (EN 10365 tabulates 12.99e3 cm^6)
  // (AISC Design Guide 9, 2nd ed., Appendix A, I-shapes; from memory).
  it('has omega_n,max = h_s b/4, S_w,max = h_s b^2 tf/16 over tf, Iw = tf b^3 h_s^2/24', () => {
    near(f.normalisedWarpingMax, 4.7875e-3);
    near(f.warpingStaticalMomentMax, 1.01734375e-6);
    expect(f.thicknessAtStaticalMomentMax).toBe(0.0085);
    near(f.warpingConstant, (0.0085 * 1e-3 * 0.1915 ** 2) / 24);
    near(f.warpingConstant, 12.99e-9, 2e-3);
  });

  it('gives stresses per unit action that match the flange-bending analogy', () => {
    // A bimoment B is a flange moment B/h_s on each flange, sigma = (B/h_s)/(tf b^2/6): per unit B, 1/(0.1915 x 1.41667e-5) = 368607 1/m^4.
    near(f.normalStressPerBimoment, 1 / (0.1915 * ((0.0085 * 0.01) / 6)), 1e-12);
    // A warping torque T_w is a flange shear T_w/h_s, tau_max = 1.5 V/(b tf): per unit T_w, 1.5/(0.1915 x 8.5e-4) = 9215.17 1/m^3.
    near(f.shearStressPerWarpingTorque, 1.5 / (0.1915 * 0.1 * 0.0085), 1e-12);
  });
});

describe('a channel 200 x 80, web 6, flanges 11 (mm, thin-walled)', () => {
  const d = { depth: 0.2, flangeWidth: 0.08, flangeThickness: 0.011, webThickness: 0.006 };
  // b' = 0.077, h' = 0.189. e0 = 3 b'^2 tf/(6 b' tf + h' tw) = 3 x 0.005929 x 0.011/(0.005082 + 0.001134) = 1.95657e-4/6.216e-3 = 0.0314764 m.
  const bm = 0.077;
  const hm = 0.189;
  const e0 = (3 * bm * bm * 0.011) / (6 * bm * 0.011 + hm * 0.006);
  const f = channelWarpingStressFactors(d);

  it('places the shear centre at e0 = 3 b\'^2 tf/(6 b\' tf + h\' tw) = 31.48 mm from the web mid-line', () => {
    near(channelShearCentreDistance(d), e0);
    near(e0, 0.0314764, 1e-5);
  });

  it('has the largest omega_n at the flange tips, (b\' - e0) h\'/2', () => {
    // 0.0455236 x 0.189/2 = 4.30198e-3 m^2, larger than the junction's e0 h'/2 = 2.97452e-3.
    near(f.normalisedWarpingMax, ((bm - e0) * hm) / 2);
  });

  it('has Iw equal to the closed form in channel.ts (DG9 2nd ed., Appendix A, from memory)', () => {
    near(f.warpingConstant, ((0.011 * bm ** 3 * hm ** 2) / 12) * ((3 * bm * 0.011 + 2 * hm * 0.006) / (6 * bm * 0.011 + hm * 0.006)), 1e-12);
  });

  it('has the largest S_w/t in the flange where omega_n = 0: tf h\' (b\' - e0)^2 / 4', () => {
    // Flange: 0.011 x 0.189 x 0.0455236^2 / 4 = 1.07713e-6 m^4 over tf: 9.792e-5 m^3.
    // Junction: 0.011 x 0.189 x 0.077 x (0.077 - 0.0629528)/4 = 5.6194e-7; mid-web: |5.6194e-7 - 0.006 x 0.0314764 x 0.189^2/8| = 2.8379e-7 over tw: 4.73e-5.
    near(f.warpingStaticalMomentMax, (0.011 * hm * (bm - e0) ** 2) / 4);
    expect(f.thicknessAtStaticalMomentMax).toBe(0.011);
    near(f.shearStressPerWarpingTorque, (0.011 * hm * (bm - e0) ** 2) / 4 / (f.warpingConstant * 0.011));
  });

  it('takes a given shear-centre offset', () => {
    const g = channelWarpingStressFactors({ ...d, shearCentreFromWeb: 0.03 });
    near(g.normalisedWarpingMax, ((bm - 0.03) * hm) / 2);
  });

  it('refuses impossible geometry', () => {
    expect(() => channelWarpingStressFactors({ ...d, flangeThickness: 0.11 })).toThrow(EngineError);
    expect(() => iSectionWarpingStressFactors({ ...d, depth: -1 })).toThrow(EngineError);
    expect(() => channelWarpingStressFactors({ ...d, shearCentreFromWeb: 0.2 })).toThrow(EngineError);
  });
});
