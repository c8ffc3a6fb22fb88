/**
 * Non-alloy structural steels of EN 10025-2: S235, S275 and S355, with the minimum upper yield
 * strength ReH and tensile strength Rm by nominal thickness from the standard's Table 7.
 */

import { ductileGrade } from './ductile-grade.js';
import type { MaterialEntry, ThicknessBand } from '../material-entry.js';

const STANDARD = 'EN 10025-2';

const SOURCE =
  'EN 10025-2:2019 Table 7, minimum ReH and the lower limit of Rm by nominal thickness (values from memory, ' +
  'no copy at hand), used as EN 1993-1-1 3.2.1 allows; E = 210 GPa, G = 81 GPa, nu = 0.3 per ' +
  'EN 1993-1-1:2005 3.2.6; density 7850 kg/m^3 (common practice); strengths in compression taken equal ' +
  'to those in tension (common practice)';

/** Millimetres to metres, by division so that 16 mm is the same double as 0.016. */
const mm = (value: number): number => value / 1000;
/** Megapascals to pascals. */
const mpa = (value: number): number => value * 1e6;

/**
 * The largest double below a positive limit: the band model closes every band above, and this turns
 * the standard's open bound "t < 3 mm" into a closed one that excludes 3 mm itself.
 */
function justBelow(limit: number): number {
  const bits = new DataView(new ArrayBuffer(8));
  bits.setFloat64(0, limit);
  bits.setBigUint64(0, bits.getBigUint64(0) - 1n);
  return bits.getFloat64(0);
}

/** Upper limits of Table 7's ReH columns: t <= 16, 16 < t <= 40, ... 200 < t <= 250 mm. */
const YIELD_BAND_LIMITS = [16, 40, 63, 80, 100, 150, 200, 250].map(mm);
/** Upper limits of Table 7's Rm columns: t < 3, 3 <= t <= 100, 100 < t <= 150, 150 < t <= 250 mm. */
const TENSILE_BAND_LIMITS = [justBelow(mm(3)), mm(100), mm(150), mm(250)];

interface GradeTable {
  readonly grade: string;
  /** Quality grades (impact-test classes) and steel numbers with the same strengths. */
  readonly aliases: readonly string[];
  /** ReH (MPa) for each of YIELD_BAND_LIMITS. */
  readonly yieldMpa: readonly number[];
  /** Minimum Rm (MPa) for each of TENSILE_BAND_LIMITS. */
  readonly tensileMpa: readonly number[];
}

const GRADE_TABLES: readonly GradeTable[] = [
  {
    grade: 'S235',
    aliases: ['S235JR', 'S235J0', 'S235J2', '1.0038', '1.0114', '1.0117'],
    yieldMpa: [235, 225, 215, 215, 215, 195, 185, 175],
    tensileMpa: [360, 360, 350, 340],
  },
  {
    grade: 'S275',
    aliases: ['S275JR', 'S275J0', 'S275J2', '1.0044', '1.0143', '1.0145'],
    yieldMpa: [275, 265, 255, 245, 235, 225, 215, 205],
    tensileMpa: [430, 410, 400, 380],
  },
  {
    grade: 'S355',
    aliases: ['S355JR', 'S355J0', 'S355J2', 'S355K2', '1.0045', '1.0553', '1.0577', '1.0596'],
    yieldMpa: [355, 345, 335, 325, 315, 295, 285, 275],
    tensileMpa: [510, 470, 450, 450],
  },
];

/** The value of the first band, among `limits`, that holds `thickness`. */
function valueAt(thickness: number, limits: readonly number[], values: readonly number[]): number {
  const index = limits.findIndex((limit) => thickness <= limit);
  const value = values[index];
  if (value === undefined) throw new Error(`${STANDARD}: no band holds ${thickness} m`);
  return value;
}

/** Table 7 prints ReH and Rm in columns of their own; each band here is one cell of both. */
function thicknessBands(table: GradeTable): ThicknessBand[] {
  const limits = [...new Set([...YIELD_BAND_LIMITS, ...TENSILE_BAND_LIMITS])].sort((a, b) => a - b);
  return limits.map((maxThickness) => ({
    maxThickness,
    yieldStrength: mpa(valueAt(maxThickness, YIELD_BAND_LIMITS, table.yieldMpa)),
    ultimateStrength: mpa(valueAt(maxThickness, TENSILE_BAND_LIMITS, table.tensileMpa)),
  }));
}

/** The entry's own strengths are the grade's nominal ones: ReH for t <= 16 mm, Rm for 3 <= t <= 100 mm. */
function gradeEntry(table: GradeTable): MaterialEntry {
  const yieldStrength = mpa(valueAt(mm(16), YIELD_BAND_LIMITS, table.yieldMpa));
  const ultimateStrength = mpa(valueAt(mm(100), TENSILE_BAND_LIMITS, table.tensileMpa));
  return ductileGrade({
    grade: table.grade,
    standard: STANDARD,
    aliases: table.aliases,
    elasticModulus: 210e9,
    shearModulus: 81e9,
    poissonRatio: 0.3,
    yieldStrength,
    ultimateStrength,
    density: 7850,
    source: SOURCE,
    thicknessBands: thicknessBands(table),
  });
}

export const EN_10025_2_GRADES: readonly MaterialEntry[] = GRADE_TABLES.map(gradeEntry);
