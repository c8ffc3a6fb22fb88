/** The analysis part of a member-check response: reactions, diagrams, extremes, equilibrium. */

import type { DiagramField } from '../../engine/analysis/result.js';
import type { QuantityKind } from '../quantities.js';
import { presentedQuantity } from './quantity.js';
import { z } from './zod.js';

/** Each diagram, its kind of quantity and its sign convention: the schema and presenter read this. */
export const DIAGRAM_FIELD_INFO: Record<DiagramField, { kind: QuantityKind; description: string }> = {
  axial: { kind: 'force', description: 'Axial force N, positive in tension.' },
  shearY: {
    kind: 'force',
    description: 'Shear force Vy: the sum of the y forces (loads and reactions) on the part of the member left of x; positive just right of the left support of a simple span under a downward load.',
  },
  momentZ: { kind: 'moment', description: 'Bending moment Mz in the vertical plane, positive sagging (bottom fibre in tension); d(momentZ)/dx = shearY.' },
  shearZ: { kind: 'force', description: 'Shear force Vz: the sum of the z forces left of x (the horizontal plane, z in the place of y).' },
  momentY: { kind: 'moment', description: 'Bending moment in the horizontal plane, positive when the -z fibre is in tension; d(momentY)/dx = shearZ.' },
  torque: { kind: 'moment', description: 'Twisting moment T on the face whose outward normal is +x, right-hand rule: minus the torques applied left of x.' },
  deflectionY: { kind: 'deflection', description: 'Deflection along y, positive up.' },
  slopeZ: { kind: 'angle', description: 'Slope d(deflectionY)/dx, the right-hand rotation about z.' },
  deflectionZ: { kind: 'deflection', description: 'Deflection along z, positive along +z.' },
  slopeY: { kind: 'angle', description: 'Slope d(deflectionZ)/dx in the horizontal plane (the opposite sign of the right-hand rotation about y).' },
  twist: { kind: 'angle', description: 'Angle of twist about x, right-hand rule.' },
};

export const reactionOutput = z
  .object({
    label: z.string().optional(),
    position: presentedQuantity('length', 'Position of the support.'),
    fx: presentedQuantity('force', 'Force the support applies to the member along +x.'),
    fy: presentedQuantity('force', 'Force the support applies along +y (up).'),
    fz: presentedQuantity('force', 'Force the support applies along +z.'),
    mx: presentedQuantity('moment', 'Torque the support applies about +x, right-hand rule.'),
    my: presentedQuantity('moment', 'Moment the support applies about +y, right-hand rule.'),
    mz: presentedQuantity('moment', 'Moment the support applies about +z, right-hand rule (counterclockwise seen from +z).'),
  })
  .openapi('Reaction', { description: 'The forces and moments a support applies to the member.' });

const diagramShape = Object.fromEntries(
  Object.entries(DIAGRAM_FIELD_INFO).map(([field, info]) => [field, z.array(z.number()).openapi({ description: `${info.description} Values aligned with x, in the response's ${info.kind} unit.` })]),
) as Record<DiagramField, z.ZodArray<z.ZodNumber>>;

export const diagramsOutput = z
  .object({
    x: z.array(z.number()).openapi({ description: 'Positions, in the length unit: the evenly spaced samples and every node; at a jump a position appears twice, the value just left first.' }),
    ...diagramShape,
  })
  .openapi('Diagrams');

const extreme = z.object({
  value: z.number().openapi({ description: "The extreme value, in the unit of the diagram's kind (see Diagrams)." }),
  position: presentedQuantity('length', 'Where the value occurs (the first place on a plateau).'),
});

export const fieldExtremesOutput = z
  .object({
    max: extreme.openapi({ description: 'The largest value and where it occurs.' }),
    min: extreme.openapi({ description: 'The smallest value and where it occurs.' }),
  })
  .openapi('FieldExtremes', { description: 'Largest and smallest value of one diagram, found exactly (at nodes, jumps and the roots of the derivative), not from the samples.' });

export const extremesOutput = z
  .object(Object.fromEntries(Object.keys(DIAGRAM_FIELD_INFO).map((field) => [field, fieldExtremesOutput])) as Record<DiagramField, typeof fieldExtremesOutput>)
  .openapi('Extremes');

export const equilibriumOutput = z
  .object({
    force: z.number().openapi({ description: 'Largest |sum of forces| of loads and reactions over the member, divided by forceScale. Dimensionless.' }),
    moment: z.number().openapi({ description: 'Largest |sum of moments about x = 0|, divided by momentScale. Dimensionless.' }),
    forceScale: presentedQuantity('force', 'Sum of the magnitudes of the load resultants.'),
    momentScale: presentedQuantity('moment', 'forceScale x length plus the applied moments.'),
  })
  .openapi('Equilibrium', { description: 'How closely the reactions balance the loads: a check an integrator can assert.' });
