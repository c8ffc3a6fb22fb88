/**
 * The yardstick of `npm run bench:http`: a bare Fastify route on the same path that parses the same
 * JSON body and sends the same answer bytes, with nothing in between. Started by bench/http.ts with
 * PORT and ANSWER_FILE (the service's own answer, read once).
 */

import { readFileSync } from 'node:fs';
import Fastify from 'fastify';

const answer = readFileSync(process.env.ANSWER_FILE ?? '', 'utf8');
const app = Fastify({ logger: false });
app.post('/v1/member-checks', async (_request, reply) => reply.type('application/json; charset=utf-8').send(answer));
await app.listen({ port: Number(process.env.PORT), host: '127.0.0.1' });
