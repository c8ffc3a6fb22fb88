/** POST /v1/member-sizing: the lightest (or shallowest, or least utilized) section that passes. */

import { SIZING_OBJECTIVES } from '../../engine/sizing/rank-candidates.js';
import { FAILURE_MODES } from '../../engine/checks/failure-mode.js';
import { memberCheckRequest } from './member-check-request.js';
import { auditOutput, memberCheckResponse, notices, unitsEcho } from './member-check-response.js';
import { presentedQuantity, quantity } from './quantity.js';
import { shapeInput } from './section-input.js';
import { z } from './zod.js';

export const MAX_CANDIDATES = 500;
/** candidates x load states x (loads + supports + hinges + 1): about a second of work at most. */
export const MAX_SIZING_WORK = 20000;

const designationList = z.array(z.string().min(1).max(64)).min(1).max(MAX_CANDIDATES);

export const candidatesInput = z
  .union([
    z.strictObject({ family: z.string().min(1).max(32).openapi({ description: 'Every catalogue section of one family ("IPE", "SHS", "W"...).' }) }),
    z.strictObject({ families: z.array(z.string().min(1).max(32)).min(1).max(20).openapi({ description: 'Every catalogue section of these families.' }) }),
    z.strictObject({ designations: designationList.openapi({ description: 'These catalogue sections.' }) }),
    z.strictObject({
      sections: z
        .array(shapeInput)
        .min(1)
        .max(MAX_CANDIDATES)
        .openapi({ description: 'Explicit shapes with their dimensions; each is named by its place in this list ("sections/0").' }),
    }),
  ])
  .openapi('SizingCandidates', { description: `The sections to choose from: a family, several families, designations, or explicit shapes (at most ${MAX_CANDIDATES}).` });

export const sizingLimits = z
  .strictObject({
    maxDepth: quantity('length', 'Only candidates no deeper than this (overall depth along y).').optional(),
    maxWidth: quantity('length', 'Only candidates no wider than this (overall width along z).').optional(),
    maxMassPerLength: quantity('massPerLength', 'Only candidates no heavier than this per length.').optional(),
  })
  .openapi('SizingLimits', { description: 'Candidates outside these limits are left out before checking.' });

/** A shelf beam of a fictional shelving maker: the lightest IPE for a 2.7 m bay. */
export const MEMBER_SIZING_EXAMPLE = {
  member: { length: '2.7 m', supports: [{ position: 0, type: 'pinned' }, { position: '2.7 m', type: 'roller' }] },
  material: { grade: 'S355' },
  loads: [{ type: 'distributed', from: 0, to: '2.7 m', qy: '-8 kN/m', label: 'two pallet loads' }],
  selfWeight: true,
  candidates: { family: 'IPE' },
  limits: { maxDepth: '240 mm' },
  objective: 'lightest',
  criteria: { deflectionLimitRatio: 200 },
  output: { samples: 11 },
};

export const memberSizingRequest = memberCheckRequest
  .omit({ section: true })
  .extend({
    candidates: candidatesInput,
    limits: sizingLimits.optional(),
    objective: z
      .enum(SIZING_OBJECTIVES)
      .optional()
      .openapi({ description: 'How to choose among the passing candidates: lightest by mass per length (default), shallowest by depth, or least-utilization.' }),
  })
  .openapi('MemberSizingRequest', { description: 'A member-check request without its section, with the candidates to choose from.', example: MEMBER_SIZING_EXAMPLE });

export const candidateRow = z
  .object({
    rank: z.number().int().openapi({ description: '1 for the selected candidate; passing candidates first, by the objective, then failing ones, closest to passing first.' }),
    designation: z.string().openapi({ description: 'The catalogue designation, or "sections/i" for an explicit shape.' }),
    family: z.string().optional().openapi({ description: 'The catalogue family.' }),
    massPerLength: presentedQuantity('massPerLength', 'Nominal mass per length (catalogue), or area x density.'),
    depth: presentedQuantity('length', 'Overall depth along y, when known.').optional(),
    governingMode: z.enum(FAILURE_MODES).optional().openapi({ description: 'The governing failure mode; absent when nothing has any demand or the candidate could not be checked.' }),
    utilization: z.number().optional().openapi({ description: 'The governing utilization; absent when the candidate could not be checked.' }),
    verdict: z.enum(['pass', 'fail', 'not-verified', 'error']).openapi({ description: "The candidate's verdict (a candidate is selected only with pass); 'error': the candidate could not be checked (see problem)." }),
    problem: z.string().optional().openapi({ description: 'Why a candidate could not be checked.' }),
  })
  .openapi('SizingCandidateRow');

export const memberSizingResponse = z
  .object({
    units: unitsEcho,
    objective: z.enum(SIZING_OBJECTIVES).openapi({ description: 'The objective used.' }),
    selected: z
      .object({ designation: z.string().openapi({ description: 'The chosen candidate.' }), result: memberCheckResponse })
      .openapi({ description: 'The candidate chosen, with its full member-check result.' }),
    candidates: z.array(candidateRow).openapi({ description: 'Every candidate checked, ranked.' }),
    excluded: z
      .array(z.object({ designation: z.string().openapi({ description: 'The candidate left out.' }), reason: z.string().openapi({ description: 'Which limit it is beyond.' }) }))
      .openapi({ description: 'Candidates left out by the limits.' }),
    notices,
    audit: auditOutput.openapi({ description: 'The engine version and the digest of the sizing input: the check without its section, the material as the request names it, every candidate shape, the limits in SI and the objective.' }),
  })
  .openapi('MemberSizingResponse');

export type MemberSizingRequest = z.infer<typeof memberSizingRequest>;
export type CandidateRow = z.infer<typeof candidateRow>;
