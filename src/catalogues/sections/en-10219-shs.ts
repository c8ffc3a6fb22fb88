/**
 * Cold-formed square hollow sections (SHS), common sizes of EN 10219-2, 40x40x3 to 200x200x10.
 * Corners take the outer radius EN 10219-2 uses for computing properties (see table-rows.ts).
 */

import type { SectionEntry } from '../section-entry.js';
import { boxEntry, type BoxRow, type TableFamily } from './table-rows.js';

const SHS_FAMILY: TableFamily = {
  family: 'SHS',
  standard: 'EN 10219-2',
  source:
    'EN 10219-2, square hollow sections (values from memory, no copy at hand): mass and A are the ' +
    'standard\'s Annex B nominal area (and 7.85 kg/dm^3) rounded to 3 significant figures as the ' +
    'tables print them; I and It only where a remembered table value agreed with that geometry',
};

// designation, H, B, T (mm), M (kg/m), A (cm^2), I strong, I weak, It (cm^4)
const SHS_ROWS: readonly BoxRow[] = [
  ['SHS 40x40x3', 40, 40, 3, 3.30, 4.21, 9.32, 9.32, undefined],
  ['SHS 40x40x4', 40, 40, 4, 4.20, 5.35, 11.1, 11.1, undefined],
  ['SHS 50x50x3', 50, 50, 3, 4.25, 5.41, 19.5, 19.5, undefined],
  ['SHS 50x50x4', 50, 50, 4, 5.45, 6.95, 23.7, 23.7, undefined],
  ['SHS 60x60x3', 60, 60, 3, 5.19, 6.61, 35.1, 35.1, undefined],
  ['SHS 60x60x4', 60, 60, 4, 6.71, 8.55, 43.6, 43.6, undefined],
  ['SHS 70x70x4', 70, 70, 4, 7.97, 10.1, undefined, undefined, undefined],
  ['SHS 80x80x4', 80, 80, 4, 9.22, 11.7, 111, 111, undefined],
  ['SHS 80x80x5', 80, 80, 5, 11.3, 14.4, 131, 131, undefined],
  ['SHS 90x90x5', 90, 90, 5, 12.8, 16.4, undefined, undefined, undefined],
  ['SHS 100x100x4', 100, 100, 4, 11.7, 14.9, 226, 226, undefined],
  ['SHS 100x100x5', 100, 100, 5, 14.4, 18.4, 271, 271, 441],
  ['SHS 100x100x6', 100, 100, 6, 17.0, 21.6, 311, 311, undefined],
  ['SHS 120x120x5', 120, 120, 5, 17.5, 22.4, 485, 485, undefined],
  ['SHS 120x120x6', 120, 120, 6, 20.7, 26.4, 562, 562, undefined],
  ['SHS 140x140x6', 140, 140, 6, 24.5, 31.2, undefined, undefined, undefined],
  ['SHS 150x150x6', 150, 150, 6, 26.4, 33.6, 1146, 1146, undefined],
  ['SHS 150x150x8', 150, 150, 8, 33.9, 43.2, undefined, undefined, undefined],
  ['SHS 160x160x8', 160, 160, 8, 36.5, 46.4, undefined, undefined, undefined],
  ['SHS 180x180x8', 180, 180, 8, 41.5, 52.8, undefined, undefined, undefined],
  ['SHS 200x200x8', 200, 200, 8, 46.5, 59.2, 3566, 3566, undefined],
  ['SHS 200x200x10', 200, 200, 10, 57.0, 72.6, 4251, 4251, undefined],
];

export const SHS_SECTIONS: readonly SectionEntry[] = SHS_ROWS.map((row) => boxEntry(row, SHS_FAMILY));
