/**
 * Austenitic stainless steels 304 (1.4301) and 316 (1.4401), annealed, at the ASTM A240 plate and sheet
 * minimums; the EN 10088 numbers and names are aliases.
 */

import { ductileGrade } from './ductile-grade.js';
import type { MaterialEntry } from '../material-entry.js';

const STANDARD = 'ASTM A240/A240M';

const SOURCE_TAIL =
  'E = 193 GPa, nu = 0.29 and density 8000 kg/m^3 as typical datasheet values (common practice), ' +
  'G = E / (2 (1 + nu)); strengths in compression taken equal to those in tension (common practice), ' +
  'though annealed austenitic steel work-hardens and has no sharp yield; EN 10088-2 gives higher minimums ' +
  '(1.4301 cold-rolled strip Rp0.2 230 MPa, Rm 540 MPa, as recalled), so these are the lower of the two';

const mpa = (value: number): number => value * 1e6;
const ELASTIC_MODULUS = 193e9;
const POISSON_RATIO = 0.29;

interface StainlessGrade {
  readonly grade: string;
  readonly aliases: readonly string[];
}

// ASTM A240/A240M tensile requirements (values from memory): both types Rp0.2 >= 205 MPa (30 ksi), Rm >= 515 MPa (75 ksi).
const STAINLESS_GRADES_TABLE: readonly StainlessGrade[] = [
  { grade: 'AISI 304', aliases: ['1.4301', 'X5CrNi18-10', 'UNS S30400', '304 annealed'] },
  { grade: 'AISI 316', aliases: ['1.4401', 'X5CrNiMo17-12-2', 'UNS S31600', '316 annealed'] },
];

function stainlessEntry(grade: StainlessGrade): MaterialEntry {
  return ductileGrade({
    grade: grade.grade,
    standard: STANDARD,
    aliases: grade.aliases,
    elasticModulus: ELASTIC_MODULUS,
    shearModulus: ELASTIC_MODULUS / (2 * (1 + POISSON_RATIO)),
    poissonRatio: POISSON_RATIO,
    yieldStrength: mpa(205),
    ultimateStrength: mpa(515),
    density: 8000,
    source:
      `ASTM A240/A240M tensile requirements, type ${grade.grade.replace('AISI ', '')} annealed: 0.2 % proof ` +
      `205 MPa, tensile 515 MPa minimum (values from memory); ${SOURCE_TAIL}`,
    thicknessBands: [],
  });
}

export const STAINLESS_GRADES: readonly MaterialEntry[] = STAINLESS_GRADES_TABLE.map(stainlessEntry);
