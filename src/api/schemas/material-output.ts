/** A resolved material in a response. */

import type { Material } from '../../engine/materials/material.js';
import { fieldTableShape, type FieldTable } from './field-table.js';
import { z } from './zod.js';

type NumericMaterialField = { [K in keyof Material]-?: Material[K] extends number ? K : never }[keyof Material];

export const MATERIAL_FIELDS: FieldTable<NumericMaterialField> = {
  elasticModulus: { kind: 'stress', description: "Young's modulus E." },
  shearModulus: { kind: 'stress', description: 'Shear modulus G.' },
  poissonRatio: { kind: 'ratio', description: "Poisson's ratio." },
  yieldStrength: { kind: 'stress', description: 'Yield strength in tension (for the thickness band used).' },
  compressiveYieldStrength: { kind: 'stress', description: 'Yield strength in compression.' },
  ultimateStrength: { kind: 'stress', description: 'Ultimate tensile strength.' },
  compressiveUltimateStrength: { kind: 'stress', description: 'Ultimate compressive strength.' },
  shearYieldRatio: { kind: 'ratio', description: 'Shear yield strength / tensile yield strength.' },
  density: { kind: 'density', description: 'Density.' },
};

const numeric = fieldTableShape(MATERIAL_FIELDS);

export const materialOutput = z
  .object({
    grade: z.string().openapi({ description: 'The grade ("S355"), or the name given to a material stated in the request.' }),
    standard: z.string().openapi({ description: 'The standard the grade belongs to.' }),
    ...numeric,
    behaviour: z.enum(['ductile', 'brittle']).openapi({ description: 'ductile: von Mises and yield strengths; brittle: modified Mohr and ultimate strengths.' }),
    source: z.string().openapi({ description: 'Where the values come from.' }),
  })
  .openapi('Material');
