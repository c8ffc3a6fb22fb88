/**
 * ASME B36.10M welded and seamless wrought steel pipe, NPS 1/8 to NPS 24 (NPS 22 has no Schedule 40
 * and is left out), Schedules 40 and 80. Designations "NPS 2 SCH 40"; where a schedule has the same
 * wall as the STD or XS weight class the source says so.
 */

import type { SectionEntry } from '../section-entry.js';
import { in2, inch } from './us-customary-units.js';

const STANDARD = 'ASME B36.10M';

/**
 * One row of the standard's pipe table in both of its unit systems: outside diameter (in, mm), wall
 * (in, mm) and the plain-end mass it prints (kg/m), plus the metal area (in^2) of common pipe data
 * tables. The standard's mass is (D - t) t x 0.02466 kg/m with D and t in mm, i.e. density 7850 kg/m^3.
 */
export type PipeScheduleRow = readonly [
  nominalPipeSize: string,
  outsideDiameterIn: number,
  outsideDiameterMm: number,
  schedule: 40 | 80,
  wallThicknessIn: number,
  wallThicknessMm: number,
  massKgPerM: number,
  metalAreaIn2: number,
  weightClass: 'STD' | 'XS' | undefined,
];

// NPS, OD (in), OD (mm), schedule, wall (in), wall (mm), plain-end mass (kg/m), metal area (in^2), weight class.
export const PIPE_SCHEDULE_ROWS: readonly PipeScheduleRow[] = [
  ['1/8', 0.405, 10.3, 40, 0.068, 1.73, 0.37, 0.072, 'STD'],
  ['1/8', 0.405, 10.3, 80, 0.095, 2.41, 0.47, 0.093, 'XS'],
  ['1/4', 0.540, 13.7, 40, 0.088, 2.24, 0.63, 0.125, 'STD'],
  ['1/4', 0.540, 13.7, 80, 0.119, 3.02, 0.80, 0.157, 'XS'],
  ['3/8', 0.675, 17.1, 40, 0.091, 2.31, 0.84, 0.167, 'STD'],
  ['3/8', 0.675, 17.1, 80, 0.126, 3.20, 1.10, 0.217, 'XS'],
  ['1/2', 0.840, 21.3, 40, 0.109, 2.77, 1.27, 0.250, 'STD'],
  ['1/2', 0.840, 21.3, 80, 0.147, 3.73, 1.62, 0.320, 'XS'],
  ['3/4', 1.050, 26.7, 40, 0.113, 2.87, 1.69, 0.333, 'STD'],
  ['3/4', 1.050, 26.7, 80, 0.154, 3.91, 2.20, 0.433, 'XS'],
  ['1', 1.315, 33.4, 40, 0.133, 3.38, 2.50, 0.494, 'STD'],
  ['1', 1.315, 33.4, 80, 0.179, 4.55, 3.24, 0.639, 'XS'],
  ['1-1/4', 1.660, 42.2, 40, 0.140, 3.56, 3.39, 0.669, 'STD'],
  ['1-1/4', 1.660, 42.2, 80, 0.191, 4.85, 4.47, 0.881, 'XS'],
  ['1-1/2', 1.900, 48.3, 40, 0.145, 3.68, 4.05, 0.799, 'STD'],
  ['1-1/2', 1.900, 48.3, 80, 0.200, 5.08, 5.41, 1.068, 'XS'],
  ['2', 2.375, 60.3, 40, 0.154, 3.91, 5.44, 1.075, 'STD'],
  ['2', 2.375, 60.3, 80, 0.218, 5.54, 7.48, 1.477, 'XS'],
  ['2-1/2', 2.875, 73.0, 40, 0.203, 5.16, 8.63, 1.704, 'STD'],
  ['2-1/2', 2.875, 73.0, 80, 0.276, 7.01, 11.41, 2.254, 'XS'],
  ['3', 3.500, 88.9, 40, 0.216, 5.49, 11.29, 2.228, 'STD'],
  ['3', 3.500, 88.9, 80, 0.300, 7.62, 15.27, 3.016, 'XS'],
  ['3-1/2', 4.000, 101.6, 40, 0.226, 5.74, 13.57, 2.680, 'STD'],
  ['3-1/2', 4.000, 101.6, 80, 0.318, 8.08, 18.63, 3.678, 'XS'],
  ['4', 4.500, 114.3, 40, 0.237, 6.02, 16.07, 3.174, 'STD'],
  ['4', 4.500, 114.3, 80, 0.337, 8.56, 22.32, 4.407, 'XS'],
  ['5', 5.563, 141.3, 40, 0.258, 6.55, 21.77, 4.300, 'STD'],
  ['5', 5.563, 141.3, 80, 0.375, 9.53, 30.97, 6.112, 'XS'],
  ['6', 6.625, 168.3, 40, 0.280, 7.11, 28.26, 5.581, 'STD'],
  ['6', 6.625, 168.3, 80, 0.432, 10.97, 42.56, 8.405, 'XS'],
  ['8', 8.625, 219.1, 40, 0.322, 8.18, 42.55, 8.399, 'STD'],
  ['8', 8.625, 219.1, 80, 0.500, 12.70, 64.64, 12.76, 'XS'],
  ['10', 10.750, 273.1, 40, 0.365, 9.27, 60.31, 11.91, 'STD'],
  ['10', 10.750, 273.1, 80, 0.594, 15.09, 95.98, 18.92, undefined],
  ['12', 12.750, 323.8, 40, 0.406, 10.31, 79.73, 15.74, undefined],
  ['12', 12.750, 323.8, 80, 0.688, 17.48, 132.08, 26.03, undefined],
  ['14', 14.000, 355.6, 40, 0.438, 11.13, 94.55, 18.62, undefined],
  ['14', 14.000, 355.6, 80, 0.750, 19.05, 158.11, 31.22, undefined],
  ['16', 16.000, 406.4, 40, 0.500, 12.70, 123.31, 24.35, 'XS'],
  ['16', 16.000, 406.4, 80, 0.844, 21.44, 203.54, 40.14, undefined],
  ['18', 18.000, 457, 40, 0.562, 14.27, 155.81, 30.79, undefined],
  ['18', 18.000, 457, 80, 0.938, 23.83, 254.57, 50.23, undefined],
  ['20', 20.000, 508, 40, 0.594, 15.09, 183.43, 36.15, undefined],
  ['20', 20.000, 508, 80, 1.031, 26.19, 311.19, 61.44, undefined],
  ['24', 24.000, 610, 40, 0.688, 17.48, 255.43, 50.31, undefined],
  ['24', 24.000, 610, 80, 1.219, 30.96, 441.88, 87.18, undefined],
];

function pipeEntry(row: PipeScheduleRow): SectionEntry {
  const [nps, outsideDiameter, , schedule, wallThickness, , mass, metalArea, weightClass] = row;
  const sameAs = weightClass === undefined ? '' : ` (same wall as ${weightClass})`;
  return {
    designation: `NPS ${nps} SCH ${schedule}`,
    family: 'PIPE',
    standard: STANDARD,
    // The inch dimensions are the defining ones; the mm columns are their rounded conversions.
    dimensions: { shape: 'tube', outerDiameter: inch(outsideDiameter), wallThickness: inch(wallThickness) },
    massPerLength: mass,
    tabulated: { area: in2(metalArea) },
    source:
      `ASME B36.10M pipe dimensions table, NPS ${nps} Schedule ${schedule}${sameAs}: OD, wall and plain-end ` +
      'mass (values from memory, no copy at hand); metal area as printed in common pipe data tables ' +
      '(values from memory); checked against pi (D - t) t and 7850 kg/m^3',
  };
}

export const PIPES: readonly SectionEntry[] = PIPE_SCHEDULE_ROWS.map(pipeEntry);
