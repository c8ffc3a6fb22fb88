/**
 * One member check, from the parsed request to the presented response:
 * normalise (units to SI, catalogue names resolved) -> engine -> present.
 */

import { analyseMember } from '../engine/analysis/analyse-member.js';
import type { MemberAnalysis } from '../engine/analysis/result.js';
import { sampleDiagrams } from '../engine/analysis/sample-diagrams.js';
import { checkMember } from '../engine/checks/check-member.js';
import type { BucklingInput, LateralTorsionalInput, PinInput } from '../engine/checks/check-input.js';
import type { MemberCheckOutcome } from '../engine/checks/check-outcome.js';
import type { CriteriaInput } from '../engine/checks/criteria.js';
import { EngineError } from '../engine/engine-error.js';
import type { Material } from '../engine/materials/material.js';
import { memberStiffness } from '../engine/member/member-stiffness.js';
import { selfWeightLoad } from '../engine/member/self-weight.js';
import { checkCombinations, type CombinationsOutcome } from '../engine/combinations/check-combinations.js';
import type { LoadCaseModel } from '../engine/combinations/load-actions.js';
import type { LoadModel, MemberModel } from '../engine/member/model.js';
import type { SectionProperties } from '../engine/sections/section-properties.js';
import type { MaterialLookup, SectionLookup } from './normalise/catalogue-lookup.js';
import { normaliseBuckling, normaliseCriteria, normaliseLateralTorsional, normalisePins } from './normalise/check-options.js';
import { resolveMaterial, type MaterialResolver } from './normalise/material.js';
import { asksForCombinations, readCombinations, resolveCombinations, type NormalisedCombinations } from './normalise/load-combinations.js';
import { normaliseLoads, normaliseMember, type NormalisedMember } from './normalise/member.js';
import { QuantityReader, type Path } from './normalise/quantity-reader.js';
import { resolveSection, type ResolvedSection } from './normalise/section.js';
import { resolveOutputUnits, present, withSignificantDigits, type OutputUnits } from './output-units.js';
import { presentDiagrams, presentEquilibrium, presentExtremes, presentReactions } from './present/analysis.js';
import { presentChecks } from './present/checks.js';
import { presentLoadCombinations } from './present/load-combinations.js';
import { presentMaterial } from './present/material.js';
import { presentSection } from './present/section.js';
import { jsonPointer, ProblemError, tooMuchWork } from './problems.js';
import type { MemberCheckRequest } from './schemas/member-check-request.js';
import type { MemberCheckResponse } from './schemas/member-check-response.js';
import { SELF_WEIGHT_CASE } from './schemas/load-combinations-input.js';
import { memberCheckAudit } from './audit/input-digest.js';
import { DEFAULT_SAMPLES } from './schemas/output-options.js';

export interface Catalogues {
  readonly sections: SectionLookup;
  readonly materials: MaterialLookup;
}

/** What a request says apart from its section: shared by every candidate of a sizing. */
export interface NormalisedCheck {
  readonly member: NormalisedMember;
  readonly loads: readonly LoadModel[];
  readonly loadLabels: readonly (string | undefined)[];
  readonly supportLabels: readonly (string | undefined)[];
  /** Whether the member's own weight is added: as the request says, else by default (not for custom sections). */
  readonly selfWeight: boolean;
  /** True when the request said selfWeight itself; false when the default decided. */
  readonly selfWeightGiven: boolean;
  readonly samples: number;
  readonly units: OutputUnits;
  /** output.detail: summary leaves out the diagrams, the section table and the envelopes. */
  readonly detail: 'full' | 'summary';
  readonly material: MaterialResolver;
  readonly criteria: CriteriaInput;
  readonly buckling: BucklingInput;
  readonly lateralTorsional: LateralTorsionalInput;
  readonly pins: readonly PinInput[];
  /** The request states that its loads along y act through the shear centre. */
  readonly loadsThroughShearCentre: boolean;
  /** Load cases, moving loads and combinations; null for one load state given in `loads`. */
  readonly combinations: NormalisedCombinations | null;
  readonly base: Path;
}

/**
 * The member's own weight is added unless the request says otherwise, for catalogue and shape sections:
 * leaving it out is the unsafe side. A custom section may describe only part of a member, so there it
 * is added only when asked for. Either way a notice says which.
 */
export function selfWeightOf(request: Pick<MemberCheckRequest, 'selfWeight'>, customSection: boolean): boolean {
  return request.selfWeight ?? !customSection;
}

/** Everything but the section, converted and validated; throws one problem listing every bad field. */
export function normaliseCheck(
  request: Omit<MemberCheckRequest, 'section'>,
  catalogues: Catalogues,
  base: Path,
  reader = new QuantityReader(),
  customSection = false,
): NormalisedCheck {
  const selfWeight = selfWeightOf(request, customSection);
  const member = normaliseMember(request.member, reader, [...base, 'member']);
  const loads = normaliseLoads(request.loads ?? [], reader, [...base, 'loads']);
  const combinationsRead = asksForCombinations(request) ? readCombinations(request, reader, base) : null;
  const material = resolveMaterial(request.material, catalogues.materials, reader, [...base, 'material']);
  const criteria = normaliseCriteria(request.criteria, reader, [...base, 'criteria']);
  const buckling = normaliseBuckling(request.buckling, reader, [...base, 'buckling']);
  const lateralTorsional = normaliseLateralTorsional(request.lateralTorsional, reader, [...base, 'lateralTorsional']);
  const pins = normalisePins(request.member.supports, catalogues.materials, reader, [...base, 'member', 'supports']);
  const units = withSignificantDigits(resolveOutputUnits(request.output?.units, [...base, 'output', 'units']), request.output?.significantDigits);
  reader.finish();
  const samples = request.output?.samples ?? DEFAULT_SAMPLES;
  const combinations = combinationsRead === null ? null : resolveCombinations({ ...request, selfWeight }, combinationsRead, member, samples, base);
  return {
    member,
    loads,
    loadLabels: (request.loads ?? []).map((load) => load.label),
    supportLabels: request.member.supports.map((support) => support.label),
    selfWeight,
    selfWeightGiven: request.selfWeight !== undefined,
    samples,
    units,
    detail: request.output?.detail ?? 'full',
    material,
    criteria,
    buckling,
    lateralTorsional,
    pins,
    loadsThroughShearCentre: request.loadsThroughShearCentre ?? false,
    combinations,
    base,
  };
}

export function memberModel(check: NormalisedCheck, section: SectionProperties, material: Material): MemberModel {
  const loads = check.selfWeight ? [...check.loads, selfWeightLoad(section.area, material.density, check.member.length)] : check.loads;
  return {
    length: check.member.length,
    supports: check.member.supports,
    hinges: check.member.hinges,
    loads,
    stiffness: memberStiffness(section, material),
  };
}

/** The engine's own errors, as problems whose pointers are rooted where this check sits. */
function problemFromEngineError(error: EngineError, base: Path): ProblemError {
  const pointer = jsonPointer([...base, ...error.path]);
  const errors = error.path.length > 0 ? [{ pointer, message: error.message }] : [];
  if (error.kind === 'unstable-member') return new ProblemError('unstableMember', error.message, errors, { mechanism: error.details });
  if (error.kind === 'outside-member') return new ProblemError('invalidInput', `${pointer}: ${error.message}`, [{ pointer, message: error.message }]);
  return new ProblemError('notApplicable', error.message, errors);
}

export interface CheckedMember {
  readonly section: ResolvedSection;
  readonly material: Material;
  readonly model: MemberModel;
  readonly analysis: MemberAnalysis;
  readonly outcome: MemberCheckOutcome;
  /** With load combinations: every combination; model and analysis above are then the shown combination's, the outcome the overall one. */
  readonly combinations: CombinationsOutcome | null;
}

export function checkWithSection(check: NormalisedCheck, section: ResolvedSection): CheckedMember {
  const { material } = check.material.forThickness(section.properties.thickestElement);
  const model = memberModel(check, section.properties, material);
  const checks = {
    section: section.properties,
    dimensions: section.dimensions,
    fabrication: section.entry === undefined ? ('welded' as const) : ('rolled' as const),
    material,
    criteria: check.criteria,
    buckling: check.buckling,
    lateralTorsional: check.lateralTorsional,
    pins: check.pins,
    loadsThroughShearCentre: check.loadsThroughShearCentre,
  };
  try {
    if (check.combinations !== null) return checkCombinationsWithSection(check, check.combinations, section, material, model, checks);
    const analysis = analyseMember(model);
    const outcome = checkMember({ analysis, model, ...checks });
    return { section, material, model, analysis, outcome, combinations: null };
  } catch (error) {
    if (error instanceof EngineError) throw problemFromEngineError(error, check.base);
    throw error;
  }
}

function checkCombinationsWithSection(
  check: NormalisedCheck,
  combinations: NormalisedCombinations,
  section: ResolvedSection,
  material: Material,
  model: MemberModel,
  checks: Omit<Parameters<typeof checkMember>[0], 'analysis' | 'model'>,
): CheckedMember {
  const cases: LoadCaseModel[] = check.selfWeight
    ? [{ id: SELF_WEIGHT_CASE, category: 'permanent', loads: [selfWeightLoad(section.properties.area, material.density, check.member.length)] }, ...combinations.cases]
    : [...combinations.cases];
  const outcome = checkCombinations({
    member: { length: model.length, supports: model.supports, hinges: model.hinges, stiffness: model.stiffness },
    cases,
    movingLoads: combinations.movingLoads,
    combinations: combinations.combinations,
    samples: check.samples,
    checks,
  });
  const shown = outcome.results[outcome.shown] as CombinationsOutcome['results'][number];
  const notices = [...outcome.outcome.notices, ...combinations.notices];
  return {
    section,
    material,
    model: shown.state.model,
    analysis: shown.state.analysis,
    outcome: { ...outcome.outcome, notices },
    combinations: outcome,
  };
}

export function presentCheck(check: NormalisedCheck, checked: CheckedMember): MemberCheckResponse {
  const { units } = check;
  const { section, material, analysis, outcome } = checked;
  const summary = check.detail === 'summary';
  const selfWeightIntensity = check.selfWeight ? -selfWeightLoad(section.properties.area, material.density, analysis.length).qy[0] : 0;
  return {
    units: units.names,
    member: { length: present(units, 'length', analysis.length), nodes: analysis.nodes.map((x) => present(units, 'length', x)) },
    section: summary ? undefined : presentSection(section, units, material.density),
    material: presentMaterial(material, units),
    selfWeight: { applied: check.selfWeight, intensity: present(units, 'forcePerLength', selfWeightIntensity) },
    reactions: presentReactions(analysis, check.supportLabels, units),
    diagrams: summary ? undefined : presentDiagrams(sampleDiagrams(analysis, check.samples), units),
    extremes: presentExtremes(analysis, units),
    equilibrium: presentEquilibrium(analysis, units),
    ...presentChecks(outcome, units, checked.combinations?.worstChecks),
    loadCombinations:
      checked.combinations === null || check.combinations === null
        ? undefined
        : presentLoadCombinations(check.combinations, checked.combinations, check.supportLabels, units, check.detail),
    notices: withSelfWeightNotice(outcome.notices, check, present(units, 'forcePerLength', selfWeightIntensity), units.names.forcePerLength),
    audit: memberCheckAudit(check, section, material),
  };
}

/** The notices with one saying whether the member's own weight was added and why, after the caution. */
function withSelfWeightNotice(notices: readonly string[], check: NormalisedCheck, intensity: number, unit: string): string[] {
  const said = check.selfWeight
    ? `Self-weight added: ${Number(intensity.toPrecision(4))} ${unit} downward (density x area x g)${check.selfWeightGiven ? '' : ', by default for a catalogue or shape section; selfWeight: false leaves it out'}.`
    : check.selfWeightGiven
      ? "Self-weight not added (selfWeight: false): the member's own weight is not in these results."
      : "Self-weight not added: a custom section's default (it may describe only part of a member); give selfWeight: true to add density x area x g.";
  const [caution, ...rest] = notices;
  return caution === undefined ? [said] : [caution, said, ...rest];
}

/**
 * The work of one check in load states: one, or one per combination and train position searched, and
 * with a moving load one for each envelope point (about nine single-load analyses, a few load states'
 * worth of work, counted as one to keep the count simple and on the safe side of the budget).
 */
export function loadStatesOf(check: NormalisedCheck): number {
  return check.combinations === null ? 1 : check.combinations.loadStates + check.combinations.envelopePoints;
}

/** Load states several checks share (a batch): each check takes its own from what is left, or is refused. */
export interface WorkBudget {
  remaining: number;
  readonly limit: number;
}

function spend(budget: WorkBudget, check: NormalisedCheck): void {
  const states = loadStatesOf(check);
  if (states > budget.remaining) {
    throw tooMuchWork([...check.base, 'combinations'], `${states} load states (combinations x train positions, and envelope points), but only ${budget.remaining} of the batch's ${budget.limit} are left`);
  }
  budget.remaining -= states;
}

/** A request normalised and checked, before presenting: what the engine made of it. */
export function checkRequest(request: MemberCheckRequest, catalogues: Catalogues, base: Path = [], budget?: WorkBudget): { check: NormalisedCheck; checked: CheckedMember } {
  const reader = new QuantityReader();
  const section = resolveSection(request.section, catalogues.sections, reader, [...base, 'section']);
  const check = normaliseCheck(request, catalogues, base, reader, 'shape' in request.section && request.section.shape === 'custom');
  if (budget !== undefined) spend(budget, check);
  return { check, checked: checkWithSection(check, section()) };
}

export function runMemberCheck(request: MemberCheckRequest, catalogues: Catalogues, base: Path = [], budget?: WorkBudget): MemberCheckResponse {
  const { check, checked } = checkRequest(request, catalogues, base, budget);
  return presentCheck(check, checked);
}
