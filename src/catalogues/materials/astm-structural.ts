/**
 * ASTM structural steels as AISC practice uses them: A36, A572 Grade 50, A992 and A500 Grades B and C
 * (round and shaped hollow sections separately, as A500 gives them different yield strengths).
 */

import { ductileGrade } from './ductile-grade.js';
import type { MaterialEntry } from '../material-entry.js';
import { ksi, lbPerFt3 } from '../sections/us-customary-units.js';

const ELASTIC_CONSTANTS =
  'E = 29,000 ksi and G = 11,200 ksi as AISC 360-16 defines them in its list of symbols; ' +
  'nu = 0.3 (common practice); density 490 lb/ft^3, the basis of the AISC Manual weights; strengths in ' +
  'compression taken equal to those in tension (common practice); SI converted exactly from ksi';

interface AstmGrade {
  readonly grade: string;
  readonly standard: string;
  readonly aliases: readonly string[];
  readonly yieldKsi: number;
  readonly tensileKsi: number;
  /** Table and scope notes of the standard. */
  readonly note: string;
}

const ASTM_GRADES: readonly AstmGrade[] = [
  {
    grade: 'A36',
    standard: 'ASTM A36/A36M',
    aliases: [],
    yieldKsi: 36,
    tensileKsi: 58,
    note:
      'ASTM A36/A36M tensile requirements: Fy 36 ksi, Fu 58-80 ksi (minimum taken) for shapes and for plates up to ' +
      '8 in; plates over 8 in have Fy 32 ksi, which this entry does not cover',
  },
  {
    grade: 'A572 Gr 50',
    standard: 'ASTM A572/A572M',
    aliases: ['A572 Grade 50', 'A572-50', 'A572 50'],
    yieldKsi: 50,
    tensileKsi: 65,
    note:
      'ASTM A572/A572M tensile requirements, Grade 50: Fy 50 ksi, Fu 65 ksi; shapes of all groups, plates and bars up ' +
      'to 4 in thick (thicker plates are outside the grade)',
  },
  {
    grade: 'A992',
    standard: 'ASTM A992/A992M',
    aliases: [],
    yieldKsi: 50,
    tensileKsi: 65,
    note: 'ASTM A992/A992M tensile requirements: Fy 50-65 ksi, Fu 65 ksi minimum, Fy/Fu <= 0.85; structural shapes only',
  },
  {
    grade: 'A500 Gr B (round)',
    standard: 'ASTM A500/A500M',
    // A bare "A500 Gr B" reads as round: its yield is the lower, so it is safe for either shape.
    aliases: ['A500 Grade B round', 'A500 Gr B', 'A500 Grade B'],
    yieldKsi: 42,
    tensileKsi: 58,
    note: 'ASTM A500/A500M (recent editions, as recalled) tensile requirements, Grade B round: Fy 42 ksi, Fu 58 ksi',
  },
  {
    grade: 'A500 Gr B (shaped)',
    standard: 'ASTM A500/A500M',
    aliases: ['A500 Gr B (rectangular)', 'A500 Gr B (square)', 'A500 Grade B shaped', 'A500 Grade B rectangular'],
    yieldKsi: 46,
    tensileKsi: 58,
    note: 'ASTM A500/A500M (recent editions, as recalled) tensile requirements, Grade B shaped (square, rectangular): Fy 46 ksi, Fu 58 ksi',
  },
  {
    grade: 'A500 Gr C (round)',
    standard: 'ASTM A500/A500M',
    // As for Grade B, a bare "A500 Gr C" reads as the lower-yield round tube.
    aliases: ['A500 Grade C round', 'A500 Gr C', 'A500 Grade C'],
    yieldKsi: 46,
    tensileKsi: 62,
    note: 'ASTM A500/A500M (recent editions, as recalled) tensile requirements, Grade C round: Fy 46 ksi, Fu 62 ksi',
  },
  {
    grade: 'A500 Gr C (shaped)',
    standard: 'ASTM A500/A500M',
    aliases: ['A500 Gr C (rectangular)', 'A500 Gr C (square)', 'A500 Grade C shaped', 'A500 Grade C rectangular'],
    yieldKsi: 50,
    tensileKsi: 62,
    note: 'ASTM A500/A500M (recent editions, as recalled) tensile requirements, Grade C shaped (square, rectangular): Fy 50 ksi, Fu 62 ksi',
  },
];

function astmEntry(grade: AstmGrade): MaterialEntry {
  return ductileGrade({
    grade: grade.grade,
    standard: grade.standard,
    aliases: grade.aliases,
    elasticModulus: ksi(29000),
    shearModulus: ksi(11200),
    poissonRatio: 0.3,
    yieldStrength: ksi(grade.yieldKsi),
    ultimateStrength: ksi(grade.tensileKsi),
    density: lbPerFt3(490),
    source: `${grade.note} (values from memory); ${ELASTIC_CONSTANTS}`,
    // The ASTM limits are by product (plate or shape), not by element thickness, so no bands.
    thicknessBands: [],
  });
}

export const ASTM_STRUCTURAL_GRADES: readonly MaterialEntry[] = ASTM_GRADES.map(astmEntry);
