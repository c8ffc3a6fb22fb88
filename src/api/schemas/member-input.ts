/** The member, its supports, hinges and loads, as a request gives them. */

import { pinInput } from './check-options.js';
import { quantity } from './quantity.js';
import { z } from './zod.js';

export const MAX_SUPPORTS = 1000;
export const MAX_HINGES = 1000;
export const MAX_LOADS = 1000;

const direction = z.enum(['ux', 'uy', 'uz', 'rx', 'ry', 'rz']).openapi({
  description: 'ux, uy, uz: translations along x, y, z; rx: twist about x; ry, rz: bending rotations about y and z.',
});

const position = quantity('length', 'Position along the member, measured from its start (x = 0) towards its end.');

const springs = z
  .strictObject({
    ux: quantity('translationalStiffness', 'Spring along x.').optional(),
    uy: quantity('translationalStiffness', 'Spring along y.').optional(),
    uz: quantity('translationalStiffness', 'Spring along z.').optional(),
    rx: quantity('rotationalStiffness', 'Torsional spring about x.').optional(),
    ry: quantity('rotationalStiffness', 'Rotational spring about y.').optional(),
    rz: quantity('rotationalStiffness', 'Rotational spring about z.').optional(),
  })
  .openapi({ description: 'Linear springs for directions that are not rigidly restrained; a direction cannot be both.' });

const presetSupport = z
  .strictObject({
    position,
    type: z.enum(['fixed', 'pinned', 'roller', 'bearing', 'torsion-restraint']).openapi({
      description:
        'fixed: all six directions restrained. pinned: ux, uy, uz and rx restrained, bending rotations free. roller: uy, uz and rx restrained, free along x and in bending rotation. bearing: a shaft bearing, ux, uy and uz restrained, free to turn (twist) and in bending rotation. torsion-restraint: only twist (rx) held, where a coupling, a drive or a brake holds a shaft against turning; the torque flows there.',
    }),
    label: z.string().max(64).optional().openapi({ description: 'A name echoed with the reaction.' }),
    pin: pinInput.optional(),
    bearingLength: quantity('length', 'Length of the seat or plate the member bears on here: the stiff bearing length of the patch-loading check (EN 1993-1-5 6.3). Default 0, the safe side.').optional(),
  })
  .openapi('PresetSupport');

const generalSupport = z
  .strictObject({
    position,
    type: z.literal('general'),
    restrained: z.array(direction).max(6).openapi({ description: 'The directions the support holds rigidly.' }),
    springs: springs.optional(),
    label: z.string().max(64).optional().openapi({ description: 'A name echoed with the reaction.' }),
    pin: pinInput.optional(),
    bearingLength: quantity('length', 'Length of the seat or plate the member bears on here: the stiff bearing length of the patch-loading check (EN 1993-1-5 6.3). Default 0, the safe side.').optional(),
  })
  .openapi('GeneralSupport', { description: 'A support that names what it restrains, with optional springs.' });

export const supportInput = z.discriminatedUnion('type', [presetSupport, generalSupport]).openapi('Support');

const hinge = z
  .strictObject({ position })
  .openapi('Hinge', { description: 'An internal hinge: a release of both bending moments (axial force and torque pass through).' });

export const memberInput = z
  .strictObject({
    length: quantity('length', 'Length of the member; x runs from 0 to length.'),
    supports: z
      .array(supportInput)
      .min(1)
      .max(MAX_SUPPORTS)
      .openapi({ description: `The supports, anywhere in [0, length]; 1 to ${MAX_SUPPORTS}. Their reactions come back in this order.` }),
    hinges: z
      .array(hinge)
      .max(MAX_HINGES)
      .optional()
      .openapi({ description: 'Internal hinges (moment releases), anywhere in (0, length).' }),
  })
  .openapi('Member', {
    description: 'A straight prismatic member. Axes: x along the member from its start, y up (gravity is -y), z horizontal, right-handed.',
  });

const force = (axis: string) => quantity('force', `Force along ${axis}, positive along +${axis}.`).optional();
const moment = (axis: string, what: string) =>
  quantity('moment', `${what} about ${axis}, positive by the right-hand rule.`).optional();

const pointLoad = z
  .strictObject({
    type: z.literal('point'),
    position,
    fx: force('x'),
    fy: force('y'),
    fz: force('z'),
    mx: moment('x', 'Torque'),
    my: moment('y', 'Moment'),
    mz: moment('z', 'Moment'),
    label: z.string().max(64).optional(),
    bearingLength: quantity('length', 'Length along the member over which the load bears on the flange (a wheel contact, a bearing plate): the stiff bearing length of the patch-loading check (EN 1993-1-5 6.3). Default 0, the safe side.').optional(),
  })
  .openapi('PointLoad', { description: 'Concentrated forces and moments at one position; any subset.' });

function intensity(kind: 'forcePerLength' | 'momentPerLength', description: string) {
  const one = quantity(kind, description);
  return z
    .union([one, z.tuple([one, one])])
    .optional()
    .openapi({ description: `${description} One value (uniform) or [at from, at to] (linear).` });
}

const distributedLoad = z
  .strictObject({
    type: z.literal('distributed'),
    from: quantity('length', 'Start of the loaded length.'),
    to: quantity('length', 'End of the loaded length; greater than from.'),
    qx: intensity('forcePerLength', 'Force per length along x, positive along +x.'),
    qy: intensity('forcePerLength', 'Force per length along y, positive up (a gravity load is negative).'),
    qz: intensity('forcePerLength', 'Force per length along z, positive along +z.'),
    mx: intensity('momentPerLength', 'Distributed torque about x, positive by the right-hand rule.'),
    label: z.string().max(64).optional(),
  })
  .openapi('DistributedLoad', { description: 'A load spread over [from, to], uniform or linearly varying.' });

export const loadInput = z.discriminatedUnion('type', [pointLoad, distributedLoad]).openapi('Load');

export const loadsInput = z.array(loadInput).max(MAX_LOADS);

export type MemberInput = z.infer<typeof memberInput>;
export type SupportInput = z.infer<typeof supportInput>;
export type LoadInput = z.infer<typeof loadInput>;
