/** Presenting a material in the response's units. */

import type { Material } from '../../engine/materials/material.js';
import type { OutputUnits } from '../output-units.js';
import { presentFieldTable } from '../schemas/field-table.js';
import { MATERIAL_FIELDS } from '../schemas/material-output.js';

export function presentMaterial(material: Material, units: OutputUnits) {
  const numeric = presentFieldTable(MATERIAL_FIELDS, material, units);
  return { grade: material.grade, standard: material.standard, ...numeric, behaviour: material.behaviour, source: material.source };
}
