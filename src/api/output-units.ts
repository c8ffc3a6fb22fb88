/**
 * The units a response is presented in: SI by default, the US customary set, or a unit per kind of
 * quantity. Resolved once per request into factors, so presenting a value is one division.
 */

import { invalidField, ProblemError, type FieldError } from './problems.js';
import { QUANTITY_KINDS, unitFactorToSI, type QuantityKind } from './quantities.js';

export type OutputUnitsRequest = 'SI' | 'US' | Partial<Record<QuantityKind, string>> | undefined;

const SI_UNITS: Record<QuantityKind, string> = { ...QUANTITY_KINDS };

/** US customary practice: inches for sections and deflections, kips, kip-feet and ksi. */
const US_UNITS: Record<QuantityKind, string> = {
  length: 'in',
  deflection: 'in',
  force: 'kip',
  moment: 'kip*ft',
  stress: 'ksi',
  forcePerLength: 'kip/ft',
  momentPerLength: 'kip*ft/ft',
  density: 'lbm/ft^3',
  angle: 'rad',
  translationalStiffness: 'kip/in',
  rotationalStiffness: 'kip*in/rad',
  area: 'in^2',
  sectionModulus: 'in^3',
  secondMoment: 'in^4',
  warpingConstant: 'in^6',
  massPerLength: 'lbm/ft',
  torsionalShearPerTorque: 'in^-3',
};

export interface OutputUnits {
  /** The unit each kind is presented in, echoed in the response. */
  readonly names: Readonly<Record<QuantityKind, string>>;
  /** SI units per presented unit. */
  readonly factors: Readonly<Record<QuantityKind, number>>;
  /** Significant digits every presented quantity is rounded to (output.significantDigits); none by default. */
  readonly significantDigits?: number;
}

/** The same units, every presented quantity rounded to `digits` significant digits. */
export function withSignificantDigits(units: OutputUnits, digits: number | undefined): OutputUnits {
  return digits === undefined ? units : { ...units, significantDigits: digits };
}

/** `value` to `digits` significant digits (none: as it is); -0 becomes 0. */
export function rounded(value: number, digits: number | undefined): number {
  const result = digits === undefined ? value : Number(value.toPrecision(digits));
  return result === 0 ? 0 : result;
}

function build(names: Record<QuantityKind, string>): OutputUnits {
  const factors = {} as Record<QuantityKind, number>;
  for (const kind of Object.keys(names) as QuantityKind[]) {
    const factor = unitFactorToSI(names[kind], kind);
    if (factor === undefined) throw new Error(`unit table: ${names[kind]} is not a ${kind}`);
    factors[kind] = factor;
  }
  return { names, factors };
}

export const SI_OUTPUT: OutputUnits = build(SI_UNITS);
export const US_OUTPUT: OutputUnits = build(US_UNITS);

/** `unit` as an operand: a plain name as it is, anything else in parentheses. */
function operand(unit: string): string {
  return /^[A-Za-z]+$/.test(unit) ? unit : `(${unit})`;
}

/**
 * Kinds whose unit is made from the base units (length, force, moment) unless the request names it:
 * with length mm and force kN, a force per length is in kN/mm and a second moment in mm^4. Stress,
 * density and mass per length keep their own units (MPa is not kN/mm^2 to anyone reading them).
 * Made from SI names, each gives its SI unit back ("N/m", "m^4"), so SI answers are unchanged.
 */
const DERIVED_UNITS: readonly { readonly kind: QuantityKind; readonly name: (names: Readonly<Record<QuantityKind, string>>) => string }[] = [
  { kind: 'deflection', name: (n) => n.length },
  { kind: 'area', name: (n) => `${operand(n.length)}^2` },
  { kind: 'sectionModulus', name: (n) => `${operand(n.length)}^3` },
  { kind: 'secondMoment', name: (n) => `${operand(n.length)}^4` },
  { kind: 'warpingConstant', name: (n) => `${operand(n.length)}^6` },
  { kind: 'torsionalShearPerTorque', name: (n) => `${operand(n.length)}^-3` },
  { kind: 'forcePerLength', name: (n) => `${n.force}/${operand(n.length)}` },
  { kind: 'translationalStiffness', name: (n) => `${n.force}/${operand(n.length)}` },
  { kind: 'momentPerLength', name: (n) => `${n.moment}/${operand(n.length)}` },
  { kind: 'rotationalStiffness', name: (n) => `${n.moment}/rad` },
];

/** Resolves output.units; `path` is where it sits in the request, for the error pointers. */
export function resolveOutputUnits(request: OutputUnitsRequest, path: readonly (string | number)[]): OutputUnits {
  if (request === undefined || request === 'SI') return SI_OUTPUT;
  if (request === 'US') return US_OUTPUT;
  const names = { ...SI_UNITS };
  const factors = { ...SI_OUTPUT.factors };
  const errors: FieldError[] = [];
  for (const [kind, unitName] of Object.entries(request) as [QuantityKind, string][]) {
    const factor = unitFactorToSI(unitName, kind);
    if (factor === undefined) {
      errors.push(invalidField([...path, kind], `"${unitName}" is not a unit of ${kind} (SI: ${QUANTITY_KINDS[kind]})`).errors[0] as FieldError);
      continue;
    }
    names[kind] = unitName;
    factors[kind] = factor;
  }
  if (errors.length > 0) throw new ProblemError('invalidInput', 'Some output units are not valid.', errors);
  for (const derived of DERIVED_UNITS) {
    if (request[derived.kind] !== undefined) continue;
    const name = derived.name(names);
    // Taken from mathjs, not multiplied out, so the echoed name and the factor cannot disagree; a name
    // made from unusual base units that mathjs cannot read back keeps the SI unit.
    const factor = unitFactorToSI(name, derived.kind);
    if (factor === undefined) continue;
    names[derived.kind] = name;
    factors[derived.kind] = factor;
  }
  return { names, factors };
}

/** A length the engine wrote into a text ("2.5 m", "1e-7 m"), with the number it holds. */
const METRE_TEXT = /(-?\d+(?:\.\d+)?(?:e[-+]?\d+)?) m\b/g;

/**
 * A text of the engine (a location, a reason) with every length in it, which the engine writes in
 * metres ("span 0 m to 3.6 m"), in the presented length unit ("span 0 mm to 3600 mm"), six significant
 * digits at most as the engine writes them. In SI the text is returned as it is.
 */
export function textInUnits(units: OutputUnits, text: string): string {
  if (units.factors.length === 1) return text;
  return text.replace(METRE_TEXT, (_match, metres: string) => `${Number((Number(metres) / units.factors.length).toPrecision(6))} ${units.names.length}`);
}

/** An SI value in the presented unit; -0 becomes 0. */
export function present(units: OutputUnits, kind: QuantityKind, valueSI: number): number {
  const value = valueSI / units.factors[kind];
  if (units.significantDigits !== undefined) return rounded(value, units.significantDigits);
  return value === 0 ? 0 : value;
}
