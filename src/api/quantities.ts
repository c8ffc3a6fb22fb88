/**
 * Quantities at the boundary: a number in SI base units, or a string with a unit that mathjs parses
 * ("250 mm", "12 kN", "5 kip/ft", "36 ksi"). Everything past this module is SI numbers.
 */

import { all, create, type Unit } from 'mathjs';

const math = create(all as NonNullable<typeof all>);
// US customary units: mathjs lacks ksi, and its kip is 4448.2216 N, not the exact 1000 lbf
// (NIST SP 811, 2008, B.8: 1 lbf = 4.4482216152605 N).
// mathjs's psi (6894.75729276459 Pa) is not lbf/in^2 exactly either.
math.createUnit({ kip: { definition: '1000 lbf' }, psi: { definition: '1 lbf/in^2' } }, { override: true });
math.createUnit('ksi', '1000 lbf/in^2');
math.createUnit('Msi', '1000000 lbf/in^2');

/** Each kind of quantity the contract takes or returns, with its SI unit. */
export const QUANTITY_KINDS = {
  length: 'm',
  deflection: 'm',
  force: 'N',
  moment: 'N*m',
  stress: 'Pa',
  forcePerLength: 'N/m',
  momentPerLength: 'N*m/m',
  density: 'kg/m^3',
  angle: 'rad',
  translationalStiffness: 'N/m',
  rotationalStiffness: 'N*m/rad',
  area: 'm^2',
  sectionModulus: 'm^3',
  secondMoment: 'm^4',
  warpingConstant: 'm^6',
  massPerLength: 'kg/m',
  torsionalShearPerTorque: 'm^-3',
} as const;

export type QuantityKind = keyof typeof QUANTITY_KINDS;

/** mathjs's base dimension index for angles: treated as dimensionless except for the angle kind. */
const ANGLE_DIMENSION = 7;

const SI_DIMENSIONS = Object.fromEntries(
  Object.entries(QUANTITY_KINDS).map(([kind, unit]) => [kind, math.unit(1, unit).dimensions]),
) as Record<QuantityKind, number[]>;

function sameDimension(kind: QuantityKind, unit: Unit): boolean {
  const expected = SI_DIMENSIONS[kind];
  const actual = unit.dimensions;
  return expected.every((power, index) => {
    if (index === ANGLE_DIMENSION && kind !== 'angle') return true;
    return Math.abs(power - (actual[index] ?? 0)) < 1e-12;
  });
}

/** Magnitudes past this (in SI) are refused: no member of this trade comes near, and squares of them overflow. */
const MAX_MAGNITUDE = 1e15;

/** The value in the kind's SI unit; undefined when mathjs cannot convert (an angle where none belongs). */
function convert(unit: Unit, kind: QuantityKind): number | undefined {
  try {
    return unit.toNumber(siUnitFor(kind, unit));
  } catch {
    return undefined;
  }
}

/** The SI unit to convert to; a radian the input leaves out (it is dimensionless) is left out too. */
function siUnitFor(kind: QuantityKind, unit: Unit): string {
  const si = QUANTITY_KINDS[kind];
  const expectsAngle = (SI_DIMENSIONS[kind][ANGLE_DIMENSION] ?? 0) !== 0;
  const hasAngle = (unit.dimensions[ANGLE_DIMENSION] ?? 0) !== 0;
  return expectsAngle && !hasAngle && kind !== 'angle' ? si.replace('/rad', '') : si;
}

export type QuantityResult = { readonly ok: true; readonly value: number } | { readonly ok: false; readonly message: string };

const MAX_QUANTITY_STRING = 64;

/**
 * Parsing a unit string with mathjs costs tens of microseconds, and a configurator sends the same few
 * strings ("2.7 m", "-5 kN/m") again and again: results are remembered by kind and text. Bounded by
 * starting afresh once it holds STRINGS_REMEMBERED entries.
 */
const STRINGS_REMEMBERED = 4096;
const parsedStrings = new Map<string, QuantityResult>();

function remembered<T>(cache: Map<string, T>, key: string, compute: () => T): T {
  const known = cache.get(key);
  if (known !== undefined) return known;
  const result = compute();
  if (cache.size >= STRINGS_REMEMBERED) cache.clear();
  cache.set(key, result);
  return result;
}

/** A number (already SI) or a unit string, as an SI number of the given kind. */
export function quantityToSI(input: number | string, kind: QuantityKind): QuantityResult {
  if (typeof input === 'number') {
    return Number.isFinite(input) ? { ok: true, value: input } : { ok: false, message: 'must be a finite number' };
  }
  return remembered(parsedStrings, `${kind}\n${input}`, () => parseQuantity(input, kind));
}

function parseQuantity(input: string, kind: QuantityKind): QuantityResult {
  const text = input.trim();
  if (text.length === 0 || text.length > MAX_QUANTITY_STRING) {
    return { ok: false, message: `must be a number in ${QUANTITY_KINDS[kind]} or a string such as "${example(kind)}"` };
  }
  let unit: Unit;
  try {
    unit = math.unit(text);
  } catch {
    return { ok: false, message: `"${text}" is not a quantity with a known unit (for example "${example(kind)}")` };
  }
  if (unit.value === null || unit.units.length === 0) {
    return { ok: false, message: `"${text}" has no unit; give a number in ${QUANTITY_KINDS[kind]} or a value with a unit` };
  }
  if (!sameDimension(kind, unit)) {
    return { ok: false, message: `"${text}" is not ${describeKind(kind)} (expected a unit like ${QUANTITY_KINDS[kind]})` };
  }
  const value = convert(unit, kind);
  if (value === undefined) return { ok: false, message: `"${text}" is not ${describeKind(kind)} (expected a unit like ${QUANTITY_KINDS[kind]})` };
  if (!Number.isFinite(value)) return { ok: false, message: `"${text}" is not finite` };
  if (Math.abs(value) > MAX_MAGNITUDE) return { ok: false, message: `"${text}" is beyond the range this service computes with (${MAX_MAGNITUDE} ${QUANTITY_KINDS[kind]})` };
  return { ok: true, value };
}

const parsedUnitNames = new Map<string, number | null>();

/** How many SI units one of `unitName` is, when `unitName` is a unit of the kind; undefined otherwise. */
export function unitFactorToSI(unitName: string, kind: QuantityKind): number | undefined {
  return remembered(parsedUnitNames, `${kind}\n${unitName}`, () => parseUnitFactor(unitName, kind) ?? null) ?? undefined;
}

function parseUnitFactor(unitName: string, kind: QuantityKind): number | undefined {
  let unit: Unit;
  try {
    // A unit name only: "kN", not "2 kN".
    if (/^\s*[-+.\d]/.test(unitName)) return undefined;
    unit = math.unit(1, unitName);
  } catch {
    return undefined;
  }
  if (!sameDimension(kind, unit)) return undefined;
  const factor = convert(unit, kind);
  if (factor === undefined) return undefined;
  return Number.isFinite(factor) && factor > 0 ? factor : undefined;
}

const EXAMPLES: Record<QuantityKind, string> = {
  length: '250 mm',
  deflection: '12 mm',
  force: '12 kN',
  moment: '2.5 kN*m',
  stress: '355 MPa',
  forcePerLength: '5 kN/m',
  momentPerLength: '0.2 kN*m/m',
  density: '7850 kg/m^3',
  angle: '0.5 deg',
  translationalStiffness: '20 kN/mm',
  rotationalStiffness: '50 kN*m/rad',
  area: '28.5 cm^2',
  sectionModulus: '194 cm^3',
  secondMoment: '1943 cm^4',
  warpingConstant: '12990 cm^6',
  massPerLength: '22.4 kg/m',
  torsionalShearPerTorque: '100 m^-3',
};

export function example(kind: QuantityKind): string {
  return EXAMPLES[kind];
}

/** "a length", "an angle": the kind in words, with its article. */
function describeKind(kind: QuantityKind): string {
  const words = kind.replace(/([A-Z])/g, ' $1').toLowerCase();
  return `${/^[aeiou]/.test(words) ? 'an' : 'a'} ${words}`;
}
