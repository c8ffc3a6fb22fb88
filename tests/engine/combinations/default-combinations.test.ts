import { describe, expect, it } from 'vitest';
import { defaultCombinations } from '../../../src/engine/combinations/default-combinations.js';

const written = (actions: Parameters<typeof defaultCombinations>[0]) => defaultCombinations(actions).map((c) => `${c.id}: ${c.description}`);

describe('defaultCombinations', () => {
  it('combines permanent, imposed, snow and wind after the allowable-stress pattern (common practice)', () => {
    expect(
      written([
        { id: 'G', category: 'permanent', moving: false },
        { id: 'L', category: 'imposed', moving: false },
        { id: 'S', category: 'snow', moving: false },
        { id: 'W', category: 'wind', moving: false },
      ]),
    ).toEqual([
      'strength-1: 1 G',
      'strength-2: 1 G + 1 L',
      'strength-3: 1 G + 1 S',
      'strength-4: 1 G + 1 W',
      'strength-5: 1 G + 0.75 L + 0.75 S + 0.75 W',
      'strength-6: 0.6 G + 1 W',
      'serviceability-1: 1 G + 1 L',
      'serviceability-2: 1 G + 1 S',
      'serviceability-3: 1 G + 1 W',
      'serviceability-4: 1 G + 1 L + 1 S + 1 W',
    ]);
  });
  it('moves one train at a time: every variable action together once per moving load', () => {
    expect(
      written([
        { id: 'G', category: 'permanent', moving: false },
        { id: 'goods', category: 'imposed', moving: false },
        { id: 'cart', category: 'imposed', moving: true },
        { id: 'hoist', category: 'imposed', moving: true },
      ]).filter((line) => line.includes('0.75') || line.startsWith('serviceability')),
    ).toEqual([
      'strength-5: 1 G + 0.75 goods + 0.75 cart',
      'strength-6: 1 G + 0.75 goods + 0.75 hoist',
      'serviceability-1: 1 G + 1 goods',
      'serviceability-2: 1 G + 1 cart',
      'serviceability-3: 1 G + 1 hoist',
      'serviceability-4: 1 G + 1 goods + 1 cart',
      'serviceability-5: 1 G + 1 goods + 1 hoist',
    ]);
  });
  it('checks permanent actions alone for serviceability when nothing varies, and each accidental action with them', () => {
    expect(
      written([
        { id: 'G', category: 'permanent', moving: false },
        { id: 'impact', category: 'accidental', moving: false },
      ]),
    ).toEqual(['strength-1: 1 G', 'strength-2: 1 G + 1 impact', 'serviceability-1: 1 G']);
  });
  it('takes wind directions one at a time and keeps a reduced imposed load beside an accidental action', () => {
    expect(
      written([
        { id: 'G', category: 'permanent', moving: false },
        { id: 'goods', category: 'imposed', moving: false },
        { id: 'wind +y', category: 'wind', moving: false },
        { id: 'wind -y', category: 'wind', moving: false },
        { id: 'forklift impact', category: 'accidental', moving: false },
      ]).filter((line) => !/: 1 G \+ 1 (goods|wind [+-]y)$/.test(line)),
    ).toEqual([
      'strength-1: 1 G',
      'strength-5: 1 G + 0.75 goods + 0.75 wind +y',
      'strength-6: 1 G + 0.75 goods + 0.75 wind -y',
      'strength-7: 0.6 G + 1 wind +y',
      'strength-8: 0.6 G + 1 wind -y',
      'strength-9: 1 G + 1 forklift impact + 0.5 goods',
      'serviceability-4: 1 G + 1 goods + 1 wind +y',
      'serviceability-5: 1 G + 1 goods + 1 wind -y',
    ]);
  });
});
