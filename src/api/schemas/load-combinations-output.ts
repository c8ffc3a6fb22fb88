/** The load-combination part of a member-check answer: each combination, its envelope and the one that governs. */

import { ACTION_CATEGORIES } from '../../engine/combinations/load-actions.js';
import { REACTION_COMPONENTS } from '../../engine/combinations/train-envelope.js';
import { DIAGRAM_FIELD_INFO, extremesOutput, reactionOutput } from './analysis-output.js';
import { failureCheckOutput, governingOutput, uncheckedOutput, verdictOutput } from './check-output.js';
import { presentedQuantity } from './quantity.js';
import { z } from './zod.js';

const fieldColumns = (what: string) =>
  z
    .object(Object.fromEntries(Object.entries(DIAGRAM_FIELD_INFO).map(([field, info]) => [field, z.array(z.number()).openapi({ description: `${what} of ${field}, aligned with x, in the ${info.kind} unit.` })])) as Record<string, z.ZodArray<z.ZodNumber>>)
    .openapi({ description: `${what} of every diagram at the positions x.` });

export const diagramEnvelopeOutput = z
  .object({
    x: z.array(z.number()).openapi({ description: 'Positions, in the length unit: the evenly spaced samples and every fixed node (supports, hinges, load-case load points and ends); an interior node appears twice, the value just left first.' }),
    max: fieldColumns('Largest value'),
    min: fieldColumns('Smallest value'),
  })
  .openapi('DiagramEnvelope', { description: 'Largest and smallest value of each diagram at fixed positions over several load states.' });

const movingExtreme = z.object({
  value: z.number().openapi({ description: "The extreme value, in the unit of the diagram's kind." }),
  position: presentedQuantity('length', 'Where on the member it occurs.'),
  loadPosition: presentedQuantity('length', "Where the train's reference point stands when it occurs."),
});

const movingExtremes = z
  .object(
    Object.fromEntries(
      Object.keys(DIAGRAM_FIELD_INFO).map((field) => [
        field,
        z
          .object({
            max: movingExtreme.openapi({ description: 'The largest value, where, and the train position.' }),
            min: movingExtreme.openapi({ description: 'The smallest value, where, and the train position.' }),
          })
          .openapi({ description: `Extremes of ${field} over every train position.` }),
      ]),
    ) as Record<string, z.ZodObject<{ max: typeof movingExtreme; min: typeof movingExtreme }>>,
  )
  .openapi('MovingLoadExtremes', { description: 'The exact largest and smallest value of each diagram over the member and every train position, with the train position that causes it (refined by Brent\'s method from the best positions searched).' });

const reactionBound = z.object({
  value: z.number().openapi({ description: 'In the force or moment unit.' }),
  loadPosition: presentedQuantity('length', "Where the train's reference point stands."),
});

const reactionEnvelope = z
  .object({
    label: z.string().optional(),
    position: presentedQuantity('length', 'Position of the support.'),
    max: z
      .object(Object.fromEntries(REACTION_COMPONENTS.map((component) => [component, reactionBound.openapi({ description: `Largest ${component} and the train position.` })])) as Record<string, typeof reactionBound>)
      .openapi({ description: 'Largest value of each component.' }),
    min: z
      .object(Object.fromEntries(REACTION_COMPONENTS.map((component) => [component, reactionBound.openapi({ description: `Smallest ${component} and the train position.` })])) as Record<string, typeof reactionBound>)
      .openapi({ description: 'Smallest value of each component.' }),
  })
  .openapi('ReactionEnvelope', { description: 'Largest and smallest value of each reaction component over the whole travel, exact (from the influence lines), with the train position; a value approached as an axle nears a support is given at the support.' });

const combinedBound = z.object({
  value: z.number().openapi({ description: 'In the force or moment unit.' }),
  combination: z.string().openapi({ description: 'The combination that gives it.' }),
  loadPosition: presentedQuantity('length', "Where the train's reference point stands, when the combination moves one.").optional(),
});

const combinedReactionEnvelope = z
  .object({
    label: z.string().optional(),
    position: presentedQuantity('length', 'Position of the support.'),
    max: z
      .object(Object.fromEntries(REACTION_COMPONENTS.map((component) => [component, combinedBound.openapi({ description: `Largest ${component}, its combination and train position.` })])) as Record<string, typeof combinedBound>)
      .openapi({ description: 'Largest value of each component.' }),
    min: z
      .object(Object.fromEntries(REACTION_COMPONENTS.map((component) => [component, combinedBound.openapi({ description: `Smallest ${component}, its combination and train position.` })])) as Record<string, typeof combinedBound>)
      .openapi({ description: 'Smallest value of each component.' }),
  })
  .openapi('CombinedReactionEnvelope', { description: 'A support\'s reactions at their extremes over the combinations.' });

const combinationOutput = z
  .object({
    id: z.string().openapi({ description: 'The combination id (given, or strength-n / serviceability-n for the default set).' }),
    purpose: z.enum(['strength', 'serviceability']).openapi({ description: 'strength: strength and stability checks; serviceability: deflection and twist.' }),
    description: z.string().openapi({ description: 'The factors in words, e.g. "1 permanent + 1 goods".' }),
    factors: z.record(z.string(), z.number()).openapi({ description: 'Factor by action id, as used.' }),
    verdict: verdictOutput,
    unchecked: uncheckedOutput,
    governing: governingOutput,
    movingLoad: z
      .object({
        id: z.string().openapi({ description: 'The moving load.' }),
        factor: z.number().openapi({ description: 'Its factor in this combination.' }),
        loadPosition: presentedQuantity('length', "The governing position of the train's reference point: where this combination's highest utilization was found."),
        positionsSearched: z.number().int().openapi({ description: 'Train positions checked on the grid and at the nodes, before the refinement.' }),
        extremes: movingExtremes,
        reactions: z.array(reactionEnvelope).openapi({ description: 'One per support, in the order given.' }),
        envelope: diagramEnvelopeOutput.optional().openapi({ description: 'The envelope over every train position; absent with output.detail "summary".' }),
      })
      .optional()
      .openapi({ description: 'Present when the combination moves a train: the envelope over its positions.' }),
    reactions: z.array(reactionOutput).openapi({ description: 'At the governing train position when a train moves.' }),
    extremes: extremesOutput.openapi({ description: "Each diagram's exact extremes, at the governing train position when a train moves (movingLoad.extremes holds them over every position)." }),
    checks: z.array(failureCheckOutput).openapi({ description: "The checks of the combination's purpose, at its governing train position when a train moves (the top-level checks hold each check at its worst over every position searched)." }),
  })
  .openapi('CombinationResult');

export const loadCombinationsOutput = z
  .object({
    set: z.enum(['given', 'default']).openapi({ description: 'given: the combinations of the request; default: built from the categories (see basis).' }),
    basis: z.string().openapi({ description: 'How the combinations were made.' }),
    governing: z.string().openapi({ description: 'The combination that holds the governing check.' }),
    shown: z.string().openapi({ description: 'The combination whose reactions, diagrams, extremes, buckling and stresses are at the top (at its governing train position): the strength combination with the highest utilization, or the governing one when no combination is for strength.' }),
    reactions: z
      .array(combinedReactionEnvelope)
      .openapi({ description: 'For support design: each support\'s reactions at their largest and smallest over every strength combination (over all combinations when none is for strength) and every train position, in the order given.' }),
    actions: z
      .array(
        z.object({
          id: z.string().openapi({ description: 'The id combinations name it by.' }),
          kind: z.enum(['load-case', 'moving-load', 'self-weight']).openapi({ description: 'Where it comes from in the request.' }),
          category: z.enum(ACTION_CATEGORIES).openapi({ description: 'Its category.' }),
          description: z.string().optional().openapi({ description: 'As given.' }),
        }),
      )
      .openapi({ description: 'Every action the combinations may name.' }),
    combinations: z.array(combinationOutput).openapi({ description: 'Every combination checked, in order.' }),
    envelope: z
      .object({ strength: diagramEnvelopeOutput.optional(), serviceability: diagramEnvelopeOutput.optional() })
      .optional()
      .openapi({ description: 'The envelope of every combination of each purpose, over every train position (exact); absent with output.detail "summary".' }),
  })
  .optional()
  .openapi('LoadCombinationsResult', {
    description: 'Present when the request gives loadCases, movingLoads or combinations. The top-level checks are then each check at its worst over every combination and every train position checked (with combination and loadPosition), and governing and verdict are over all of them.',
  });
