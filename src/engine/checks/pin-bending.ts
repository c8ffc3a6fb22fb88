/**
 * The bending moment in a connection pin. The pin spans between the plates that load it, so it bends
 * as well as shears; for a short, stout pin shear governs, for a long pin in thick plates bending does.
 *
 * - Double shear (an eye plate of thickness b between two clevis plates of thickness a, with a clear gap
 *   c each side): M = F (b + 4c + 2a) / 8, EN 1993-1-8:2005 Table 3.10 (from memory): the eye's load
 *   spread over b, the clevis reactions over a, the pin a simple beam between them.
 * - Single shear (two lapped plates t1 and t2, gap c): the two bearing resultants, at the plates'
 *   mid-thicknesses, make a couple over the lever arm between them, M = F (t1 / 2 + c + t2 / 2)
 *   (common practice, the safe side: the clamping of a head or nut is not counted on).
 */

import type { PinInput } from './check-input.js';

export interface PinBending {
  /** N*m */
  readonly moment: number;
  /** The formula, in one line. */
  readonly basis: string;
}

export function pinBendingMoment(pin: Pick<PinInput, 'shearPlanes' | 'plateThickness' | 'clevisPlateThickness' | 'gap'>, force: number): PinBending {
  const { plateThickness: b, clevisPlateThickness: a, gap: c } = pin;
  if (pin.shearPlanes === 2) {
    return { moment: (force * (b + 4 * c + 2 * a)) / 8, basis: 'M = F (b + 4c + 2a) / 8 (EN 1993-1-8:2005 Table 3.10, from memory)' };
  }
  return { moment: force * (b / 2 + c + a / 2), basis: 'M = F (t1 / 2 + c + t2 / 2), the bearing resultants of the two plates a couple (common practice, the safe side)' };
}
