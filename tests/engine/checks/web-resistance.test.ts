import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { slendernessEpsilon } from '../../../src/engine/checks/outstand-slenderness.js';
import { EngineError } from '../../../src/engine/engine-error.js';
import {
  patchLoadingBucklingCoefficient,
  patchLoadingResistance,
  recommendedShearAreaFactor,
  shearBucklingCoefficient,
  shearBucklingReductionFactor,
  webShearBucklingResistance,
} from '../../../src/engine/checks/web-resistance.js';
import { relativeError } from './fixtures/inputs.js';

// Welded I 800 x 250 x 5 / 15: overall depth 800 mm, flanges 250 x 15 mm, web 5 mm, hw = 800 - 2 x 15 = 770 mm.
const PLATE_GIRDER = { webDepth: 0.77, webThickness: 0.005, flangeWidth: 0.25, flangeThickness: 0.015 } as const;
const S355 = 355e6;
const S275 = 275e6;
// IPE 300 (EN 10365 dimensions): h 300, b 150, tw 7.1, tf 10.7, r 15 mm; hw taken as the straight web
// 300 - 2 x 10.7 - 2 x 15 = 248.6 mm.
const IPE300 = { webDepth: 0.2486, webThickness: 0.0071, flangeWidth: 0.15, flangeThickness: 0.0107 } as const;

describe('webShearBucklingResistance (EN 1993-1-5:2006, clause 5)', () => {
  it('requires the shear buckling check for the 800 x 250 x 5 / 15 girder in S355 and gives V_bw = 299.0 kN', () => {
    // eps = sqrt(235 / 355) = sqrt(0.661972) = 0.813617 (EN 1993-1-1, Table 5.2).
    // Limit 72 eps / eta = 72 x 0.813617 / 1.2 = 48.817 (5.1(2), eta = 1.2 recommended up to S460);
    // hw / tw = 770 / 5 = 154 > 48.8: check required.
    // lambdaBar_w = hw / (86.4 tw eps) = 770 / (86.4 x 5 x 0.813617) = 770 / 351.482 = 2.19072 (eq. 5.6).
    // Table 5.1, non-rigid end post, lambdaBar_w >= 0.83 / 1.2: chi_w = 0.83 / 2.19072 = 0.378871.
    // fyw hw tw / sqrt(3) = 355e6 x 0.770 x 0.005 / 1.732051 = 1.366750e6 / 1.732051 = 789 093 N;
    // V_bw = 0.378871 x 789 093 = 298 964 N (eq. 5.2 without gamma_M1): close to the "about 300 kN" estimate.
    // Bound eta x 789 093 = 946 912 N (eq. 5.1).
    const result = webShearBucklingResistance({ ...PLATE_GIRDER, webYieldStrength: S355 });
    expect(result.epsilon).toBeCloseTo(0.813617, 6);
    expect(result.shearAreaFactor).toBe(1.2);
    expect(result.webSlendernessRatio).toBeCloseTo(154, 10);
    expect(result.shearBucklingSlendernessLimit).toBeCloseTo(48.817, 3);
    expect(result.shearBucklingCheckRequired).toBe(true);
    expect(result.shearBucklingCoefficient).toBe(5.34);
    expect(result.webSlenderness).toBeCloseTo(2.19072, 5);
    expect(result.endPost).toBe('non-rigid');
    expect(result.shearBucklingReductionFactor).toBeCloseTo(0.378871, 6);
    expect(relativeError(result.webContribution, 298_964)).toBeLessThan(1e-5);
    expect(result.flangeContribution).toBe(0);
    expect(relativeError(result.plasticShearBound, 946_912)).toBeLessThan(1e-5);
    expect(result.resistance).toBe(result.webContribution);
    // tau_cr = 5.34 x 190000 MPa x (5 / 770)^2 = 5.34 x 190000 x 4.21654e-5 = 42.781 MPa (Annex A.1).
    expect(result.criticalShearStress / 1e6).toBeCloseTo(42.781, 3);
    // Flange-induced buckling, eq. 8.1, k = 0.55: 0.55 x 210000 / 355 x sqrt(770 x 5 / (250 x 15))
    // = 325.352 x sqrt(1.026667) = 325.352 x 1.013246 = 329.662 >= 154: in range.
    expect(result.flangeInducedBucklingLimit).toBeCloseTo(329.662, 3);
    expect(result.inRange).toBe(true);
    expect(result.outOfRangeReasons).toEqual([]);
  });

  it('gives the rigid end post chi_w = 1.37 / (0.7 + lambdaBar_w) above 1.08', () => {
    // Table 5.1: 1.37 / (0.7 + 2.19072) = 1.37 / 2.89072 = 0.473930; V_bw = 0.473930 x 789 093 = 373 975 N.
    const result = webShearBucklingResistance({ ...PLATE_GIRDER, webYieldStrength: S355, endPost: 'rigid' });
    expect(result.shearBucklingReductionFactor).toBeCloseTo(0.47393, 5);
    expect(relativeError(result.resistance, 373_975)).toBeLessThan(1e-5);
  });

  it('uses k_tau of Annex A.3 with intermediate stiffeners: a = hw and a = hw / 2', () => {
    // a / hw = 1: k_tau = 5.34 + 4 (1)^2 = 9.34 (eq. A.5); lambdaBar_w = 770 / (37.4 x 5 x 0.813617 x sqrt(9.34))
    // = 770 / (152.146 x 3.056141) = 770 / 464.980 = 1.65598 (eq. 5.7); chi_w = 0.83 / 1.65598 = 0.501213.
    // 5.1(2) limit 31 eps sqrt(k_tau) / eta = 31 x 0.813617 x 3.056141 / 1.2 = 64.235.
    const square = webShearBucklingResistance({ ...PLATE_GIRDER, webYieldStrength: S355, transverseStiffenerSpacing: 0.77 });
    expect(square.shearBucklingCoefficient).toBeCloseTo(9.34, 12);
    expect(square.webSlenderness).toBeCloseTo(1.65598, 5);
    expect(square.shearBucklingReductionFactor).toBeCloseTo(0.501213, 6);
    expect(square.shearBucklingSlendernessLimit).toBeCloseTo(64.235, 3);
    // a / hw = 0.5 < 1: k_tau = 4 + 5.34 / 0.25 = 25.36 (eq. A.5); lambdaBar_w = 770 / (152.146 x 5.035871) = 1.00497.
    const narrow = webShearBucklingResistance({ ...PLATE_GIRDER, webYieldStrength: S355, transverseStiffenerSpacing: 0.385 });
    expect(narrow.shearBucklingCoefficient).toBeCloseTo(25.36, 12);
    expect(narrow.webSlenderness).toBeCloseTo(1.00497, 5);
  });

  it('needs no shear buckling check for an IPE 300 web in S275', () => {
    // eps = sqrt(235 / 275) = 0.924416; limit 72 x 0.924416 / 1.2 = 55.465; hw / tw = 248.6 / 7.1 = 35.014 < 55.465.
    // lambdaBar_w = 248.6 / (86.4 x 7.1 x 0.924416) = 248.6 / 567.074 = 0.438391 < 0.83 / 1.2 = 0.691667: chi_w = eta = 1.2.
    // V_b = 1.2 x 275e6 x 0.2486 x 0.0071 / sqrt(3) = 336 289 N.
    // (With hw = h - 2 tf = 278.6 mm, hw / tw = 39.2: the same conclusion.)
    const result = webShearBucklingResistance({ ...IPE300, webYieldStrength: S275 });
    expect(result.shearBucklingSlendernessLimit).toBeCloseTo(55.465, 3);
    expect(result.webSlendernessRatio).toBeCloseTo(35.014, 3);
    expect(result.shearBucklingCheckRequired).toBe(false);
    expect(result.webSlenderness).toBeCloseTo(0.438391, 6);
    expect(result.shearBucklingReductionFactor).toBe(1.2);
    expect(relativeError(result.resistance, 336_289)).toBeLessThan(1e-5);
    expect(result.resistance).toBeCloseTo(result.plasticShearBound, 6);
  });

  it('reports the flange-induced buckling limit of eq. 8.1 as out of range', () => {
    // tw = 2.5 mm: hw / tw = 308; limit 325.352 x sqrt(770 x 2.5 / (250 x 15)) = 325.352 x 0.716473 = 233.106 < 308.
    const result = webShearBucklingResistance({ ...PLATE_GIRDER, webThickness: 0.0025, webYieldStrength: S355 });
    expect(result.flangeInducedBucklingLimit).toBeCloseTo(233.106, 3);
    expect(result.inRange).toBe(false);
    expect(result.outOfRangeReasons).toHaveLength(1);
    expect(result.outOfRangeReasons[0]).toMatch(/flange-induced buckling/);
    // k = 0.3 (plastic rotation): the limit scales by 0.3 / 0.55.
    const plastic = webShearBucklingResistance({ ...PLATE_GIRDER, webYieldStrength: S355, flangeMomentUse: 'plastic-rotation' });
    expect(plastic.flangeInducedBucklingLimit).toBeCloseTo((329.662 * 0.3) / 0.55, 2);
  });

  it('takes eta = 1.0 above S460 and flags grades above S700 or an eta outside 1.0 to 1.2', () => {
    expect(recommendedShearAreaFactor(460e6)).toBe(1.2);
    expect(recommendedShearAreaFactor(690e6)).toBe(1.0);
    expect(webShearBucklingResistance({ ...PLATE_GIRDER, webYieldStrength: 690e6 }).shearAreaFactor).toBe(1.0);
    const tooStrong = webShearBucklingResistance({ webDepth: 0.77, webThickness: 0.005, webYieldStrength: 900e6 });
    expect(tooStrong.inRange).toBe(false);
    expect(tooStrong.flangeInducedBucklingLimit).toBeNull();
    const badEta = webShearBucklingResistance({ webDepth: 0.77, webThickness: 0.005, webYieldStrength: S355, shearAreaFactor: 1.5 });
    expect(badEta.inRange).toBe(false);
  });

  it('refuses a non-positive dimension', () => {
    expect(() => webShearBucklingResistance({ webDepth: 0, webThickness: 0.005, webYieldStrength: S355 })).toThrow(EngineError);
    expect(() => webShearBucklingResistance({ webDepth: 0.77, webThickness: Number.NaN, webYieldStrength: S355 })).toThrow(EngineError);
  });
});

describe('Table 5.1 and k_tau: continuity and limits', () => {
  it('gives chi_w = eta up to 0.83 / eta and joins 0.83 / lambdaBar_w there exactly', () => {
    // 0.83 / (0.83 / eta) = eta: the two branches meet.
    for (const eta of [1.0, 1.2]) {
      const joint = 0.83 / eta;
      expect(shearBucklingReductionFactor(0, eta, 'non-rigid')).toBe(eta);
      expect(shearBucklingReductionFactor(joint * (1 - 1e-12), eta, 'rigid')).toBe(eta);
      expect(shearBucklingReductionFactor(joint, eta, 'non-rigid')).toBeCloseTo(eta, 12);
    }
  });

  it('has a step of 0.15 % at lambdaBar_w = 1.08 for a rigid end post (as the table is written)', () => {
    // 0.83 / 1.08 = 0.768519 and 1.37 / 1.78 = 0.769663.
    expect(shearBucklingReductionFactor(1.08 - 1e-12, 1.2, 'rigid')).toBeCloseTo(0.768519, 6);
    expect(shearBucklingReductionFactor(1.08, 1.2, 'rigid')).toBeCloseTo(0.769663, 6);
  });

  it('joins the two k_tau branches at a = hw (9.34) and tends to 5.34 for a long panel', () => {
    expect(shearBucklingCoefficient(1, 1)).toBeCloseTo(9.34, 12);
    expect(shearBucklingCoefficient(1, 1 - 1e-9)).toBeCloseTo(9.34, 6);
    expect(shearBucklingCoefficient(1, 1e6)).toBeCloseTo(5.34, 9);
    expect(shearBucklingCoefficient(1, undefined)).toBe(5.34);
  });

  it('keeps chi_w within (0, eta] and V_b at most the plastic bound for any web', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 3, noNaN: true }),
        fc.double({ min: 0.003, max: 0.04, noNaN: true }),
        fc.double({ min: 200e6, max: 700e6, noNaN: true }),
        fc.constantFrom<'rigid' | 'non-rigid'>('rigid', 'non-rigid'),
        (webDepth, webThickness, webYieldStrength, endPost) => {
          const result = webShearBucklingResistance({ webDepth, webThickness, webYieldStrength, endPost });
          expect(result.shearBucklingReductionFactor).toBeGreaterThan(0);
          expect(result.shearBucklingReductionFactor).toBeLessThanOrEqual(result.shearAreaFactor);
          expect(result.resistance).toBeLessThanOrEqual(result.plasticShearBound * (1 + 1e-12));
          expect(Number.isFinite(result.resistance)).toBe(true);
        },
      ),
    );
  });
});

describe('patchLoadingResistance (EN 1993-1-5:2006, clause 6)', () => {
  it('gives F_R = 188.3 kN for ss = 100 mm on the 800 x 250 x 5 / 15 web in S355, type (a), no stiffeners', () => {
    // k_F = 6 (Figure 6.1, a -> infinity).
    // F_cr = 0.9 x 6 x 210e9 x 0.005^3 / 0.770 = 5.4 x 210e9 x 1.25e-7 / 0.770 = 141 750 / 0.770 = 184 091 N (eq. 6.5).
    // m1 = 355 x 250 / (355 x 5) = 50 (eq. 6.8); m2 = 0.02 x (770 / 15)^2 = 0.02 x 2635.11 = 52.7022 (eq. 6.9, assumed lambdaBar_F > 0.5).
    // l_y = 0.100 + 2 x 0.015 x (1 + sqrt(102.7022)) = 0.100 + 0.030 x 11.13421 = 0.434026 m (eq. 6.10).
    // F_y = 0.434026 x 0.005 x 355e6 = 770 397 N; lambdaBar_F = sqrt(770 397 / 184 091) = sqrt(4.18487) = 2.04570 > 0.5: m2 kept
    // (and without m2: l_y = 0.1 + 0.03 x 8.07107 = 0.342132, lambdaBar_F = 1.8163 > 0.5, so only the first reading holds).
    // chi_F = 0.5 / 2.04570 = 0.244416 (eq. 6.3); L_eff = 0.244416 x 0.434026 = 0.106083 m (eq. 6.2);
    // F_R = 355e6 x 0.106083 x 0.005 = 188 297 N (eq. 6.1 without gamma_M1).
    const result = patchLoadingResistance({ ...PLATE_GIRDER, loadType: 'type-a', stiffBearingLength: 0.1, webYieldStrength: S355 });
    expect(result.bucklingCoefficient).toBe(6);
    expect(relativeError(result.criticalLoad, 184_091)).toBeLessThan(1e-5);
    expect(result.flangeStrengthRatio).toBeCloseTo(50, 10);
    expect(result.flangeSlendernessTerm).toBeCloseTo(52.7022, 4);
    expect(result.bothM2AssumptionsConsistent).toBe(false);
    expect(result.elasticLoadedLength).toBeNull();
    expect(result.effectiveLoadedLength).toBeCloseTo(0.434026, 6);
    expect(relativeError(result.yieldLoad, 770_397)).toBeLessThan(1e-5);
    expect(result.slenderness).toBeCloseTo(2.0457, 4);
    expect(result.reductionFactor).toBeCloseTo(0.244416, 5);
    expect(result.effectiveLength).toBeCloseTo(0.106083, 6);
    expect(relativeError(result.resistance, 188_297)).toBeLessThan(1e-5);
    expect(result.inRange).toBe(true);
  });

  it('caps l_y at the stiffener spacing and raises k_F with it (type (a), a = 0.3 m)', () => {
    // Figure 6.1: k_F = 6 + 2 (hw / a)^2; a = hw gives 8.
    // a = 0.3 m: k_F = 6 + 2 (0.77 / 0.3)^2 = 6 + 2 x 6.587778 = 19.17556; F_cr = 184 091 x 19.17556 / 6 = 588 341 N.
    // l_y = min(0.434026, a = 0.3) = 0.3 m (eq. 6.10); F_y = 0.3 x 1.775e6 = 532 500 N;
    // lambdaBar_F = sqrt(532 500 / 588 341) = sqrt(0.905088) = 0.951361 > 0.5; chi_F = 0.525563; F_R = 532 500 x 0.525563 = 279 862 N.
    expect(patchLoadingBucklingCoefficient('type-a', 0.77, { transverseStiffenerSpacing: 0.77 })).toBeCloseTo(8, 12);
    const result = patchLoadingResistance({
      ...PLATE_GIRDER,
      loadType: 'type-a',
      stiffBearingLength: 0.1,
      webYieldStrength: S355,
      transverseStiffenerSpacing: 0.3,
    });
    expect(result.bucklingCoefficient).toBeCloseTo(19.17556, 5);
    expect(relativeError(result.criticalLoad, 588_341)).toBeLessThan(1e-5);
    expect(result.effectiveLoadedLength).toBe(0.3);
    expect(result.slenderness).toBeCloseTo(0.951361, 6);
    expect(relativeError(result.resistance, 279_862)).toBeLessThan(1e-5);
  });

  it('gives F_R = 78.2 kN at an unstiffened member end, type (c), ss = 100 mm, c = 0', () => {
    // k_F = 2 + 6 (0.1 + 0) / 0.77 = 2.779221 <= 6 (Figure 6.1); F_cr = 184 091 x 2.779221 / 6 = 85 271.5 N.
    // l_e = k_F E tw^2 / (2 fyw hw) = 2.779221 x 210e9 x 2.5e-5 / (2 x 355e6 x 0.77) = 14.5909e6 / 546.7e6 = 0.0266891 m <= ss + c (eq. 6.13).
    // eq. 6.11: 0.0266891 + 0.015 sqrt(25 + (1.779271)^2 + 52.7022) = 0.0266891 + 0.015 x 8.99267 = 0.161579 m;
    // eq. 6.12: 0.0266891 + 0.015 x 10.13421 = 0.178702 m; l_y = 0.161579 m.
    // F_y = 0.161579 x 1.775e6 = 286 803 N; lambdaBar_F = sqrt(286 803 / 85 271.5) = 1.83396; chi_F = 0.272634;
    // L_eff = 0.0440520 m; F_R = 1.775e6 x 0.0440520 = 78 192 N.
    const result = patchLoadingResistance({
      ...PLATE_GIRDER,
      loadType: 'type-c',
      stiffBearingLength: 0.1,
      endDistance: 0,
      webYieldStrength: S355,
    });
    expect(result.bucklingCoefficient).toBeCloseTo(2.779221, 6);
    expect(relativeError(result.criticalLoad, 85_271.5)).toBeLessThan(1e-5);
    expect(result.elasticLoadedLength).toBeCloseTo(0.0266891, 7);
    expect(result.effectiveLoadedLength).toBeCloseTo(0.161579, 6);
    expect(result.slenderness).toBeCloseTo(1.83396, 4);
    expect(relativeError(result.resistance, 78_192)).toBeLessThan(1e-4);
    // k_F is capped at 6 far from the end: 2 + 6 x 1.0 / 0.77 = 9.79 -> 6.
    expect(patchLoadingBucklingCoefficient('type-c', 0.77, { stiffBearingLength: 0.1, endDistance: 0.9 })).toBe(6);
  });

  it('drops m2 and caps chi_F at 1 for a stocky IPE 300 web in S275 (ss = 0)', () => {
    // F_cr = 0.9 x 6 x 210e9 x 0.0071^3 / 0.2486 = 1.134e12 x 3.57911e-7 / 0.2486 = 1 632 627 N.
    // m1 = 150 / 7.1 = 21.1268; assume m2 = 0.02 (248.6 / 10.7)^2 = 10.7960:
    // l_y = 2 x 0.0107 x (1 + sqrt(31.9228)) = 0.0214 x 6.65003 = 0.142311 m, lambdaBar_F = sqrt(0.142311 x 0.0071 x 275e6 / 1 632 627) = 0.41254 <= 0.5:
    // the assumption fails; m2 = 0: l_y = 0.0214 x (1 + 4.59639) = 0.119763 m, F_y = 0.119763 x 1.9525e6 = 233 837 N,
    // lambdaBar_F = 0.37845, 0.5 / 0.37845 = 1.321 -> chi_F = 1; F_R = F_y = 233 837 N.
    const result = patchLoadingResistance({ ...IPE300, loadType: 'type-a', stiffBearingLength: 0, webYieldStrength: S275 });
    expect(relativeError(result.criticalLoad, 1_632_627)).toBeLessThan(1e-6);
    expect(result.flangeSlendernessTerm).toBe(0);
    expect(result.bothM2AssumptionsConsistent).toBe(false);
    expect(result.effectiveLoadedLength).toBeCloseTo(0.119763, 6);
    expect(result.slenderness).toBeCloseTo(0.37845, 5);
    expect(result.reductionFactor).toBe(1);
    expect(relativeError(result.resistance, 233_837)).toBeLessThan(1e-5);
  });

  it('takes the lower reading where both m2 assumptions hold (IPE 300, ss = 80 mm)', () => {
    // With m2: l_y = 0.08 + 0.142311 = 0.222311 m, lambdaBar_F = sqrt(0.222311 / 0.836172) = 0.51562 > 0.5 (consistent),
    // F = 1.9525e6 x 0.222311 x 0.5 / 0.51562 = 420 910 N.
    // Without m2: l_y = 0.08 + 0.119763 = 0.199763 m, lambdaBar_F = sqrt(0.199763 / 0.836172) = 0.48878 <= 0.5 (consistent),
    // F = 1.9525e6 x 0.199763 = 390 037 N (here 0.836172 m = F_cr / (tw fyw) = 1 632 627 / 1.9525e6). The lower: 390 037 N.
    const result = patchLoadingResistance({ ...IPE300, loadType: 'type-a', stiffBearingLength: 0.08, webYieldStrength: S275 });
    expect(result.bothM2AssumptionsConsistent).toBe(true);
    expect(result.flangeSlendernessTerm).toBe(0);
    expect(result.slenderness).toBeCloseTo(0.48878, 5);
    expect(relativeError(result.resistance, 390_037)).toBeLessThan(1e-5);
  });

  it('takes ss as at most hw (6.3) and refuses a negative bearing length or end distance', () => {
    const long = patchLoadingResistance({ ...PLATE_GIRDER, loadType: 'type-a', stiffBearingLength: 2, webYieldStrength: S355 });
    const atDepth = patchLoadingResistance({ ...PLATE_GIRDER, loadType: 'type-a', stiffBearingLength: 0.77, webYieldStrength: S355 });
    expect(long.stiffBearingLength).toBe(0.77);
    expect(long.resistance).toBe(atDepth.resistance);
    expect(() =>
      patchLoadingResistance({ ...PLATE_GIRDER, loadType: 'type-a', stiffBearingLength: -0.01, webYieldStrength: S355 }),
    ).toThrow(EngineError);
    expect(() =>
      patchLoadingResistance({ ...PLATE_GIRDER, loadType: 'type-c', stiffBearingLength: 0.1, endDistance: -1, webYieldStrength: S355 }),
    ).toThrow(EngineError);
  });

  it('keeps chi_F in (0, 1] and F_R at most F_y for any web and load', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 2, noNaN: true }),
        fc.double({ min: 0.003, max: 0.04, noNaN: true }),
        fc.double({ min: 0.005, max: 0.06, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.boolean(),
        (webDepth, webThickness, flangeThickness, stiffBearingLength, atEnd) => {
          const common = { webDepth, webThickness, flangeWidth: 0.2, flangeThickness, stiffBearingLength, webYieldStrength: S355 };
          const result = atEnd
            ? patchLoadingResistance({ ...common, loadType: 'type-c', endDistance: 0 })
            : patchLoadingResistance({ ...common, loadType: 'type-a' });
          expect(result.reductionFactor).toBeGreaterThan(0);
          expect(result.reductionFactor).toBeLessThanOrEqual(1);
          expect(result.resistance).toBeLessThanOrEqual(result.yieldLoad * (1 + 1e-12));
          expect(Number.isFinite(result.resistance)).toBe(true);
        },
      ),
    );
  });
});

describe('slendernessEpsilon (EN 1993-1-1 Table 5.2), as the web checks use it', () => {
  it('is 1 for S235 and sqrt(235 / 355) = 0.813617 for S355 (EN 1993-1-1, Table 5.2)', () => {
    expect(slendernessEpsilon(235e6)).toBe(1);
    expect(slendernessEpsilon(355e6)).toBeCloseTo(0.813617, 6);
  });
});
