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

export const memberCheckRequest = z
  .strictObject({
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
      .openapi({ description: 'Add the member\'s own weight, density x area x g (g = 9.80665 m/s^2) downward (-y) over its whole length. Default false.' }),
    criteria: criteriaInput.optional(),
    buckling: bucklingInput.optional(),
    lateralTorsional: lateralTorsionalInput.optional(),
    output: outputOptions.optional(),
  })
  .openapi('MemberCheckRequest', {
    description: 'A straight member to analyse and check.',
    example: MEMBER_CHECK_EXAMPLE,
  });

export type MemberCheckRequest = z.infer<typeof memberCheckRequest>;
