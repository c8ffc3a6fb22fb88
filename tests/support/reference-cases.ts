/** What the reference-case runners share: reading a folder of cases, and the kind of each quantity (which fixes its comparison scale). */

import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { expect } from 'vitest';
import type { DiagramField } from '../../src/engine/analysis/result.js';

/** Every case of the folder beside `base` (an import.meta.url), in file-name order. */
export function readReferenceCases<Case>(folderName: string, base: string): { file: string; reference: Case }[] {
  const folder = fileURLToPath(new URL(`./${folderName}/`, base));
  return readdirSync(folder)
    .filter((name) => name.endsWith('.json'))
    .sort()
    .map((file) => ({ file, reference: JSON.parse(readFileSync(folder + file, 'utf8')) as Case }));
}

export type Component = 'fx' | 'fy' | 'fz' | 'mx' | 'my' | 'mz';

/** The kinds of tests/reference/README.md: a case's expected numbers of one kind set its scale. */
export type Kind = 'force' | 'moment' | 'length' | 'rotation';

export const FIELD_KIND: Record<DiagramField, Kind> = {
  axial: 'force',
  shearY: 'force',
  shearZ: 'force',
  momentZ: 'moment',
  momentY: 'moment',
  torque: 'moment',
  deflectionY: 'length',
  deflectionZ: 'length',
  slopeZ: 'rotation',
  slopeY: 'rotation',
  twist: 'rotation',
};

export const COMPONENT_KIND: Record<Component, Kind> = { fx: 'force', fy: 'force', fz: 'force', mx: 'moment', my: 'moment', mz: 'moment' };

/**
 * The comparison scale of each kind from the largest expected number of each (tests/reference/README.md):
 * a force scale is at least the moment scale over the length, a length scale at least the rotation
 * scale times the length, and so on, so that a kind with only small numbers is not held to a scale of 0.
 */
export function scalesByKind(largest: Readonly<Record<Kind, number>>, length: number): Record<Kind, number> {
  return {
    force: Math.max(largest.force, largest.moment / length),
    moment: Math.max(largest.moment, largest.force * length),
    length: Math.max(largest.length, largest.rotation * length),
    rotation: Math.max(largest.rotation, largest.length / length),
  };
}

/** |actual - expected| <= tolerance x scale, with both numbers in the message. */
export function closeOnScale(actual: number, expected: number, tolerance: number, scale: number, what: string): void {
  const error = Math.abs(actual - expected);
  expect(error, `${what}: got ${actual}, expected ${expected}`).toBeLessThanOrEqual(tolerance * scale);
}
