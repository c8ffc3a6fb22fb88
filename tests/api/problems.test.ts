import { describe, expect, it } from 'vitest';
import { jsonPointer, PROBLEMS, ProblemError } from '../../src/api/problems.js';

describe('jsonPointer', () => {
  it('escapes ~ and / as RFC 6901 section 3 requires', () => {
    expect(jsonPointer(['loads', 2, 'position'])).toBe('/loads/2/position');
    expect(jsonPointer(['a/b', 'm~n'])).toBe('/a~1b/m~0n');
    expect(jsonPointer([])).toBe('');
  });
});

describe('ProblemError', () => {
  it('builds an RFC 9457 body from the registry', () => {
    const body = new ProblemError('unstableMember', 'free along x', [{ pointer: '/member', message: 'x' }]).body('/v1/member-checks');
    expect(body).toMatchObject({
      type: PROBLEMS.unstableMember.type,
      title: PROBLEMS.unstableMember.title,
      status: 422,
      detail: 'free along x',
      instance: '/v1/member-checks',
      errors: [{ pointer: '/member', message: 'x' }],
    });
  });

  it('declares each problem type once, with a distinct URI', () => {
    const types = Object.values(PROBLEMS).map((p) => p.type);
    expect(new Set(types).size).toBe(types.length);
  });
});
