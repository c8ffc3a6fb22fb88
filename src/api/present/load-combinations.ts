/** Presenting the combinations, their moving-load envelopes and the governing combination in the response's units. */

import { DIAGRAM_FIELDS, type DiagramField } from '../../engine/analysis/result.js';
import type { CombinationsOutcome, CombinedReactionBound } from '../../engine/combinations/check-combinations.js';
import { REACTION_COMPONENTS, type ReactionBound, type ReactionComponent } from '../../engine/combinations/train-envelope.js';
import type { DiagramEnvelope } from '../../engine/combinations/diagram-envelope.js';
import type { NormalisedCombinations } from '../normalise/load-combinations.js';
import { present, textInUnits, type OutputUnits } from '../output-units.js';
import { DIAGRAM_FIELD_INFO } from '../schemas/analysis-output.js';
import { presentColumn, presentExtremes, presentReactions } from './analysis.js';
import { presentCheckList, presentGoverning } from './checks.js';

const REACTION_KIND: Record<ReactionComponent, 'force' | 'moment'> = { fx: 'force', fy: 'force', fz: 'force', mx: 'moment', my: 'moment', mz: 'moment' };

export const DEFAULT_SET_BASIS =
  'Default set, common practice in the allowable-stress format (a placeholder for the governing code; after ASCE/SEI 7, 2.4.1 and 2.5.2, from memory): strength G; G + Q for each variable action; G + 0.75 (the variable actions together, one wind direction and one moving load at a time); 0.6 G + W for each wind action (wind at its characteristic, service-level value); G + A + 0.5 (imposed and other) + 0.2 (snow) for each accidental action. Serviceability, unfactored: G when nothing varies; G + Q for each variable action; G + the variable actions together, chosen as for strength. Loads at characteristic values; the required safety factors apply to the resistance.';
const GIVEN_SET_BASIS = 'The combinations given in the request, each action times its factor (superposition).';

export function presentEnvelope(envelope: DiagramEnvelope, units: OutputUnits) {
  // presentColumn hands back the engine's own column in SI: the answer only reads it.
  const max = {} as Record<DiagramField, number[]>;
  const min = {} as Record<DiagramField, number[]>;
  for (const field of DIAGRAM_FIELDS) {
    const factor = units.factors[DIAGRAM_FIELD_INFO[field].kind];
    max[field] = presentColumn(envelope.max[field], factor, units.significantDigits) as number[];
    min[field] = presentColumn(envelope.min[field], factor, units.significantDigits) as number[];
  }
  return { x: presentColumn(envelope.x, units.factors.length, units.significantDigits) as number[], max, min };
}

function presentBounds(bounds: Readonly<Record<ReactionComponent, ReactionBound>>, units: OutputUnits) {
  const out = {} as Record<ReactionComponent, { value: number; loadPosition: number }>;
  for (const component of REACTION_COMPONENTS) {
    const bound = bounds[component];
    out[component] = { value: present(units, REACTION_KIND[component], bound.value), loadPosition: present(units, 'length', bound.loadPosition) };
  }
  return out;
}

function presentCombinedBounds(bounds: Readonly<Record<ReactionComponent, CombinedReactionBound>>, units: OutputUnits) {
  const out = {} as Record<ReactionComponent, { value: number; combination: string; loadPosition: number | undefined }>;
  for (const component of REACTION_COMPONENTS) {
    const bound = bounds[component];
    out[component] = {
      value: present(units, REACTION_KIND[component], bound.value),
      combination: bound.combination,
      loadPosition: bound.loadPosition === null ? undefined : present(units, 'length', bound.loadPosition),
    };
  }
  return out;
}

export function presentLoadCombinations(normalised: NormalisedCombinations, outcome: CombinationsOutcome, labels: readonly (string | undefined)[], units: OutputUnits, detail: 'full' | 'summary' = 'full') {
  const summary = detail === 'summary';
  const length = (value: number) => present(units, 'length', value);
  return {
    set: normalised.set,
    basis: normalised.set === 'default' ? DEFAULT_SET_BASIS : GIVEN_SET_BASIS,
    governing: (outcome.results[outcome.governing] as CombinationsOutcome['results'][number]).combination.id,
    shown: (outcome.results[outcome.shown] as CombinationsOutcome['results'][number]).combination.id,
    reactions: outcome.reactions.map((reaction, i) => ({
      label: labels[i],
      position: length(reaction.position),
      max: presentCombinedBounds(reaction.max, units),
      min: presentCombinedBounds(reaction.min, units),
    })),
    actions: normalised.actions.map((action) => ({ id: action.id, kind: action.kind, category: action.category, description: action.description })),
    combinations: outcome.results.map((result) => {
      const { combination, state, movingLoad } = result;
      return {
        id: combination.id,
        purpose: combination.purpose,
        description: combination.description,
        factors: Object.fromEntries(combination.factors),
        verdict: state.outcome.verdict,
        unchecked: state.outcome.unchecked.map(({ mode, reason }) => ({ mode, reason: textInUnits(units, reason) })),
        governing: presentGoverning(state.outcome.governing, units),
        movingLoad:
          movingLoad === null
            ? undefined
            : {
                id: movingLoad.id,
                factor: movingLoad.factor,
                loadPosition: length(result.loadPosition as number),
                positionsSearched: movingLoad.positionsSearched,
                extremes: Object.fromEntries(
                  DIAGRAM_FIELDS.map((field) => {
                    const kind = DIAGRAM_FIELD_INFO[field].kind;
                    const { max, min } = movingLoad.extremes[field];
                    const one = (extreme: typeof max) => ({ value: present(units, kind, extreme.value), position: length(extreme.position), loadPosition: length(extreme.loadPosition) });
                    return [field, { max: one(max), min: one(min) }];
                  }),
                ),
                reactions: movingLoad.reactions.map((reaction, i) => ({
                  label: labels[i],
                  position: length(reaction.position),
                  max: presentBounds(reaction.max, units),
                  min: presentBounds(reaction.min, units),
                })),
                envelope: summary ? undefined : presentEnvelope(result.envelope as DiagramEnvelope, units),
              },
        reactions: presentReactions(state.analysis, labels, units),
        extremes: presentExtremes(state.analysis, units),
        checks: presentCheckList(state.outcome.checks, units),
      };
    }),
    envelope: summary
      ? undefined
      : {
          strength: outcome.envelopes.strength === null ? undefined : presentEnvelope(outcome.envelopes.strength, units),
          serviceability: outcome.envelopes.serviceability === null ? undefined : presentEnvelope(outcome.envelopes.serviceability, units),
        },
  };
}
