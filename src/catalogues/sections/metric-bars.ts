/**
 * Metric solid bars: round bars of 10 to 100 mm and flat bars of 20x5 to 200x20 mm.
 *
 * Naming: the designations "RD d" (round bar of diameter d mm, e.g. "RD 20") and "FL b x t" (flat
 * bar b mm wide and t mm thick, e.g. "FL 100x10") are this service's own company-neutral naming;
 * the sizes are common stock sizes of the hot-rolled bar standards (EN 10060 round, EN 10058 flat).
 * A flat bar stands on edge: its width b is the depth along y, so bending about z is about the strong
 * axis as for every other catalogue section.
 */

import type { SectionEntry } from '../section-entry.js';
import { mm, type TableFamily } from './table-rows.js';

const ROUND_FAMILY: TableFamily = {
  family: 'ROUND',
  standard: 'EN 10060 (sizes); designation is Memberproof naming',
  source:
    'Stock diameters of EN 10060 (from memory); mass is 7850 kg/m^3 times the nominal area, rounded ' +
    'to 3 significant figures (it agrees with the remembered EN 10060 table masses)',
};

const FLAT_FAMILY: TableFamily = {
  family: 'FLAT',
  standard: 'EN 10058 (sizes); designation is Memberproof naming',
  source:
    'Stock sizes of EN 10058 (from memory); mass is 7850 kg/m^3 times the nominal area b t, rounded ' +
    'to 3 significant figures',
};

// designation, d (mm), M (kg/m)
type RoundBarRow = readonly [designation: string, diameterMm: number, massKgPerM: number];

const ROUND_ROWS: readonly RoundBarRow[] = [
  ['RD 10', 10, 0.617],
  ['RD 12', 12, 0.888],
  ['RD 16', 16, 1.58],
  ['RD 20', 20, 2.47],
  ['RD 25', 25, 3.85],
  ['RD 30', 30, 5.55],
  ['RD 40', 40, 9.86],
  ['RD 50', 50, 15.4],
  ['RD 60', 60, 22.2],
  ['RD 70', 70, 30.2],
  ['RD 80', 80, 39.5],
  ['RD 100', 100, 61.7],
];

// designation, b, t (mm), M (kg/m)
type FlatBarRow = readonly [designation: string, widthMm: number, thicknessMm: number, massKgPerM: number];

const FLAT_ROWS: readonly FlatBarRow[] = [
  ['FL 20x5', 20, 5, 0.785],
  ['FL 25x5', 25, 5, 0.981],
  ['FL 30x6', 30, 6, 1.41],
  ['FL 40x5', 40, 5, 1.57],
  ['FL 40x8', 40, 8, 2.51],
  ['FL 50x6', 50, 6, 2.36],
  ['FL 50x10', 50, 10, 3.93],
  ['FL 60x8', 60, 8, 3.77],
  ['FL 80x8', 80, 8, 5.02],
  ['FL 80x10', 80, 10, 6.28],
  ['FL 100x10', 100, 10, 7.85],
  ['FL 100x12', 100, 12, 9.42],
  ['FL 120x12', 120, 12, 11.3],
  ['FL 150x15', 150, 15, 17.7],
  ['FL 200x20', 200, 20, 31.4],
];

export const ROUND_BARS: readonly SectionEntry[] = ROUND_ROWS.map(([designation, d, mass]) => ({
  designation,
  ...ROUND_FAMILY,
  dimensions: { shape: 'round', diameter: mm(d) },
  massPerLength: mass,
  tabulated: {},
}));

export const FLAT_BARS: readonly SectionEntry[] = FLAT_ROWS.map(([designation, b, t, mass]) => ({
  designation,
  ...FLAT_FAMILY,
  dimensions: { shape: 'rectangle', depth: mm(b), width: mm(t) },
  massPerLength: mass,
  tabulated: {},
}));
