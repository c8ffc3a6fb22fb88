/**
 * Sizing: every candidate section checked by the same engine with the same criteria, ranked by the
 * objective. What does not depend on the section (member, loads, criteria, units) is normalised once.
 */

import { overallDepth, overallWidth } from '../catalogues/overall-size.js';
import type { SectionEntry } from '../catalogues/section-entry.js';
import { SCREENING_CAUTION } from '../engine/caution.js';
import { sizingAudit } from './audit/input-digest.js';
import type { SectionDimensions } from '../engine/sections/dimensions.js';
import { rankCandidates, type SizingObjective } from '../engine/sizing/rank-candidates.js';
import type { LoadedCatalogues } from './load-catalogues.js';
import { checkWithSection, loadStatesOf, normaliseCheck, presentCheck, type CheckedMember, type NormalisedCheck } from './member-check.js';
import { QuantityReader } from './normalise/quantity-reader.js';
import { propertiesOf, shapeDimensions, unknownDesignation } from './normalise/section.js';
import { present } from './output-units.js';
import { invalidField, PROBLEMS, ProblemError } from './problems.js';
import type { CandidateRow, MemberSizingRequest } from './schemas/member-sizing-exchange.js';
import { MAX_CANDIDATES, MAX_SIZING_WORK } from './schemas/member-sizing-exchange.js';

interface Candidate {
  /** Where an explicit shape sits in the request, for its error pointers. */
  readonly path: readonly (string | number)[];
  readonly designation: string;
  readonly dimensions: SectionDimensions;
  readonly entry?: SectionEntry;
}

interface CandidateResult {
  readonly index: number;
  readonly candidate: Candidate;
  readonly massPerLength: number;
  readonly depth: number | undefined;
  readonly utilization: number;
  readonly passes: boolean;
  readonly checked?: CheckedMember;
  readonly problem?: ProblemError;
}

function listCandidates(request: MemberSizingRequest, catalogues: LoadedCatalogues, reader: QuantityReader): Candidate[] {
  const spec = request.candidates;
  const fromEntry = (entry: SectionEntry): Candidate => ({ path: ['candidates'], designation: entry.designation, dimensions: entry.dimensions, entry });
  if ('family' in spec || 'families' in spec) {
    const families = 'family' in spec ? [spec.family] : spec.families;
    return families.flatMap((family, i) => {
      const items = catalogues.sections.list({ family, limit: MAX_CANDIDATES + 1 }).items;
      if (items.length === 0) {
        const known = catalogues.sections.families().map((f) => f.family).join(', ');
        throw invalidField('family' in spec ? ['candidates', 'family'] : ['candidates', 'families', i], `no catalogue family "${family}"; the families are ${known}`);
      }
      return items.map(fromEntry);
    });
  }
  if ('designations' in spec) {
    return spec.designations.map((designation, i) => {
      const entry = catalogues.sections.find(designation);
      if (entry === undefined) throw unknownDesignation(designation, catalogues.sections, ['candidates', 'designations', i]);
      return fromEntry(entry);
    });
  }
  return spec.sections.map((shape, i) => ({
    path: ['candidates', 'sections', i],
    designation: `sections/${i}`,
    dimensions: shapeDimensions(shape, reader, ['candidates', 'sections', i]),
  }));
}

function checkCandidate(check: NormalisedCheck, candidate: Candidate, index: number, density: number): CandidateResult {
  const depth = overallDepth(candidate.dimensions);
  try {
    const properties = propertiesOf(candidate.dimensions, candidate.path);
    const massPerLength = candidate.entry?.massPerLength ?? properties.area * density;
    const checked = checkWithSection(check, { dimensions: candidate.dimensions, properties, ...(candidate.entry ? { entry: candidate.entry } : {}) });
    const utilization = checked.outcome.governing?.utilization ?? 0;
    return { index, candidate, massPerLength, depth, utilization, passes: checked.outcome.verdict === 'pass', checked };
  } catch (error) {
    if (!(error instanceof ProblemError)) throw error;
    return { index, candidate, massPerLength: candidate.entry?.massPerLength ?? 0, depth, utilization: Number.MAX_VALUE, passes: false, problem: error };
  }
}

export function runMemberSizing(request: MemberSizingRequest, catalogues: LoadedCatalogues) {
  const reader = new QuantityReader();
  const limits = request.limits ?? {};
  const maxDepth = limits.maxDepth === undefined ? undefined : reader.positive(limits.maxDepth, 'length', ['limits', 'maxDepth']);
  const maxWidth = limits.maxWidth === undefined ? undefined : reader.positive(limits.maxWidth, 'length', ['limits', 'maxWidth']);
  const maxMass = limits.maxMassPerLength === undefined ? undefined : reader.positive(limits.maxMassPerLength, 'massPerLength', ['limits', 'maxMassPerLength']);
  const all = listCandidates(request, catalogues, reader);
  const check = normaliseCheck(request, catalogues, [], reader);
  if (all.length > MAX_CANDIDATES) {
    throw invalidField(['candidates'], `${all.length} candidates; at most ${MAX_CANDIDATES} are checked in one request`);
  }
  const { density } = check.material;
  // Each candidate is a whole analysis and check per load state: bound the work one request may ask for.
  const loads =
    check.combinations === null
      ? check.loads.length
      : check.combinations.cases.reduce((sum, loadCase) => sum + loadCase.loads.length, 0) + Math.max(0, ...check.combinations.movingLoads.map((train) => train.axles.length));
  const states = loadStatesOf(check);
  const work = all.length * states * (loads + check.member.supports.length + check.member.hinges.length + 1);
  if (work > MAX_SIZING_WORK) {
    const statesText = states === 1 ? '' : ` x ${states} load states`;
    throw invalidField(['candidates'], `${all.length} candidates${statesText} x ${loads} loads is more work than one request may ask (candidates x load states x (loads and axles + supports + hinges + 1) <= ${MAX_SIZING_WORK}); narrow the candidates or the limits`);
  }
  const excluded: { designation: string; reason: string }[] = [];
  const kept = all.filter((candidate) => {
    const depth = overallDepth(candidate.dimensions);
    const width = overallWidth(candidate.dimensions);
    const reason =
      maxDepth !== undefined && !(depth !== undefined && depth <= maxDepth)
        ? 'deeper than limits.maxDepth (or depth unknown)'
        : maxWidth !== undefined && !(width !== undefined && width <= maxWidth)
          ? 'wider than limits.maxWidth (or width unknown)'
          : maxMass !== undefined && candidate.entry !== undefined && candidate.entry.massPerLength > maxMass
            ? 'heavier than limits.maxMassPerLength'
            : undefined;
    if (reason) excluded.push({ designation: candidate.designation, reason });
    return reason === undefined;
  });
  const results = kept
    .map((candidate, index) => checkCandidate(check, candidate, index, density))
    .filter((result) => {
      const tooHeavy = maxMass !== undefined && result.candidate.entry === undefined && result.massPerLength > maxMass;
      if (tooHeavy) excluded.push({ designation: result.candidate.designation, reason: 'heavier than limits.maxMassPerLength' });
      return !tooHeavy;
    });
  if (results.length === 0) {
    throw invalidField(['limits'], 'no candidate is within the limits');
  }
  const checkable = results.filter((result) => result.checked);
  if (checkable.length === 0) {
    // Every candidate failed alike (an unstable member, a position outside it): that problem is the answer.
    throw (results[0] as CandidateResult).problem as ProblemError;
  }
  const objective: SizingObjective = request.objective ?? 'lightest';
  const ranked = rankCandidates(results, objective);
  const rows = ranked.map((result, i) => candidateRow(result, i + 1, check));
  const best = ranked[0] as CandidateResult;
  if (!best.passes || !best.checked) {
    const closest = rows[0] as CandidateRow;
    const gaps = best.checked?.outcome.unchecked.map((gap) => gap.mode) ?? [];
    const unverified = best.checked?.outcome.verdict === 'not-verified' ? ` It is not verified: ${[...new Set(gaps)].join(', ')} could not be checked (see unchecked in a member check).` : '';
    throw new ProblemError(
      'noPassingCandidate',
      `None of the ${results.length} candidates passes; the closest is ${closest.designation}, governed by ${closest.governingMode ?? 'no mode'} at a utilization of ${closest.utilization?.toFixed(3)}.${unverified}`,
      [],
      { closest, candidates: rows, excluded },
    );
  }
  return {
    units: check.units.names,
    objective,
    selected: { designation: best.candidate.designation, result: presentCheck(check, best.checked) },
    candidates: rows,
    excluded,
    notices: [SCREENING_CAUTION, ...(excluded.length > 0 ? [`${excluded.length} candidates were left out by the limits.`] : [])],
    audit: sizingAudit(check, request.material, all, { maxDepth, maxWidth, maxMassPerLength: maxMass }, objective),
  };
}

function candidateRow(result: CandidateResult, rank: number, check: NormalisedCheck): CandidateRow {
  const { candidate, checked } = result;
  const governing = checked?.outcome.governing;
  return {
    rank,
    designation: candidate.designation,
    ...(candidate.entry ? { family: candidate.entry.family } : {}),
    massPerLength: present(check.units, 'massPerLength', result.massPerLength),
    ...(result.depth === undefined ? {} : { depth: present(check.units, 'length', result.depth) }),
    ...(governing ? { governingMode: governing.mode } : {}),
    ...(checked ? { utilization: result.utilization } : {}),
    verdict: checked ? checked.outcome.verdict : 'error',
    ...(result.problem ? { problem: `${PROBLEMS[result.problem.problem].title}: ${result.problem.detail}` } : {}),
  };
}
