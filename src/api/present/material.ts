/** Presenting a material in the response's units. */

import type { Material } from '../../engine/materials/material.js';
import { present, type OutputUnits } from '../output-units.js';
import { MATERIAL_FIELDS } from '../schemas/material-output.js';

export function presentMaterial(material: Material, units: OutputUnits) {
  const numeric = Object.fromEntries(
    Object.entries(MATERIAL_FIELDS).map(([name, field]) => {
      const value = material[name as keyof typeof MATERIAL_FIELDS];
      return [name, field.kind === 'ratio' ? value : present(units, field.kind, value)];
    }),
  ) as Record<keyof typeof MATERIAL_FIELDS, number>;
  return { grade: material.grade, standard: material.standard, ...numeric, behaviour: material.behaviour, source: material.source };
}
