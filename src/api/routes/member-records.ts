/** POST /v1/member-reports (HTML) and POST /v1/member-diagrams (SVG): a member check rendered. */

import type { FastifyInstance } from 'fastify';
import { memberFigure, memberReport } from '../member-record.js';
import type { Catalogues } from '../member-check.js';
import type { RouteContract } from '../route-contract.js';
import { MEMBER_CHECK_EXAMPLE, memberCheckRequest } from '../schemas/member-check-request.js';
import { htmlDocument, MEMBER_REPORT_EXAMPLE, memberReportRequest, svgDocument } from '../schemas/member-record-exchange.js';
import { parseBody } from '../validation.js';
import { timedCompute } from '../metrics.js';

const CHECK_PROBLEMS = ['unknownDesignation', 'unknownGrade', 'unstableMember', 'impossibleGeometry', 'notApplicable', 'tooMuchWork'] as const;

export const memberReportContract: RouteContract = {
  method: 'post',
  path: '/v1/member-reports',
  operationId: 'reportMember',
  summary: 'A calculation record of one member check, as an HTML page',
  description: 'The member check of POST /v1/member-checks with a job title and reference, answered as one self-contained HTML page to file with a quote: printable on A4, readable in black and white. Problems are JSON (application/problem+json) as on every route.',
  tag: 'members',
  body: memberReportRequest,
  response: htmlDocument,
  responseMediaType: 'text/html',
  responseDescription: 'The calculation record.',
  problems: [...CHECK_PROBLEMS],
  exampleBody: MEMBER_REPORT_EXAMPLE,
};

export const memberDiagramsContract: RouteContract = {
  method: 'post',
  path: '/v1/member-diagrams',
  operationId: 'drawMember',
  summary: 'The figure of one member check, as SVG',
  description: 'The member check of POST /v1/member-checks answered as one SVG figure: the member, supports and loads to scale, and the diagrams with their extremes labelled. With load combinations the figure shows the state at the top of the JSON answer (the strength combination with the highest utilization).',
  tag: 'members',
  body: memberCheckRequest,
  response: svgDocument,
  responseMediaType: 'image/svg+xml',
  responseDescription: 'The figure.',
  problems: [...CHECK_PROBLEMS],
  exampleBody: MEMBER_CHECK_EXAMPLE,
};

export function memberRecordRoutes(catalogues: Catalogues) {
  return async function register(app: FastifyInstance): Promise<void> {
    app.post('/v1/member-reports', async (request, reply) => {
      const { report, ...check } = parseBody(memberReportRequest, request.body);
      return reply.type('text/html; charset=utf-8').send(timedCompute(request, () => memberReport(check, report, catalogues)));
    });
    app.post('/v1/member-diagrams', async (request, reply) => {
      return reply.type('image/svg+xml; charset=utf-8').send(timedCompute(request, () => memberFigure(parseBody(memberCheckRequest, request.body), catalogues)));
    });
  };
}
