import { describe, expect, it } from 'vitest';
import { lateralTorsionalChecks, lateralTorsionalExclusion } from '../../../src/engine/checks/lateral-torsional-buckling.js';
import { generalCriticalMoment } from '../../../src/engine/checks/lateral-torsional-critical-moment.js';
import { cantileverTipLoad, FIXED, PIN, ROLLER, simpleSpanUniformLoad, support, uniformMoment } from './fixtures/analyses.js';
import { contextOf, relativeError } from './fixtures/inputs.js';
import { steel } from './fixtures/materials.js';
import { iSection, rectangle, round, tee } from './fixtures/sections.js';

// 200 x 100 x 5.6 x 8.5 welded I (no fillets): Iy = (2 * 0.0085 * 0.1^3 + 0.183 * 0.0056^3) / 12 = 1.41934e-6 m^4,
// J = (2 * 0.1 * 0.0085^3 + 0.1915 * 0.0056^3) / 3 = 5.2152e-8 m^4, Iw = 0.0085 * 0.1^3 * 0.1915^2 / 24 = 1.29881e-8 m^6.
const section = iSection(0.2, 0.1, 0.0056, 0.0085);

describe('the elastic critical moment through the shear centre (generalCriticalMoment with zg = zj = 0)', () => {
  it('matches the Timoshenko & Gere closed form for a simply supported I-beam in uniform moment (C1 = 1)', () => {
    // L = 4 m: E Iy = 298061, G J = 4224.3, (pi / 4) sqrt(1.25911e9) = 27869; pi^2 E Iw / (G J L^2) = 26919 / 67589
    // = 0.39828; M_cr = 27869 * sqrt(1.39828) = 32955 N*m (Theory of Elastic Stability, 2nd ed., ch. 6, from memory).
    expect(section.secondMomentY).toBeCloseTo(1.41934e-6, 10);
    expect(section.torsionConstant).toBeCloseTo(5.2152e-8, 11);
    expect(section.warpingConstant).toBeCloseTo(1.29881e-8, 12);
    const moment = generalCriticalMoment({
      elasticModulus: steel.elasticModulus,
      shearModulus: steel.shearModulus,
      secondMomentY: section.secondMomentY,
      torsionConstant: section.torsionConstant,
      warpingConstant: section.warpingConstant,
      unbracedLength: 4,
      factors: { c1: 1, c2: 0, c3: 0 },
    });
    expect(relativeError(moment, 32955)).toBeLessThan(1e-3);
  });

  it('reduces to (pi / L) sqrt(E Iy G J) for a narrow rectangle (no warping) and scales with C1', () => {
    const base = { elasticModulus: 200e9, shearModulus: 80e9, secondMomentY: 1e-7, torsionConstant: 4e-7, warpingConstant: 0, unbracedLength: 2 };
    const expected = (Math.PI / 2) * Math.sqrt(200e9 * 1e-7 * 80e9 * 4e-7);
    expect(generalCriticalMoment({ ...base, factors: { c1: 1, c2: 0, c3: 0 } })).toBeCloseTo(expected, 6);
    expect(generalCriticalMoment({ ...base, factors: { c1: 1.75, c2: 0, c3: 0 } })).toBeCloseTo(1.75 * expected, 6);
  });
});

describe('lateralTorsionalExclusion', () => {
  it('applies to open sections bent about their strong axis, rectangles only when at least twice as deep as wide', () => {
    expect(lateralTorsionalExclusion(section)).toBeNull();
    expect(lateralTorsionalExclusion({ ...section, shape: 'channel' })).toBeNull();
    expect(lateralTorsionalExclusion(rectangle(0.05, 0.1))).toBeNull();
    expect(lateralTorsionalExclusion(rectangle(0.06, 0.1))).toContain('common practice');
    expect(lateralTorsionalExclusion(round(0.05))).toContain('closed section');
    // A tee applies; its critical moment is left unchecked (see lateralTorsionalChecks), never called not applicable.
    expect(lateralTorsionalExclusion(tee())).toBeNull();
    expect(lateralTorsionalExclusion(rectangle(0.2, 0.1))).toContain('not the strong axis');
  });
});

describe('lateralTorsionalChecks', () => {
  it('checks a simple span with its own Cb: 1.136 under a uniform load', () => {
    const analysis = simpleSpanUniformLoad(4, 5e3, 1);
    const context = contextOf({ analysis, section, material: steel });
    const { summary, findings } = lateralTorsionalChecks(context);
    expect(summary?.momentGradientFactor).toBeCloseTo(1.13636, 5);
    expect(summary?.unbracedLength).toBe(4);
    const [check] = findings.checks;
    // w L^2 / 8 = 10 kN*m. Through the shear centre M_cr would be 1.13636 * 32955 = 37449 N*m; the default
    // top-flange load (zg = h/2 = 0.1 m, C2 = 0.454, NCCI SN003 Table 3.2, from memory) takes it to
    // P [sqrt(a0 + (C2 zg)^2) - C2 zg] with P = C1 pi^2 E Iy / L^2 and sqrt(a0) = 37449 / P.
    const p = (1.13636 * Math.PI ** 2 * 210e9 * 1.41934e-6) / 16;
    const a0 = (37449 / p) ** 2;
    const criticalMoment = p * (Math.sqrt(a0 + 0.0454 ** 2) - 0.0454);
    expect(relativeError(summary?.criticalMoment ?? 0, criticalMoment)).toBeLessThan(1e-3);
    // EN 1993-1-1:2005 6.3.2.2 (from memory), welded I with h/b = 2: curve c, alpha_LT = 0.49.
    const wFy = (section.secondMomentZ / 0.1) * steel.yieldStrength;
    const slenderness = Math.sqrt(wFy / criticalMoment);
    const phi = 0.5 * (1 + 0.49 * (slenderness - 0.2) + slenderness ** 2);
    const chi = 1 / (phi + Math.sqrt(phi ** 2 - slenderness ** 2));
    expect(summary?.curve).toBe('c');
    expect(relativeError(summary?.reductionFactor ?? 0, chi)).toBeLessThan(2e-3);
    expect(check?.demand).toBeCloseTo(10e3, 6);
    expect(relativeError(check?.capacity ?? 0, chi * wFy)).toBeLessThan(2e-3);
    expect(check?.requiredSafetyFactor).toBe(1.5);
    expect(check?.position).toBeCloseTo(2, 12);
  });

  it('takes the load through the shear centre when asked: the classic M_cr, about 24 % above the top-flange one here', () => {
    const analysis = simpleSpanUniformLoad(4, 5e3, 1);
    const top = lateralTorsionalChecks(contextOf({ analysis, section, material: steel })).summary?.criticalMoment ?? 0;
    const centre = lateralTorsionalChecks(contextOf({ analysis, section, material: steel, lateralTorsional: { loadHeight: 'shear-centre' } })).summary;
    expect(relativeError(centre?.criticalMoment ?? 0, 1.13636 * 32955)).toBeLessThan(1e-3);
    expect(centre?.loadHeight).toBe(0);
    expect(centre?.criticalMoment ?? 0).toBeGreaterThan(1.2 * top);
  });

  it('leaves an angle unchecked rather than calling lateral-torsional buckling not applicable', () => {
    const angle = { ...iSection(0.1, 0.075, 0.008, 0.008), shape: 'angle' as const };
    const { findings } = lateralTorsionalChecks(contextOf({ analysis: simpleSpanUniformLoad(2, 1e3, 1), section: angle, material: steel }));
    expect(findings.checks).toHaveLength(0);
    expect(findings.notApplicable).toHaveLength(0);
    expect(findings.unchecked?.map((gap) => gap.mode)).toEqual(['lateral-torsional-buckling']);
  });

  it('takes a cantilever with a fixed root at twice its length and Cb = 1: the end-couple case, M_cr = (pi / 2L) sqrt(E Iy G J) (Timoshenko & Gere 2nd ed., ch. 6, from memory)', () => {
    const analysis = cantileverTipLoad(2, 1e3, 1);
    const { summary } = lateralTorsionalChecks(contextOf({ analysis, section, material: steel, supports: [support(0, FIXED)] }));
    expect(summary?.effectiveLength).toBe(4);
    expect(summary?.momentGradientFactor).toBe(1);
  });

  it('triples the length of an overhang whose root is only a fork (common practice, conservative)', () => {
    const analysis = cantileverTipLoad(2, 1e3, 1);
    const { summary } = lateralTorsionalChecks(contextOf({ analysis, section, material: steel, supports: [support(0, [...PIN, 'rz'])] }));
    expect(summary?.effectiveLength).toBe(6);
  });

  it('refuses to guess when no support holds the member against lateral movement and twist', () => {
    const analysis = cantileverTipLoad(2, 1e3, 1);
    expect(() => lateralTorsionalChecks(contextOf({ analysis, section, material: steel, supports: [support(0, ['ux', 'uy', 'rz'])] }))).toThrow(/lateralTorsional\.unbracedLength/);
  });

  it('uses a requested unbraced length with Cb = 1 unless one is given', () => {
    const analysis = uniformMoment(6, 8e3, 1);
    const supports = [support(0, PIN), support(6, ROLLER)];
    const given = lateralTorsionalChecks(contextOf({ analysis, section, material: steel, supports, lateralTorsional: { unbracedLength: 2 } }));
    expect(given.summary?.unbracedLength).toBe(2);
    expect(given.summary?.momentGradientFactor).toBe(1);
    const withFactor = lateralTorsionalChecks(
      contextOf({ analysis, section, material: steel, supports, lateralTorsional: { unbracedLength: 2, momentGradientFactor: 1.3 } }),
    );
    expect(withFactor.summary?.momentGradientFactor).toBe(1.3);
  });

  it('does not apply when braced, or without a strong-axis moment', () => {
    const braced = lateralTorsionalChecks(contextOf({ analysis: uniformMoment(4, 8e3, 1), section, material: steel, lateralTorsional: { braced: true } }));
    expect(braced.summary).toBeNull();
    expect(braced.findings.notApplicable[0]?.reason).toContain('braced');
    const unloaded = lateralTorsionalChecks(contextOf({ analysis: uniformMoment(4, 0, 1), section, material: steel }));
    expect(unloaded.findings.notApplicable[0]?.reason).toContain('no strong-axis bending moment');
  });
});
