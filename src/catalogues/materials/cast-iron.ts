/**
 * Grey cast iron ASTM A48 Class 30: brittle, far stronger in compression than in tension, with no
 * yield point. The checks of a brittle material use its ultimate strengths, so the entry sets
 * yieldStrength = ultimateStrength (tension) and compressiveYieldStrength = compressiveUltimateStrength.
 */

import type { MaterialEntry } from '../material-entry.js';
import { ksi, lbPerIn3, mpsi } from '../sections/us-customary-units.js';

// Shigley's Mechanical Engineering Design, 10th ed., Table A-24, Class 30 (values from memory).
const TENSILE_ULTIMATE = ksi(31);
const COMPRESSIVE_ULTIMATE = ksi(109);
// The table gives ranges, E 13.0-16.4 Mpsi and G 5.2-6.6 Mpsi; the lower ends are taken (stiffness
// is stress-dependent in grey iron, and the lower value gives the larger deflection).
const ELASTIC_MODULUS = mpsi(13.0);
const SHEAR_MODULUS = mpsi(5.2);

export const CAST_IRON_GRADES: readonly MaterialEntry[] = [
  {
    grade: 'ASTM A48 Class 30',
    standard: 'ASTM A48/A48M',
    aliases: ['A48 Cl 30', 'A48 30', 'Class 30 grey iron', 'Class 30 gray iron'],
    elasticModulus: ELASTIC_MODULUS,
    shearModulus: SHEAR_MODULUS,
    // nu = E / (2 G) - 1 from the two lower ends, 13.0 / 10.4 - 1 = 0.25.
    poissonRatio: ELASTIC_MODULUS / (2 * SHEAR_MODULUS) - 1,
    yieldStrength: TENSILE_ULTIMATE,
    compressiveYieldStrength: COMPRESSIVE_ULTIMATE,
    ultimateStrength: TENSILE_ULTIMATE,
    compressiveUltimateStrength: COMPRESSIVE_ULTIMATE,
    // Modified Mohr (Shigley 10th ed., eq. 5-32a) puts failure in pure shear at tau = Sut; Table A-24's
    // torsional modulus of rupture (about 40 ksi for Class 30) is higher, so 1 is on the safe side.
    shearYieldRatio: 1,
    density: lbPerIn3(0.26),
    behaviour: 'brittle',
    source:
      "Shigley's Mechanical Engineering Design, 10th ed., Table A-24, ASTM A48 Class 30: Sut 31 ksi, Suc 109 ksi, " +
      'E 13.0 Mpsi and G 5.2 Mpsi (lower ends of the ranges); weight density 0.260 lbf/in^3 for grey cast iron ' +
      'from Table A-5 (values from memory); brittle, no yield: yieldStrength is the tensile ultimate and ' +
      'compressiveYieldStrength the compressive ultimate, as the brittle checks use ultimates; A48 classes ' +
      'rate separately cast test bars, and heavy sections of a casting are weaker',
    thicknessBands: [],
  },
];
