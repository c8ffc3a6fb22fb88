/**
 * A calculation record of one member check as a single self-contained HTML page: the job, the verdict
 * and what governs, the inputs in the answer's units, the figure, every check with its formula and
 * source, the combinations, every notice and the caution, the engine version and the input digest.
 * No external asset, no script; a print stylesheet lays it out on A4. A plain style of our own that
 * reads the same printed in black and white (the verdict is a word in a box, never a colour alone).
 * Every text from the request or the answer is escaped.
 */

import type { MemberCheckResponse } from '../api/schemas/member-check-response.js';
import { escapeText, formatValue } from './svg-markup.js';

export interface ReportMeta {
  readonly title: string;
  readonly reference: string;
  readonly preparedBy?: string;
}

/** A load as the request gave it, in the answer's units, for the inputs table. */
export interface ReportLoad {
  /** The load case or moving load it belongs to; absent for plain loads. */
  readonly group?: string;
  readonly label?: string;
  /** "point at 1200 mm", "distributed 0 mm to 3600 mm", "axle at offset 800 mm". */
  readonly where: string;
  /** "fy = -6 kN", ... */
  readonly actions: readonly string[];
}

export interface ReportInput {
  readonly meta: ReportMeta;
  readonly answer: MemberCheckResponse;
  /** Supports as the request gave them (type and position in the answer's units). */
  readonly supports: readonly { readonly position: number; readonly type: string; readonly label?: string }[];
  readonly hinges: readonly number[];
  readonly loads: readonly ReportLoad[];
  /** The member figure, an SVG document (its XML declaration, if any, is dropped when inlined). */
  readonly figureSvg: string;
}

const STYLE = `
:root { color: #111; background: #fff; font: 10.5pt/1.4 sans-serif; }
body { max-width: 190mm; margin: 8mm auto; padding: 0 4mm; }
h1 { font-size: 16pt; margin: 0 0 1mm; }
h2 { font-size: 12pt; margin: 6mm 0 2mm; border-bottom: 0.3mm solid #111; padding-bottom: 0.5mm; }
p { margin: 1mm 0; }
.job { color: #333; }
.verdict { border: 0.8mm solid #111; padding: 2mm 3mm; margin: 4mm 0; }
.verdict.fail { border-style: double; border-width: 1.6mm; }
.verdict.not-verified { border-style: dashed; border-width: 1.2mm; }
.verdict .word { font-size: 18pt; font-weight: bold; letter-spacing: 0.1em; margin: 0; }
.caution { border: 0.3mm dashed #111; padding: 2mm 3mm; }
table { border-collapse: collapse; width: 100%; margin: 1mm 0; }
th, td { border: 0.2mm solid #777; padding: 0.8mm 1.5mm; text-align: left; vertical-align: top; }
th { background: #eee; font-weight: bold; }
td.number { text-align: right; white-space: nowrap; font-variant-numeric: tabular-nums; }
tr.fails td { font-weight: bold; }
tr.governs td:first-child::before { content: "\\25B6  "; }
.figure svg { width: 100%; height: auto; }
.basis { font-size: 9pt; color: #333; }
footer { margin-top: 6mm; font-size: 9pt; color: #333; border-top: 0.2mm solid #777; padding-top: 1mm; word-break: break-all; }
@page { size: A4; margin: 14mm 12mm; }
@media print {
  :root { font-size: 9.5pt; }
  body { margin: 0; max-width: none; }
  h2 { break-after: avoid; }
  tr, .verdict, .caution, .figure { break-inside: avoid; }
}
`;

const text = escapeText;

function row(cells: readonly string[], className?: string): string {
  return `<tr${className ? ` class="${className}"` : ''}>${cells.join('')}</tr>`;
}

const cell = (value: string) => `<td>${text(value)}</td>`;
const numberCell = (value: number) => `<td class="number">${text(formatValue(value))}</td>`;
const head = (...names: string[]) => `<tr>${names.map((name) => `<th>${text(name)}</th>`).join('')}</tr>`;

function inputsSection(input: ReportInput): string {
  const { answer } = input;
  const u = answer.units;
  const supports = input.supports.map((support) => row([cell(support.label ?? ''), cell(support.type), numberCell(support.position)]));
  const loads = input.loads.map((load) => row([cell(load.group ?? ''), cell(load.label ?? ''), cell(load.where), cell(load.actions.join(', '))]));
  return [
    '<h2>Member and loads</h2>',
    `<p>Length ${text(formatValue(answer.member.length))} ${text(u.length)}; self-weight ${answer.selfWeight.applied ? `added, ${text(formatValue(answer.selfWeight.intensity))} ${text(u.forcePerLength)} downward` : 'not added'}.</p>`,
    `<table class="supports">${head('support', 'type', `position (${u.length})`)}${supports.join('')}</table>`,
    input.hinges.length > 0 ? `<p>Internal hinges at ${input.hinges.map((x) => text(formatValue(x))).join(', ')} ${text(u.length)}.</p>` : '',
    loads.length > 0 ? `<table class="loads">${head('case', 'label', 'where', 'actions')}${loads.join('')}</table>` : '<p>No applied loads.</p>',
  ].join('');
}

function sectionAndMaterial(answer: MemberCheckResponse): string {
  const u = answer.units;
  const s = answer.section as unknown as { designation?: string; properties?: Record<string, unknown> };
  const p = (s.properties ?? {}) as Record<string, unknown>;
  const property = (name: string, key: string, unit: string) => (typeof p[key] === 'number' ? row([cell(name), numberCell(p[key] as number), cell(unit)]) : '');
  const m = answer.material as unknown as Record<string, unknown>;
  const material = (name: string, key: string, unit: string) => (typeof m[key] === 'number' ? row([cell(name), numberCell(m[key] as number), cell(unit)]) : '');
  return [
    '<h2>Section and material</h2>',
    `<p>Section ${text(s.designation ?? 'given by its dimensions')}; material ${text(String(m.grade ?? 'given by its properties'))}.</p>`,
    '<table class="properties">',
    head('property', 'value', 'unit'),
    property('area A', 'area', u.area),
    property('second moment Iz', 'secondMomentZ', u.secondMoment),
    property('second moment Iy', 'secondMomentY', u.secondMoment),
    property('section modulus Wz', 'sectionModulusZ', u.sectionModulus),
    property('torsion constant J', 'torsionConstant', u.secondMoment),
    material("Young's modulus E", 'elasticModulus', u.stress),
    material('yield strength', 'yieldStrength', u.stress),
    material('ultimate strength', 'ultimateStrength', u.stress),
    '</table>',
  ].join('');
}

function checksSection(answer: MemberCheckResponse): string {
  const u = answer.units as unknown as Record<string, string>;
  const governing = answer.governing;
  const rows = answer.checks.map((check) => {
    const unit = u[check.quantity] ?? '';
    const governs = governing !== undefined && check.mode === governing.mode && check.utilization === governing.utilization;
    const classes = [check.passes ? '' : 'fails', governs ? 'governs' : ''].filter(Boolean).join(' ');
    const where = [check.location ?? '', check.position === undefined ? '' : `x = ${formatValue(check.position)} ${u.length}`, check.combination === undefined ? '' : `combination ${check.combination}`]
      .filter(Boolean)
      .join('; ');
    return row(
      [
        cell(check.mode),
        `<td class="number">${text(`${formatValue(check.demand)} ${unit}`)}</td>`,
        `<td class="number">${text(`${formatValue(check.capacity)} ${unit}`)}</td>`,
        numberCell(check.requiredSafetyFactor),
        numberCell(check.utilization),
        cell(check.passes ? 'passes' : 'FAILS'),
        cell(where),
        `<td class="basis">${text(check.basis)}</td>`,
      ],
      classes || undefined,
    );
  });
  const notApplicable = answer.notApplicable.map((item) => `<li>${text(item.mode)}: ${text(item.reason)}</li>`).join('');
  const unchecked = answer.unchecked.map((item) => `<li><strong>${text(item.mode)}</strong>: ${text(item.reason)}</li>`).join('');
  return [
    '<h2>Checks</h2>',
    `<table class="checks">${head('mode', 'demand', 'capacity', 'required factor', 'utilization', 'result', 'where', 'formula and source')}${rows.join('')}</table>`,
    unchecked ? `<p><strong>Applies but not evaluated (the member is not verified for these):</strong></p><ul class="unchecked">${unchecked}</ul>` : '',
    notApplicable ? `<p>Not applicable:</p><ul>${notApplicable}</ul>` : '',
  ].join('');
}

function combinationsSection(answer: MemberCheckResponse): string {
  const result = answer.loadCombinations;
  if (result === undefined) return '';
  const rows = result.combinations.map((combination) =>
    row([
      cell(combination.id),
      cell(combination.purpose),
      cell(combination.description),
      cell(combination.governing?.mode ?? ''),
      combination.governing === undefined ? cell('') : numberCell(combination.governing.utilization),
      cell(combination.verdict),
    ]),
  );
  return [
    '<h2>Load combinations</h2>',
    `<p>${text(result.basis)} Governing: ${text(result.governing)}.</p>`,
    `<table class="combinations">${head('combination', 'purpose', 'factors', 'governing mode', 'utilization', 'verdict')}${rows.join('')}</table>`,
  ].join('');
}

/** The verdict as a word that reads the same in black and white. */
const VERDICT_WORDS: Record<MemberCheckResponse['verdict'], string> = { pass: 'PASS', fail: 'FAIL', 'not-verified': 'NOT VERIFIED' };

/** The figure inlined: its XML declaration dropped, the rest as it is (the renderer escaped its texts). */
function inlineSvg(svg: string): string {
  return svg.replace(/^<\?xml[^>]*\?>\s*/, '');
}

export function memberReportHtml(input: ReportInput): string {
  const { meta, answer } = input;
  const governing = answer.governing;
  const verdictWord = VERDICT_WORDS[answer.verdict];
  const governingText =
    governing === undefined
      ? 'No check has any demand.'
      : `Governing: ${governing.mode}, utilization ${formatValue(governing.utilization)} (safety factor ${formatValue(governing.safetyFactor)})${governing.location ? `, ${governing.location}` : ''}${governing.position === undefined ? '' : `, at x = ${formatValue(governing.position)} ${answer.units.length}`}.`;
  const job = [`Reference ${meta.reference}`, meta.preparedBy ? `prepared by ${meta.preparedBy}` : ''].filter(Boolean).join(', ');
  const [caution, ...notices] = answer.notices;
  return [
    '<!DOCTYPE html>',
    '<html lang="en"><head><meta charset="utf-8">',
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    `<title>${text(meta.title)}</title>`,
    `<style>${STYLE}</style>`,
    '</head><body>',
    `<header><h1>${text(meta.title)}</h1><p class="job">${text(job)}</p></header>`,
    `<section class="verdict ${answer.verdict}"><p class="word">${verdictWord}</p><p class="governing">${text(governingText)}</p></section>`,
    `<section class="caution"><p><strong>Caution.</strong> ${text(caution ?? '')}</p></section>`,
    inputsSection(input),
    sectionAndMaterial(answer),
    `<h2>Diagrams</h2><div class="figure">${inlineSvg(input.figureSvg)}</div>`,
    checksSection(answer),
    combinationsSection(answer),
    '<h2>Notices</h2>',
    `<ul class="notices">${notices.map((notice) => `<li>${text(notice)}</li>`).join('')}</ul>`,
    `<footer><p>Computed by Memberproof, engine version ${text(answer.audit.engineVersion)}. Input digest (SHA-256 of the canonical input): <span class="digest">${text(answer.audit.inputDigest)}</span>.</p><p>${text(caution ?? '')}</p></footer>`,
    '</body></html>',
  ].join('\n');
}
