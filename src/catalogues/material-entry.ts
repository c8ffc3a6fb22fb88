/** One material grade of a catalogue, with the thickness bands of its strengths where the standard has them. */

import type { Material } from '../engine/materials/material.js';

/** Strengths for elements up to maxThickness (m), from the standard's table. */
export interface ThicknessBand {
  readonly maxThickness: number;
  readonly yieldStrength: number;
  readonly ultimateStrength: number;
}

export interface MaterialEntry extends Material {
  /** Other spellings that resolve to this grade ("A992", "ASTM A992"). */
  readonly aliases: readonly string[];
  /** Ascending by maxThickness; the first band whose maxThickness >= the thickest element applies. */
  readonly thicknessBands: readonly ThicknessBand[];
}
