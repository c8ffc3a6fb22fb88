/**
 * Writes the pinned answers (tests/api/answer-pins): each whole answer as the bytes the service sends,
 * and the status, content type and SHA-256 of every pinned request in digests.json. Run it only when an
 * answer is meant to change, and say in the commit why it changed.
 */

import { writeFileSync } from 'node:fs';
import { buildApp } from '../src/app.js';
import { answerOf, PINS_FOLDER } from '../tests/api/answer-pins/answers.js';
import { digestRequests, WHOLE_ANSWERS } from '../tests/api/answer-pins/cases.js';

const app = await buildApp();
const digests: Record<string, { status: number; contentType: string; sha256: string }> = {};
for (const pinned of [...WHOLE_ANSWERS, ...digestRequests()]) {
  const { body, ...digest } = await answerOf(app, pinned);
  digests[pinned.name] = digest;
  if (WHOLE_ANSWERS.includes(pinned)) writeFileSync(new URL(`${pinned.name}.answer.json`, PINS_FOLDER), body);
}
writeFileSync(new URL('digests.json', PINS_FOLDER), `${JSON.stringify(digests, null, 2)}\n`);
await app.close();
console.log(`${Object.keys(digests).length} answers pinned`);
