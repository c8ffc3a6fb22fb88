/**
 * The requests whose whole answers are pinned byte for byte (tests/api/answer-pins.test.ts): the typical
 * check, unit strings with US and per-kind output units, torsion on a tube, a batch with a bad item,
 * sizing, section properties, a problem answer, catalogue look-ups, every route's example and every
 * reference case.
 * Invented members of a fictional shelving and work-platform maker.
 */

import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { routeContracts } from '../../../src/app.js';
import { CATALOGUE_CHECK, PLATFORM_JOIST, TYPICAL_CHECK } from '../../../bench/typical-checks.js';

export interface PinnedRequest {
  readonly name: string;
  readonly url: string;
  /** Sent as a POST; a request without a body is a GET. */
  readonly body?: unknown;
}

/** Answers kept whole in files beside this one, so that a change shows as a readable diff. */
export const WHOLE_ANSWERS: readonly PinnedRequest[] = [
  { name: 'typical-check', url: '/v1/member-checks', body: TYPICAL_CHECK },
  { name: 'catalogue-check-us-units', url: '/v1/member-checks', body: { ...CATALOGUE_CHECK, output: { samples: 11, units: 'US' } } },
  {
    name: 'tube-cantilever-torsion-mm-kn',
    url: '/v1/member-checks',
    body: {
      member: { length: '1200 mm', supports: [{ position: 0, type: 'fixed', label: 'wall bracket' }] },
      section: { shape: 'tube', outerDiameter: '60.3 mm', wallThickness: '4 mm' },
      material: { grade: 'S355' },
      loads: [
        { type: 'point', position: '1200 mm', fy: '-1.5 kN', fz: '0.4 kN', mx: '0.25 kN*m', label: 'sign arm' },
        { type: 'distributed', from: '200 mm', to: '1000 mm', qy: ['-0.5 kN/m', '-1.5 kN/m'] },
      ],
      selfWeight: true,
      output: { samples: 21, units: { length: 'mm', force: 'kN', moment: 'kN*m', stress: 'MPa' } },
    },
  },
  {
    name: 'batch-with-a-bad-item',
    url: '/v1/member-checks/batch',
    body: {
      items: [
        { id: 'bay-1', ...CATALOGUE_CHECK },
        { id: 'bay-2', ...TYPICAL_CHECK, output: { samples: 5 } },
        { id: 'bay-3', ...CATALOGUE_CHECK, section: { designation: 'IPE 999' } },
      ],
    },
  },
  {
    name: 'sizing-platform-joist',
    url: '/v1/member-sizing',
    body: { ...PLATFORM_JOIST, candidates: { family: 'IPE' } },
  },
  { name: 'section-properties-rhs', url: '/v1/section-properties', body: { section: { designation: 'RHS 120x60x4' }, output: { units: { length: 'mm' } } } },
  {
    name: 'problem-two-bad-fields',
    url: '/v1/member-checks',
    body: { ...TYPICAL_CHECK, member: { length: '4 kg', supports: TYPICAL_CHECK.member.supports }, loads: [{ type: 'point', position: 1, fy: '2 m' }] },
  },
];

const referenceFolder = (name: string) => fileURLToPath(new URL(`../../reference/${name}/`, import.meta.url));

function referenceRequests(name: string): PinnedRequest[] {
  const folder = referenceFolder(name);
  return readdirSync(folder)
    .filter((file) => file.endsWith('.json'))
    .sort()
    .map((file) => ({ name: `${name}/${file}`, url: '/v1/member-checks', body: (JSON.parse(readFileSync(folder + file, 'utf8')) as { request: unknown }).request }));
}

/** Answers pinned by their SHA-256: every route's example, catalogue look-ups (a 404 among them) and every reference case. */
export function digestRequests(): PinnedRequest[] {
  const examples = routeContracts()
    .filter((contract) => contract.exampleBody !== undefined)
    .map((contract) => ({ name: `example ${contract.operationId}`, url: contract.path, body: contract.exampleBody }));
  const catalogue = ['/v1/sections?family=IPE&units=US', '/v1/sections/HEA%20200', '/v1/materials/S355?units=US', '/v1/sections/IPE%20999'].map((url) => ({ name: `GET ${url}`, url }));
  return [...examples, ...catalogue, ...referenceRequests('beam-diagrams'), ...referenceRequests('member-checks')];
}
