/**
 * Turns one row of a standard's section table, printed in the table's own units (mm, cm^2, cm^4...),
 * into a SectionEntry in SI. Each catalogue file keeps its table readable, one row per size.
 */

import type { SectionEntry, TabulatedSectionValues } from '../section-entry.js';

/** Millimetres to metres. */
export const mm = (value: number): number => value * 1e-3;
/** Square centimetres to m^2. */
export const cm2 = (value: number): number => value * 1e-4;
/** Cubic centimetres (section moduli) to m^3. */
export const cm3 = (value: number): number => value * 1e-6;
/** Centimetres to the fourth (second moments, torsion constants) to m^4. */
export const cm4 = (value: number): number => value * 1e-8;
/** Centimetres to the sixth (warping constants) to m^6. */
export const cm6 = (value: number): number => value * 1e-12;

/** The tables' density of steel, kg/m^3 (EN 10365 and EN 10219-2 use 7.85 kg/dm^3). */
export const STEEL_DENSITY = 7850;

/** The fields every row shares once its geometry is known. */
export interface TableFamily {
  readonly family: string;
  readonly standard: string;
  readonly source: string;
}

/** Drops the tabulated values a row leaves out (undefined), so an entry only holds what is known. */
function knownValues(values: Partial<Record<keyof TabulatedSectionValues, number>>): TabulatedSectionValues {
  const known: Record<string, number> = {};
  for (const [name, value] of Object.entries(values)) {
    if (value !== undefined) known[name] = value;
  }
  return known;
}

/**
 * An I or H section row in the order EN 10365's tables print it. The standard's y-y (strong) axis is
 * our z axis and its z-z (weak) axis our y axis, so Iy of the table becomes secondMomentZ.
 */
export type ISectionRow = readonly [
  designation: string,
  depthMm: number,
  flangeWidthMm: number,
  webThicknessMm: number,
  flangeThicknessMm: number,
  rootRadiusMm: number,
  massKgPerM: number,
  areaCm2: number | undefined,
  strongSecondMomentCm4: number | undefined,
  strongElasticModulusCm3: number | undefined,
  strongPlasticModulusCm3: number | undefined,
  weakSecondMomentCm4: number | undefined,
  weakElasticModulusCm3: number | undefined,
  weakPlasticModulusCm3: number | undefined,
  torsionConstantCm4: number | undefined,
  warpingConstantThousandCm6: number | undefined,
];

const optional = (value: number | undefined, toSi: (value: number) => number): number | undefined =>
  value === undefined ? undefined : toSi(value);

export function iSectionEntry(row: ISectionRow, family: TableFamily): SectionEntry {
  const [designation, h, b, tw, tf, r, mass, area, iStrong, wStrong, wplStrong, iWeak, wWeak, wplWeak, it, iw] = row;
  return {
    designation,
    ...family,
    dimensions: {
      shape: 'i-section',
      depth: mm(h),
      flangeWidth: mm(b),
      webThickness: mm(tw),
      flangeThickness: mm(tf),
      rootRadius: mm(r),
    },
    massPerLength: mass,
    tabulated: knownValues({
      area: optional(area, cm2),
      secondMomentZ: optional(iStrong, cm4),
      sectionModulusZ: optional(wStrong, cm3),
      plasticModulusZ: optional(wplStrong, cm3),
      secondMomentY: optional(iWeak, cm4),
      sectionModulusY: optional(wWeak, cm3),
      plasticModulusY: optional(wplWeak, cm3),
      torsionConstant: optional(it, cm4),
      warpingConstant: optional(iw, (value) => cm6(value * 1e3)),
    }),
  };
}

/**
 * Outer corner radius EN 10219-2 (Annex B, as recalled) takes for computing the properties of a
 * cold-formed hollow section: 2 t up to 6 mm, 2.5 t up to 10 mm, 3 t above.
 */
export function coldFormedOuterCornerRadius(wallThickness: number): number {
  if (wallThickness <= mm(6)) return 2 * wallThickness;
  if (wallThickness <= mm(10)) return 2.5 * wallThickness;
  return 3 * wallThickness;
}

/**
 * A rectangular or square hollow section row: depth H x width B x wall T as the designation writes
 * them. The depth H lies along y, so bending about z is about the strong axis.
 */
export type BoxRow = readonly [
  designation: string,
  depthMm: number,
  widthMm: number,
  wallThicknessMm: number,
  massKgPerM: number,
  areaCm2: number | undefined,
  strongSecondMomentCm4: number | undefined,
  weakSecondMomentCm4: number | undefined,
  torsionConstantCm4: number | undefined,
];

export function boxEntry(row: BoxRow, family: TableFamily): SectionEntry {
  const [designation, h, b, t, mass, area, iStrong, iWeak, it] = row;
  return {
    designation,
    ...family,
    dimensions: {
      shape: 'box',
      depth: mm(h),
      width: mm(b),
      wallThickness: mm(t),
      outerCornerRadius: coldFormedOuterCornerRadius(mm(t)),
    },
    massPerLength: mass,
    tabulated: knownValues({
      area: optional(area, cm2),
      secondMomentZ: optional(iStrong, cm4),
      secondMomentY: optional(iWeak, cm4),
      torsionConstant: optional(it, cm4),
    }),
  };
}

/** A circular hollow section row: outside diameter D x wall T. */
export type TubeRow = readonly [
  designation: string,
  outerDiameterMm: number,
  wallThicknessMm: number,
  massKgPerM: number,
  areaCm2: number | undefined,
  secondMomentCm4: number | undefined,
  torsionConstantCm4: number | undefined,
];

export function tubeEntry(row: TubeRow, family: TableFamily): SectionEntry {
  const [designation, d, t, mass, area, i, it] = row;
  return {
    designation,
    ...family,
    dimensions: { shape: 'tube', outerDiameter: mm(d), wallThickness: mm(t) },
    massPerLength: mass,
    tabulated: knownValues({
      area: optional(area, cm2),
      secondMomentZ: optional(i, cm4),
      secondMomentY: optional(i, cm4),
      torsionConstant: optional(it, cm4),
    }),
  };
}
