/** One stock section of a catalogue: a standard's designation, its nominal geometry and tabulated values. */

import type { SectionDimensions } from '../engine/sections/dimensions.js';

/** Values the standard (or a manufacturer) tabulates, SI; used to check the computed properties. */
export interface TabulatedSectionValues {
  readonly area?: number;
  readonly secondMomentZ?: number;
  readonly secondMomentY?: number;
  readonly sectionModulusZ?: number;
  readonly sectionModulusY?: number;
  readonly plasticModulusZ?: number;
  readonly plasticModulusY?: number;
  readonly torsionConstant?: number;
  readonly warpingConstant?: number;
}

export interface SectionEntry {
  /** As the standard writes it: "IPE 200", "SHS 100x100x5", "NPS 2 SCH 40", "W8X31". */
  readonly designation: string;
  /** "IPE", "HEA", "HEB", "SHS", "RHS", "CHS", "PIPE", "W", "ROUND", "FLAT", or a company's own. */
  readonly family: string;
  /** The standard or catalogue the entry comes from, e.g. "EN 10365:2017". */
  readonly standard: string;
  readonly dimensions: SectionDimensions;
  /** Nominal mass per length, kg/m, as tabulated. */
  readonly massPerLength: number;
  readonly tabulated: TabulatedSectionValues;
  /** Where the numbers come from, and whether from memory. */
  readonly source: string;
}
