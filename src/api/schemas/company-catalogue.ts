/**
 * A company catalogue file: a deployment's own stock sections and material grades, validated with the
 * same schemas as the requests (quantities may carry units).
 */

import { quantity } from './quantity.js';
import { materialProperties } from './material-input.js';
import { shapeInput } from './section-input.js';
import { z } from './zod.js';

const companySection = z.strictObject({
  designation: z.string().min(1).max(64),
  family: z.string().min(1).max(32),
  standard: z.string().max(128).optional(),
  massPerLength: quantity('massPerLength', 'Nominal mass per length.'),
  section: shapeInput,
  source: z.string().max(256).optional(),
});

const { name: _label, ...gradeFields } = materialProperties.shape;

const companyMaterial = z.strictObject({
  grade: z.string().min(1).max(64),
  standard: z.string().max(128).optional(),
  aliases: z.array(z.string().min(1).max(64)).max(16).optional(),
  ...gradeFields,
  thicknessBands: z
    .array(
      z.strictObject({
        maxThickness: quantity('length', 'The band holds elements up to this thickness.'),
        yieldStrength: quantity('stress', 'Yield strength in the band.'),
        ultimateStrength: quantity('stress', 'Ultimate strength in the band.'),
      }),
    )
    .max(16)
    .optional(),
  source: z.string().max(256).optional(),
});

export const companyCatalogueFile = z.strictObject({
  sections: z.array(companySection).max(20000).optional(),
  materials: z.array(companyMaterial).max(2000).optional(),
});

export type CompanyCatalogueFile = z.infer<typeof companyCatalogueFile>;
