/**
 * Wrought aluminium alloys of EN 573-3 in temper T6, as extruded profiles: EN AW-6061-T6, 6063-T6 and
 * 6082-T6, with the 0.2 % proof strength fo and tensile strength fu by wall thickness.
 */

import { ductileGrade } from './ductile-grade.js';
import type { MaterialEntry, ThicknessBand } from '../material-entry.js';

const STANDARD = 'EN 573-3 / EN 755-2';

const SOURCE_TAIL =
  'parent metal only (welds and their heat-affected zones are weaker, EN 1999-1-1 Table 3.2b rho_o,haz); ' +
  'E = 70 GPa, G = 27 GPa, nu = 0.3, density 2700 kg/m^3 per EN 1999-1-1:2007 3.2.5; shear yield fo / sqrt(3) ' +
  'as in EN 1999-1-1 6.2.6; strengths in compression taken equal to those in tension (common practice)';

const mm = (value: number): number => value / 1000;
const mpa = (value: number): number => value * 1e6;

interface AlloyTable {
  readonly grade: string;
  readonly aliases: readonly string[];
  /** [maximum wall thickness mm, fo MPa, fu MPa], ascending by thickness. */
  readonly bands: readonly (readonly [number, number, number])[];
  readonly note: string;
}

const ALLOY_TABLES: readonly AlloyTable[] = [
  {
    grade: 'EN AW-6061-T6',
    aliases: ['EN AW-AlMg1SiCu-T6', 'AlMg1SiCu T6'],
    bands: [[25, 240, 260]],
    note: 'EN 1999-1-1:2007 Table 3.2b (after EN 755-2), 6061 T6 extruded profiles t <= 25 mm: fo 240 MPa, fu 260 MPa',
  },
  {
    grade: 'EN AW-6063-T6',
    aliases: ['EN AW-AlMg0.7Si-T6', 'AlMg0.7Si T6'],
    bands: [
      [10, 170, 215],
      [25, 160, 195],
    ],
    note:
      'EN 1999-1-1:2007 Table 3.2b (after EN 755-2), 6063 T6 extruded profiles: t <= 10 mm fo 170 / fu 215 MPa, ' +
      '10 < t <= 25 mm fo 160 / fu 195 MPa',
  },
  {
    grade: 'EN AW-6082-T6',
    aliases: ['EN AW-AlSi1MgMn-T6', 'AlSi1MgMn T6'],
    bands: [
      [5, 250, 290],
      [15, 260, 310],
    ],
    note:
      'EN 1999-1-1:2007 Table 3.2b (after EN 755-2), 6082 T6 extruded open and hollow profiles: t <= 5 mm ' +
      'fo 250 / fu 290 MPa, 5 < t <= 15 mm fo 260 / fu 310 MPa',
  },
];

/** The entry's own strengths are those of its thinnest band (for 6082 also the lower ones). */
function alloyEntry(table: AlloyTable): MaterialEntry {
  const bands: ThicknessBand[] = table.bands.map(([maxMm, proofMpa, tensileMpa]) => ({
    maxThickness: mm(maxMm),
    yieldStrength: mpa(proofMpa),
    ultimateStrength: mpa(tensileMpa),
  }));
  const thinnest = bands[0];
  if (thinnest === undefined) throw new Error(`${table.grade} has no thickness band`);
  return ductileGrade({
    grade: table.grade,
    standard: STANDARD,
    aliases: table.aliases,
    elasticModulus: 70e9,
    shearModulus: 27e9,
    poissonRatio: 0.3,
    yieldStrength: thinnest.yieldStrength,
    ultimateStrength: thinnest.ultimateStrength,
    density: 2700,
    source: `${table.note} (values from memory, no copy at hand); ${SOURCE_TAIL}`,
    thicknessBands: bands,
  });
}

export const ALUMINIUM_GRADES: readonly MaterialEntry[] = ALLOY_TABLES.map(alloyEntry);
