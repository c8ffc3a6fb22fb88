/**
 * Load cases, moving loads and combinations, from the request to the engine's models: quantities to SI
 * (read with the request's other quantities), then, once the member length is known, the checks that
 * need it, the default combinations and the limits on work.
 */

import { defaultCombinations, type ActionSummary } from '../../engine/combinations/default-combinations.js';
import type { ActionCategory, CombinationModel, LoadCaseModel, MovingLoadModel } from '../../engine/combinations/load-actions.js';
import { structuralNodesOf } from '../../engine/combinations/influence-lines.js';
import { gridIntervals, trainPositions } from '../../engine/combinations/train-positions.js';
import type { LoadModel } from '../../engine/member/model.js';
import { invalidField, tooMuchWork } from '../problems.js';
import type { MemberCheckRequest } from '../schemas/member-check-request.js';
import { MAX_LOADS } from '../schemas/member-input.js';
import { MAX_LOAD_STATES, MAX_TRAIN_INTERVALS, SELF_WEIGHT_CASE } from '../schemas/load-combinations-input.js';
import { normaliseLoads, type NormalisedMember } from './member.js';
import type { Path, QuantityReader } from './quantity-reader.js';

/** Load states x (loads + axles + supports + hinges + 1): about a second of work. */
export const MAX_COMBINATION_WORK = 1_000_000;
/** Envelope points with a moving load: about nine single-load analyses each, half a second at this bound. */
export const MAX_ENVELOPE_POINTS = 5001;
/** Envelope numbers in one answer: (combinations with a moving load + 2) x envelope points, 22 numbers each. */
export const MAX_ENVELOPE_ANSWER_POINTS = 100_000;

export type ActionKind = 'load-case' | 'moving-load' | 'self-weight';

export interface ActionEcho {
  readonly id: string;
  readonly kind: ActionKind;
  readonly category: ActionCategory;
  readonly description: string | undefined;
}

export interface NormalisedCombinations {
  /** The load cases; the self-weight case is added per section (it depends on the area). */
  readonly cases: readonly LoadCaseModel[];
  readonly movingLoads: readonly MovingLoadModel[];
  readonly combinations: readonly CombinationModel[];
  readonly set: 'given' | 'default';
  readonly actions: readonly ActionEcho[];
  /** Sum over combinations of the train positions searched, 1 for a combination without a moving load. */
  readonly loadStates: number;
  /** Points of each envelope when some load moves (0 otherwise): the influence lines are read at each. */
  readonly envelopePoints: number;
  readonly notices: readonly string[];
}

interface ReadTrain {
  readonly offsets: number[];
  readonly fy: number[];
  readonly fz: number[];
  readonly from: number | undefined;
  readonly to: number | undefined;
  readonly step: number | undefined;
}

/** Quantities read; the rest waits for the member length. */
export interface ReadCombinations {
  readonly caseLoads: readonly LoadModel[][];
  readonly trains: readonly ReadTrain[];
}

type CombinationFields = Pick<MemberCheckRequest, 'loads' | 'loadCases' | 'movingLoads' | 'combinations' | 'selfWeight'>;

export function asksForCombinations(request: CombinationFields): boolean {
  return request.loadCases !== undefined || request.movingLoads !== undefined || request.combinations !== undefined;
}

export function readCombinations(request: CombinationFields, reader: QuantityReader, base: Path): ReadCombinations {
  const caseLoads = (request.loadCases ?? []).map((loadCase, i) => normaliseLoads(loadCase.loads, reader, [...base, 'loadCases', i, 'loads']));
  const trains = (request.movingLoads ?? []).map((train, i): ReadTrain => {
    const path = [...base, 'movingLoads', i];
    return {
      offsets: train.axles.map((axle, j) => reader.read(axle.offset, 'length', [...path, 'axles', j, 'offset'])),
      fy: train.axles.map((axle, j) => reader.optional(axle.fy, 'force', [...path, 'axles', j, 'fy'], 0)),
      fz: train.axles.map((axle, j) => reader.optional(axle.fz, 'force', [...path, 'axles', j, 'fz'], 0)),
      from: train.from === undefined ? undefined : reader.read(train.from, 'length', [...path, 'from']),
      to: train.to === undefined ? undefined : reader.read(train.to, 'length', [...path, 'to']),
      step: train.step === undefined ? undefined : reader.positive(train.step, 'length', [...path, 'step']),
    };
  });
  return { caseLoads, trains };
}

/**
 * The travel of a train: by default the whole pass, from the front axle entering at x = 0 to the rear
 * axle leaving at the length (positions with part of the train off the member can govern: a heavy axle
 * alone on the span). A given travel is clipped to the positions where some axle stands on the member.
 */
function movingLoadModel(request: NonNullable<CombinationFields['movingLoads']>[number], read: ReadTrain, length: number, path: Path): MovingLoadModel {
  if (request.category === 'permanent') throw invalidField([...path, 'category'], 'a moving load is a variable action: give it the category of what moves (imposed, other, ...)');
  const first = Math.min(...read.offsets);
  const last = Math.max(...read.offsets);
  if (read.from === undefined && read.to === undefined && last - first > length) {
    throw invalidField([...path, 'axles'], `the axles span ${last - first} m, more than the member's ${length} m; give from and to, the travel of the reference point (axles off the member carry nothing)`);
  }
  const givenFrom = read.from ?? -last;
  const givenTo = read.to ?? length - first;
  if (givenFrom > givenTo) {
    throw invalidField([...path, read.to === undefined ? 'from' : 'to'], `the travel runs from ${givenFrom} m to ${givenTo} m: from must not lie beyond to`);
  }
  const from = Math.max(givenFrom, -last);
  const to = Math.min(givenTo, length - first);
  if (from > to) {
    throw invalidField([...path, read.from !== undefined && read.from > length - first ? 'from' : 'to'], `no axle stands on the member anywhere from ${givenFrom} m to ${givenTo} m`);
  }
  const step = read.step ?? (to > from ? (to - from) / 100 : length);
  const model: MovingLoadModel = {
    id: request.id,
    category: request.category,
    axles: read.offsets.map((offset, j) => ({ offset, fy: read.fy[j] as number, fz: read.fz[j] as number })),
    from,
    to,
    step,
  };
  const intervals = gridIntervals(model);
  if (!(intervals <= MAX_TRAIN_INTERVALS)) {
    throw tooMuchWork([...path, 'step'], `a travel of ${to - from} m in steps of ${step} m is ${intervals} intervals; at most ${MAX_TRAIN_INTERVALS}`);
  }
  return model;
}

function givenCombinations(request: CombinationFields, known: ReadonlyMap<string, ActionKind>, base: Path): CombinationModel[] {
  const seen = new Set<string>();
  return (request.combinations ?? []).map((combination, i) => {
    const path = [...base, 'combinations', i];
    if (seen.has(combination.id)) throw invalidField([...path, 'id'], `another combination has the id "${combination.id}"`);
    seen.add(combination.id);
    const entries = Object.entries(combination.factors);
    if (entries.length === 0) throw invalidField([...path, 'factors'], 'names no action: give a factor for at least one load case or moving load');
    if (entries.every(([, factor]) => factor === 0)) throw invalidField([...path, 'factors'], 'every factor is 0: the combination carries no load');
    for (const [id] of entries) {
      if (!known.has(id)) {
        const ids = [...known.keys()].map((name) => `"${name}"`).join(', ');
        throw invalidField([...path, 'factors', id], `no load case or moving load has the id "${id}"; the ids are ${ids || 'none'}`);
      }
    }
    const trains = entries.filter(([id, factor]) => known.get(id) === 'moving-load' && factor !== 0);
    if (trains.length > 1) {
      throw invalidField([...path, 'factors'], `moves ${trains.length} trains (${trains.map(([id]) => id).join(', ')}); a combination moves one: give trains that travel together as one moving load, or one combination each`);
    }
    return {
      id: combination.id,
      purpose: combination.purpose,
      factors: new Map(entries),
      description: combination.description ?? entries.map(([id, factor]) => `${factor} ${id}`).join(' + '),
    };
  });
}

/** The checks and defaults that need the member length; throws one problem for the first fault. */
export function resolveCombinations(request: CombinationFields, read: ReadCombinations, member: NormalisedMember, samples: number, base: Path): NormalisedCombinations {
  if ((request.loads ?? []).length > 0) {
    throw invalidField([...base, 'loads'], 'must be empty when loads come in loadCases or movingLoads: put these loads in a load case so their category and factors are stated');
  }
  const actions: ActionEcho[] = [];
  const known = new Map<string, ActionKind>();
  const add = (id: string, kind: ActionKind, category: ActionCategory, description: string | undefined, path: Path): void => {
    if (id === SELF_WEIGHT_CASE) throw invalidField(path, `"${SELF_WEIGHT_CASE}" is reserved for the member's own weight (set selfWeight: true)`);
    if (known.has(id)) throw invalidField(path, `another load case or moving load has the id "${id}"`);
    known.set(id, kind);
    actions.push({ id, kind, category, description });
  };
  if (request.selfWeight === true) {
    known.set(SELF_WEIGHT_CASE, 'self-weight');
    actions.push({ id: SELF_WEIGHT_CASE, kind: 'self-weight', category: 'permanent', description: "the member's own weight" });
  }
  const cases = (request.loadCases ?? []).map((loadCase, i): LoadCaseModel => {
    add(loadCase.id, 'load-case', loadCase.category, loadCase.description, [...base, 'loadCases', i, 'id']);
    return { id: loadCase.id, category: loadCase.category, loads: read.caseLoads[i] as LoadModel[] };
  });
  const totalLoads = cases.reduce((sum, loadCase) => sum + loadCase.loads.length, 0);
  if (totalLoads > MAX_LOADS) throw tooMuchWork([...base, 'loadCases'], `${totalLoads} loads over all load cases; at most ${MAX_LOADS}`);
  const movingLoads = (request.movingLoads ?? []).map((train, i) => {
    add(train.id, 'moving-load', train.category, train.description, [...base, 'movingLoads', i, 'id']);
    return movingLoadModel(train, read.trains[i] as ReadTrain, member.length, [...base, 'movingLoads', i]);
  });
  if (actions.length === 0) {
    throw invalidField([...base, request.combinations === undefined ? 'loadCases' : 'combinations'], 'there is no load case, moving load or self-weight to combine');
  }
  const given = request.combinations !== undefined;
  const combinations = given
    ? givenCombinations(request, known, base)
    : defaultCombinations(actions.map((action): ActionSummary => ({ id: action.id, category: action.category, moving: action.kind === 'moving-load' })));
  const notices: string[] = [];
  if (!given) {
    notices.push('The combinations are the default set: common practice in the allowable-stress format (characteristic loads, 0.75 on variable actions acting together, 0.6 on permanent actions against wind), a placeholder for the combinations of the governing code; give combinations to use the code\'s.');
    if (actions.some((action) => action.category === 'accidental')) notices.push('Accidental combinations are checked with the same required safety factors as the others; the governing code may allow lower ones.');
  } else if (request.selfWeight === true) {
    const without = combinations.filter((combination) => !combination.factors.has(SELF_WEIGHT_CASE)).map((combination) => combination.id);
    if (without.length > 0) {
      const named = without.map((id) => `"${id}"`).join(', ');
      notices.push(`selfWeight is true, but ${without.length === 1 ? `combination ${named} gives` : `combinations ${named} give`} no factor for "${SELF_WEIGHT_CASE}": the member's own weight is left out there.`);
    }
  }
  const structuralNodes = structuralNodesOf(member);
  const positionsOf = new Map(movingLoads.map((train) => [train.id, trainPositions(train, structuralNodes, member.length).length]));
  let loadStates = 0;
  let axles = 0;
  for (const combination of combinations) {
    const train = movingLoads.find((candidate) => (combination.factors.get(candidate.id) ?? 0) !== 0);
    loadStates += train === undefined ? 1 : (positionsOf.get(train.id) as number);
    axles = Math.max(axles, train?.axles.length ?? 0);
  }
  if (loadStates > MAX_LOAD_STATES) {
    throw tooMuchWork([...base, given ? 'combinations' : 'movingLoads'], `${combinations.length} combinations search ${loadStates} load states (train positions); at most ${MAX_LOAD_STATES}: fewer combinations, a coarser step or a shorter travel`);
  }
  const work = loadStates * (totalLoads + axles + member.supports.length + member.hinges.length + 1);
  if (work > MAX_COMBINATION_WORK) {
    throw tooMuchWork([...base, 'loadCases'], `${loadStates} load states x ${totalLoads + axles + member.supports.length + member.hinges.length + 1} loads, axles, supports and hinges is ${work}; at most ${MAX_COMBINATION_WORK}`);
  }
  // A moving load's envelope: influence lines read at every envelope point (about nine single-load
  // analyses a point) and one envelope a combination that moves a train, two for the purposes.
  const caseNodes = read.caseLoads.reduce((sum, loads) => sum + loads.reduce((n, load) => n + (load.kind === 'point' ? 1 : 2), 0), 0);
  const envelopePoints = movingLoads.length === 0 ? 0 : samples + 2 * (member.supports.length + member.hinges.length + caseNodes) + 2;
  if (envelopePoints > MAX_ENVELOPE_POINTS) {
    throw tooMuchWork([...base, 'output', 'samples'], `with moving loads the envelope holds samples + 2 a node = ${envelopePoints} points; at most ${MAX_ENVELOPE_POINTS}: fewer samples`);
  }
  const movingCombinations = combinations.filter((combination) => movingLoads.some((train) => (combination.factors.get(train.id) ?? 0) !== 0)).length;
  const answerPoints = (movingCombinations + 2) * envelopePoints;
  if (answerPoints > MAX_ENVELOPE_ANSWER_POINTS) {
    throw tooMuchWork([...base, 'output', 'samples'], `${movingCombinations} combinations with a moving load and the two purposes make ${answerPoints} envelope points in the answer; at most ${MAX_ENVELOPE_ANSWER_POINTS}: fewer samples or combinations`);
  }
  return { cases, movingLoads, combinations, set: given ? 'given' : 'default', actions, loadStates, envelopePoints, notices };
}
