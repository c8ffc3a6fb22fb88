/** GET /healthz (the process answers) and GET /readyz (the catalogues are loaded). */

import type { FastifyInstance } from 'fastify';
import type { RouteContract } from '../route-contract.js';
import { z } from '../schemas/zod.js';

const catalogueSummary = z.object({
  name: z.string().openapi({ description: 'Where the entries come from: "embedded" or a company file path.' }),
  sections: z.number().int().openapi({ description: 'Sections taken from this source.' }),
  materials: z.number().int().openapi({ description: 'Materials taken from this source.' }),
});

export const readinessOutput = z
  .object({
    status: z.enum(['ready', 'loading']).openapi({ description: 'ready once every catalogue is loaded (503 while loading).' }),
    catalogues: z.array(catalogueSummary).openapi({ description: 'What was loaded, source by source.' }),
    sectionFamilies: z.record(z.string(), z.number().int()).openapi({ description: 'Number of sections per family.' }),
  })
  .openapi('Readiness');

const livenessOutput = z.object({ status: z.literal('alive').openapi({ description: 'The process answers.' }) }).openapi('Liveness');

export type Readiness = z.infer<typeof readinessOutput>;

export const healthContracts: RouteContract[] = [
  {
    method: 'get',
    path: '/healthz',
    operationId: 'liveness',
    summary: 'The process is alive',
    description: 'Answers as long as the process serves requests.',
    tag: 'operations',
    response: livenessOutput,
    responseDescription: 'Alive.',
    problems: [],
  },
  {
    method: 'get',
    path: '/readyz',
    operationId: 'readiness',
    summary: 'The service is ready',
    description: 'Ready once the embedded and company catalogues are loaded; reports what was loaded.',
    tag: 'operations',
    response: readinessOutput,
    responseDescription: 'Ready, with the catalogues loaded.',
    problems: [],
  },
];

export function healthRoutes(readiness: () => Readiness) {
  return async function register(app: FastifyInstance): Promise<void> {
    app.get('/healthz', async () => ({ status: 'alive' as const }));
    app.get('/readyz', async (_request, reply) => {
      const state = readiness();
      return reply.code(state.status === 'ready' ? 200 : 503).send(state);
    });
  };
}
