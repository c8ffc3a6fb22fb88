/**
 * Run before every test file (vitest setupFiles): the file fails when any of its test apps took a
 * request the contract refuses or sent an answer the contract does not describe.
 */

import { afterAll, expect } from 'vitest';
import { contractViolations } from './strict-contract.js';

afterAll(() => {
  expect(contractViolations, 'exchanges that disagree with openapi/openapi.json').toEqual([]);
});
