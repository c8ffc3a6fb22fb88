/**
 * The pins declared at supports, in shear and in bearing. The pin carries the whole reaction force
 * R = sqrt(fx^2 + fy^2 + fz^2): its orientation is not known, so no component is taken as running along
 * the pin (conservative).
 * - shear: tau = R / (n A), n = 1 (single shear) or 2 (double shear), A = pi d^2 / 4, against the pin
 *   material's shear strength (average direct shear on the shear planes, Shigley 10th ed., ch. 3, from
 *   memory);
 * - bearing: sigma = R / (d t) on the eye and R / (n d a) on each clevis plate (in single shear the other
 *   plate, all of R), the larger, on the projected area, against the lower compressive strength of the
 *   pin and of the member material (the plates are taken to be of the member's material);
 * - bending: sigma = M / (pi d^3 / 32) against the pin's yield strength, with M from pin-bending.ts.
 */

import { EngineError } from '../engine-error.js';
import type { CheckContext, CheckFindings } from './check-context.js';
import type { FailureCheck } from './check-outcome.js';
import { failureCheck } from './failure-check.js';
import { pinBendingMoment } from './pin-bending.js';
import { materialStrengths } from './strengths.js';

export function pinChecks(context: CheckContext): CheckFindings {
  const { input, criteria, strengths } = context;
  const { analysis, model } = input;
  const checks: FailureCheck[] = [];
  (input.pins ?? []).forEach((pin, index) => {
    const reaction = analysis.reactions[pin.support];
    if (!Number.isInteger(pin.support) || reaction === undefined) {
      throw new EngineError(
        'not-applicable',
        `Pin ${index} names support ${pin.support}, but the member has ${model.supports.length} supports.`,
        ['pins', index, 'support'],
      );
    }
    const force = Math.hypot(reaction.fx, reaction.fy, reaction.fz);
    const pinStrengths = materialStrengths(pin.material, input.criteria?.shearYieldRatio ?? pin.material.shearYieldRatio);
    const area = (Math.PI * pin.diameter ** 2) / 4;
    const shearKind = pin.shearPlanes === 2 ? 'double shear' : 'single shear';
    checks.push(
      failureCheck({
        mode: 'pin-shear',
        quantity: 'stress',
        demand: force / (pin.shearPlanes * area),
        capacity: pinStrengths.shear.value,
        requiredSafetyFactor: criteria.requiredSafetyFactor['pin-shear'],
        position: reaction.position,
        location: `pin at support ${pin.support} (${shearKind})`,
        basis: `tau = R / (${pin.shearPlanes} pi d^2 / 4), average shear on the shear planes (Shigley 10th ed., ch. 3, from memory), against the pin's ${pinStrengths.shear.symbol}`,
      }),
    );
    const plateWeaker = strengths.compression.value < pinStrengths.compression.value;
    // The eye carries R on d t; each clevis plate R / n on d a (in single shear the other plate, all of R).
    const eyeBearing = force / (pin.diameter * pin.plateThickness);
    const clevisBearing = force / (pin.shearPlanes * pin.diameter * pin.clevisPlateThickness);
    checks.push(
      failureCheck({
        mode: 'pin-bearing',
        quantity: 'stress',
        demand: Math.max(eyeBearing, clevisBearing),
        capacity: plateWeaker ? strengths.compression.value : pinStrengths.compression.value,
        requiredSafetyFactor: criteria.requiredSafetyFactor['pin-bearing'],
        position: reaction.position,
        location: eyeBearing >= clevisBearing ? `pin at support ${pin.support}, plate ${pin.plateThickness} m thick` : `pin at support ${pin.support}, ${pin.shearPlanes === 2 ? 'each clevis plate' : 'the other plate'} ${pin.clevisPlateThickness} m thick`,
        basis: `sigma = R / (d t) on the eye or R / (n d a) on a clevis plate, the larger, on the projected area (Shigley 10th ed., ch. 3, from memory) against the lower ${plateWeaker ? 'member' : 'pin'} ${plateWeaker ? strengths.compression.symbol : pinStrengths.compression.symbol}`,
      }),
    );
    const bending = pinBendingMoment(pin, force);
    checks.push(
      failureCheck({
        mode: 'pin-bending',
        quantity: 'stress',
        demand: bending.moment / ((Math.PI * pin.diameter ** 3) / 32),
        capacity: pinStrengths.tension.value,
        requiredSafetyFactor: criteria.requiredSafetyFactor['pin-bending'],
        position: reaction.position,
        location: `pin at support ${pin.support} (${shearKind}), gap ${pin.gap} m`,
        basis: `sigma = M / (pi d^3 / 32), ${bending.basis}, against the pin's ${pinStrengths.tension.symbol}`,
      }),
    );
  });
  if (checks.length > 0) return { checks, notApplicable: [] };
  const reason = 'no pin declared at any support (pins)';
  return {
    checks,
    notApplicable: [
      { mode: 'pin-shear', reason },
      { mode: 'pin-bearing', reason },
      { mode: 'pin-bending', reason },
    ],
  };
}
