import { describe, expect, it } from 'vitest';
import { finiteJson } from '../../src/api/answer-json.js';
import { NonFiniteResultError } from '../../src/api/finite-guard.js';

describe('finiteJson', () => {
  it('is JSON.stringify for a finite answer', () => {
    const answer = { reactions: [{ fy: 12.5, label: 'left' }], diagrams: { x: [0, 0.5, 1] }, verdict: 'pass' };
    expect(finiteJson(answer)).toBe(JSON.stringify(answer));
  });

  it('refuses NaN and infinities anywhere, naming where', () => {
    expect(() => finiteJson({ diagrams: { momentZ: [0, Number.NaN] } })).toThrow(new NonFiniteResultError('non-finite number at /diagrams/momentZ/1'));
    expect(() => finiteJson({ checks: [{ utilization: Number.POSITIVE_INFINITY }] })).toThrow(NonFiniteResultError);
    expect(() => finiteJson([Number.NEGATIVE_INFINITY])).toThrow(NonFiniteResultError);
  });

  it('lets a finite answer whose text says null pass (a label, a null kept by design)', () => {
    const answer = { reactions: [{ label: 'null', fy: 1 }], note: null };
    expect(finiteJson(answer)).toBe('{"reactions":[{"label":"null","fy":1}],"note":null}');
  });

  it('refuses NaN beside a label that says null', () => {
    expect(() => finiteJson({ label: 'null', value: Number.NaN })).toThrow(NonFiniteResultError);
  });
});
