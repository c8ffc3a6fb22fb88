/**
 * The member figure, on a hand-made simple span whose diagrams are worked out below: which panels it
 * draws, how a jump is drawn, what the extreme labels say, that every text is escaped, that the
 * document is well formed and that a non-finite input is refused.
 */

import { describe, expect, it } from 'vitest';
import { FIGURE_FIELDS, type FigureExtremes, type FigureField, type FigureInput } from '../../src/rendering/figure-input.js';
import { memberFigureSvg } from '../../src/rendering/member-figure-svg.js';

/**
 * A 3.6 m simple span (pinned at 0, roller at 3.6) with P = 6 kN down at a = 1.2 m (b = 2.4 m), kN and
 * m, EI = 2000 kN*m^2, sampled every 0.36 m plus the load point twice.
 * - Reactions by moments about each support: RA = P b / L = 6 x 2.4 / 3.6 = 4 kN, RB = P a / L = 2 kN.
 * - Vy = RA = 4 kN left of the load, RA - P = -2 kN right of it: a jump of -6 kN at x = 1.2 m.
 * - Mz = 4 x up to the load, 4 x 1.2 = 4.8 kN*m under it, then 4.8 - 2 (x - 1.2), 0 at x = 3.6.
 * - Deflection (elastic line of a simple span under a point load, integrated twice with v = 0 at both
 *   supports): v = -P b x (L^2 - b^2 - x^2) / (6 L EI) for x <= a, and the same with a and b, x and
 *   L - x exchanged for x >= a. dv/dx = 0 in the longer part, at L - x = sqrt((L^2 - a^2) / 3) =
 *   sqrt(3.84) = 1.9596 m, that is x = 1.6404 m, where v = -6 x 1.2 x 1.9596 x (11.52 - 3.84) /
 *   (6 x 3.6 x 2000) = -108.36 / 43200 m = -2.508 mm.
 * Every other diagram is zero (written as -0 and 0, to check that no "-0" reaches the text).
 */
const L = 3.6;
const P = 6;
const A = 1.2;
const B = L - A;
const EI = 2000;
const DEFLECTION_AT = L - Math.sqrt((L * L - A * A) / 3);

function deflectionMm(x: number): number {
  const metres = x <= A ? (-P * B * x * (L * L - B * B - x * x)) / (6 * L * EI) : (-P * A * (L - x) * (L * L - A * A - (L - x) ** 2)) / (6 * L * EI);
  return metres * 1000;
}

function slope(x: number): number {
  const h = 1e-6;
  return (deflectionMm(x + h) - deflectionMm(x - h)) / (2 * h) / 1000;
}

const ZERO_EXTREMES: FigureExtremes = { max: { value: 0, position: 0 }, min: { value: 0, position: 0 } };

function simpleSpan(): FigureInput & { diagrams: Record<'x' | FigureField, number[]> } {
  const x: number[] = [];
  const shearY: number[] = [];
  for (let i = 0; i <= 10; i++) {
    const at = (L * i) / 10;
    if (x.length > 0 && (x[x.length - 1] as number) < A && at > A) {
      // The load point twice: the value just left first, then just right.
      x.push(A, A);
      shearY.push(4, -2);
    }
    x.push(at);
    shearY.push(at < A ? 4 : -2);
  }
  const diagrams = Object.fromEntries(FIGURE_FIELDS.map((field, k) => [field, x.map(() => (k % 2 === 0 ? -0 : 0))])) as Record<FigureField, number[]>;
  diagrams.shearY = shearY;
  diagrams.momentZ = x.map((at) => (at <= A ? 4 * at : 4.8 - 2 * (at - A)));
  diagrams.deflectionY = x.map(deflectionMm);
  diagrams.slopeZ = x.map(slope);
  const extremes = Object.fromEntries(FIGURE_FIELDS.map((field) => [field, ZERO_EXTREMES])) as Record<FigureField, FigureExtremes>;
  extremes.shearY = { max: { value: 4, position: 0 }, min: { value: -2, position: A } };
  extremes.momentZ = { max: { value: 4.8, position: A }, min: { value: 0, position: 0 } };
  extremes.deflectionY = { max: { value: 0, position: 0 }, min: { value: deflectionMm(DEFLECTION_AT), position: DEFLECTION_AT } };
  extremes.slopeZ = { max: { value: slope(L), position: L }, min: { value: slope(0), position: 0 } };
  return {
    title: 'Simple span',
    units: { length: 'm', force: 'kN', moment: 'kN*m', deflection: 'mm', forcePerLength: 'kN/m', angle: 'rad' },
    length: L,
    supports: [
      { position: 0, kind: 'pinned', label: 'A' },
      { position: L, kind: 'roller', label: 'B' },
    ],
    hinges: [],
    pointLoads: [{ position: A, fx: 0, fy: -P, fz: 0, mx: 0, my: 0, mz: 0, label: 'P' }],
    distributedLoads: [],
    diagrams: { x, ...diagrams },
    extremes,
  };
}

/** The data-field of every panel, in document order. */
function panelFields(svg: string): string[] {
  return [...svg.matchAll(/<g class="panel" data-field="([A-Za-z]+)"/g)].map((m) => m[1] as string);
}

/** The markup of one panel (panels hold no nested groups). */
function panelOf(svg: string, field: FigureField): string {
  const start = svg.indexOf(`<g class="panel" data-field="${field}"`);
  expect(start).toBeGreaterThanOrEqual(0);
  return svg.slice(start, svg.indexOf('</g>', start));
}

/** The text of each <text> element of a piece of markup. */
function texts(markup: string): string[] {
  return [...markup.matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((m) => m[1] as string);
}

/**
 * What keeps a document from being well formed XML, as a list: a tag that is not `<name a="v" ...>`
 * (every attribute quoted), an element closed out of order or never, text holding a raw `>` or an `&`
 * that starts no entity, more than one root element.
 */
function wellFormedProblems(document: string): string[] {
  const problems: string[] = [];
  const open: string[] = [];
  let roots = 0;
  let at = 0;
  while (at < document.length) {
    const tagStart = document.indexOf('<', at);
    const text = document.slice(at, tagStart === -1 ? document.length : tagStart);
    if (text.includes('>')) problems.push(`raw > in text "${text}"`);
    if (/&(?!(amp|lt|gt|quot|#39);)/.test(text)) problems.push(`bare & in text "${text}"`);
    if (text.trim() !== '' && open.length === 0) problems.push(`text outside the root: "${text}"`);
    if (tagStart === -1) break;
    const tagEnd = document.indexOf('>', tagStart);
    if (tagEnd === -1) {
      problems.push(`unclosed tag at ${tagStart}`);
      break;
    }
    const tag = document.slice(tagStart, tagEnd + 1);
    at = tagEnd + 1;
    const parts = /^<(\/?)([A-Za-z][\w:-]*)((?:\s+[\w:-]+="[^"<>]*")*)\s*(\/?)>$/.exec(tag);
    if (parts === null) {
      problems.push(`malformed tag ${tag}`);
      continue;
    }
    const [, closing, name, attributes = '', selfClosing] = parts;
    if (/&(?!(amp|lt|gt|quot|#39);)/.test(attributes)) problems.push(`bare & in attributes of ${tag}`);
    if (closing === '/') {
      const expected = open.pop();
      if (expected !== name) problems.push(`</${name}> closes <${expected ?? 'nothing'}>`);
    } else {
      if (open.length === 0) roots++;
      if (selfClosing !== '/') open.push(name as string);
    }
  }
  if (open.length > 0) problems.push(`never closed: ${open.join(', ')}`);
  if (roots !== 1) problems.push(`${roots} root elements`);
  return problems;
}

describe('the well-formedness check of this file', () => {
  it('finds an element left open, one closed out of order, an unquoted attribute and a bare &', () => {
    expect(wellFormedProblems('<svg><g><line/></svg>')).not.toEqual([]);
    expect(wellFormedProblems('<svg><g></svg></g>')).not.toEqual([]);
    expect(wellFormedProblems('<svg width=3></svg>')).not.toEqual([]);
    expect(wellFormedProblems('<svg><text>a & b</text></svg>')).not.toEqual([]);
    expect(wellFormedProblems('<svg></svg><svg></svg>')).not.toEqual([]);
    expect(wellFormedProblems('<svg a="1"><text>a &amp; b</text><line/></svg>')).toEqual([]);
  });
});

describe('memberFigureSvg', () => {
  it('is one well-formed SVG document of A4 text width, with no script and nothing fetched', () => {
    const svg = memberFigureSvg(simpleSpan());
    expect(wellFormedProblems(svg)).toEqual([]);
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg" width="180mm"')).toBe(true);
    expect(svg).toMatch(/viewBox="0 0 720 [\d.]+"/);
    expect(svg).not.toMatch(/<script|href=|url\(|@import/);
  });

  it('draws a panel only for a diagram that is not zero, in the fixed order, and never the slopes', () => {
    // Vy, Mz and the deflection are not zero; slopeZ is not either, but slopes have no panel.
    expect(panelFields(memberFigureSvg(simpleSpan()))).toEqual(['shearY', 'momentZ', 'deflectionY']);
  });

  it('counts a diagram within 1e-12 of the largest of its kind as zero, and one above as not', () => {
    const input = simpleSpan();
    // The largest force is 4 kN, so shear of 1e-13 kN (under 4e-12) is rounding; 1e-9 kN is not.
    input.diagrams.shearZ = input.diagrams.x.map(() => 1e-13);
    expect(panelFields(memberFigureSvg(input))).not.toContain('shearZ');
    input.diagrams.shearZ = input.diagrams.x.map(() => 1e-9);
    expect(panelFields(memberFigureSvg(input))).toContain('shearZ');
  });

  it('draws the jump of Vy under the load as a vertical segment: the same x twice in the polyline', () => {
    const panel = panelOf(memberFigureSvg(simpleSpan()), 'shearY');
    const points = (/<polyline class="curve" points="([^"]+)"/.exec(panel)?.[1] ?? '').split(' ').map((p) => p.split(','));
    const jumps = points.slice(1).filter((p, i) => p[0] === points[i]?.[0]);
    // The member spans user units 60 to 660, so x = 1.2 m of 3.6 is at 60 + 600 x 1.2 / 3.6 = 260.
    expect(jumps.map((p) => p[0])).toEqual(['260.00']);
    const [before, after] = points.filter((p) => p[0] === '260.00');
    expect(before?.[1]).not.toBe(after?.[1]);
  });

  it('labels the extremes with value, unit and position, leaving out those at zero', () => {
    const svg = memberFigureSvg(simpleSpan());
    // From the derivation above: Vy from 4 kN at the left support to -2 kN right of the load.
    expect(texts(panelOf(svg, 'shearY'))).toEqual(['Shear force Vy (kN)', 'sum of the y forces left of x; positive plotted up', '4 kN at x = 0 m', '-2 kN at x = 1.2 m']);
    // Mz: 4 kN x 1.2 m = 4.8 kN*m under the load; its minimum, 0 at the supports, is not labelled.
    expect(texts(panelOf(svg, 'momentZ')).slice(2)).toEqual(['4.8 kN*m at x = 1.2 m']);
    // Deflection: -2.508 mm at x = 1.6404 m, four significant digits; its maximum, 0, not labelled.
    expect(texts(panelOf(svg, 'deflectionY')).slice(2)).toEqual(['-2.508 mm at x = 1.64 m']);
  });

  it('labels a constant diagram once', () => {
    const input = simpleSpan();
    input.diagrams.axial = input.diagrams.x.map(() => -3);
    const extremes = { ...input.extremes, axial: { max: { value: -3, position: 0 }, min: { value: -3, position: 0 } } };
    const panel = panelOf(memberFigureSvg({ ...input, extremes }), 'axial');
    expect(texts(panel).slice(2)).toEqual(['-3 kN at x = 0 m']);
  });

  it('draws the member: supports, the load with its value, the length with its unit', () => {
    const svg = memberFigureSvg(simpleSpan());
    const before = svg.slice(0, svg.indexOf('<g class="panel"'));
    expect(texts(before)).toEqual(['Simple span', 'Elevation: x along the member, +y up', 'A', 'B', 'P: Fy = -6 kN', 'L = 3.6 m']);
  });

  it('draws a shaft bearing as a block with a circle and a torsion restraint as a crossed box', () => {
    const shaft = { ...simpleSpan(), supports: [{ position: 0, kind: 'bearing' as const }, { position: L, kind: 'torsion-restraint' as const }] };
    const before = (svg: string) => svg.slice(0, svg.indexOf('<g class="panel"'));
    const drawn = before(memberFigureSvg(shaft));
    const plain = before(memberFigureSvg(simpleSpan()));
    // The bearing: one rect and one circle more than a pinned support draws; the restraint: a rect crossed by two lines.
    expect((drawn.match(/<rect /g) ?? []).length - (plain.match(/<rect /g) ?? []).length).toBe(2);
    // The roller's two wheels go, the bearing's one circle comes.
    expect((drawn.match(/<circle /g) ?? []).length).toBe((plain.match(/<circle /g) ?? []).length - 2 + 1);
    expect(wellFormedProblems(memberFigureSvg(shaft))).toEqual([]);
  });

  it('adds the plan view only when something acts along z', () => {
    const input = simpleSpan();
    expect(memberFigureSvg(input)).not.toContain('Plan, seen from above');
    const sideways = { ...input, distributedLoads: [{ from: 0, to: L, qy: [0, 0] as const, qz: [0.5, 0.5] as const }] };
    const svg = memberFigureSvg(sideways);
    expect(svg).toContain('Plan, seen from above');
    expect(texts(svg)).toContain('qz = 0.5 kN/m');
  });

  it('escapes every text it is given: title, labels and unit names', () => {
    const attack = `<script>alert("x")</script>'`;
    const input = simpleSpan();
    const svg = memberFigureSvg({
      ...input,
      title: attack,
      units: { ...input.units, force: attack },
      supports: input.supports.map((s) => ({ ...s, label: attack })),
      pointLoads: input.pointLoads.map((p) => ({ ...p, label: attack, mz: 1 })),
      distributedLoads: [{ from: 0, to: 1, qy: [-1, -2], qz: [0, 0], label: attack }],
    });
    expect(svg).not.toContain('<script');
    expect(svg).not.toContain('alert("x")');
    expect(svg).toContain('&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt;&#39;');
    expect(wellFormedProblems(svg)).toEqual([]);
  });

  it('writes no NaN, no Infinity and no negative zero', () => {
    const svg = memberFigureSvg(simpleSpan());
    expect(svg).not.toMatch(/NaN|Infinity/);
    const negativeZeros = [...svg.matchAll(/-\d+(\.\d+)?/g)].filter((m) => Number(m[0]) === 0);
    expect(negativeZeros).toEqual([]);
  });

  it('refuses an input holding a number that is not finite, naming where it is', () => {
    const withNaN = simpleSpan();
    withNaN.diagrams.momentZ[3] = Number.NaN;
    expect(() => memberFigureSvg(withNaN)).toThrow(/diagrams\.momentZ\[3\]/);
    const withInfinity = simpleSpan();
    expect(() => memberFigureSvg({ ...withInfinity, pointLoads: [{ ...withInfinity.pointLoads[0]!, fy: Number.NEGATIVE_INFINITY }] })).toThrow(/pointLoads\[0\]\.fy/);
    const badExtreme = simpleSpan();
    expect(() => memberFigureSvg({ ...badExtreme, extremes: { ...badExtreme.extremes, twist: { max: { value: Number.NaN, position: 0 }, min: { value: 0, position: 0 } } } })).toThrow(
      /extremes\.twist\.max\.value/,
    );
    expect(() => memberFigureSvg({ ...simpleSpan(), length: Number.POSITIVE_INFINITY })).toThrow(Error);
  });

  it('refuses a member that is not positive in length and a diagram not aligned with x', () => {
    expect(() => memberFigureSvg({ ...simpleSpan(), length: 0 })).toThrow(/length/);
    const short = simpleSpan();
    short.diagrams.torque = short.diagrams.torque.slice(1);
    expect(() => memberFigureSvg(short)).toThrow(/diagrams\.torque/);
  });
});
