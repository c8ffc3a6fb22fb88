/** POST /v1/section-properties */

import type { FastifyInstance } from 'fastify';
import { SCREENING_CAUTION } from '../../engine/caution.js';
import { answerOnce, type AnswerCache } from '../answer-cache.js';
import type { Catalogues } from '../member-check.js';
import { resolveMaterial } from '../normalise/material.js';
import { QuantityReader } from '../normalise/quantity-reader.js';
import { resolveSection } from '../normalise/section.js';
import { resolveOutputUnits } from '../output-units.js';
import { presentSection } from '../present/section.js';
import type { RouteContract } from '../route-contract.js';
import { SECTION_PROPERTIES_EXAMPLE, sectionPropertiesRequest, sectionPropertiesResponse } from '../schemas/section-properties-exchange.js';
import { parseBody } from '../validation.js';
import { sectionPropertiesAudit } from '../audit/input-digest.js';
import { timedCompute } from '../metrics.js';

export const sectionPropertiesContract: RouteContract = {
  method: 'post',
  path: '/v1/section-properties',
  operationId: 'sectionProperties',
  summary: 'Properties of one cross-section',
  description:
    'Area, centroid, second moments (and principal axes), elastic and plastic moduli, radii of gyration, torsion constant and torsional shear per unit torque, the shear-stress terms Q and b, the warping constant, and the stress points, for a catalogue designation or a shape with its dimensions. Root fillets and corner radii are included exactly.',
  tag: 'sections',
  body: sectionPropertiesRequest,
  response: sectionPropertiesResponse,
  responseDescription: 'The section and its properties.',
  problems: ['unknownDesignation', 'unknownGrade', 'impossibleGeometry'],
  exampleBody: SECTION_PROPERTIES_EXAMPLE,
};

export function sectionPropertiesRoutes(catalogues: Catalogues, answers: AnswerCache) {
  return async function register(app: FastifyInstance): Promise<void> {
    app.post('/v1/section-properties', { config: { answerCache: true } }, (request, reply) => {
      answerOnce(answers, request, reply, () => timedCompute(request, () => sectionPropertiesAnswer(request.body, catalogues)));
    });
  };
}

/** The section's properties in the requested units, with the material's mass per length when one is given. */
function sectionPropertiesAnswer(requestBody: unknown, catalogues: Catalogues) {
  const body = parseBody(sectionPropertiesRequest, requestBody);
  const reader = new QuantityReader();
  const section = resolveSection(body.section, catalogues.sections, reader, ['section']);
  const material = body.material === undefined ? undefined : resolveMaterial(body.material, catalogues.materials, reader, ['material']);
  const units = resolveOutputUnits(body.output?.units, ['output', 'units']);
  reader.finish();
  const resolved = section();
  const density = material?.density;
  return { units: units.names, section: presentSection(resolved, units, density), notices: [SCREENING_CAUTION], audit: sectionPropertiesAudit(resolved, density, units.names) };
}
