/** What a request may ask of the response's form. */

import { QUANTITY_KINDS, type QuantityKind } from '../quantities.js';
import { z } from './zod.js';

export const DEFAULT_SAMPLES = 101;
export const MAX_SAMPLES = 10001;

const unitMap = z
  .strictObject(
    Object.fromEntries(
      (Object.keys(QUANTITY_KINDS) as QuantityKind[]).map((kind) => [
        kind,
        z.string().min(1).max(32).optional().openapi({ description: `Unit for ${kind} values (SI: ${QUANTITY_KINDS[kind]}).` }),
      ]),
    ) as Record<QuantityKind, z.ZodOptional<z.ZodString>>,
  )
  .openapi('UnitMap', { description: 'A unit per kind of quantity; kinds not named stay SI.', example: { length: 'mm', force: 'kN', moment: 'kN*m', stress: 'MPa' } });

export const outputUnits = z
  .union([z.enum(['SI', 'US']), unitMap])
  .openapi('OutputUnits', {
    description: 'SI (default); US (in, kip, kip*ft, ksi, kip/ft, in^4...); or a unit per kind of quantity. Kinds not named stay SI, except the derived ones, which follow the base units named: deflection the length unit; area, section moduli, second moments, the warping constant and torsional shear per torque its powers (mm^2 ... mm^6, mm^-3); force per length and translational stiffness force over length (kN/mm); moment per length moment over length; rotational stiffness moment per radian. Stress, density and mass per length follow nothing. The response echoes the units used in `units`.',
  });

export const outputOptions = z
  .strictObject({
    samples: z
      .number()
      .int()
      .min(2)
      .max(MAX_SAMPLES)
      .optional()
      .openapi({ description: `Evenly spaced diagram points from 0 to the length, default ${DEFAULT_SAMPLES}, at most ${MAX_SAMPLES}; every node is added, twice where a diagram jumps.` }),
    units: outputUnits.optional(),
    detail: z
      .enum(['full', 'summary'])
      .optional()
      .openapi({ description: 'full (default): everything. summary: the verdict, governing check, checks, reactions and extremes, without the sampled diagrams, the echoed section table and the envelopes of load combinations: a small answer for a configurator or a large batch.' }),
    significantDigits: z
      .number()
      .int()
      .min(1)
      .max(17)
      .optional()
      .openapi({ description: 'Round every presented quantity (lengths, forces, stresses, diagram values...) to this many significant digits; the calculation is not rounded. Utilizations, safety factors and other ratios are never rounded, so a verdict always reads as its number.' }),
  })
  .openapi('OutputOptions');

export type OutputOptions = z.infer<typeof outputOptions>;
