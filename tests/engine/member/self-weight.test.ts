import { describe, expect, it } from 'vitest';
import { analyseMember } from '../../../src/engine/analysis/analyse-member.js';
import { STANDARD_GRAVITY } from '../../../src/engine/member/model.js';
import { selfWeightLoad } from '../../../src/engine/member/self-weight.js';
import { memberModel, pinnedAt, rollerAt } from './model-builders.js';

describe('selfWeightLoad', () => {
  it('is -density x area x g over the whole length', () => {
    // 2.85e-3 m^2 of steel at 7850 kg/m^3: 7850 x 2.85e-3 x 9.80665 = 219.399277125 N/m.
    const load = selfWeightLoad(2.85e-3, 7850, 6);
    expect(load).toEqual({ kind: 'distributed', from: 0, to: 6, qx: [0, 0], qy: [load.qy[0], load.qy[0]], qz: [0, 0], mx: [0, 0] });
    expect(load.qy[0]).toBeCloseTo(-219.399277125, 9);
    expect(STANDARD_GRAVITY).toBe(9.80665);
  });

  it('is 0, not -0, for a weightless member', () => {
    expect(Object.is(selfWeightLoad(1e-3, 0, 2).qy[0], 0)).toBe(true);
  });

  it('puts half the weight on each support of a simple span', () => {
    const length = 6;
    const a = analyseMember(memberModel(length, [pinnedAt(0), rollerAt(length)], [selfWeightLoad(2.85e-3, 7850, length)]));
    // Statics: each support carries w L / 2 = 219.399277125 x 3 N.
    expect(a.reactions[0]?.fy).toBeCloseTo(219.399277125 * 3, 9);
    expect(a.reactions[1]?.fy).toBeCloseTo(219.399277125 * 3, 9);
  });
});
