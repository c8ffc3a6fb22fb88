import { describe, expect, it } from 'vitest';
import { checkMember } from '../../../src/engine/checks/check-member.js';
import {
  BRITTLE_NOTICE,
  CAUTION_NOTICE,
  COLUMN_NOTICE,
  ELEMENTARY_SHEAR_NOTICE,
  EXCLUSIONS_NOTICE,
  LOCAL_BUCKLING_NOTICE,
  NO_DEMAND_NOTICE,
  UNSYMMETRIC_NOTICE,
  BIAXIAL_SHEAR_NOTICE,
  STAND_IN_NOTICES,
  WEB_TOE_NOTICE,
  WARPING_NOTICE,
  SHEAR_CENTRE_NOTICE,
} from '../../../src/engine/checks/notices.js';
import { analysisFrom, constantAxial, simpleSpanUniformLoad } from './fixtures/analyses.js';
import { inputOf } from './fixtures/inputs.js';
import { castIron, columnSteel, steel } from './fixtures/materials.js';
import { iSection, rectangle, round } from './fixtures/sections.js';

describe('memberNotices', () => {
  it('always carries the screening caution and the exclusions', () => {
    const outcome = checkMember(inputOf({ analysis: simpleSpanUniformLoad(4, 1e3, 1), section: rectangle(0.1, 0.2), material: steel }));
    expect(outcome.notices[0]).toBe(CAUTION_NOTICE);
    expect(outcome.notices).toContain(EXCLUSIONS_NOTICE);
    expect(outcome.notices).toContain(ELEMENTARY_SHEAR_NOTICE);
    expect(outcome.notices.some((n) => n.startsWith('Default criteria'))).toBe(true);
    expect(outcome.notices).not.toContain(LOCAL_BUCKLING_NOTICE);
  });

  it('warns that the web at the fillet root, warping and the shear centre are left out, where they matter', () => {
    const section = iSection(0.2, 0.1, 0.0056, 0.0085);
    const beam = checkMember(inputOf({ analysis: simpleSpanUniformLoad(4, 1e3, 1), section, material: steel }));
    expect(beam.notices).toContain(WEB_TOE_NOTICE);
    expect(beam.notices).not.toContain(WARPING_NOTICE);
    expect(beam.notices).not.toContain(SHEAR_CENTRE_NOTICE);
    const twisted = checkMember(inputOf({ analysis: constantAxial(3, 0, { torque: [200] }), section, material: steel }));
    expect(twisted.notices).toContain(WARPING_NOTICE);
  });

  it('names the defaults only when some stand in', () => {
    const criteria = { requiredSafetyFactor: 2, deflectionLimitRatio: 300, cantileverDeflectionLimitRatio: 150, allowedTwist: 0.02 };
    const outcome = checkMember(inputOf({ analysis: simpleSpanUniformLoad(4, 1e3, 1), section: rectangle(0.1, 0.2), material: steel, criteria }));
    expect(outcome.notices.some((n) => n.startsWith('Default criteria'))).toBe(false);
  });

  it('warns of brittle materials, thin walls and column assumptions where they apply', () => {
    const brittle = checkMember(inputOf({ analysis: simpleSpanUniformLoad(4, 1e3, 1), section: rectangle(0.1, 0.2), material: castIron }));
    expect(brittle.notices).toContain(BRITTLE_NOTICE);
    const column = checkMember(inputOf({ analysis: constantAxial(3, -50e3), section: iSection(0.2, 0.1, 0.0056, 0.0085), material: steel }));
    expect(column.notices).toContain(LOCAL_BUCKLING_NOTICE);
    expect(column.notices).toContain(COLUMN_NOTICE);
    expect(column.notices.some((n) => n.startsWith('Effective-length factor about the y axis: K = 1'))).toBe(true);
  });

  it('says when the compressive force reaches the Euler load', () => {
    // d = 40 mm, L = 1.5 m pinned: P_e = 114.1 kN; 150 kN exceeds it.
    const outcome = checkMember(inputOf({ analysis: constantAxial(1.5, -150e3), section: round(0.04), material: columnSteel }));
    expect(outcome.notices.some((n) => n.includes('reaches the Euler load'))).toBe(true);
  });

  it('warns of unsymmetric bending and of biaxial shear on a solid section', () => {
    const angle = { ...rectangle(0.1, 0.2), shape: 'angle' as const, productMoment: 1e-6 };
    const outcome = checkMember(inputOf({ analysis: simpleSpanUniformLoad(4, 1e3, 1), section: angle, material: steel }));
    expect(outcome.notices).toContain(UNSYMMETRIC_NOTICE);
    const biaxial = analysisFrom(2, [{ start: 0, end: 2, fields: { shearY: [1e3], shearZ: [1e3], momentZ: [0, 1e3], momentY: [0, 1e3] } }]);
    expect(checkMember(inputOf({ analysis: biaxial, section: rectangle(0.1, 0.2), material: steel })).notices).toContain(BIAXIAL_SHEAR_NOTICE);
  });

  it('names the stand-ins of a section given by its properties', () => {
    const known = {
      bendingStressZ: false,
      bendingStressY: true,
      plasticModulusZ: true,
      plasticModulusY: true,
      shearStressY: false,
      shearStressZ: true,
      torsionalShearStress: true,
      warpingConstant: true,
      thickestElement: true,
      productMoment: false,
    };
    const section = { ...rectangle(0.1, 0.2), shape: 'custom' as const, known };
    const outcome = checkMember(inputOf({ analysis: simpleSpanUniformLoad(4, 1e3, 1), section, material: steel }));
    expect(outcome.notices).toContain(STAND_IN_NOTICES.bendingStressZ);
    expect(outcome.notices).toContain(STAND_IN_NOTICES.shearStressY);
    expect(outcome.notices).toContain(STAND_IN_NOTICES.productMoment);
    expect(outcome.notices).not.toContain(STAND_IN_NOTICES.bendingStressY);
  });

  it('says so when nothing loads the member', () => {
    const outcome = checkMember(inputOf({ analysis: analysisFrom(2, [{ start: 0, end: 2, fields: {} }]), section: rectangle(0.1, 0.2), material: steel }));
    expect(outcome.notices).toContain(NO_DEMAND_NOTICE);
  });
});
