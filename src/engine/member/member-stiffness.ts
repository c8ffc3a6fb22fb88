/** The member's rigidities from its section and material: EA, EIz, EIy and GJ. */

import type { Material } from '../materials/material.js';
import type { SectionProperties } from '../sections/section-properties.js';
import type { MemberStiffness } from './model.js';

export function memberStiffness(
  section: Pick<SectionProperties, 'area' | 'secondMomentZ' | 'secondMomentY' | 'torsionConstant'>,
  material: Pick<Material, 'elasticModulus' | 'shearModulus'>,
): MemberStiffness {
  return {
    axial: material.elasticModulus * section.area,
    bendingZ: material.elasticModulus * section.secondMomentZ,
    bendingY: material.elasticModulus * section.secondMomentY,
    torsional: material.shearModulus * section.torsionConstant,
  };
}
