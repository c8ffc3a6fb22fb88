/**
 * Every combination of a member's actions analysed and checked, and the one that governs.
 *
 * A combination without a moving load is one load state: the load cases times their factors
 * (superposition; the member is linear elastic). A combination with a moving load is a family of load
 * states, one for each position of the train. The checks are made at every position of
 * trainPositions() (a grid, and each axle on an end, support or hinge and a hair to either side), then
 * near the two best positions for the governing utilization refined by Brent's method, and where each
 * diagram's largest and smallest values lie. Those extremes are found over every position by Brent's
 * method on the superposed diagram (superposition.ts): exact to rounding in value and to about 1e-7 of
 * the length in position (checked against the closed-form absolute maximum moment of a simple span
 * under two moving loads, AISC Steel Construction Manual, beam diagrams, cases 43 and 44). The
 * envelopes of the diagrams and reactions come from the influence lines, exact over every position
 * (train-envelope.ts).
 */

import { analyseMember } from '../analysis/analyse-member.js';
import { DIAGRAM_FIELDS, type DiagramField, type MemberAnalysis } from '../analysis/result.js';
import { ZERO_TOLERANCE, withoutNegativeZero } from '../analysis/tolerances.js';
import type { MemberCheckInput } from '../checks/check-input.js';
import { checkMember } from '../checks/check-member.js';
import type { FailureCheck, MemberCheckOutcome, NotApplicableCheck, UncheckedMode } from '../checks/check-outcome.js';
import { FAILURE_MODES, type FailureMode } from '../checks/failure-mode.js';
import { governingFailure } from '../checks/governing.js';
import { verdictOf } from '../checks/verdict.js';
import { EngineError } from '../engine-error.js';
import type { LoadModel, MemberModel } from '../member/model.js';
import { validateMemberModel } from '../member/validate-model.js';
import { brentMaximum } from './brent-maximum.js';
import { combinedStaticLoads, trainLoads } from './combined-loads.js';
import { emptyEnvelope, envelopePositions, mergeEnvelope, widenEnvelope, type DiagramEnvelope, type EnvelopePositions } from './diagram-envelope.js';
import type { CombinationModel, CombinationPurpose, LoadCaseModel, MovingLoadModel } from './load-actions.js';
import { FIELD_PLANE, influenceLines, structuralNodesOf, type InfluenceLines } from './influence-lines.js';
import { REACTION_COMPONENTS, trainEnvelope, type ReactionBound, type ReactionBounds, type ReactionComponent, type TrainEnvelope } from './train-envelope.js';
import { superposedFieldExtremes } from './superposition.js';
import { trainPositions } from './train-positions.js';

export interface CombinationsInput {
  readonly member: Omit<MemberModel, 'loads'>;
  readonly cases: readonly LoadCaseModel[];
  readonly movingLoads: readonly MovingLoadModel[];
  readonly combinations: readonly CombinationModel[];
  /** Evenly spaced envelope points (the fixed nodes are added). */
  readonly samples: number;
  readonly checks: Omit<MemberCheckInput, 'analysis' | 'model'>;
}

/** One analysed and checked load state. */
export interface LoadState {
  readonly model: MemberModel;
  readonly analysis: MemberAnalysis;
  /** The checks of the combination's purpose only. */
  readonly outcome: MemberCheckOutcome;
  /** The modes of the other purpose that the member would be checked for (with a demand, or left unchecked). */
  readonly otherPurposeModes: readonly FailureMode[];
}

/** An extreme of a diagram over the member and every train position: its value, where on the member, and where the train stood. */
export interface MovingExtreme {
  readonly value: number;
  readonly position: number;
  readonly loadPosition: number;
}

export interface ReactionEnvelope {
  readonly position: number;
  readonly max: Readonly<Record<ReactionComponent, ReactionBound>>;
  readonly min: Readonly<Record<ReactionComponent, ReactionBound>>;
}

export interface MovingLoadResult {
  readonly id: string;
  readonly factor: number;
  /** The train positions at which the checks were made, on the grid and at the nodes (refinements not counted). */
  readonly positionsSearched: number;
  readonly extremes: Readonly<Record<DiagramField, { readonly max: MovingExtreme; readonly min: MovingExtreme }>>;
  readonly reactions: readonly ReactionEnvelope[];
}

export interface CombinationResult {
  readonly combination: CombinationModel;
  /** At the governing train position for a moving load. */
  readonly state: LoadState;
  /** Where the train's reference point stands in `state`; null without a moving load. */
  readonly loadPosition: number | null;
  readonly movingLoad: MovingLoadResult | null;
  /** With a moving load: largest and smallest value at the envelope positions over every train position; null without. */
  readonly envelope: DiagramEnvelope | null;
}

/** A check at its worst over every combination and train position, and where that was. */
export interface WorstCheck {
  readonly check: FailureCheck;
  readonly combination: string;
  readonly loadPosition: number | null;
}

export interface CombinationsOutcome {
  readonly results: readonly CombinationResult[];
  /** Index into results of the combination that holds the governing check. */
  readonly governing: number;
  /** Index into results of the combination whose state is shown at the top: the strength combination with the highest utilization, else the governing one. */
  readonly shown: number;
  /** Each support's reactions at their extremes over the strength combinations (all, when none is for strength). */
  readonly reactions: readonly CombinedReactionEnvelope[];
  readonly worstChecks: readonly WorstCheck[];
  /** Every check at its worst, the governing one, the verdict; buckling, stresses and criteria of the shown combination. */
  readonly outcome: MemberCheckOutcome;
  readonly envelopes: Readonly<Record<CombinationPurpose, DiagramEnvelope | null>>;
  readonly envelopePositions: EnvelopePositions;
}

const SERVICEABILITY_MODES: readonly FailureMode[] = ['deflection', 'twist'];
/** Modes checked separately per span, segment or support: their location is part of what they are. */
const LOCATED_MODES: readonly FailureMode[] = ['deflection', 'lateral-torsional-buckling', 'pin-shear', 'pin-bearing', 'pin-bending'];
/**
 * Position tolerance of the refinement, relative to the member length. A smooth maximum cannot be
 * located much closer than sqrt(machine epsilon) ~ 1.5e-8 (the values there agree to rounding), and a
 * tighter tolerance only spends evaluations on rounding noise; the value is then exact to about 1e-14.
 */
const REFINEMENT_TOLERANCE = 1e-7;
/** The refinement of the governing utilization looks near this many of the best grid positions; a diagram's extremes near the best one. */
const PEAKS_REFINED = 2;

function servesPurpose(mode: FailureMode, purpose: CombinationPurpose): boolean {
  return SERVICEABILITY_MODES.includes(mode) === (purpose === 'serviceability');
}

/** The outcome with only the checks of the purpose, its governing check and verdict taken again. */
function outcomeForPurpose(outcome: MemberCheckOutcome, purpose: CombinationPurpose): MemberCheckOutcome {
  const checks = outcome.checks.filter((check) => servesPurpose(check.mode, purpose));
  const unchecked = outcome.unchecked.filter((gap) => servesPurpose(gap.mode, purpose));
  return {
    ...outcome,
    checks,
    notApplicable: outcome.notApplicable.filter((reason) => servesPurpose(reason.mode, purpose)),
    unchecked,
    governing: governingFailure(checks),
    verdict: verdictOf(checks, unchecked),
  };
}

/** The modes of the purpose a combination does not serve that apply to the member: checks with a demand, and modes left unchecked. */
function otherPurposeModesOf(outcome: MemberCheckOutcome, purpose: CombinationPurpose): FailureMode[] {
  const modes = new Set<FailureMode>();
  for (const check of outcome.checks) if (!servesPurpose(check.mode, purpose) && check.demand > 0) modes.add(check.mode);
  for (const gap of outcome.unchecked) if (!servesPurpose(gap.mode, purpose)) modes.add(gap.mode);
  return [...modes];
}

/** Each load case's loads must lie on the member: checked case by case so the pointer names the case. */
function validateCases(member: Omit<MemberModel, 'loads'>, cases: readonly LoadCaseModel[]): void {
  cases.forEach((loadCase, i) => {
    try {
      validateMemberModel({ ...member, loads: loadCase.loads });
    } catch (error) {
      if (error instanceof EngineError && error.path[0] === 'loads') {
        throw new EngineError(error.kind, error.message.replace(/^(The (start|end) of )?[Ll]oad (\d+)/, (_, prefix: string | undefined, _part, n: string) => `${prefix ?? ''}${prefix ? 'l' : 'L'}oad ${n} of load case "${loadCase.id}"`), ['loadCases', i, ...error.path], error.details);
      }
      throw error;
    }
  });
}


/** The structural nodes (where an axle makes a breakpoint of every response) and every load-case load point and end: where the fixed loads' diagrams may jump or kink. */
function fixedNodesOf(member: Omit<MemberModel, 'loads'>, cases: readonly LoadCaseModel[]): number[] {
  const nodes = structuralNodesOf(member);
  for (const loadCase of cases) {
    for (const load of loadCase.loads) {
      if (load.kind === 'point') nodes.push(load.position);
      else nodes.push(load.from, load.to);
    }
  }
  return nodes;
}

/** The identity of a check across load states: its mode, and for per-span, per-segment and per-support checks where it lies (a check without demand has no place and joins its mode). */
function checkKey(check: FailureCheck): string {
  return LOCATED_MODES.includes(check.mode) && check.location !== null ? `${check.mode}|${check.location}` : check.mode;
}

class WorstChecks {
  private readonly byKey = new Map<string, WorstCheck>();

  note(outcome: MemberCheckOutcome, combination: string, loadPosition: number | null): void {
    for (const check of outcome.checks) {
      const key = checkKey(check);
      const known = this.byKey.get(key);
      if (known === undefined || check.utilization > known.check.utilization) this.byKey.set(key, { check, combination, loadPosition });
    }
  }

  /** Every check at its worst; a check without demand only where its mode has no other entry. */
  all(): WorstCheck[] {
    const entries = [...this.byKey.values()];
    const withDemand = new Set(entries.filter((entry) => entry.check.utilization > 0).map((entry) => entry.check.mode));
    return entries.filter((entry) => entry.check.utilization > 0 || !withDemand.has(entry.check.mode));
  }
}

/** Indices of the best local maxima of `values`, best first. */
function peakIndices(values: readonly number[], count: number): number[] {
  const peaks: number[] = [];
  for (let k = 0; k < values.length; k++) {
    const value = values[k] as number;
    if ((k === 0 || value >= (values[k - 1] as number)) && (k === values.length - 1 || value >= (values[k + 1] as number))) peaks.push(k);
  }
  return peaks.sort((a, b) => (values[b] as number) - (values[a] as number) || a - b).slice(0, count);
}

/**
 * The largest value of f over the positions, refined near the best grid peaks: returns the position and
 * value, the grid's own when no refinement beats it.
 */
function refinedMaximum(positions: readonly number[], values: readonly number[], f: (p: number) => number, tolerance: number, peaks = PEAKS_REFINED): { position: number; value: number } {
  let best = { position: positions[0] as number, value: values[0] as number };
  for (let k = 1; k < values.length; k++) if ((values[k] as number) > best.value) best = { position: positions[k] as number, value: values[k] as number };
  if (positions.length < 2) return best;
  for (const k of peakIndices(values, peaks)) {
    const lo = positions[Math.max(0, k - 1)] as number;
    const hi = positions[Math.min(positions.length - 1, k + 1)] as number;
    const found = brentMaximum(f, lo, hi, tolerance);
    if (found.value > best.value) best = { position: found.x, value: found.value };
  }
  return best;
}

function evaluateState(member: Omit<MemberModel, 'loads'>, loads: readonly LoadModel[], input: CombinationsInput, purpose: CombinationPurpose): LoadState {
  const model: MemberModel = { ...member, loads };
  const analysis = analyseMember(model);
  const whole = checkMember({ ...input.checks, analysis, model });
  return { model, analysis, outcome: outcomeForPurpose(whole, purpose), otherPurposeModes: otherPurposeModesOf(whole, purpose) };
}

function movingLoadOf(combination: CombinationModel, index: number, movingLoads: readonly MovingLoadModel[]): { train: MovingLoadModel; factor: number } | null {
  const named = movingLoads.filter((train) => (combination.factors.get(train.id) ?? 0) !== 0);
  if (named.length > 1) {
    throw new EngineError('not-applicable', `Combination "${combination.id}" moves ${named.length} trains; a combination moves one (give trains that travel together as one moving load).`, ['combinations', index, 'factors']);
  }
  const train = named[0];
  return train === undefined ? null : { train, factor: combination.factors.get(train.id) as number };
}

/** The fixed loads' own envelope plus factor x the train's: the train's largest values where the factor is positive, its smallest where negative. */
function superposedEnvelope(fixed: DiagramEnvelope, train: TrainEnvelope, factor: number): DiagramEnvelope {
  for (const field of DIAGRAM_FIELDS) {
    const up = factor >= 0 ? train.max[field] : train.min[field];
    const down = factor >= 0 ? train.min[field] : train.max[field];
    fixed.max[field].forEach((value, k, column) => (column[k] = value + factor * (up[k] as number)));
    fixed.min[field].forEach((value, k, column) => (column[k] = value + factor * (down[k] as number)));
  }
  return fixed;
}

function superposedReactions(fixed: MemberAnalysis, train: TrainEnvelope, factor: number): ReactionEnvelope[] {
  return fixed.reactions.map((reaction, i) => {
    const bounds = train.reactions[i] as ReactionBounds;
    const max = {} as Record<ReactionComponent, ReactionBound>;
    const min = {} as Record<ReactionComponent, ReactionBound>;
    for (const component of REACTION_COMPONENTS) {
      const up = factor >= 0 ? bounds.max[component] : bounds.min[component];
      const down = factor >= 0 ? bounds.min[component] : bounds.max[component];
      max[component] = { value: reaction[component] + factor * up.value, loadPosition: up.loadPosition };
      min[component] = { value: reaction[component] + factor * down.value, loadPosition: down.loadPosition };
    }
    return { position: reaction.position, max, min };
  });
}

function checkMovingCombination(
  input: CombinationsInput,
  combination: CombinationModel,
  moving: { train: MovingLoadModel; factor: number },
  trainEnvelopeOf: (train: MovingLoadModel) => TrainEnvelope,
  structuralNodes: readonly number[],
  positions: EnvelopePositions,
  worst: WorstChecks,
): CombinationResult {
  const { member } = input;
  const { length } = member;
  const staticLoads = combinedStaticLoads(input.cases, combination);
  const loadsAt = (p: number): LoadModel[] => [...staticLoads, ...trainLoads(moving.train, p, moving.factor, length)];
  // A diagram's extremes at many train positions: the fixed loads solved once, the train alone (a few
  // point loads) at each position, the two superposed (see superposition.ts). (Superposing whole
  // analyses for the checks was measured no faster than solving: merging the pieces costs what solving does.)
  const fixed = analyseMember({ ...member, loads: staticLoads });
  const trainAnalyses = new Map<number, MemberAnalysis>();
  const trainAnalysisAt = (p: number): MemberAnalysis => {
    let known = trainAnalyses.get(p);
    if (known === undefined) {
      known = analyseMember({ ...member, loads: trainLoads(moving.train, p, 1, length) });
      trainAnalyses.set(p, known);
    }
    return known;
  };
  const stateAt = (p: number): LoadState => {
    const state = evaluateState(member, loadsAt(p), input, combination.purpose);
    worst.note(state.outcome, combination.id, p);
    return state;
  };
  const trainAt = trainPositions(moving.train, structuralNodes, length);
  const utilization: number[] = [];
  const fieldMax = Object.fromEntries(DIAGRAM_FIELDS.map((field) => [field, [] as number[]])) as Record<DiagramField, number[]>;
  const fieldMin = Object.fromEntries(DIAGRAM_FIELDS.map((field) => [field, [] as number[]])) as Record<DiagramField, number[]>;
  for (const p of trainAt) {
    const state = stateAt(p);
    utilization.push(state.outcome.governing?.utilization ?? 0);
    for (const field of DIAGRAM_FIELDS) {
      fieldMax[field].push(state.analysis.extremes[field].max.value);
      fieldMin[field].push(-state.analysis.extremes[field].min.value);
    }
  }
  const tolerance = REFINEMENT_TOLERANCE * length;
  const refinedGoverning = refinedMaximum(trainAt, utilization, (p) => stateAt(p).outcome.governing?.utilization ?? 0, tolerance);

  const extremes = {} as Record<DiagramField, { max: MovingExtreme; min: MovingExtreme }>;
  for (const field of DIAGRAM_FIELDS) {
    const plane = FIELD_PLANE[field];
    // A diagram no axle force reaches does not change with the train's position: the grid's value is exact.
    const reached = plane !== null && moving.train.axles.some((axle) => (plane === 'y' ? axle.fy : axle.fz) !== 0);
    const extremeAt = (p: number, side: 'max' | 'min'): MovingExtreme => {
      const extreme = superposedFieldExtremes(fixed, trainAnalysisAt(p), moving.factor, field)[side];
      return { value: extreme.value, position: extreme.position, loadPosition: p };
    };
    const refine = (side: 'max' | 'min', values: readonly number[]): MovingExtreme => {
      const sign = side === 'max' ? 1 : -1;
      const best = reached ? refinedMaximum(trainAt, values, (p) => sign * extremeAt(p, side).value, tolerance, 1) : { position: trainAt[0] as number, value: 0 };
      return extremeAt(best.position, side);
    };
    extremes[field] = { max: refine('max', fieldMax[field]), min: refine('min', fieldMin[field]) };
  }
  // Each check is checked where the diagram it measures peaks (bending where the moment does, shear
  // where the shear does, deflection where the deflection does), besides the grid: the governing state
  // is the worst of all of them.
  const candidates = new Set<number>([refinedGoverning.position]);
  for (const field of DIAGRAM_FIELDS) {
    if (FIELD_PLANE[field] === null) continue;
    candidates.add(extremes[field].max.loadPosition);
    candidates.add(extremes[field].min.loadPosition);
  }
  let governing = { position: refinedGoverning.position, state: stateAt(refinedGoverning.position) };
  for (const p of candidates) {
    if (p === refinedGoverning.position) continue;
    const candidate = stateAt(p);
    if ((candidate.outcome.governing?.utilization ?? 0) > (governing.state.outcome.governing?.utilization ?? 0)) governing = { position: p, state: candidate };
  }
  const { state } = governing;
  const train = trainEnvelopeOf(moving.train);
  const envelope = emptyEnvelope(positions);
  widenEnvelope(envelope, positions, fixed);
  return {
    combination,
    state,
    loadPosition: governing.position,
    movingLoad: {
      id: moving.train.id,
      factor: moving.factor,
      positionsSearched: trainAt.length,
      extremes,
      reactions: superposedReactions(fixed, train, moving.factor),
    },
    envelope: superposedEnvelope(envelope, train, moving.factor),
  };
}

/** Values within ZERO_TOLERANCE of a field's largest magnitude become 0, and no value is -0 (as in the diagrams). */
function roundEnvelope(envelope: DiagramEnvelope): DiagramEnvelope {
  for (const field of DIAGRAM_FIELDS) {
    let scale = 0;
    for (const value of envelope.max[field]) scale = Math.max(scale, Math.abs(value));
    for (const value of envelope.min[field]) scale = Math.max(scale, Math.abs(value));
    const round = (value: number) => (Math.abs(value) <= ZERO_TOLERANCE * scale ? 0 : withoutNegativeZero(value));
    envelope.max[field].forEach((value, k, column) => (column[k] = round(value)));
    envelope.min[field].forEach((value, k, column) => (column[k] = round(value)));
  }
  return envelope;
}

/** A reaction component at its largest or smallest over the combinations, and where that was. */
export interface CombinedReactionBound {
  readonly value: number;
  readonly combination: string;
  readonly loadPosition: number | null;
}

export interface CombinedReactionEnvelope {
  readonly position: number;
  readonly max: Readonly<Record<ReactionComponent, CombinedReactionBound>>;
  readonly min: Readonly<Record<ReactionComponent, CombinedReactionBound>>;
}

/** Each support's reactions at their largest and smallest over the strength combinations (over all of them when none is for strength). */
function reactionsOverCombinations(results: readonly CombinationResult[]): CombinedReactionEnvelope[] {
  const strength = results.filter((result) => result.combination.purpose === 'strength');
  const over = strength.length > 0 ? strength : results;
  const first = over[0] as CombinationResult;
  return first.state.analysis.reactions.map((reaction, s) => {
    const max = {} as Record<ReactionComponent, CombinedReactionBound>;
    const min = {} as Record<ReactionComponent, CombinedReactionBound>;
    for (const component of REACTION_COMPONENTS) {
      for (const result of over) {
        const id = result.combination.id;
        const moving = result.movingLoad?.reactions[s];
        const high = moving === undefined ? { value: (result.state.analysis.reactions[s] as typeof reaction)[component], combination: id, loadPosition: null } : { value: moving.max[component].value, combination: id, loadPosition: moving.max[component].loadPosition };
        const low = moving === undefined ? { ...high } : { value: moving.min[component].value, combination: id, loadPosition: moving.min[component].loadPosition };
        if (max[component] === undefined || high.value > max[component].value) max[component] = high;
        if (min[component] === undefined || low.value < min[component].value) min[component] = low;
      }
    }
    return { position: reaction.position, max, min };
  });
}

const STRENGTH_MODES = FAILURE_MODES.filter((mode) => !SERVICEABILITY_MODES.includes(mode));

function aggregateOutcome(results: readonly CombinationResult[], worstChecks: readonly WorstCheck[]): { outcome: MemberCheckOutcome; governing: number; shown: number } {
  const checks = worstChecks.map((entry) => entry.check);
  const governingCheck = governingFailure(checks);
  let governing = 0;
  if (governingCheck !== null) {
    // governingFailure picks among checks within a tie by mode; find the entry it picked.
    const entry = worstChecks.find(
      (candidate) =>
        candidate.check.mode === governingCheck.mode &&
        candidate.check.utilization === governingCheck.utilization &&
        candidate.check.position === governingCheck.position &&
        candidate.check.location === governingCheck.location,
    );
    governing = Math.max(0, results.findIndex((result) => result.combination.id === entry?.combination));
  }
  // The state shown at the top: the strength combination with the highest utilization (the stresses,
  // reactions and buckling of a serviceability combination would understate them), else the governing one.
  let shown = -1;
  results.forEach((result, i) => {
    if (result.combination.purpose !== 'strength') return;
    const utilization = result.state.outcome.governing?.utilization ?? 0;
    if (shown < 0 || utilization > ((results[shown] as CombinationResult).state.outcome.governing?.utilization ?? 0)) shown = i;
  });
  if (shown < 0) shown = governing;
  const checked = new Set(checks.map((check) => check.mode));
  const notApplicable: NotApplicableCheck[] = [];
  const unchecked: UncheckedMode[] = [];
  const seenModes = new Set<FailureMode>();
  const uncheckedModes = new Set<FailureMode>();
  const notices: string[] = [];
  const seenNotices = new Set<string>();
  for (const result of results) {
    for (const reason of result.state.outcome.notApplicable) {
      if (checked.has(reason.mode) || seenModes.has(reason.mode)) continue;
      seenModes.add(reason.mode);
      notApplicable.push(reason);
    }
    for (const gap of result.state.outcome.unchecked) {
      if (uncheckedModes.has(gap.mode)) continue;
      uncheckedModes.add(gap.mode);
      unchecked.push(gap);
    }
    for (const notice of result.state.outcome.notices) {
      if (seenNotices.has(notice)) continue;
      seenNotices.add(notice);
      notices.push(notice);
    }
  }
  // A purpose no combination serves leaves its modes unchecked: those that apply to the member make the
  // verdict 'not-verified'; the rest are listed as not applicable, so no mode vanishes without a word.
  for (const [purpose, modes] of [['strength', STRENGTH_MODES], ['serviceability', SERVICEABILITY_MODES]] as const) {
    if (results.some((result) => result.combination.purpose === purpose)) continue;
    const applying = new Set(results.flatMap((result) => result.state.otherPurposeModes));
    const reason = `no ${purpose} combination was given, so this mode was not checked`;
    for (const mode of modes) {
      if (checked.has(mode) || seenModes.has(mode) || uncheckedModes.has(mode)) continue;
      if (applying.has(mode)) {
        uncheckedModes.add(mode);
        unchecked.push({ mode, reason });
      } else notApplicable.push({ mode, reason });
    }
    notices.push(`No ${purpose} combination was given: the ${purpose === 'strength' ? 'strength and stability' : 'deflection and twist'} checks were not made.`);
  }
  const base = (results[shown] as CombinationResult).state.outcome;
  return {
    governing,
    shown,
    outcome: {
      checks,
      notApplicable,
      unchecked,
      governing: governingCheck,
      verdict: verdictOf(checks, unchecked),
      buckling: base.buckling,
      lateralTorsionalBuckling: base.lateralTorsionalBuckling,
      stresses: base.stresses,
      criteria: base.criteria,
      notices,
    },
  };
}

export function checkCombinations(input: CombinationsInput): CombinationsOutcome {
  const { member, cases, combinations } = input;
  if (combinations.length === 0) throw new EngineError('not-applicable', 'There is no combination to check.', ['combinations']);
  validateCases(member, cases);
  const structuralNodes = structuralNodesOf(member);
  const positions = envelopePositions(member.length, input.samples, fixedNodesOf(member, cases));
  const worst = new WorstChecks();
  const envelopes: Record<CombinationPurpose, DiagramEnvelope | null> = { strength: null, serviceability: null };
  const envelopeOf = (purpose: CombinationPurpose): DiagramEnvelope => (envelopes[purpose] ??= emptyEnvelope(positions));
  const trainEnvelopes = new Map<string, TrainEnvelope>();
  let lines: InfluenceLines | null = null;
  const trainEnvelopeOf = (train: MovingLoadModel): TrainEnvelope => {
    let known = trainEnvelopes.get(train.id);
    if (known === undefined) {
      lines ??= influenceLines(member, positions);
      known = trainEnvelope(lines, train);
      trainEnvelopes.set(train.id, known);
    }
    return known;
  };
  const results = combinations.map((combination, index): CombinationResult => {
    const moving = movingLoadOf(combination, index, input.movingLoads);
    if (moving !== null) return checkMovingCombination(input, combination, moving, trainEnvelopeOf, structuralNodes, positions, worst);
    const state = evaluateState(member, combinedStaticLoads(cases, combination), input, combination.purpose);
    worst.note(state.outcome, combination.id, null);
    widenEnvelope(envelopeOf(combination.purpose), positions, state.analysis);
    return { combination, state, loadPosition: null, movingLoad: null, envelope: null };
  });
  for (const result of results) {
    if (result.envelope === null) continue;
    mergeEnvelope(envelopeOf(result.combination.purpose), result.envelope);
    roundEnvelope(result.envelope);
  }
  for (const envelope of Object.values(envelopes)) if (envelope !== null) roundEnvelope(envelope);
  const worstChecks = worst.all();
  const { outcome, governing, shown } = aggregateOutcome(results, worstChecks);
  return { results, governing, shown, worstChecks, outcome, envelopes, envelopePositions: positions, reactions: reactionsOverCombinations(results) };
}

