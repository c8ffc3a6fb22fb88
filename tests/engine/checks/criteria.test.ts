import { describe, expect, it } from 'vitest';
import { DEFAULT_CRITERIA, resolveCriteria } from '../../../src/engine/checks/criteria.js';
import { FAILURE_MODES } from '../../../src/engine/checks/failure-mode.js';
import { castIron, steel } from './fixtures/materials.js';

describe('resolveCriteria', () => {
  it('fills the documented defaults: 1.5 on yield and design-curve resistances, 2.0 on ultimate, 2.5 on elastic instability, 1.0 on serviceability', () => {
    const criteria = resolveCriteria({}, steel);
    expect(criteria.requiredSafetyFactor.tension).toBe(1.5);
    expect(criteria.requiredSafetyFactor.combined).toBe(1.5);
    expect(criteria.requiredSafetyFactor['pin-shear']).toBe(1.5);
    expect(criteria.requiredSafetyFactor['tension-ultimate']).toBe(2.0);
    expect(criteria.requiredSafetyFactor.buckling).toBe(2.5);
    expect(criteria.requiredSafetyFactor['lateral-torsional-buckling']).toBe(1.5);
    expect(criteria.requiredSafetyFactor['web-shear-buckling']).toBe(1.5);
    expect(criteria.requiredSafetyFactor['flexural-torsional-buckling']).toBe(2.5);
    expect(criteria.requiredSafetyFactor['pin-bending']).toBe(1.5);
    expect(criteria.requiredSafetyFactor.deflection).toBe(1.0);
    expect(criteria.requiredSafetyFactor.twist).toBe(1.0);
    expect(criteria.deflectionLimitRatio).toBe(250);
    expect(criteria.cantileverDeflectionLimitRatio).toBe(180);
    expect(criteria.allowedTwist).toBeCloseTo(Math.PI / 180, 15);
    expect(criteria.defaulted).toEqual(['requiredSafetyFactor', 'deflectionLimitRatio', 'cantileverDeflectionLimitRatio', 'allowedTwist']);
  });

  it('fills in the criteria of a request that gives none once per material behaviour and shares them, frozen', () => {
    const first = resolveCriteria({}, steel);
    expect(resolveCriteria({ shearYieldRatio: undefined }, steel)).toBe(first);
    expect(Object.isFrozen(first) && Object.isFrozen(first.requiredSafetyFactor) && Object.isFrozen(first.defaulted)).toBe(true);
    // Another shear yield ratio or another behaviour gets its own criteria; a given limit is never shared.
    expect(resolveCriteria({ shearYieldRatio: 0.5 }, steel).shearYieldRatio).toBe(0.5);
    expect(resolveCriteria({}, castIron).requiredSafetyFactor.bending).toBe(2.0);
    expect(resolveCriteria({}, steel)).toEqual(first);
    expect(Object.isFrozen(resolveCriteria({ deflectionLimitRatio: 360 }, steel))).toBe(false);
  });

  it('gives every failure mode a factor', () => {
    const criteria = resolveCriteria();
    for (const mode of FAILURE_MODES) expect(criteria.requiredSafetyFactor[mode]).toBeGreaterThan(0);
  });

  it('takes a single number as a floor: it never lowers a mode below its default, and says which it kept', () => {
    const criteria = resolveCriteria({ requiredSafetyFactor: 1.5 }, steel);
    expect(criteria.requiredSafetyFactor.bending).toBe(1.5);
    expect(criteria.requiredSafetyFactor.buckling).toBe(2.5);
    expect(criteria.requiredSafetyFactor['tension-ultimate']).toBe(2.0);
    expect(criteria.keptDefaults).toEqual(['tension-ultimate', 'buckling', 'eccentric-column', 'flexural-torsional-buckling', 'local-buckling', 'ultimate']);
    // By mode, a factor is taken as given, lower or not.
    expect(resolveCriteria({ requiredSafetyFactor: { buckling: 1.2 } }, steel).requiredSafetyFactor.buckling).toBe(1.2);
  });

  it('applies a single number to every strength and stability mode but not to deflection and twist', () => {
    const criteria = resolveCriteria({ requiredSafetyFactor: 3 }, steel);
    expect(criteria.requiredSafetyFactor.bending).toBe(3);
    expect(criteria.requiredSafetyFactor.buckling).toBe(3);
    expect(criteria.requiredSafetyFactor['tension-ultimate']).toBe(3);
    expect(criteria.requiredSafetyFactor.deflection).toBe(1);
    expect(criteria.requiredSafetyFactor.twist).toBe(1);
    expect(criteria.defaulted).not.toContain('requiredSafetyFactor');
  });

  it('overrides only the modes a record names', () => {
    const criteria = resolveCriteria({ requiredSafetyFactor: { bending: 1.8, ultimate: 2.4 } }, steel);
    expect(criteria.requiredSafetyFactor.bending).toBe(1.8);
    expect(criteria.requiredSafetyFactor.shear).toBe(1.5);
    // 'ultimate' sets every check against an ultimate strength: tension-ultimate for a ductile material.
    expect(criteria.requiredSafetyFactor['tension-ultimate']).toBe(2.4);
    expect(criteria.requiredSafetyFactor.ultimate).toBe(2.4);
    expect(resolveCriteria({ requiredSafetyFactor: { ultimate: 2.4, 'tension-ultimate': 2.2 } }).requiredSafetyFactor['tension-ultimate']).toBe(2.2);
  });

  it('checks a brittle material against ultimate strengths with the ultimate factor unless the mode is named', () => {
    const criteria = resolveCriteria({ requiredSafetyFactor: { ultimate: 3, shear: 2.2 } }, castIron);
    expect(criteria.requiredSafetyFactor.tension).toBe(3);
    expect(criteria.requiredSafetyFactor.bending).toBe(3);
    expect(criteria.requiredSafetyFactor.combined).toBe(3);
    expect(criteria.requiredSafetyFactor.shear).toBe(2.2);
    expect(criteria.requiredSafetyFactor.buckling).toBe(2.5);
    expect(resolveCriteria({}, castIron).requiredSafetyFactor.bending).toBe(2.0);
  });

  it('takes the shear yield ratio from the request, else from the material', () => {
    expect(resolveCriteria({ shearYieldRatio: 0.58 }, steel).shearYieldRatio).toBe(0.58);
    expect(resolveCriteria({}, { ...steel, shearYieldRatio: 0.6 }).shearYieldRatio).toBe(0.6);
    expect(resolveCriteria().shearYieldRatio).toBe(DEFAULT_CRITERIA.shearYieldRatio);
  });

  it('keeps given limits and lists only the defaults it used', () => {
    const criteria = resolveCriteria({ deflectionLimitRatio: 360, allowedTwist: 0.01 }, steel);
    expect(criteria.deflectionLimitRatio).toBe(360);
    expect(criteria.allowedTwist).toBe(0.01);
    expect(criteria.defaulted).toEqual(['requiredSafetyFactor', 'cantileverDeflectionLimitRatio']);
  });
});
