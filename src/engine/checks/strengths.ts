/**
 * The strengths a material's stresses are compared with. A ductile material is checked against its
 * yield strengths; a brittle one (no yield) against its ultimate strengths.
 */

import type { Material } from '../materials/material.js';

export interface Strength {
  /** Pa */
  readonly value: number;
  /** Its symbol in a basis line: "Sy", "Syc", "Sut", "Suc", "Ssy". */
  readonly symbol: string;
}

export interface MaterialStrengths {
  readonly tension: Strength;
  readonly compression: Strength;
  readonly shear: Strength;
}

/**
 * Shear: ductile, Ssy = shearYieldRatio * Sy (distortion energy gives 1/sqrt(3), Shigley 10th ed.,
 * eq. 5-21, from memory); brittle, Sut, since in pure shear (sigma1 = tau, sigma3 = -tau) the modified-Mohr
 * criterion reduces to tau = Sut (Shigley 10th ed., sec. 5-9, from memory).
 */
export function materialStrengths(material: Material, shearYieldRatio: number): MaterialStrengths {
  if (material.behaviour === 'brittle') {
    return {
      tension: { value: material.ultimateStrength, symbol: 'Sut' },
      compression: { value: material.compressiveUltimateStrength, symbol: 'Suc' },
      shear: { value: material.ultimateStrength, symbol: 'Sut' },
    };
  }
  return {
    tension: { value: material.yieldStrength, symbol: 'Sy' },
    compression: { value: material.compressiveYieldStrength, symbol: 'Syc' },
    shear: { value: shearYieldRatio * material.yieldStrength, symbol: 'Ssy' },
  };
}
