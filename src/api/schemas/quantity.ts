/** The contract's quantity fields: a number in SI units or a string with a unit. */

import { example, QUANTITY_KINDS, type QuantityKind } from '../quantities.js';
import { z } from './zod.js';

/**
 * A dimensional input. The normaliser converts it to SI; the schema checks only its shape, so an
 * error in the unit is reported with the field's pointer by the normaliser.
 */
export function quantity(kind: QuantityKind, description: string) {
  return z
    .union([z.number(), z.string().min(1).max(64)])
    .openapi({
      description: `${description} A number in ${QUANTITY_KINDS[kind]}, or a string with a unit, e.g. "${example(kind)}".`,
      example: example(kind),
    });
}

/** A dimensional output, always a number in the response's units for its kind. */
export function presentedQuantity(kind: QuantityKind, description: string) {
  return z.number().openapi({ description: `${description} In the response's ${kind} unit (SI: ${QUANTITY_KINDS[kind]}).` });
}

export type QuantityInput = z.infer<ReturnType<typeof quantity>>;
