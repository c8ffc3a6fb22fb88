/**
 * Mass per unit length of a prismatic member, kg/m: area (m^2) times density (kg/m^3).
 *
 * @example massPerLength({ area: 2.848e-3 }, 7850) // 22.36 (IPE 200 in steel)
 */

import type { SectionProperties } from './section-properties.js';

export function massPerLength(properties: Pick<SectionProperties, 'area'>, density: number): number {
  return properties.area * density;
}
