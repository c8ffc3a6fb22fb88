/**
 * A ductile metal's catalogue entry from its tension values: compression strengths equal to those in
 * tension and the von Mises shear yield ratio, both common practice for structural and machine steels
 * and wrought aluminium.
 */

import { DISTORTION_ENERGY_SHEAR_RATIO } from '../../engine/materials/material.js';
import type { MaterialEntry } from '../material-entry.js';

export type DuctileGradeValues = Omit<
  MaterialEntry,
  'compressiveYieldStrength' | 'compressiveUltimateStrength' | 'shearYieldRatio' | 'behaviour'
>;

/** Example: ductileGrade({ grade: 'S355', yieldStrength: 355e6, ultimateStrength: 470e6, ... }). */
export function ductileGrade(values: DuctileGradeValues): MaterialEntry {
  return {
    ...values,
    compressiveYieldStrength: values.yieldStrength,
    compressiveUltimateStrength: values.ultimateStrength,
    shearYieldRatio: DISTORTION_ENERGY_SHEAR_RATIO,
    behaviour: 'ductile',
  };
}
