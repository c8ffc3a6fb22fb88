/** GET /openapi.json (the contract) and GET /docs (a browsable view of it). */

import swagger from '@fastify/swagger';
import swaggerUi from '@fastify/swagger-ui';
import type { FastifyInstance } from 'fastify';
import type { OpenApiDocument } from '../openapi/document.js';

export function docsRoutes(document: OpenApiDocument) {
  return async function register(app: FastifyInstance): Promise<void> {
    await app.register(swagger, { mode: 'static', specification: { document: document as never } });
    await app.register(swaggerUi, { routePrefix: '/docs', uiConfig: { docExpansion: 'list', deepLinking: true } });
    app.get('/openapi.json', { schema: { hide: true } }, async () => document);
  };
}
