/** Cold-drawn carbon steel bar, AISI/SAE 1018 and 1045, as machine-design handbooks tabulate it. */

import { ductileGrade } from './ductile-grade.js';
import type { MaterialEntry } from '../material-entry.js';
import { lbPerIn3 } from '../sections/us-customary-units.js';

const STANDARD = 'AISI/SAE';

const SOURCE_TAIL =
  'E = 207 GPa, G = 79.3 GPa, nu = 0.292 and weight density 0.282 lbf/in^3 for carbon steel from Shigley ' +
  'Table A-5 (values from memory); shear yield by the distortion-energy theory; strengths in compression ' +
  'taken equal to those in tension (common practice); minimum values, properties of small bars';

const mpa = (value: number): number => value * 1e6;

interface BarGrade {
  readonly grade: string;
  readonly aliases: readonly string[];
  readonly yieldMpa: number;
  readonly tensileMpa: number;
}

// Shigley's Mechanical Engineering Design, 10th ed., Table A-20 (values from memory): Sy, Sut in MPa.
const BAR_GRADES: readonly BarGrade[] = [
  { grade: 'AISI 1018 CD', aliases: ['1018 cold drawn', 'AISI 1018 cold drawn', 'SAE 1018 CD'], yieldMpa: 370, tensileMpa: 440 },
  { grade: 'AISI 1045 CD', aliases: ['1045 cold drawn', 'AISI 1045 cold drawn', 'SAE 1045 CD'], yieldMpa: 530, tensileMpa: 630 },
];

function barEntry(bar: BarGrade): MaterialEntry {
  return ductileGrade({
    grade: bar.grade,
    standard: STANDARD,
    aliases: bar.aliases,
    elasticModulus: 207e9,
    shearModulus: 79.3e9,
    poissonRatio: 0.292,
    yieldStrength: mpa(bar.yieldMpa),
    ultimateStrength: mpa(bar.tensileMpa),
    density: lbPerIn3(0.282),
    source:
      `Shigley's Mechanical Engineering Design, 10th ed., Table A-20, ${bar.grade}: Sy ${bar.yieldMpa} MPa, ` +
      `Sut ${bar.tensileMpa} MPa (values from memory); ${SOURCE_TAIL}`,
    // The cold-drawn strengths hold for bar sizes the table covers; it gives no thickness bands.
    thicknessBands: [],
  });
}

export const AISI_CARBON_BAR_GRADES: readonly MaterialEntry[] = BAR_GRADES.map(barEntry);
