/** POST /v1/member-sizing */

import type { FastifyInstance } from 'fastify';
import { answerOnce, type AnswerCache } from '../answer-cache.js';
import type { LoadedCatalogues } from '../load-catalogues.js';
import { runMemberSizing } from '../member-sizing.js';
import type { RouteContract } from '../route-contract.js';
import { MEMBER_SIZING_EXAMPLE, memberSizingRequest, memberSizingResponse } from '../schemas/member-sizing-exchange.js';
import { parseBody } from '../validation.js';
import { timedCompute } from '../metrics.js';

export const memberSizingContract: RouteContract = {
  method: 'post',
  path: '/v1/member-sizing',
  operationId: 'sizeMember',
  summary: 'Choose the section that passes',
  description:
    'Checks every candidate section with the same engine and criteria (self-weight per candidate when asked) and returns the one the objective prefers among those that pass, with its full member-check result, and a ranked table of all candidates. When none passes: 422 with the closest candidate and what governs it.',
  tag: 'members',
  body: memberSizingRequest,
  response: memberSizingResponse,
  responseDescription: 'The selected section and the ranked candidates.',
  problems: ['unknownDesignation', 'unknownGrade', 'unstableMember', 'impossibleGeometry', 'notApplicable', 'noPassingCandidate', 'tooMuchWork'],
  exampleBody: MEMBER_SIZING_EXAMPLE,
};

export function memberSizingRoutes(catalogues: LoadedCatalogues, answers: AnswerCache) {
  return async function register(app: FastifyInstance): Promise<void> {
    app.post('/v1/member-sizing', { config: { answerCache: true } }, (request, reply) => {
      answerOnce(answers, request, reply, () => timedCompute(request, () => runMemberSizing(parseBody(memberSizingRequest, request.body), catalogues)));
    });
  };
}
