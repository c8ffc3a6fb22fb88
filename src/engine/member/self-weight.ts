/** The member's own weight as a load. */

import { withoutNegativeZero } from '../analysis/tolerances.js';
import { STANDARD_GRAVITY, type DistributedLoadModel } from './model.js';

/**
 * Self-weight over the whole member: qy = -density x area x g (N/m, downward), from x = 0 to length.
 * Example: selfWeightLoad(2.85e-3, 7850, 6) gives qy = -219.4 N/m on [0, 6] (area m^2, density kg/m^3).
 */
export function selfWeightLoad(area: number, density: number, length: number): DistributedLoadModel {
  const qy = withoutNegativeZero(-density * area * STANDARD_GRAVITY);
  return { kind: 'distributed', from: 0, to: length, qx: [0, 0], qy: [qy, qy], qz: [0, 0], mx: [0, 0] };
}
