/** Cold-formed circular hollow sections (CHS), common sizes of EN 10219-2, 21.3x2.0 to 323.9x10. */

import type { SectionEntry } from '../section-entry.js';
import { tubeEntry, type TubeRow, type TableFamily } from './table-rows.js';

const CHS_FAMILY: TableFamily = {
  family: 'CHS',
  standard: 'EN 10219-2',
  source:
    'EN 10219-2, circular hollow sections (values from memory, no copy at hand): mass, A, I and ' +
    'It = 2 I are the annulus values for the nominal D and T (7.85 kg/dm^3), rounded as the tables ' +
    'print them; checked against the area and mass computed from the dimensions',
};

// designation, D, T (mm), M (kg/m), A (cm^2), I (cm^4), It (cm^4)
const CHS_ROWS: readonly TubeRow[] = [
  ['CHS 21.3x2.0', 21.3, 2.0, 0.952, 1.21, 0.571, 1.14],
  ['CHS 26.9x2.0', 26.9, 2.0, 1.23, 1.57, 1.22, 2.44],
  ['CHS 33.7x2.6', 33.7, 2.6, 1.99, 2.54, 3.09, 6.19],
  ['CHS 42.4x2.6', 42.4, 2.6, 2.55, 3.25, 6.46, 12.9],
  ['CHS 48.3x3.2', 48.3, 3.2, 3.56, 4.53, 11.6, 23.2],
  ['CHS 60.3x3.2', 60.3, 3.2, 4.51, 5.74, 23.5, 46.9],
  ['CHS 76.1x3.2', 76.1, 3.2, 5.75, 7.33, 48.8, 97.6],
  ['CHS 88.9x3.2', 88.9, 3.2, 6.76, 8.62, 79.2, 158],
  ['CHS 88.9x4.0', 88.9, 4.0, 8.38, 10.7, 96.3, 193],
  ['CHS 114.3x3.6', 114.3, 3.6, 9.83, 12.5, 192, 384],
  ['CHS 114.3x5.0', 114.3, 5.0, 13.5, 17.2, 257, 514],
  ['CHS 139.7x5.0', 139.7, 5.0, 16.6, 21.2, 481, 961],
  ['CHS 168.3x5.0', 168.3, 5.0, 20.1, 25.7, 856, 1712],
  ['CHS 168.3x6.3', 168.3, 6.3, 25.2, 32.1, 1053, 2107],
  ['CHS 193.7x6.3', 193.7, 6.3, 29.1, 37.1, 1630, 3260],
  ['CHS 219.1x6.3', 219.1, 6.3, 33.1, 42.1, 2386, 4772],
  ['CHS 219.1x8.0', 219.1, 8.0, 41.6, 53.1, 2960, 5919],
  ['CHS 244.5x8.0', 244.5, 8.0, 46.7, 59.4, 4160, 8321],
  ['CHS 273.0x8.0', 273.0, 8.0, 52.3, 66.6, 5852, 11700],
  ['CHS 323.9x8.0', 323.9, 8.0, 62.3, 79.4, 9910, 19820],
  ['CHS 323.9x10.0', 323.9, 10.0, 77.4, 98.6, 12160, 24320],
];

export const CHS_SECTIONS: readonly SectionEntry[] = CHS_ROWS.map((row) => tubeEntry(row, CHS_FAMILY));
