/** POST /v1/section-properties: the properties of one section, from a designation or a shape. */

import { auditOutput, notices, unitsEcho } from './member-check-response.js';
import { materialInput } from './material-input.js';
import { outputUnits } from './output-options.js';
import { resolvedSectionOutput } from './section-output.js';
import { sectionInput } from './section-input.js';
import { z } from './zod.js';

/** A storage-rack beam of a fictional shelving maker: a box section with rounded corners. */
export const SECTION_PROPERTIES_EXAMPLE = {
  section: { shape: 'box', width: '50 mm', depth: '100 mm', wallThickness: '3 mm', outerCornerRadius: '6 mm' },
  material: { grade: 'S355' },
  output: { units: { length: 'mm', area: 'mm^2', secondMoment: 'mm^4', sectionModulus: 'mm^3', massPerLength: 'kg/m' } },
};

export const sectionPropertiesRequest = z
  .strictObject({
    section: sectionInput,
    material: materialInput.optional().openapi({ description: 'Optional: gives massPerLength from its density.' }),
    output: z.strictObject({ units: outputUnits.optional() }).optional().openapi({ description: 'The units of the response.' }),
  })
  .openapi('SectionPropertiesRequest');

export const sectionPropertiesResponse = z
  .object({ units: unitsEcho, section: resolvedSectionOutput, notices, audit: auditOutput })
  .openapi('SectionPropertiesResponse');

export type SectionPropertiesRequest = z.infer<typeof sectionPropertiesRequest>;
