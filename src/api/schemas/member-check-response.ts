/** The answer to POST /v1/member-checks. */

import { QUANTITY_KINDS, type QuantityKind } from '../quantities.js';
import { diagramsOutput, equilibriumOutput, extremesOutput, reactionOutput } from './analysis-output.js';
import { checksOutput } from './check-output.js';
import { loadCombinationsOutput } from './load-combinations-output.js';
import { materialOutput } from './material-output.js';
import { resolvedSectionOutput } from './section-output.js';
import { z } from './zod.js';

export const unitsEcho = z
  .object(
    Object.fromEntries(
      (Object.keys(QUANTITY_KINDS) as QuantityKind[]).map((kind) => [kind, z.string().openapi({ description: `Unit of every ${kind} value in this response (SI: ${QUANTITY_KINDS[kind]}).` })]),
    ) as Record<QuantityKind, z.ZodString>,
  )
  .openapi('Units', { description: 'The unit every kind of quantity in this response is given in.' });

export const notices = z
  .array(z.string())
  .openapi({ description: 'Cautions and the limits of the calculation. The first is always the screening-calculation caution.' });

export const auditOutput = z
  .object({
    engineVersion: z.string().openapi({ description: 'The version of the service that computed the answer.' }),
    inputDigest: z
      .string()
      .regex(/^[0-9a-f]{64}$/)
      .openapi({
        description:
          'SHA-256 (hex) of the canonical JSON of the input as the engine received it: every quantity in SI, section and material as resolved (catalogue values included), defaults not filled in, output options; object keys sorted, no whitespace, numbers as ECMAScript writes them, labels left out. Equal inputs give equal digests on every run and machine, however the request wrote its values.',
      }),
  })
  .openapi('Audit', { description: 'Which engine and which exact input produced this answer.' });

export const memberCheckResponse = z
  .object({
    units: unitsEcho,
    member: z
      .object({
      length: z.number().openapi({ description: 'Member length, in the length unit.' }),
        nodes: z.array(z.number()).openapi({ description: 'Node positions of the analysis (ends, supports, hinges, point loads, ends of distributed loads), in the length unit.' }),
      })
      .openapi({ description: 'The member as analysed.' }),
    section: resolvedSectionOutput.optional().openapi({ description: 'The section as resolved, with its properties; absent with output.detail "summary".' }),
    material: materialOutput,
    selfWeight: z
      .object({ applied: z.boolean().openapi({ description: 'True when selfWeight was asked for.' }), intensity: z.number().openapi({ description: 'Self-weight per length (downward), in the forcePerLength unit; 0 when not applied.' }) })
      .openapi({ description: 'Whether the member\'s own weight was added.' }),
    reactions: z.array(reactionOutput).openapi({ description: 'One per support, in the order given.' }),
    diagrams: diagramsOutput.optional().openapi({ description: 'The sampled diagrams; absent with output.detail "summary".' }),
    extremes: extremesOutput,
    equilibrium: equilibriumOutput,
    ...checksOutput,
    loadCombinations: loadCombinationsOutput,
    notices,
    audit: auditOutput,
  })
  .openapi('MemberCheckResponse');

export type MemberCheckResponse = z.infer<typeof memberCheckResponse>;
