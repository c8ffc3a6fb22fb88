/**
 * Whether a material is a structural steel, to which the EN 1993 design curves and plate limits apply:
 * ductile, with E near 210 GPa. Other materials (aluminium, cast iron) get the elastic methods, or have
 * the steel-only modes left unchecked.
 */

import type { Material } from '../materials/material.js';

/** E of the steels EN 1993 was written for lies in this range (common practice: 190 to 220 GPa). */
const STEEL_MODULUS_RANGE = [190e9, 220e9] as const;

export function isStructuralSteel(material: Pick<Material, 'behaviour' | 'elasticModulus'>): boolean {
  return material.behaviour === 'ductile' && material.elasticModulus >= STEEL_MODULUS_RANGE[0] && material.elasticModulus <= STEEL_MODULUS_RANGE[1];
}

/**
 * The yield strength that gives, through EN 1993's eps = sqrt(235 MPa / fy), the same plate slenderness
 * limit for a material of another stiffness: plate buckling scales with sqrt(E / fy), so fy E_steel / E.
 */
export function steelEquivalentYieldStrength(material: Pick<Material, 'yieldStrength' | 'elasticModulus'>): number {
  return (material.yieldStrength * 210e9) / material.elasticModulus;
}
