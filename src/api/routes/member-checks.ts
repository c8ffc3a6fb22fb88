/** POST /v1/member-checks: analyse and check one member. */

import type { FastifyInstance } from 'fastify';
import { answerOnce, type AnswerCache } from '../answer-cache.js';
import { runMemberCheck, type Catalogues } from '../member-check.js';
import type { RouteContract } from '../route-contract.js';
import { MEMBER_CHECK_COMBINATIONS_EXAMPLE, MEMBER_CHECK_EXAMPLE, MEMBER_CHECK_GIVEN_COMBINATIONS_EXAMPLE, memberCheckRequest } from '../schemas/member-check-request.js';
import { memberCheckResponse } from '../schemas/member-check-response.js';
import { parseBody } from '../validation.js';
import { timedCompute } from '../metrics.js';

export const memberCheckContract: RouteContract = {
  method: 'post',
  path: '/v1/member-checks',
  operationId: 'checkMember',
  summary: 'Analyse and check one straight member',
  description:
    'Exact reactions, sampled diagrams with their exact extremes, deflections and the equilibrium residual of a straight prismatic member on any supports (statically indeterminate included), under point and distributed loads in any direction. The loads may come as one load state (loads) or as load cases, moving loads and combinations: every combination is checked (a moving load at every position, refined to the worst), and the answer gives each combination, the envelope and the governing combination.',
  tag: 'members',
  body: memberCheckRequest,
  response: memberCheckResponse,
  responseDescription: 'The analysed member.',
  problems: ['unknownDesignation', 'unknownGrade', 'unstableMember', 'impossibleGeometry', 'notApplicable', 'tooMuchWork'],
  exampleBody: MEMBER_CHECK_EXAMPLE,
  moreExamples: {
    defaultCombinations: { summary: 'Load cases and a moving trolley, default combinations', value: MEMBER_CHECK_COMBINATIONS_EXAMPLE },
    givenCombinations: { summary: 'Load cases and a moving trolley, combinations given', value: MEMBER_CHECK_GIVEN_COMBINATIONS_EXAMPLE },
  },
};

export function memberCheckRoutes(catalogues: Catalogues, answers: AnswerCache) {
  return async function register(app: FastifyInstance): Promise<void> {
    app.post('/v1/member-checks', { config: { answerCache: true } }, (request, reply) => {
      answerOnce(answers, request, reply, () =>
        timedCompute(request, () => {
          const answer = runMemberCheck(parseBody(memberCheckRequest, request.body), catalogues);
          request.observed.verdicts = [answer.verdict];
          return answer;
        }),
      );
    });
  };
}
