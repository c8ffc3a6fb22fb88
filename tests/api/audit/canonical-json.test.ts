import { describe, expect, it } from 'vitest';
import { canonicalJson } from '../../../src/api/audit/canonical-json.js';

describe('canonicalJson', () => {
  it('sorts keys, drops undefined members, writes -0 as 0 and numbers as ECMAScript does', () => {
    expect(canonicalJson({ b: 1, a: [2, -0, 0.1 + 0.2, 1e21, 1.5e-7], c: undefined, d: null, e: 'x"y' })).toBe('{"a":[2,0,0.30000000000000004,1e+21,1.5e-7],"b":1,"d":null,"e":"x\\"y"}');
  });
  it('writes a Map as an object of its entries and a typed array as an array', () => {
    expect(canonicalJson({ m: new Map([['z', 1], ['a', 2]]), t: new Float64Array([1, 2.5]) })).toBe('{"m":{"a":2,"z":1},"t":[1,2.5]}');
  });
  it('orders keys by UTF-16 code units, the same on every machine', () => {
    expect(canonicalJson({ b: 1, B: 2, a: 3, é: 4 })).toBe('{"B":2,"a":3,"b":1,"é":4}');
  });
  it('refuses what has no canonical form', () => {
    expect(() => canonicalJson({ x: Number.NaN })).toThrow(/canonical/);
    expect(() => canonicalJson({ x: Infinity })).toThrow(/canonical/);
    expect(() => canonicalJson({ f: () => 1 })).toThrow(/canonical/);
  });
});
