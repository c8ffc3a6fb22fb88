/** A material in a request: a catalogue grade, or its properties given directly. */

import { quantity } from './quantity.js';
import { z } from './zod.js';

export const gradeReference = z
  .strictObject({
    grade: z
      .string()
      .min(1)
      .max(64)
      .openapi({ description: 'A catalogue grade ("S355", "A992", "EN AW-6061-T6"); case, spacing and the standard prefix are not significant.', example: 'S355' }),
  })
  .openapi('MaterialGrade', { description: 'A material from the catalogues, by grade. Strengths follow the thickness band of the section\'s thickest element where the standard has bands.' });

export const materialProperties = z
  .strictObject({
    name: z.string().max(64).optional().openapi({ description: 'A label echoed in the response.' }),
    elasticModulus: quantity('stress', "Young's modulus E."),
    shearModulus: quantity('stress', 'Shear modulus G; if absent, E / (2 (1 + poissonRatio)).').optional(),
    poissonRatio: z.number().gt(-1).lt(0.5).optional().openapi({ description: "Poisson's ratio; 0.3 if neither it nor shearModulus is given." }),
    yieldStrength: quantity('stress', 'Yield (or 0.2 % proof) strength in tension.'),
    compressiveYieldStrength: quantity('stress', 'Yield strength in compression; the tensile value if absent.').optional(),
    ultimateStrength: quantity('stress', 'Ultimate tensile strength.'),
    compressiveUltimateStrength: quantity('stress', 'Ultimate compressive strength; the tensile value if absent.').optional(),
    shearYieldRatio: z.number().gt(0).max(1).optional().openapi({ description: 'Shear yield strength / tensile yield strength; 1/sqrt(3) (distortion energy) if absent.' }),
    density: quantity('density', 'Density, for self-weight and mass; 7850 kg/m^3 if absent.').optional(),
    behaviour: z.enum(['ductile', 'brittle']).optional().openapi({ description: 'Ductile (von Mises) or brittle (modified Mohr, ultimate strengths); ductile if absent.' }),
  })
  .openapi('MaterialProperties', { description: 'A material given by its properties.' });

export const materialInput = z
  .union([gradeReference, materialProperties])
  .openapi('MaterialInput', { description: 'A catalogue grade, or the properties of a material.' });

export type MaterialInput = z.infer<typeof materialInput>;
