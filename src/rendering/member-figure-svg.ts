/**
 * The figure of one member as a self-contained SVG document: the member to scale with its supports,
 * hinges and loads, a plan view when anything acts along z, then one panel a diagram that is not zero.
 * Black lines, light grey fills and generic sans-serif text, so it reads the same printed in black and
 * white; no scripts, no fonts or images fetched. Every panel plots positive values up. The slopes
 * (slopeZ, slopeY) have no panel; their extremes stay in the answer.
 */

import { assertDrawable, FIGURE_FIELDS, type FigureField, type FigureInput, type SupportKind } from './figure-input.js';
import { element, formatCoordinate, formatValue, textElement } from './svg-markup.js';

type UnitKind = keyof FigureInput['units'];

/** The kind of each diagram: the unit it is printed in and the scale its zero test is relative to. */
const FIELD_KIND: Readonly<Record<FigureField, UnitKind>> = {
  axial: 'force',
  shearY: 'force',
  momentZ: 'moment',
  shearZ: 'force',
  momentY: 'moment',
  torque: 'moment',
  deflectionY: 'deflection',
  slopeZ: 'angle',
  deflectionZ: 'deflection',
  slopeY: 'angle',
  twist: 'angle',
};

/** The panels in the order they are drawn; `positive` restates the answer's sign convention. */
const PANELS: readonly { field: FigureField; heading: string; positive: string }[] = [
  { field: 'shearY', heading: 'Shear force Vy', positive: 'sum of the y forces left of x' },
  { field: 'momentZ', heading: 'Bending moment Mz', positive: 'sagging positive' },
  { field: 'deflectionY', heading: 'Deflection along y', positive: 'along +y positive' },
  { field: 'shearZ', heading: 'Shear force Vz', positive: 'sum of the z forces left of x' },
  { field: 'momentY', heading: 'Bending moment My', positive: 'positive when the -z fibre is in tension' },
  { field: 'deflectionZ', heading: 'Deflection along z', positive: 'along +z positive' },
  { field: 'axial', heading: 'Axial force N', positive: 'tension positive' },
  { field: 'torque', heading: 'Torque T', positive: 'right-hand rule about +x' },
  { field: 'twist', heading: 'Angle of twist', positive: 'right-hand rule about x' },
];

/** A diagram whose every value is within this fraction of the largest of its kind is drawn as zero. */
const ZERO_FRACTION = 1e-12;

// Page geometry in user units, 4 to the millimetre: 720 across is 180 mm, an A4 page's text width.
const UNITS_PER_MM = 4;
const WIDTH = 720;
const LEFT = 60;
const RIGHT = 660;
/** Labels closer than this to an edge grow inwards instead of centring on their point. */
const EDGE = 70;
const ARROW = 40;
const HEAD = 6;
const HEAD_HALF_WIDTH = 2.6;
const BAND = 22;
const MOMENT_RADIUS = 12;
const PANEL_PLOT_TOP = 32;
const PANEL_PLOT_HEIGHT = 54;
const PANEL_HEIGHT = 106;

const STYLE = [
  'text{font-family:sans-serif;font-size:11px;fill:#000}',
  'line,path,polyline,polygon,rect,circle{fill:none;stroke:#000;stroke-width:1}',
  '.page{fill:#fff;stroke:none}',
  '.title{font-size:14px;font-weight:bold}',
  '.heading{font-size:12px;font-weight:bold}',
  '.caption{font-size:10px}',
  '.member{stroke-width:3}',
  '.wall{stroke-width:1.6}',
  '.head,.dot{fill:#000;stroke:none}',
  '.hinge{fill:#fff;stroke-width:1.2}',
  '.band{fill:#ececec;stroke-width:0.8}',
  '.area{fill:#d9d9d9;stroke:none}',
  '.zero{stroke-width:0.8}',
  '.curve{stroke-width:1.4;stroke-linejoin:round}',
  '.guide{stroke:#8c8c8c;stroke-width:0.6;stroke-dasharray:2 3}',
].join('');

/**
 * memberFigureSvg(input): the SVG document, 180 mm wide, as a string.
 * Throws a RangeError, drawing nothing, when a number in the input is not finite (see assertDrawable).
 * Example: writeFileSync('member.svg', memberFigureSvg(figureInput)).
 */
export function memberFigureSvg(input: FigureInput): string {
  assertDrawable(input);
  const toX = (x: number) => LEFT + (x / input.length) * (RIGHT - LEFT);
  const body: string[] = [];
  let top = 8;
  if (input.title !== undefined && input.title !== '') {
    body.push(textElement('text', { x: LEFT, y: top + 14, class: 'title' }, input.title));
    top += 24;
  }
  top = drawElevation(body, input, toX, top);
  if (hasHorizontalLoads(input)) top = drawPlan(body, input, toX, top);
  const tolerance = zeroTolerances(input);
  const xText = input.diagrams.x.map((x) => formatCoordinate(toX(x)));
  const guides = input.supports
    .map((s) => element('line', { x1: toX(s.position), y1: PANEL_PLOT_TOP - 4, x2: toX(s.position), y2: PANEL_PLOT_TOP + PANEL_PLOT_HEIGHT + 4, class: 'guide' }))
    .join('');
  for (const panel of PANELS) {
    if (isZero(input, panel.field, tolerance[FIELD_KIND[panel.field]])) continue;
    drawPanel(body, input, panel, top, xText, guides, toX, tolerance[FIELD_KIND[panel.field]]);
    top += PANEL_HEIGHT;
  }
  if (input.caution !== undefined && input.caution !== '') {
    body.push(textElement('text', { x: LEFT, y: top + 14, class: 'caption' }, input.caution));
    top += 22;
  }
  const height = top + 8;
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${WIDTH / UNITS_PER_MM}mm" height="${formatCoordinate(height / UNITS_PER_MM)}mm"`,
    ` viewBox="0 0 ${WIDTH} ${formatCoordinate(height)}" font-family="sans-serif" role="img">`,
    textElement('title', {}, input.title !== undefined && input.title !== '' ? input.title : 'Member figure'),
    `<style>${STYLE}</style>`,
    element('rect', { x: 0, y: 0, width: WIDTH, height, class: 'page' }),
    body.join(''),
    '</svg>',
  ].join('');
}

function hasHorizontalLoads(input: FigureInput): boolean {
  return input.pointLoads.some((p) => p.fz !== 0 || p.my !== 0) || input.distributedLoads.some((d) => d.qz[0] !== 0 || d.qz[1] !== 0);
}

/** The member in the x-y plane, +y up: loads above, supports below, then the dimension line. */
function drawElevation(out: string[], input: FigureInput, toX: (x: number) => number, top: number): number {
  const { force, moment } = input.units;
  const stacks = input.pointLoads.map((load) =>
    labelLines(load.label, [
      ['Fy', load.fy, force],
      ['Fx', load.fx, force],
      ['Mx', load.mx, moment],
      ['Mz', load.mz, moment],
    ]),
  );
  // Point loads right above the member, the distributed loads in rows above them.
  const pointZone = pointZoneHeight(stacks);
  const beamY = top + 16 + Math.max(ARROW, pointZone + bandCount(input, 'qy') * BAND_ROW);
  out.push(textElement('text', { x: LEFT, y: top + 12, class: 'caption' }, 'Elevation: x along the member, +y up'));
  drawBands(out, input, toX, beamY - pointZone, 'qy', -1);
  out.push(element('line', { x1: LEFT, y1: beamY, x2: RIGHT, y2: beamY, class: 'member' }));
  drawSupports(out, input, toX, beamY, true);
  drawHinges(out, input, toX, beamY);
  input.pointLoads.forEach((load, i) => {
    const x = toX(load.position);
    if (load.fy < 0) arrow(out, x, beamY - ARROW, x, beamY - 2);
    else if (load.fy > 0) arrow(out, x, beamY - 2, x, beamY - ARROW);
    // Fx ends at its point from the side it pushes from.
    if (load.fx !== 0) arrow(out, x - Math.sign(load.fx) * 30, beamY - 6, x, beamY - 6);
    // A torque is drawn as its vector, a double-headed arrow along x (right-hand rule).
    if (load.mx !== 0) arrow(out, x, beamY - 18, x + Math.sign(load.mx) * 28, beamY - 18, true);
    if (load.mz !== 0) momentArc(out, x, beamY, load.mz > 0);
    stackLabels(out, x, beamY, i, stacks[i] ?? []);
  });
  const dimensionY = beamY + 50;
  arrow(out, (LEFT + RIGHT) / 2, dimensionY, LEFT, dimensionY);
  arrow(out, (LEFT + RIGHT) / 2, dimensionY, RIGHT, dimensionY);
  out.push(element('line', { x1: LEFT, y1: dimensionY - 6, x2: LEFT, y2: dimensionY + 6 }));
  out.push(element('line', { x1: RIGHT, y1: dimensionY - 6, x2: RIGHT, y2: dimensionY + 6 }));
  label(out, (LEFT + RIGHT) / 2, dimensionY + 14, `L = ${formatValue(input.length)} ${input.units.length}`, 'middle');
  return dimensionY + 24;
}

/** The member seen from above (+y towards the reader), +z down the page: what acts along z. */
function drawPlan(out: string[], input: FigureInput, toX: (x: number) => number, top: number): number {
  const { force, moment } = input.units;
  const stacks = input.pointLoads.map((load) =>
    labelLines(load.label, [
      ['Fz', load.fz, force],
      ['My', load.my, moment],
    ]),
  );
  // Point loads right above the member, the distributed loads in rows above them.
  const pointZone = pointZoneHeight(stacks);
  const beamY = top + 16 + Math.max(ARROW, pointZone + bandCount(input, 'qz') * BAND_ROW);
  out.push(textElement('text', { x: LEFT, y: top + 12, class: 'caption' }, 'Plan, seen from above: x along the member, +z down the page'));
  drawBands(out, input, toX, beamY - pointZone, 'qz', 1);
  out.push(element('line', { x1: LEFT, y1: beamY, x2: RIGHT, y2: beamY, class: 'member' }));
  drawSupports(out, input, toX, beamY, false);
  drawHinges(out, input, toX, beamY);
  input.pointLoads.forEach((load, i) => {
    const x = toX(load.position);
    if (load.fz > 0) arrow(out, x, beamY - ARROW, x, beamY - 2);
    else if (load.fz < 0) arrow(out, x, beamY - 2, x, beamY - ARROW);
    // Seen from +y, a positive moment about y turns counterclockwise, as Mz does in the elevation.
    if (load.my !== 0) momentArc(out, x, beamY, load.my > 0);
    stackLabels(out, x, beamY, i, stacks[i] ?? []);
  });
  return beamY + 36;
}

/** "Fy = -6 kN" for each non-zero component, the load's own label before the first. */
function labelLines(name: string | undefined, components: readonly (readonly [string, number, string])[]): string[] {
  const lines: string[] = [];
  for (const [symbol, value, unit] of components) {
    if (value !== 0) lines.push(`${lines.length === 0 && name !== undefined && name !== '' ? `${name}: ` : ''}${symbol} = ${formatValue(value)} ${unit}`);
  }
  return lines;
}

const LINE_HEIGHT = 12;

/** Room above the member for the point loads' arrows and the tallest stack of labels, odd loads one line higher (none without point loads). */
function pointZoneHeight(stacks: readonly (readonly string[])[]): number {
  if (stacks.length === 0) return 0;
  const lines = Math.max(1, ...stacks.map((stack, i) => stack.length + (i % 2)));
  return ARROW + 5 + lines * LINE_HEIGHT;
}

/** Height of one distributed load's row: its band and its label above it. */
const BAND_ROW = BAND + LINE_HEIGHT + 6;

/** How many distributed loads have some of this component: each gets a row of its own. */
function bandCount(input: FigureInput, component: 'qy' | 'qz'): number {
  return input.distributedLoads.filter((load) => load[component][0] !== 0 || load[component][1] !== 0).length;
}

/** A load's labels stacked above its arrow; every other load's stack a line higher, to keep neighbours apart. */
function stackLabels(out: string[], x: number, beamY: number, index: number, lines: readonly string[]): void {
  const bottom = beamY - ARROW - 5 - (index % 2) * LINE_HEIGHT;
  lines.forEach((line, j) => label(out, x, bottom - (lines.length - 1 - j) * LINE_HEIGHT, line));
}

/**
 * Distributed loads of one plane as bands above the member, one row each (stacked, so that loads
 * over the same length do not hide one another), their height proportional to the intensity; `down`
 * is the sign of q whose arrows point down the page (-1 for qy, +1 for qz).
 */
function drawBands(out: string[], input: FigureInput, toX: (x: number) => number, beamY: number, component: 'qy' | 'qz', down: 1 | -1): void {
  let largest = 0;
  for (const load of input.distributedLoads) largest = Math.max(largest, Math.abs(load[component][0]), Math.abs(load[component][1]));
  if (largest === 0) return;
  const heightOf = (q: number) => (BAND * Math.abs(q)) / largest;
  let row = 0;
  for (const load of input.distributedLoads) {
    const [qStart, qEnd] = load[component];
    if (qStart === 0 && qEnd === 0) continue;
    const base = beamY - 2 - BAND_ROW * row++;
    const x0 = toX(load.from);
    const x1 = toX(load.to);
    const outline = [x0, base, x0, base - heightOf(qStart)];
    // A band whose intensity changes sign is drawn through zero where it crosses.
    if (qStart * qEnd < 0) outline.push(x0 + (qStart / (qStart - qEnd)) * (x1 - x0), base);
    outline.push(x1, base - heightOf(qEnd), x1, base);
    out.push(element('polygon', { points: pointList(outline), class: 'band' }));
    const count = Math.max(2, Math.round(Math.abs(x1 - x0) / 18) + 1);
    for (let k = 0; k < count; k++) {
      const t = k / (count - 1);
      const q = qStart + t * (qEnd - qStart);
      const h = heightOf(q);
      if (h < HEAD + 1) continue;
      const x = x0 + t * (x1 - x0);
      if (q * down > 0) arrow(out, x, base - h, x, base);
      else arrow(out, x, base, x, base - h);
    }
    const prefix = load.label !== undefined && load.label !== '' ? `${load.label}: ` : '';
    const values = qStart === qEnd ? formatValue(qStart) : `${formatValue(qStart)} to ${formatValue(qEnd)}`;
    label(out, (x0 + x1) / 2, base - Math.max(heightOf(qStart), heightOf(qEnd)) - 4, `${prefix}${component} = ${values} ${input.units.forcePerLength}`);
  }
}

function drawSupports(out: string[], input: FigureInput, toX: (x: number) => number, beamY: number, withLabels: boolean): void {
  for (const support of input.supports) {
    const x = toX(support.position);
    supportSymbol(out, support.kind, x, beamY, support.position <= input.length / 2);
    if (withLabels && support.label !== undefined && support.label !== '') label(out, x, beamY + 32, support.label);
  }
}

/**
 * fixed: a hatched wall; pinned: a triangle; roller: a triangle on two wheels; bearing: a block with a
 * circle (a shaft turning in it); torsion-restraint: a crossed box (a coupling); general: a square.
 */
function supportSymbol(out: string[], kind: SupportKind, x: number, beamY: number, wallOnLeft: boolean): void {
  switch (kind) {
    case 'fixed': {
      const side = wallOnLeft ? -1 : 1;
      out.push(element('line', { x1: x, y1: beamY - 15, x2: x, y2: beamY + 15, class: 'wall' }));
      for (let k = 0; k < 6; k++) {
        const y = beamY - 15 + k * 6;
        out.push(element('line', { x1: x, y1: y + 6, x2: x + side * 7, y2: y }));
      }
      return;
    }
    case 'pinned':
      out.push(element('polygon', { points: pointList([x, beamY + 1.5, x - 8, beamY + 14, x + 8, beamY + 14]) }));
      ground(out, x, beamY + 14);
      return;
    case 'roller':
      out.push(element('polygon', { points: pointList([x, beamY + 1.5, x - 8, beamY + 11, x + 8, beamY + 11]) }));
      out.push(element('circle', { cx: x - 4.5, cy: beamY + 13.5, r: 2.5 }));
      out.push(element('circle', { cx: x + 4.5, cy: beamY + 13.5, r: 2.5 }));
      ground(out, x, beamY + 16);
      return;
    case 'bearing':
      out.push(element('rect', { x: x - 7, y: beamY + 1.5, width: 14, height: 11 }));
      out.push(element('circle', { cx: x, cy: beamY + 7, r: 3 }));
      ground(out, x, beamY + 12.5);
      return;
    case 'torsion-restraint':
      out.push(element('rect', { x: x - 5, y: beamY - 8, width: 10, height: 16 }));
      out.push(element('line', { x1: x - 5, y1: beamY - 8, x2: x + 5, y2: beamY + 8 }));
      out.push(element('line', { x1: x + 5, y1: beamY - 8, x2: x - 5, y2: beamY + 8 }));
      return;
    case 'general':
      out.push(element('rect', { x: x - 5, y: beamY + 1.5, width: 10, height: 10 }));
      ground(out, x, beamY + 11.5);
      return;
  }
}

function ground(out: string[], x: number, y: number): void {
  out.push(element('line', { x1: x - 12, y1: y, x2: x + 12, y2: y }));
  for (let k = 0; k < 5; k++) out.push(element('line', { x1: x - 12 + k * 5, y1: y + 5, x2: x - 7 + k * 5, y2: y }));
}

function drawHinges(out: string[], input: FigureInput, toX: (x: number) => number, beamY: number): void {
  for (const position of input.hinges) out.push(element('circle', { cx: toX(position), cy: beamY, r: 3.5, class: 'hinge' }));
}

/** A straight arrow from (x1, y1) to its head at (x2, y2); `double` adds a second head, for a moment vector. */
function arrow(out: string[], x1: number, y1: number, x2: number, y2: number, double = false): void {
  const length = Math.hypot(x2 - x1, y2 - y1);
  if (length === 0) return;
  const ux = (x2 - x1) / length;
  const uy = (y2 - y1) / length;
  const heads = double ? 2 : 1;
  out.push(element('line', { x1, y1, x2: x2 - heads * HEAD * ux, y2: y2 - heads * HEAD * uy }));
  arrowHead(out, x2, y2, ux, uy);
  if (double) arrowHead(out, x2 - HEAD * ux, y2 - HEAD * uy, ux, uy);
}

function arrowHead(out: string[], tipX: number, tipY: number, ux: number, uy: number): void {
  const baseX = tipX - HEAD * ux;
  const baseY = tipY - HEAD * uy;
  const points = [tipX, tipY, baseX - HEAD_HALF_WIDTH * uy, baseY + HEAD_HALF_WIDTH * ux, baseX + HEAD_HALF_WIDTH * uy, baseY - HEAD_HALF_WIDTH * ux];
  out.push(element('polygon', { points: pointList(points), class: 'head' }));
}

/**
 * A moment as a curved arrow round (x, y): a 300 degree arc open at the bottom, counterclockwise on
 * the page when `counterclockwise` (the right-hand rule with the axis towards the reader).
 */
function momentArc(out: string[], x: number, y: number, counterclockwise: boolean): void {
  const lowerRight = -Math.PI / 3;
  const lowerLeft = (4 * Math.PI) / 3;
  const [from, to] = counterclockwise ? [lowerRight, lowerLeft] : [lowerLeft, lowerRight];
  const r = MOMENT_RADIUS;
  const startX = x + r * Math.cos(from);
  const startY = y - r * Math.sin(from);
  const endX = x + r * Math.cos(to);
  const endY = y - r * Math.sin(to);
  // SVG's sweep flag 1 turns clockwise on the page, since its y axis points down.
  const d = `M${formatCoordinate(startX)} ${formatCoordinate(startY)}A${r} ${r} 0 1 ${counterclockwise ? 0 : 1} ${formatCoordinate(endX)} ${formatCoordinate(endY)}`;
  out.push(element('path', { d }));
  // The tangent at the end, in page coordinates (y down), in the direction of travel.
  const ux = counterclockwise ? -Math.sin(to) : Math.sin(to);
  const uy = counterclockwise ? -Math.cos(to) : Math.cos(to);
  arrowHead(out, endX + HEAD * ux, endY + HEAD * uy, ux, uy);
}

/** Text at (x, y); near an edge it grows inwards so it stays on the page. */
function label(out: string[], x: number, y: number, text: string, anchor?: 'start' | 'middle' | 'end'): void {
  const chosen = anchor ?? (x < LEFT + EDGE ? 'start' : x > RIGHT - EDGE ? 'end' : 'middle');
  out.push(textElement('text', { x, y, 'text-anchor': chosen }, text));
}

function pointList(coordinates: readonly number[]): string {
  const parts: string[] = [];
  for (let i = 0; i + 1 < coordinates.length; i += 2) parts.push(`${formatCoordinate(coordinates[i] as number)},${formatCoordinate(coordinates[i + 1] as number)}`);
  return parts.join(' ');
}

/** 1e-12 of the largest magnitude among the diagrams (and their extremes) of each kind. */
function zeroTolerances(input: FigureInput): Record<UnitKind, number> {
  const largest: Record<UnitKind, number> = { length: 0, force: 0, moment: 0, deflection: 0, forcePerLength: 0, angle: 0 };
  for (const field of FIGURE_FIELDS) {
    const kind = FIELD_KIND[field];
    const { max, min } = input.extremes[field];
    let m = Math.max(largest[kind], Math.abs(max.value), Math.abs(min.value));
    const values = input.diagrams[field];
    for (let i = 0; i < values.length; i++) m = Math.max(m, Math.abs(values[i] as number));
    largest[kind] = m;
  }
  const out = { ...largest };
  for (const kind of Object.keys(out) as UnitKind[]) out[kind] = ZERO_FRACTION * largest[kind];
  return out;
}

function isZero(input: FigureInput, field: FigureField, tolerance: number): boolean {
  const { max, min } = input.extremes[field];
  if (Math.abs(max.value) > tolerance || Math.abs(min.value) > tolerance) return false;
  const values = input.diagrams[field];
  for (let i = 0; i < values.length; i++) if (Math.abs(values[i] as number) > tolerance) return false;
  return true;
}

/**
 * One diagram: a zero line, the samples as one polyline (a jump, the same x twice, stays a vertical
 * segment), a light fill between them and the curve, and the exact extremes marked and labelled.
 */
function drawPanel(
  out: string[],
  input: FigureInput,
  panel: (typeof PANELS)[number],
  top: number,
  xText: readonly string[],
  guides: string,
  toX: (x: number) => number,
  tolerance: number,
): void {
  const { field } = panel;
  const values = input.diagrams[field];
  const { max, min } = input.extremes[field];
  const unit = input.units[FIELD_KIND[field]];
  let high = Math.max(0, max.value);
  let low = Math.min(0, min.value);
  for (let i = 0; i < values.length; i++) {
    const v = values[i] as number;
    if (v > high) high = v;
    else if (v < low) low = v;
  }
  // Divided by the largest magnitude first, so no range of finite values overflows or underflows.
  const magnitude = Math.max(high, -low);
  const top01 = high / magnitude;
  const perUnit = PANEL_PLOT_HEIGHT / (top01 - low / magnitude);
  const toY = (v: number) => PANEL_PLOT_TOP + (top01 - v / magnitude) * perUnit;
  const zeroY = formatCoordinate(toY(0));
  out.push(`<g class="panel" data-field="${field}" transform="translate(0,${formatCoordinate(top)})">`);
  out.push(textElement('text', { x: LEFT, y: 14, class: 'heading' }, `${panel.heading} (${unit})`));
  out.push(textElement('text', { x: RIGHT, y: 14, class: 'caption', 'text-anchor': 'end' }, `${panel.positive}; positive plotted up`));
  out.push(guides);
  const points: string[] = [];
  for (let i = 0; i < values.length; i++) points.push(`${xText[i]},${formatCoordinate(toY(values[i] as number))}`);
  const curve = points.join(' ');
  if (values.length > 0) {
    out.push(`<polygon class="area" points="${xText[0]},${zeroY} ${curve} ${xText[values.length - 1]},${zeroY}"/>`);
  }
  out.push(`<line class="zero" x1="${LEFT}" y1="${zeroY}" x2="${RIGHT}" y2="${zeroY}"/>`);
  if (values.length > 0) out.push(`<polyline class="curve" points="${curve}"/>`);
  const lengthUnit = input.units.length;
  const extremeLabel = (value: number, position: number) => `${formatValue(value)} ${unit} at x = ${formatValue(position)} ${lengthUnit}`;
  if (Math.abs(max.value) > tolerance) {
    const x = toX(max.position);
    const y = toY(max.value);
    out.push(element('circle', { cx: x, cy: y, r: 2.2, class: 'dot' }));
    label(out, x, y - 5, extremeLabel(max.value, max.position));
  }
  // A constant diagram (max equal to min) is labelled once.
  if (Math.abs(min.value) > tolerance && Math.abs(max.value - min.value) > tolerance) {
    const x = toX(min.position);
    const y = toY(min.value);
    out.push(element('circle', { cx: x, cy: y, r: 2.2, class: 'dot' }));
    label(out, x, y + 13, extremeLabel(min.value, min.position));
  }
  out.push('</g>');
}
