/**
 * Cold-formed rectangular hollow sections (RHS), common sizes of EN 10219-2, 60x40x3 to 300x200x10.
 * The designation reads H x B x T; H lies along y, so secondMomentZ is about the strong axis.
 */

import type { SectionEntry } from '../section-entry.js';
import { boxEntry, type BoxRow, type TableFamily } from './table-rows.js';

const RHS_FAMILY: TableFamily = {
  family: 'RHS',
  standard: 'EN 10219-2',
  source:
    'EN 10219-2, rectangular hollow sections (values from memory, no copy at hand): mass and A are ' +
    'the standard\'s Annex B nominal area (and 7.85 kg/dm^3) rounded to 3 significant figures as the ' +
    'tables print them; second moments only where a remembered table value agreed with that geometry',
};

// designation, H, B, T (mm), M (kg/m), A (cm^2), I strong (about the axis parallel to B), I weak, It (cm^4)
const RHS_ROWS: readonly BoxRow[] = [
  ['RHS 60x40x3', 60, 40, 3, 4.25, 5.41, 25.4, 13.4, undefined],
  ['RHS 80x40x3', 80, 40, 3, 5.19, 6.61, 52.3, 17.6, undefined],
  ['RHS 80x40x4', 80, 40, 4, 6.71, 8.55, undefined, undefined, undefined],
  ['RHS 100x50x4', 100, 50, 4, 8.59, 10.9, 134, 44.9, undefined],
  ['RHS 100x50x5', 100, 50, 5, 10.5, 13.4, undefined, undefined, undefined],
  ['RHS 100x60x4', 100, 60, 4, 9.22, 11.7, undefined, undefined, undefined],
  ['RHS 120x60x4', 120, 60, 4, 10.5, 13.3, 241, 81.2, undefined],
  ['RHS 120x80x5', 120, 80, 5, 14.4, 18.4, 353, 188, undefined],
  ['RHS 150x100x5', 150, 100, 5, 18.3, 23.4, 719, 384, undefined],
  ['RHS 160x80x5', 160, 80, 5, 17.5, 22.4, 722, 244, undefined],
  ['RHS 200x100x6', 200, 100, 6, 26.4, 33.6, 1703, 577, undefined],
  ['RHS 200x100x8', 200, 100, 8, 33.9, 43.2, undefined, undefined, undefined],
  ['RHS 250x150x8', 250, 150, 8, 46.5, 59.2, 4886, 2219, undefined],
  ['RHS 250x150x10', 250, 150, 10, 57.0, 72.6, undefined, undefined, undefined],
  ['RHS 300x200x10', 300, 200, 10, 72.7, 92.6, 11310, 6058, undefined],
];

export const RHS_SECTIONS: readonly SectionEntry[] = RHS_ROWS.map((row) => boxEntry(row, RHS_FAMILY));
