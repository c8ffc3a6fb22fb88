/**
 * A table of numeric fields, each with its kind of quantity (or 'ratio', dimensionless) and what it is:
 * one table gives both the response schema and the presenter of an engine object.
 */

import { present, type OutputUnits } from '../output-units.js';
import type { QuantityKind } from '../quantities.js';
import { presentedQuantity } from './quantity.js';
import { z } from './zod.js';

export type FieldTable<K extends string> = Readonly<Record<K, { readonly kind: QuantityKind | 'ratio'; readonly description: string }>>;

/** The zod shape of the table's fields, each described with its unit. */
export function fieldTableShape<K extends string>(table: FieldTable<K>): Record<K, z.ZodNumber> {
  return Object.fromEntries(
    Object.entries(table).map(([name, field]) => {
      const { kind, description } = field as FieldTable<K>[K];
      return [name, kind === 'ratio' ? z.number().openapi({ description: `${description} Dimensionless.` }) : presentedQuantity(kind, description)];
    }),
  ) as Record<K, z.ZodNumber>;
}

/** The table's fields of an SI object, in the response's units. */
export function presentFieldTable<K extends string>(table: FieldTable<K>, values: Readonly<Record<K, number>>, units: OutputUnits): Record<K, number> {
  const out = {} as Record<K, number>;
  for (const name of Object.keys(table) as K[]) {
    const kind = table[name].kind;
    out[name] = kind === 'ratio' ? values[name] : present(units, kind, values[name]);
  }
  return out;
}
