/** POST /v1/member-checks: one member, its supports, loads, section and material. */

import { bucklingInput, criteriaInput, lateralTorsionalInput } from './check-options.js';
import { materialInput } from './material-input.js';
import { loadCombinationFields } from './load-combinations-input.js';
import { loadsInput, memberInput } from './member-input.js';
import { outputOptions } from './output-options.js';
import { sectionInput } from './section-input.js';
import { z } from './zod.js';

/** A platform joist of a fictional work-platform maker: the contract's example, sent by the tests. */
export const MEMBER_CHECK_EXAMPLE = {
  member: {
    length: '3.6 m',
    supports: [
      { position: 0, type: 'pinned' },
      { position: '3.6 m', type: 'roller' },
    ],
  },
  section: { designation: 'IPE 200' },
  material: { grade: 'S355' },
  loads: [
    { type: 'distributed', from: 0, to: '3.6 m', qy: '-4.5 kN/m', label: 'decking and stored goods' },
    { type: 'point', position: '1.2 m', fy: '-6 kN', label: 'pallet truck wheel' },
  ],
  selfWeight: true,
  output: { samples: 11, units: { length: 'mm', force: 'kN', moment: 'kN*m', stress: 'MPa' } },
};

/** An aisle beam of a fictional work-platform maker: decking, stored goods and a picking trolley, default combinations. */
export const MEMBER_CHECK_COMBINATIONS_EXAMPLE = {
  member: {
    length: '4.2 m',
    supports: [
      { position: 0, type: 'pinned', label: 'column A' },
      { position: '4.2 m', type: 'roller', label: 'column B' },
    ],
  },
  section: { designation: 'IPE 240' },
  material: { grade: 'S275' },
  selfWeight: true,
  loadCases: [
    { id: 'decking', category: 'permanent', description: 'steel grating and handrail posts', loads: [{ type: 'distributed', from: 0, to: '4.2 m', qy: '-1.1 kN/m' }] },
    { id: 'goods', category: 'imposed', description: 'cartons stored along the aisle', loads: [{ type: 'distributed', from: 0, to: '4.2 m', qy: '-3.5 kN/m' }] },
  ],
  movingLoads: [
    {
      id: 'trolley',
      category: 'imposed',
      description: 'hand-pushed picking trolley, two axles 0.8 m apart',
      axles: [
        { offset: 0, fy: '-2.5 kN' },
        { offset: '0.8 m', fy: '-2.5 kN' },
      ],
      step: '0.05 m',
    },
  ],
  output: { samples: 11, units: { length: 'mm', force: 'kN', moment: 'kN*m', stress: 'MPa' } },
};

/** The same beam with combinations of its own: a strength and a serviceability combination. */
export const MEMBER_CHECK_GIVEN_COMBINATIONS_EXAMPLE = {
  ...MEMBER_CHECK_COMBINATIONS_EXAMPLE,
  combinations: [
    { id: 'goods and trolley', purpose: 'strength', factors: { selfWeight: 1, decking: 1, goods: 1, trolley: 1 }, description: 'everything at once, characteristic values' },
    { id: 'trolley deflection', purpose: 'serviceability', factors: { trolley: 1 }, description: 'deflection under the trolley alone' },
  ],
  criteria: { deflectionLimitRatio: 500 },
};

/**
 * The fields of a member check. Requests that add fields of their own (a batch item's id, a report's
 * job) spread these into a strict object of their own rather than extending MemberCheckRequest: an
 * extension is published as allOf of two objects that each refuse the other's fields, which no
 * request can satisfy.
 */
export const memberCheckFields = {
  member: memberInput,
  section: sectionInput,
  material: materialInput,
  loads: loadsInput
    .optional()
    .openapi({ description: 'Point and distributed loads, one load state; an empty list is allowed (with selfWeight, or to see the section and material). Default empty. Must be empty when the loads come in loadCases or movingLoads.' }),
  ...loadCombinationFields,
  selfWeight: z
    .boolean()
    .optional()
    .openapi({ description: 'Add the member\'s own weight, density x area x g (g = 9.80665 m/s^2) downward (-y) over its whole length. Default true for catalogue and shape sections, false for custom sections (which may describe only part of a member); a notice says which either way.' }),
  loadsThroughShearCentre: z
    .boolean()
    .optional()
    .openapi({
      description:
        'The loads along y act through the shear centre (a channel loaded through a cleat at its shear centre, or held against twist along its length). Default false: a channel loaded in the plane of its web is twisted by the load times the distance to its shear centre, which this service does not add, so torsion is listed as unchecked until this is stated or the torque is given as loads.',
    }),
  criteria: criteriaInput.optional(),
  buckling: bucklingInput.optional(),
  lateralTorsional: lateralTorsionalInput.optional(),
  output: outputOptions.optional(),
};

export const memberCheckRequest = z
  .strictObject(memberCheckFields)
  .openapi('MemberCheckRequest', {
    description: 'A straight member to analyse and check.',
    example: MEMBER_CHECK_EXAMPLE,
  });

export type MemberCheckRequest = z.infer<typeof memberCheckRequest>;
