/** Presenting reactions, diagrams, extremes and the equilibrium check in the response's units. */

import { DIAGRAM_FIELDS, type DiagramField, type MemberAnalysis } from '../../engine/analysis/result.js';
import type { SampledDiagrams } from '../../engine/analysis/sample-diagrams.js';
import { present, rounded, type OutputUnits } from '../output-units.js';
import { DIAGRAM_FIELD_INFO } from '../schemas/analysis-output.js';

export function presentReactions(analysis: MemberAnalysis, labels: readonly (string | undefined)[], units: OutputUnits) {
  return analysis.reactions.map((reaction, i) => ({
    label: labels[i],
    position: present(units, 'length', reaction.position),
    fx: present(units, 'force', reaction.fx),
    fy: present(units, 'force', reaction.fy),
    fz: present(units, 'force', reaction.fz),
    mx: present(units, 'moment', reaction.mx),
    my: present(units, 'moment', reaction.my),
    mz: present(units, 'moment', reaction.mz),
  }));
}

/**
 * One column of SI values in a presented unit: one division a value, -0 as 0. Filled by push, so the
 * array is packed: JSON.stringify writes a packed array of doubles about a quarter faster than a holey
 * one. In SI (factor 1) the column is sent as it is: x / 1 is x, and JSON writes -0 as 0.
 */
export function presentColumn(values: readonly number[], factor: number, digits: number | undefined): readonly number[] {
  if (factor === 1 && digits === undefined) return values;
  const out: number[] = [];
  for (let i = 0; i < values.length; i++) {
    const value = (values[i] as number) / factor;
    out.push(digits === undefined ? (value === 0 ? 0 : value) : rounded(value, digits));
  }
  return out;
}

export function presentDiagrams(diagrams: SampledDiagrams, units: OutputUnits) {
  const out: Record<string, readonly number[]> = { x: presentColumn(diagrams.x, units.factors.length, units.significantDigits) };
  for (const field of DIAGRAM_FIELDS) out[field] = presentColumn(diagrams.values[field], units.factors[DIAGRAM_FIELD_INFO[field].kind], units.significantDigits);
  return out as Record<'x' | DiagramField, number[]>;
}

export function presentExtremes(analysis: MemberAnalysis, units: OutputUnits) {
  const out = {} as Record<DiagramField, { max: { value: number; position: number }; min: { value: number; position: number } }>;
  for (const field of DIAGRAM_FIELDS) {
    const kind = DIAGRAM_FIELD_INFO[field].kind;
    const { max, min } = analysis.extremes[field];
    out[field] = {
      max: { value: present(units, kind, max.value), position: present(units, 'length', max.position) },
      min: { value: present(units, kind, min.value), position: present(units, 'length', min.position) },
    };
  }
  return out;
}

export function presentEquilibrium(analysis: MemberAnalysis, units: OutputUnits) {
  const { force, moment, forceScale, momentScale } = analysis.equilibrium;
  return { force, moment, forceScale: present(units, 'force', forceScale), momentScale: present(units, 'moment', momentScale) };
}
