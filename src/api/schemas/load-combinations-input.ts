/** Load cases, moving loads and combinations, as a request gives them. */

import { ACTION_CATEGORIES } from '../../engine/combinations/load-actions.js';
import { loadsInput, MAX_LOADS } from './member-input.js';
import { quantity } from './quantity.js';
import { z } from './zod.js';

export const MAX_LOAD_CASES = 50;
export const MAX_MOVING_LOADS = 10;
export const MAX_AXLES = 20;
export const MAX_COMBINATIONS = 100;
/** Grid intervals of one moving load's travel. */
export const MAX_TRAIN_INTERVALS = 1000;
/** Load states one request may ask for: the sum over combinations of the train positions searched (1 without a moving load). */
export const MAX_LOAD_STATES = 10000;
/** Reserved action id of the member's own weight when selfWeight is true and the loads come in cases. */
export const SELF_WEIGHT_CASE = 'selfWeight';

const actionId = z
  .string()
  .min(1)
  .max(64)
  .regex(/^[A-Za-z0-9][A-Za-z0-9 ._:+-]*$/)
  .openapi({ description: 'Names the action in combinations: letters, digits, space, . _ : + -; unique among load cases and moving loads.' });

const category = z.enum(ACTION_CATEGORIES).openapi({
  description: 'permanent (own weight, fixed parts), imposed (stored goods, people), snow, wind, accidental (impact, collision), other (any other variable action). Decides the factors of the default combinations.',
});

export const loadCaseInput = z
  .strictObject({
    id: actionId,
    category,
    description: z.string().max(200).optional().openapi({ description: 'What the case holds, in words; echoed.' }),
    loads: loadsInput.openapi({ description: `The loads of this case, as in loads; at most ${MAX_LOADS} over all cases.` }),
  })
  .openapi('LoadCase', { description: 'Loads of one origin that act together and take one factor in a combination.' });

const axleInput = z
  .strictObject({
    offset: quantity('length', "Distance of the axle from the train's reference point, along +x (may be negative)."),
    fy: quantity('force', 'Force along y, positive up (a wheel load is negative).').optional(),
    fz: quantity('force', 'Force along z.').optional(),
  })
  .openapi('Axle', { description: 'One wheel or contact of a moving load.' });

export const movingLoadInput = z
  .strictObject({
    id: actionId,
    category: category.openapi({ description: 'What moves: imposed, snow, wind, accidental or other (a moving load is never permanent). Decides its factors in the default combinations.' }),
    description: z.string().max(200).optional().openapi({ description: 'What moves, in words; echoed.' }),
    axles: z.array(axleInput).min(1).max(MAX_AXLES).openapi({ description: `1 to ${MAX_AXLES} axles at fixed spacing.` }),
    from: quantity('length', 'First position of the reference point; default: the whole pass, from the front axle (largest offset) on x = 0. A travel given is cut to the positions where some axle stands on the member.').optional(),
    to: quantity('length', 'Last position of the reference point; default: the rear axle (smallest offset) on the end of the member.').optional(),
    step: quantity('length', `Largest spacing of the grid of positions checked; default a hundredth of the travel (after cutting). At most ${MAX_TRAIN_INTERVALS} intervals.`).optional(),
  })
  .openapi('MovingLoad', {
    description:
      'A train of point loads of fixed spacing that travels along the member: a trolley, a hoist, a pallet truck. The checks are made on a grid no coarser than step, wherever an axle stands on an end, support or hinge and a hair to either side, and where each diagram peaks; the governing utilization and the extremes of every diagram are refined by Brent\'s method. The envelopes (diagrams and reactions) are exact over the whole travel. An axle off the member carries nothing. A train longer than the member needs from and to.',
  });

export const combinationInput = z
  .strictObject({
    id: actionId,
    purpose: z.enum(['strength', 'serviceability']).openapi({ description: 'strength: every strength and stability check; serviceability: deflection and twist.' }),
    factors: z
      .record(z.string(), z.number().min(-100).max(100))
      .openapi({ description: `Factor by action id (a load case, a moving load, or "${SELF_WEIGHT_CASE}" for the member's own weight); an action not named is left out. At least one; at most one moving load.`, example: { permanent: 1, goods: 1, trolley: 1 } }),
    description: z.string().max(200).optional().openapi({ description: 'In words; default the factors written out.' }),
  })
  .openapi('Combination', { description: 'Actions that act together, each times its factor.' });

export const loadCombinationFields = {
  loadCases: z
    .array(loadCaseInput)
    .max(MAX_LOAD_CASES)
    .optional()
    .openapi({ description: `Loads grouped by origin, 0 to ${MAX_LOAD_CASES}. With load cases or moving loads, loads must be empty; selfWeight becomes a permanent case of its own, "${SELF_WEIGHT_CASE}".` }),
  movingLoads: z.array(movingLoadInput).max(MAX_MOVING_LOADS).optional().openapi({ description: `0 to ${MAX_MOVING_LOADS} moving loads.` }),
  combinations: z
    .array(combinationInput)
    .min(1)
    .max(MAX_COMBINATIONS)
    .optional()
    .openapi({
      description: `1 to ${MAX_COMBINATIONS} combinations. Default: built from the categories (common practice in the allowable-stress format, a placeholder for the governing code; see the README). The answer says which set was used. Over all combinations at most ${MAX_LOAD_STATES} load states (train positions searched, 1 for a combination without a moving load): beyond, a 422.`,
    }),
};

export type LoadCaseRequest = z.infer<typeof loadCaseInput>;
export type MovingLoadRequest = z.infer<typeof movingLoadInput>;
export type CombinationRequest = z.infer<typeof combinationInput>;
