/**
 * What a member figure is drawn from: the member, its loads, the sampled diagrams and their exact
 * extremes, every value already in the answer's presented units. The renderer converts nothing and
 * computes no engineering quantity; it only places what it is given.
 */

import { DIAGRAM_FIELDS, type DiagramField } from '../engine/analysis/result.js';

/** The diagrams a figure knows: the answer's, with the same names and sign conventions. */
export const FIGURE_FIELDS = DIAGRAM_FIELDS;

export type FigureField = DiagramField;

export type SupportKind = 'fixed' | 'pinned' | 'roller' | 'bearing' | 'torsion-restraint' | 'general';

export interface FigureExtremes {
  readonly max: { readonly value: number; readonly position: number };
  readonly min: { readonly value: number; readonly position: number };
}

export interface FigureInput {
  readonly title?: string;
  /** A line printed under the figure: the screening caution every answer carries. */
  readonly caution?: string;
  /** Unit names to print beside values. */
  readonly units: { length: string; force: string; moment: string; deflection: string; forcePerLength: string; angle: string };
  readonly length: number;
  readonly supports: readonly { position: number; kind: SupportKind; label?: string }[];
  readonly hinges: readonly number[];
  readonly pointLoads: readonly { position: number; fx: number; fy: number; fz: number; mx: number; my: number; mz: number; label?: string }[];
  readonly distributedLoads: readonly { from: number; to: number; qy: readonly [number, number]; qz: readonly [number, number]; label?: string }[];
  /** Sampled diagrams: x ascending; at a jump x appears twice (value just left first). */
  readonly diagrams: { readonly x: readonly number[] } & Readonly<Record<FigureField, readonly number[]>>;
  /** Exact extremes of each diagram (value and position). */
  readonly extremes: Readonly<Record<FigureField, FigureExtremes>>;
}

/**
 * Throws a RangeError naming the first thing that cannot be drawn: a number that is not finite, a
 * length that is not positive, or a diagram whose column is not as long as x. A figure with NaN in it
 * would draw nothing where it should show a value, so it is refused instead.
 */
export function assertDrawable(input: FigureInput): void {
  finite(input.length, 'length');
  if (input.length <= 0) throw new RangeError(`length must be positive, not ${input.length}`);
  input.supports.forEach((support, i) => finite(support.position, `supports[${i}].position`));
  input.hinges.forEach((position, i) => finite(position, `hinges[${i}]`));
  input.pointLoads.forEach((load, i) => {
    for (const key of ['position', 'fx', 'fy', 'fz', 'mx', 'my', 'mz'] as const) finite(load[key], `pointLoads[${i}].${key}`);
  });
  input.distributedLoads.forEach((load, i) => {
    finite(load.from, `distributedLoads[${i}].from`);
    finite(load.to, `distributedLoads[${i}].to`);
    for (const key of ['qy', 'qz'] as const) load[key].forEach((q, end) => finite(q, `distributedLoads[${i}].${key}[${end}]`));
  });
  const count = input.diagrams.x.length;
  finiteColumn(input.diagrams.x, 'diagrams.x');
  for (const field of FIGURE_FIELDS) {
    const column = input.diagrams[field];
    if (column.length !== count) throw new RangeError(`diagrams.${field} holds ${column.length} values for ${count} positions`);
    finiteColumn(column, `diagrams.${field}`);
    const { max, min } = input.extremes[field];
    finite(max.value, `extremes.${field}.max.value`);
    finite(max.position, `extremes.${field}.max.position`);
    finite(min.value, `extremes.${field}.min.value`);
    finite(min.position, `extremes.${field}.min.position`);
  }
}

function finite(value: number, path: string): void {
  if (!Number.isFinite(value)) throw new RangeError(`${path} is ${value}, not a finite number`);
}

function finiteColumn(column: readonly number[], path: string): void {
  for (let i = 0; i < column.length; i++) {
    if (!Number.isFinite(column[i])) throw new RangeError(`${path}[${i}] is ${column[i]}, not a finite number`);
  }
}
