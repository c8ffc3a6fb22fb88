import { describe, expect, it } from 'vitest';
import { metres, rangeLabel } from '../../../src/engine/checks/labels.js';

describe('labels', () => {
  it('writes positions in metres with at most six significant digits', () => {
    expect(metres(2)).toBe('2 m');
    expect(metres(1.9999999999999998)).toBe('2 m');
    expect(metres(0.1234567)).toBe('0.123457 m');
    expect(rangeLabel(0, 4.5)).toBe('0 m to 4.5 m');
  });
});
