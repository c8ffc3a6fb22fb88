import { describe, expect, it } from 'vitest';
import { analyseMember } from '../../../src/engine/analysis/analyse-member.js';
import { EngineError } from '../../../src/engine/engine-error.js';
import type { MemberModel } from '../../../src/engine/member/model.js';
import { validateMemberModel } from '../../../src/engine/member/validate-model.js';
import { DEMO_STIFFNESS, distributedLoad, memberModel, pinnedAt, pointLoad, rollerAt } from './model-builders.js';

const L = 5;

function rejection(model: MemberModel): EngineError {
  try {
    validateMemberModel(model);
  } catch (error) {
    if (!(error instanceof EngineError)) throw error;
    // analyseMember refuses the same model the same way.
    expect(() => analyseMember(model)).toThrow(error.message);
    return error;
  }
  throw new Error('expected the model to be rejected');
}

describe('validateMemberModel', () => {
  it('accepts a sound model, and positions within 1e-9 of the length outside the ends', () => {
    expect(() =>
      validateMemberModel(memberModel(L, [pinnedAt(-1e-12), rollerAt(L * (1 + 1e-10))], [pointLoad(L, { fy: -1 })])),
    ).not.toThrow();
  });

  it('rejects a length that is not positive', () => {
    for (const length of [0, -2, Number.NaN, Number.POSITIVE_INFINITY]) {
      const error = rejection(memberModel(length, [pinnedAt(0)], []));
      expect(error.kind).toBe('outside-member');
      expect(error.path).toEqual(['member', 'length']);
    }
  });

  it('rejects a member without supports', () => {
    const error = rejection(memberModel(L, [], [pointLoad(1, { fy: -1 })]));
    expect(error.kind).toBe('outside-member');
    expect(error.path).toEqual(['member', 'supports']);
  });

  it('points at the support, hinge or load that lies outside the member', () => {
    expect(rejection(memberModel(L, [pinnedAt(0), rollerAt(5.1)], [])).path).toEqual(['member', 'supports', 1, 'position']);
    expect(rejection(memberModel(L, [pinnedAt(0)], [], { hinges: [2, -0.5] })).path).toEqual(['member', 'hinges', 1, 'position']);
    const loads = (load: MemberModel['loads'][number]) => memberModel(L, [pinnedAt(0), rollerAt(L)], [pointLoad(1, {}), load]);
    expect(rejection(loads(pointLoad(6, { fy: -1 }))).path).toEqual(['loads', 1, 'position']);
    expect(rejection(loads(distributedLoad(-1, 2, { qy: -1 }))).path).toEqual(['loads', 1, 'from']);
    expect(rejection(loads(distributedLoad(1, 7, { qy: -1 }))).path).toEqual(['loads', 1, 'to']);
    expect(rejection(loads(pointLoad(Number.NaN, { fy: -1 }))).kind).toBe('outside-member');
  });

  it('rejects a distributed load whose range is empty or reversed', () => {
    for (const [from, to] of [
      [2, 2],
      [3, 1],
    ] as const) {
      const error = rejection(memberModel(L, [pinnedAt(0), rollerAt(L)], [distributedLoad(from, to, { qy: -1 })]));
      expect(error.kind).toBe('outside-member');
      expect(error.path).toEqual(['loads', 0, 'to']);
    }
  });

  it('rejects a rigidity that no section can have', () => {
    const error = rejection(
      memberModel(L, [pinnedAt(0), rollerAt(L)], [], { stiffness: { ...DEMO_STIFFNESS, torsional: 0 } }),
    );
    expect(error.kind).toBe('impossible-geometry');
    expect(error.path).toEqual(['stiffness', 'torsional']);
  });
});
