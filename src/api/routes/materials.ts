/** GET /v1/materials and GET /v1/materials/{grade}: the material catalogues. */

import { finiteJson, sendJsonText } from '../answer-json.js';
import type { FastifyInstance } from 'fastify';
import type { MaterialEntry } from '../../catalogues/material-entry.js';
import { SCREENING_CAUTION } from '../../engine/caution.js';
import type { LoadedCatalogues } from '../load-catalogues.js';
import { present, resolveOutputUnits, type OutputUnits } from '../output-units.js';
import { presentMaterial } from '../present/material.js';
import { ProblemError } from '../problems.js';
import type { RouteContract } from '../route-contract.js';
import { gradeParams, materialDetailResponse, materialListResponse, unitsQuery } from '../schemas/catalogue-exchange.js';
import { parseBody } from '../validation.js';

export const materialContracts: RouteContract[] = [
  {
    method: 'get',
    path: '/v1/materials',
    operationId: 'listMaterials',
    summary: 'List catalogue materials',
    description: 'Every embedded and company grade with its properties, thickness bands and source.',
    tag: 'catalogues',
    query: unitsQuery,
    response: materialListResponse,
    responseDescription: 'All grades.',
    problems: ['invalidInput'],
  },
  {
    method: 'get',
    path: '/v1/materials/{grade}',
    operationId: 'getMaterial',
    summary: 'One catalogue material',
    description: 'The grade named (case, spacing and the standard prefix are not significant), with its thickness bands.',
    tag: 'catalogues',
    params: gradeParams,
    query: unitsQuery,
    response: materialDetailResponse,
    responseDescription: 'The grade.',
    problems: ['notFound', 'invalidInput'],
  },
];

function presentEntry(entry: MaterialEntry, units: OutputUnits) {
  return {
    ...presentMaterial(entry, units),
    aliases: [...entry.aliases],
    thicknessBands: entry.thicknessBands.map((band) => ({
      maxThickness: present(units, 'length', band.maxThickness),
      yieldStrength: present(units, 'stress', band.yieldStrength),
      ultimateStrength: present(units, 'stress', band.ultimateStrength),
    })),
  };
}

export function materialRoutes(catalogues: LoadedCatalogues) {
  return async function register(app: FastifyInstance): Promise<void> {
    app.get('/v1/materials', async (request, reply) => {
      const units = resolveOutputUnits(parseBody(unitsQuery, request.query).units, ['units']);
      const items = catalogues.materials.list().map((entry) => presentEntry(entry, units));
      return sendJsonText(reply, finiteJson({ units: units.names, items, total: items.length, notices: [SCREENING_CAUTION] }));
    });

    app.get('/v1/materials/:grade', async (request, reply) => {
      const { grade } = parseBody(gradeParams, request.params);
      const units = resolveOutputUnits(parseBody(unitsQuery, request.query).units, ['units']);
      const entry = catalogues.materials.find(grade);
      if (entry === undefined) {
        const nearest = catalogues.materials.nearest(grade, 5);
        throw new ProblemError('notFound', `No catalogue material has the grade "${grade}". Nearest: ${nearest.join(', ')}.`, [], { nearest });
      }
      return sendJsonText(reply, finiteJson({ units: units.names, material: presentEntry(entry, units), notices: [SCREENING_CAUTION] }));
    });
  };
}
