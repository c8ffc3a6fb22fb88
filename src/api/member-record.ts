/**
 * The renderings of a member check: the figure (SVG) and the calculation record (HTML), made from the
 * same normalised check and presented answer as the JSON answer, so the three always agree.
 */

import { SCREENING_CAUTION } from '../engine/caution.js';
import type { LoadModel } from '../engine/member/model.js';
import type { FigureInput, SupportKind } from '../rendering/figure-input.js';
import { memberFigureSvg } from '../rendering/member-figure-svg.js';
import { memberReportHtml, type ReportInput, type ReportLoad, type ReportMeta } from '../rendering/member-report-html.js';
import { formatValue } from '../rendering/svg-markup.js';
import { checkRequest, presentCheck, type Catalogues, type CheckedMember, type NormalisedCheck } from './member-check.js';
import { present, type OutputUnits } from './output-units.js';
import type { MemberCheckRequest } from './schemas/member-check-request.js';
import type { MemberCheckResponse } from './schemas/member-check-response.js';

function supportKinds(request: MemberCheckRequest): SupportKind[] {
  return request.member.supports.map((support) => support.type);
}

/** The loads drawn: those of the state shown (a combination's factored loads and its train where it governs). */
function figureLoads(loads: readonly LoadModel[], labels: readonly (string | undefined)[], units: OutputUnits) {
  const length = (x: number) => present(units, 'length', x);
  const force = (f: number) => present(units, 'force', f);
  const moment = (m: number) => present(units, 'moment', m);
  const perLength = (q: number) => present(units, 'forcePerLength', q);
  const pointLoads: FigureInput['pointLoads'][number][] = [];
  const distributedLoads: FigureInput['distributedLoads'][number][] = [];
  loads.forEach((load, i) => {
    const label = labels[i];
    if (load.kind === 'point') {
      pointLoads.push({ position: length(load.position), fx: force(load.fx), fy: force(load.fy), fz: force(load.fz), mx: moment(load.mx), my: moment(load.my), mz: moment(load.mz), ...(label ? { label } : {}) });
    } else {
      distributedLoads.push({ from: length(load.from), to: length(load.to), qy: [perLength(load.qy[0]), perLength(load.qy[1])], qz: [perLength(load.qz[0]), perLength(load.qz[1])], ...(label ? { label } : {}) });
    }
  });
  return { pointLoads, distributedLoads };
}

function figureInput(request: MemberCheckRequest, check: NormalisedCheck, checked: CheckedMember, answer: MemberCheckResponse, title?: string): FigureInput {
  const { units } = check;
  const labels = checked.combinations === null ? [...check.loadLabels, ...(check.selfWeight ? ['self-weight'] : [])] : [];
  const kinds = supportKinds(request);
  const diagrams = answer.diagrams as unknown as FigureInput['diagrams'];
  return {
    ...(title === undefined ? {} : { title }),
    caution: SCREENING_CAUTION,
    units: {
      length: answer.units.length,
      force: answer.units.force,
      moment: answer.units.moment,
      deflection: answer.units.deflection,
      forcePerLength: answer.units.forcePerLength,
      angle: answer.units.angle,
    },
    length: answer.member.length,
    supports: check.member.supports.map((support, i) => ({ position: present(units, 'length', support.position), kind: kinds[i] ?? 'general', ...(check.supportLabels[i] ? { label: check.supportLabels[i] as string } : {}) })),
    hinges: check.member.hinges.map((hinge) => present(units, 'length', hinge.position)),
    ...figureLoads(checked.model.loads, labels, units),
    diagrams,
    extremes: answer.extremes,
  };
}

/** The loads as the request gave them, in the answer's units, for the record's inputs table. */
function reportLoads(check: NormalisedCheck, answer: MemberCheckResponse): ReportLoad[] {
  const { units } = check;
  const u = answer.units;
  const value = (kind: 'force' | 'moment' | 'forcePerLength' | 'momentPerLength', si: number) => `${formatValue(present(units, kind, si))} ${u[kind]}`;
  const at = (x: number) => `${formatValue(present(units, 'length', x))} ${u.length}`;
  const describe = (load: LoadModel, group?: string, label?: string): ReportLoad => {
    if (load.kind === 'point') {
      const actions = (['fx', 'fy', 'fz'] as const).filter((key) => load[key] !== 0).map((key) => `${key} = ${value('force', load[key])}`);
      actions.push(...(['mx', 'my', 'mz'] as const).filter((key) => load[key] !== 0).map((key) => `${key} = ${value('moment', load[key])}`));
      return { ...(group ? { group } : {}), ...(label ? { label } : {}), where: `point at ${at(load.position)}`, actions };
    }
    const pair = (q: readonly [number, number], kind: 'forcePerLength' | 'momentPerLength') => (q[0] === q[1] ? value(kind, q[0]) : `${value(kind, q[0])} to ${value(kind, q[1])}`);
    const actions = (['qx', 'qy', 'qz'] as const).filter((key) => load[key][0] !== 0 || load[key][1] !== 0).map((key) => `${key} = ${pair(load[key], 'forcePerLength')}`);
    if (load.mx[0] !== 0 || load.mx[1] !== 0) actions.push(`mx = ${pair(load.mx, 'momentPerLength')}`);
    return { ...(group ? { group } : {}), ...(label ? { label } : {}), where: `distributed ${at(load.from)} to ${at(load.to)}`, actions };
  };
  if (check.combinations === null) return check.loads.map((load, i) => describe(load, undefined, check.loadLabels[i]));
  return [
    ...check.combinations.cases.flatMap((loadCase) => loadCase.loads.map((load) => describe(load, `${loadCase.id} (${loadCase.category})`))),
    ...check.combinations.movingLoads.flatMap((train) =>
      train.axles.map((axle, i) => ({
        group: `${train.id} (moving, ${train.category})`,
        label: `axle ${i + 1}`,
        where: `offset ${at(axle.offset)}, travel ${at(train.from)} to ${at(train.to)}`,
        actions: [axle.fy !== 0 ? `fy = ${value('force', axle.fy)}` : '', axle.fz !== 0 ? `fz = ${value('force', axle.fz)}` : ''].filter(Boolean),
      })),
    ),
  ];
}

/** A request's check, always in full detail: a rendering draws the diagrams whatever output.detail says. */
function fullCheck(request: MemberCheckRequest, catalogues: Catalogues): { check: NormalisedCheck; checked: CheckedMember } {
  const { check, checked } = checkRequest(request, catalogues);
  return { check: { ...check, detail: 'full' }, checked };
}

export function memberFigure(request: MemberCheckRequest, catalogues: Catalogues): string {
  const { check, checked } = fullCheck(request, catalogues);
  return memberFigureSvg(figureInput(request, check, checked, presentCheck(check, checked)));
}

/** Everything the record is drawn from: the checked member, its answer and its figure. */
export function memberReportInput(request: MemberCheckRequest, meta: ReportMeta, catalogues: Catalogues): ReportInput {
  const { check, checked } = fullCheck(request, catalogues);
  const answer = presentCheck(check, checked);
  return {
    meta,
    answer,
    supports: check.member.supports.map((support, i) => ({
      position: present(check.units, 'length', support.position),
      type: supportKinds(request)[i] ?? 'general',
      ...(check.supportLabels[i] ? { label: check.supportLabels[i] as string } : {}),
    })),
    hinges: check.member.hinges.map((hinge) => present(check.units, 'length', hinge.position)),
    loads: reportLoads(check, answer),
    figureSvg: memberFigureSvg(figureInput(request, check, checked, answer, meta.title)),
  };
}

export function memberReport(request: MemberCheckRequest, meta: ReportMeta, catalogues: Catalogues): string {
  return memberReportHtml(memberReportInput(request, meta, catalogues));
}
