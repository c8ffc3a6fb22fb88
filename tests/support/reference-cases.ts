/** What the reference-case runners share: reading a folder of cases, and the kind of each quantity (which fixes its comparison scale). */

import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
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
