/** GET /v1/sections and GET /v1/sections/{designation}: the section catalogues. */

import type { FastifyInstance } from 'fastify';
import type { TabulatedSectionValues } from '../../catalogues/section-entry.js';
import { overallDepth, overallWidth } from '../../catalogues/overall-size.js';
import { SCREENING_CAUTION } from '../../engine/caution.js';
import { sectionProperties } from '../../engine/sections/section-from-dimensions.js';
import { finiteJson, sendJsonText } from '../answer-json.js';
import type { LoadedCatalogues } from '../load-catalogues.js';
import { QuantityReader } from '../normalise/quantity-reader.js';
import { present, resolveOutputUnits } from '../output-units.js';
import { presentSection } from '../present/section.js';
import { ProblemError } from '../problems.js';
import type { QuantityKind } from '../quantities.js';
import type { RouteContract } from '../route-contract.js';
import {
  DEFAULT_PAGE_SIZE,
  designationParams,
  sectionDetailResponse,
  sectionListQuery,
  sectionListResponse,
  unitsQuery,
} from '../schemas/catalogue-exchange.js';
import { parseBody } from '../validation.js';

const TABULATED_KINDS: Record<keyof TabulatedSectionValues, QuantityKind> = {
  area: 'area',
  secondMomentZ: 'secondMoment',
  secondMomentY: 'secondMoment',
  sectionModulusZ: 'sectionModulus',
  sectionModulusY: 'sectionModulus',
  plasticModulusZ: 'sectionModulus',
  plasticModulusY: 'sectionModulus',
  torsionConstant: 'secondMoment',
  warpingConstant: 'warpingConstant',
};

export const sectionContracts: RouteContract[] = [
  {
    method: 'get',
    path: '/v1/sections',
    operationId: 'listSections',
    summary: 'List catalogue sections',
    description: 'The embedded and company sections, filtered by family, depth, width and mass per length, a page at a time.',
    tag: 'catalogues',
    query: sectionListQuery,
    response: sectionListResponse,
    responseDescription: 'One page of matching sections.',
    problems: ['invalidInput'],
  },
  {
    method: 'get',
    path: '/v1/sections/{designation}',
    operationId: 'getSection',
    summary: 'One catalogue section with its computed and tabulated properties',
    description: 'The section a designation names (case and spacing are not significant), its dimensions, its properties computed exactly from them, and the standard\'s tabulated values beside them.',
    tag: 'catalogues',
    params: designationParams,
    query: unitsQuery,
    response: sectionDetailResponse,
    responseDescription: 'The section.',
    problems: ['notFound', 'invalidInput'],
  },
];

/** A query bound: a plain number is SI, otherwise a value with a unit. */
function bound(reader: QuantityReader, value: string | undefined, kind: QuantityKind, name: string): number | undefined {
  if (value === undefined) return undefined;
  const number = Number(value);
  const result = Number.isFinite(number) && value.trim() !== '' ? number : reader.read(value, kind, [name]);
  if (Number.isFinite(result) && result < 0) reader.fail([name], 'must not be negative');
  return result;
}

export function sectionRoutes(catalogues: LoadedCatalogues) {
  return async function register(app: FastifyInstance): Promise<void> {
    app.get('/v1/sections', async (request, reply) => {
      const query = parseBody(sectionListQuery, request.query);
      const reader = new QuantityReader();
      const maxDepth = bound(reader, query.maxDepth, 'length', 'maxDepth');
      const maxWidth = bound(reader, query.maxWidth, 'length', 'maxWidth');
      const maxMassPerLength = bound(reader, query.maxMassPerLength, 'massPerLength', 'maxMassPerLength');
      reader.finish();
      const units = resolveOutputUnits(query.units, ['units']);
      const page = catalogues.sections.list({
        ...(query.family === undefined ? {} : { family: query.family }),
        ...(maxDepth === undefined ? {} : { maxDepth }),
        ...(maxWidth === undefined ? {} : { maxWidth }),
        ...(maxMassPerLength === undefined ? {} : { maxMassPerLength }),
        offset: query.offset ?? 0,
        limit: query.limit ?? DEFAULT_PAGE_SIZE,
      });
      const items = page.items.map((entry) => {
        const depth = overallDepth(entry.dimensions);
        const width = overallWidth(entry.dimensions);
        return {
          designation: entry.designation,
          family: entry.family,
          standard: entry.standard,
          shape: entry.dimensions.shape,
          ...(depth === undefined ? {} : { depth: present(units, 'length', depth) }),
          ...(width === undefined ? {} : { width: present(units, 'length', width) }),
          massPerLength: present(units, 'massPerLength', entry.massPerLength),
        };
      });
      return sendJsonText(
        reply,
        finiteJson({
          units: units.names,
          items,
          total: page.total,
          offset: page.offset,
          limit: page.limit,
          families: catalogues.sectionFamilies,
          notices: [SCREENING_CAUTION],
        }),
      );
    });

    app.get('/v1/sections/:designation', async (request, reply) => {
      const { designation } = parseBody(designationParams, request.params);
      const units = resolveOutputUnits(parseBody(unitsQuery, request.query).units, ['units']);
      const entry = catalogues.sections.find(designation);
      if (entry === undefined) {
        const nearest = catalogues.sections.nearest(designation, 5);
        throw new ProblemError('notFound', `No catalogue section is designated "${designation}". Nearest: ${nearest.join(', ')}.`, [], { nearest });
      }
      const tabulated: Record<string, number> = {};
      for (const [key, value] of Object.entries(entry.tabulated) as [keyof TabulatedSectionValues, number | undefined][]) {
        if (value !== undefined) tabulated[key] = present(units, TABULATED_KINDS[key], value);
      }
      return sendJsonText(
        reply,
        finiteJson({
          units: units.names,
          section: presentSection({ dimensions: entry.dimensions, properties: sectionProperties(entry.dimensions), entry }, units),
          tabulated,
          notices: [SCREENING_CAUTION],
        }),
      );
    });
  };
}
