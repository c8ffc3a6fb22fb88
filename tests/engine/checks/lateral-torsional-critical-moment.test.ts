import { describe, expect, it } from 'vitest';
import {
  criticalMomentFactors,
  generalCriticalMoment,
  teeMonosymmetryParameter,
  teeShearCentreHeight,
} from '../../../src/engine/checks/lateral-torsional-critical-moment.js';
import { relativeError } from './fixtures/inputs.js';

const E = 210e9;
const G = 81e9;

// IPE 200 (tabulated, Euronorm 19-57 / ArcelorMittal tables): Iz 142.4 cm^4, It 6.98 cm^4, Iw 12990 cm^6; L 6 m.
const ipe200 = {
  elasticModulus: E,
  shearModulus: G,
  secondMomentY: 142.4e-8,
  torsionConstant: 6.98e-8,
  warpingConstant: 12990e-12,
  unbracedLength: 6,
};
// By hand: pi^2 E Iz / L^2 = 9.869604 * 210e9 * 142.4e-8 / 36 = 9.869604 * 299040 / 36 = 81983.5 N;
// Iw / Iz = 1.299e-8 / 1.424e-6 = 0.0091222 m^2; L^2 G J / (pi^2 E Iz) = 81e9 * 6.98e-8 / 81983.5 = 5653.8 / 81983.5
// = 0.0689626 m^2; a = 0.0780848, sqrt(a) = 0.279437; M_cr (C1 = 1) = 81983.5 * 0.279437 = 22909.2 N*m.
const EULER_LOAD_IPE200 = 81983.51;
const STIFFNESS_TERM_IPE200 = 0.0780848;
const SHEAR_CENTRE_LOAD_IPE200 = 22909.2;

describe('generalCriticalMoment', () => {
  it('reduces to the doubly symmetric formula for zg = zj = 0 (IPE 200, L 6 m, C1 1)', () => {
    const moment = generalCriticalMoment({ ...ipe200, factors: { c1: 1, c2: 0, c3: 0 } });
    // (pi / L) sqrt(E Iz G J) sqrt(1 + pi^2 E Iw / (G J L^2)) (Timoshenko & Gere 2nd ed., ch. 6, from memory):
    // (pi / 6) sqrt(299040 * 5653.8) = 0.523599 * 41118.3 = 21529.5; pi^2 E Iw / (G J L^2) = 26923.3 / 203537 = 0.132277;
    // 21529.5 * sqrt(1.132277) = 21529.5 * 1.064085 = 22909.2 N*m.
    expect(relativeError(moment, SHEAR_CENTRE_LOAD_IPE200)).toBeLessThan(1e-5);
    const torsionalRigidity = G * ipe200.torsionConstant;
    const existing =
      1.3 * (Math.PI / 6) * Math.sqrt(E * ipe200.secondMomentY * torsionalRigidity) * Math.sqrt(1 + (Math.PI ** 2 * E * ipe200.warpingConstant) / (torsionalRigidity * 36));
    // The same algebra, so the same number to rounding, at any C1 (1.3 here) and C2, C3 (ignored when zg = zj = 0).
    const general = generalCriticalMoment({ ...ipe200, factors: { c1: 1.3, c2: 0.454, c3: 0.525 } });
    expect(relativeError(general, existing)).toBeLessThan(1e-12);
  });

  it('lowers M_cr by 14.9 % for a uniform load on the top flange of the IPE 200 (zg = +h/2 = 0.1 m, C1 1.127, C2 0.454)', () => {
    const factors = { c1: 1.127, c2: 0.454, c3: 0 };
    const atShearCentre = generalCriticalMoment({ ...ipe200, factors });
    const onTopFlange = generalCriticalMoment({ ...ipe200, factors, loadHeight: 0.1 });
    const onBottomFlange = generalCriticalMoment({ ...ipe200, factors, loadHeight: -0.1 });
    // C2 zg = 0.0454, (C2 zg)^2 = 0.00206116; sqrt(0.0780848 + 0.0020612) = sqrt(0.0801460) = 0.283101.
    // Top: 1.127 * 81983.5 * (0.283101 - 0.0454) = 1.127 * 81983.5 * 0.237701 = 21962.5 N*m.
    // Shear centre: 1.127 * 81983.5 * 0.279437 = 25818.7 N*m. Ratio 0.237701 / 0.279437 = 0.85064: 14.94 % lower.
    // Bottom (stabilising): 1.127 * 81983.5 * (0.283101 + 0.0454) = 30352.0 N*m.
    expect(relativeError(atShearCentre, 25818.7)).toBeLessThan(1e-5);
    expect(relativeError(onTopFlange, 21962.5)).toBeLessThan(1e-5);
    expect(relativeError(onBottomFlange, 30352.0)).toBeLessThan(1e-5);
    expect(onTopFlange / atShearCentre).toBeCloseTo(0.85064, 5);
  });

  it('keeps its digits for a load far above the shear centre: M_cr -> C1 P a / (2 C2 zg)', () => {
    // zg = 100 m, C2 zg = 45.4: sqrt(a + c^2) - c = a / (sqrt(a + c^2) + c) = a / (2c) * (1 - a / (4 c^2) + ...),
    // a / (4 c^2) = 9.5e-6; P a / (2c) = 81983.5 * 0.0780848 / 90.8 = 70.503 N*m.
    const moment = generalCriticalMoment({ ...ipe200, factors: { c1: 1, c2: 0.454, c3: 0 }, loadHeight: 100 });
    expect(relativeError(moment, (EULER_LOAD_IPE200 * STIFFNESS_TERM_IPE200) / 90.8)).toBeLessThan(2e-5);
    expect(relativeError(moment, 70.5023)).toBeLessThan(1e-5);
  });

  it('takes k and kw: fixed ends against minor-axis rotation and warping (k = kw = 0.5) act as half the length', () => {
    const halved = generalCriticalMoment({ ...ipe200, unbracedLength: 3, factors: { c1: 1, c2: 0, c3: 0 } });
    const restrained = generalCriticalMoment({
      ...ipe200,
      effectiveLengthFactor: 0.5,
      warpingLengthFactor: 0.5,
      factors: { c1: 1, c2: 0, c3: 0 },
    });
    expect(relativeError(restrained, halved)).toBeLessThan(1e-12);
  });

  it("matches Trahair's monosymmetric form for a tee without warping, flange in compression and in tension", () => {
    // Tee 100 x 100 (flange 100 x 10, stem 10 thick), mm: Iminor = 10 * 100^3 / 12 + 90 * 10^3 / 12 = 840833 mm^4,
    // J = (100 * 10^3 + 90 * 10^3) / 3 = 63333 mm^4, Iw = 0, zj = 32.280 mm (next describe), L 3 m, C1 = C3 = 1.
    // M_cr = (pi / L) sqrt(E I G J) [B + sqrt(1 + B^2)], B = (pi zj / L) sqrt(E I / G J) (Trahair, Flexural-Torsional
    // Buckling of Structures, monosymmetric beam in uniform bending, beta_x = 2 zj; from memory):
    // E I = 176575, G J = 5130.0, (pi / 3) sqrt(9.05830e8) = 1.047198 * 30097.0 = 31517.5 N*m;
    // B = 0.0338034 * sqrt(34.4201) = 0.0338034 * 5.866863 = 0.198320; sqrt(1 + B^2) = 1.019476;
    // flange compressed: 31517.5 * 1.217796 = 38381.9 N*m; stem tip compressed: 31517.5 * 0.821156 = 25880.8 N*m.
    const tee = { elasticModulus: E, shearModulus: G, secondMomentY: 840833.33e-12, torsionConstant: 63333.33e-12, warpingConstant: 0, unbracedLength: 3 };
    const factors = { c1: 1, c2: 0, c3: 1 };
    expect(relativeError(generalCriticalMoment({ ...tee, factors, monosymmetryParameter: 0.0322799 }), 38381.9)).toBeLessThan(1e-5);
    expect(relativeError(generalCriticalMoment({ ...tee, factors, monosymmetryParameter: -0.0322799 }), 25880.8)).toBeLessThan(1e-5);
  });
});

describe('criticalMomentFactors', () => {
  it('gives the tabulated simple-span factors (SN003 Table 3.2, ENV 1993-1-1 Tables F.1.1 and F.1.2, from memory)', () => {
    expect(criticalMomentFactors({ kind: 'uniform-load' })).toMatchObject({ c1: 1.127, c2: 0.454, c3: 0.525 });
    expect(criticalMomentFactors({ kind: 'central-point-load' })).toMatchObject({ c1: 1.348, c2: 0.63, c3: 1.73 });
    expect(criticalMomentFactors({ kind: 'end-moments', endMomentRatio: 1 })).toMatchObject({ c1: 1, c2: 0, c3: 1 });
    expect(criticalMomentFactors({ kind: 'end-moments', endMomentRatio: 0 })).toMatchObject({ c1: 1.879, c2: 0, c3: 0.939 });
    expect(criticalMomentFactors({ kind: 'end-moments', endMomentRatio: -1 })).toMatchObject({ c1: 2.752, c2: 0, c3: 0 });
  });

  it('interpolates linearly between the tabulated ratios of end moments', () => {
    // psi = 0.125, halfway between 0 (1.879, 0.939) and 0.25 (1.563, 0.977): C1 = 1.721, C3 = 0.958.
    const factors = criticalMomentFactors({ kind: 'end-moments', endMomentRatio: 0.125 });
    expect(factors.c1).toBeCloseTo(1.721, 12);
    expect(factors.c3).toBeCloseTo(0.958, 12);
    // psi = -0.6: 0.4 of the way from -0.5 (2.704, 0.676) to -0.75 (2.927, 0.366): C1 = 2.7932, C3 = 0.552.
    const reversed = criticalMomentFactors({ kind: 'end-moments', endMomentRatio: -0.6 });
    expect(reversed.c1).toBeCloseTo(2.7932, 12);
    expect(reversed.c3).toBeCloseTo(0.552, 12);
    expect(() => criticalMomentFactors({ kind: 'end-moments', endMomentRatio: 1.5 })).toThrow(RangeError);
  });
});

describe('tee shear centre and monosymmetry', () => {
  const tee = { depth: 0.1, flangeWidth: 0.1, webThickness: 0.01, flangeThickness: 0.01 };

  it('puts the shear centre at the flange mid-thickness: a load on the flange face is tf / 2 above it', () => {
    expect(teeShearCentreHeight(tee)).toBeCloseTo(0.095, 15);
  });

  it('computes zj by the defining integral, +32.280 mm with the flange in compression and -32.280 mm in tension', () => {
    // mm, s up from the centroid. Stem 10 x 90 (A 900, centre y 45), flange 100 x 10 (A 1000, y 95):
    // centroid 135500 / 1900 = 71.3158; plate centres sbar -26.3158 and +23.6842.
    // I = 10 * 90^3 / 12 + 900 * 26.3158^2 + 100 * 10^3 / 12 + 1000 * 23.6842^2 = 1230769 + 569275 = 1800044 mm^4.
    // Over a plate of height d: int s^3 dA = A (sbar^3 + sbar d^2 / 4), int s t^2 dA = (w^3 d / 12) sbar:
    // stem 900 (-18224.2 - 26.3158 * 2025) - 7500 * 26.3158 = -64362334 - 197368;
    // flange 1000 (13285.7 + 23.6842 * 25) + 833333 * 23.6842 = 13877570 + 19736842; sum -30945291 mm^5.
    // zs = 95 - 71.3158 = 23.6842; zj = 23.6842 + 30945291 / (2 * 1800044) = 23.6842 + 8.5957 = 32.2799 mm.
    // Cross-check: the Kitipornchai-Trahair form with rho = 1, 0.45 * 95 * (1 - (840833 / 1800044)^2) = 33.4 mm.
    expect(teeMonosymmetryParameter(tee, true)).toBeCloseTo(0.0322799, 7);
    expect(teeMonosymmetryParameter(tee, false)).toBeCloseTo(-0.0322799, 7);
  });
});

