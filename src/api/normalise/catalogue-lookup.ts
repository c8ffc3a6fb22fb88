/** What the API needs of the catalogues: lookups by name, with suggestions when a name is unknown. */

import type { MaterialEntry } from '../../catalogues/material-entry.js';
import type { SectionEntry } from '../../catalogues/section-entry.js';
import type { Material } from '../../engine/materials/material.js';

export interface SectionLookup {
  find(designation: string): SectionEntry | undefined;
  nearest(designation: string, count?: number): readonly string[];
}

export interface MaterialLookup {
  find(grade: string): MaterialEntry | undefined;
  nearest(grade: string, count?: number): readonly string[];
  forThickness(entry: MaterialEntry, thickness: number): Material;
}
