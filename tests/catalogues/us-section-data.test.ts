/**
 * Sanity of the embedded US section tables: each row typed from memory must agree with what its own
 * dimensions imply. A row that fails is dropped or corrected in the data, never given a looser tolerance.
 */

import { describe, expect, it } from 'vitest';
import type { ISectionDimensions, TubeDimensions } from '../../src/engine/sections/dimensions.js';
import { PIPES, PIPE_SCHEDULE_ROWS } from '../../src/catalogues/sections/asme-b36-pipe.js';
import { W_SHAPES } from '../../src/catalogues/sections/astm-a6-w.js';
import { in2, lbPerFt3 } from '../../src/catalogues/sections/us-customary-units.js';
import type { SectionEntry } from '../../src/catalogues/section-entry.js';

const relativeDifference = (value: number, reference: number): number => Math.abs(value / reference - 1);

function iDimensions(entry: SectionEntry): ISectionDimensions {
  if (entry.dimensions.shape !== 'i-section') throw new Error(`${entry.designation} is not an i-section`);
  return entry.dimensions;
}

function tubeDimensions(entry: SectionEntry): TubeDimensions {
  if (entry.dimensions.shape !== 'tube') throw new Error(`${entry.designation} is not a tube`);
  return entry.dimensions;
}

function tabulated(entry: SectionEntry, name: keyof SectionEntry['tabulated']): number {
  const value = entry.tabulated[name];
  if (value === undefined) throw new Error(`${entry.designation} has no tabulated ${name}`);
  return value;
}

/**
 * One root fillet of radius r: a spandrel, the r x r square in the corner less the quarter disc centred
 * at (r, r), of area (1 - pi/4) r^2; its centroid lies (r/2 r^2 - (r - 4r/(3 pi)) pi r^2/4) / area
 * = r (10 - 3 pi) / (12 - 3 pi) from each straight edge.
 */
function fillet(r: number): { area: number; centroidOffset: number } {
  return { area: (1 - Math.PI / 4) * r * r, centroidOffset: (r * (10 - 3 * Math.PI)) / (12 - 3 * Math.PI) };
}

/** Plates plus fillets; the fillets' own second moments (of order r^4) are left out. */
function iSectionFromPlates(d: ISectionDimensions) {
  const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf, rootRadius: r } = d;
  const webHeight = h - 2 * tf;
  const spandrel = fillet(r);
  const filletArm = h / 2 - tf - spandrel.centroidOffset;
  return {
    area: 2 * b * tf + webHeight * tw + 4 * spandrel.area,
    secondMomentZ: (b * h ** 3 - (b - tw) * webHeight ** 3) / 12 + 4 * spandrel.area * filletArm ** 2,
    secondMomentY: (2 * tf * b ** 3 + webHeight * tw ** 3) / 12 + 4 * spandrel.area * (tw / 2 + spandrel.centroidOffset) ** 2,
    plasticModulusZ: b * tf * (h - tf) + (tw * webHeight ** 2) / 4 + 4 * spandrel.area * filletArm,
    // Sum of b t^3 / 3 over flanges and web between flange mid-planes (thin-walled open section).
    torsionConstantOpen: (2 * b * tf ** 3 + (h - tf) * tw ** 3) / 3,
  };
}

describe('ASTM A6 W-shapes (AISC Manual Table 1-1 values from memory)', () => {
  it('holds a practical range of unique, AISC-style designations', () => {
    expect(W_SHAPES.length).toBeGreaterThanOrEqual(40);
    const names = W_SHAPES.map((entry) => entry.designation);
    expect(new Set(names).size).toBe(names.length);
    for (const name of names) expect(name).toMatch(/^W\d+X\d+$/);
    for (const entry of W_SHAPES) expect(entry.family).toBe('W');
  });

  it.each(W_SHAPES.map((entry) => [entry.designation, entry] as const))(
    '%s: tabulated area within 3 % of 2 bf tf + (d - 2 tf) tw + (4 - pi) r^2',
    (_name, entry) => {
      // r = k_des - tf stands in for the rolled fillet, which is neither a true circular arc nor
      // exactly tangent; k_des is itself a rounded design value, hence 3 % rather than rounding error.
      expect(relativeDifference(tabulated(entry, 'area'), iSectionFromPlates(iDimensions(entry)).area)).toBeLessThan(0.03);
    },
  );

  it.each(W_SHAPES.map((entry) => [entry.designation, entry] as const))(
    '%s: nominal weight within 1.5 % of 490 lb/ft^3 times the tabulated area',
    (_name, entry) => {
      // The designation's weight is nominal (a whole number of lb/ft); the area comes from the
      // dimensions. 490 lb/ft^3 is the steel density behind the AISC tables.
      const weightFromArea = lbPerFt3(490) * tabulated(entry, 'area');
      expect(relativeDifference(entry.massPerLength, weightFromArea)).toBeLessThan(0.015);
    },
  );

  it.each(W_SHAPES.map((entry) => [entry.designation, entry] as const))('%s: Ix > Iy', (_name, entry) => {
    expect(tabulated(entry, 'secondMomentZ')).toBeGreaterThan(tabulated(entry, 'secondMomentY'));
  });

  it.each(W_SHAPES.map((entry) => [entry.designation, entry] as const))(
    '%s: Sx = 2 Ix / d within 1.5 %',
    (_name, entry) => {
      // Exact for a doubly symmetric section; Ix, Sx and d are each printed to three significant
      // figures, up to 0.5 % of rounding apiece.
      const d = iDimensions(entry).depth;
      const fromIx = (2 * tabulated(entry, 'secondMomentZ')) / d;
      expect(relativeDifference(tabulated(entry, 'sectionModulusZ'), fromIx)).toBeLessThan(0.015);
    },
  );

  it.each(W_SHAPES.filter((entry) => entry.tabulated.warpingConstant !== undefined).map((entry) => [entry.designation, entry] as const))(
    '%s: Cw = Iy ho^2 / 4 within 1.5 %',
    (_name, entry) => {
      // AISC Design Guide 9 (2nd ed.), eq. 3.5 as recalled, for doubly symmetric I-shapes, ho = d - tf;
      // tolerance from three-figure rounding of Cw, Iy and the dimensions.
      const { depth, flangeThickness } = iDimensions(entry);
      const fromIy = (tabulated(entry, 'secondMomentY') * (depth - flangeThickness) ** 2) / 4;
      expect(relativeDifference(tabulated(entry, 'warpingConstant'), fromIy)).toBeLessThan(0.015);
    },
  );

  it.each(W_SHAPES.map((entry) => [entry.designation, entry] as const))(
    '%s: Ix, Iy and Zx within 2 % of plates plus circular fillets',
    (_name, entry) => {
      // Same fillet idealisation as the area; it moves the second moments less than the area because
      // the fillets sit near the centroid of the web.
      const computed = iSectionFromPlates(iDimensions(entry));
      expect(relativeDifference(tabulated(entry, 'secondMomentZ'), computed.secondMomentZ)).toBeLessThan(0.02);
      expect(relativeDifference(tabulated(entry, 'secondMomentY'), computed.secondMomentY)).toBeLessThan(0.02);
      expect(relativeDifference(tabulated(entry, 'plasticModulusZ'), computed.plasticModulusZ)).toBeLessThan(0.02);
    },
  );

  it.each(W_SHAPES.map((entry) => [entry.designation, entry] as const))(
    '%s: J between 0.9 and 1.3 times the open-section sum of b t^3 / 3',
    (_name, entry) => {
      // A guard against a slipped digit, not a check of AISC's J: the tabulated J adds the fillets
      // (most for light shapes, up to about +25 %) and takes off the flange-tip end effect (most for
      // heavy shapes, a few per cent).
      const ratio = tabulated(entry, 'torsionConstant') / iSectionFromPlates(iDimensions(entry)).torsionConstantOpen;
      expect(ratio).toBeGreaterThan(0.9);
      expect(ratio).toBeLessThan(1.3);
    },
  );

  it('W8X31 converts to SI: d = 8.00 in = 0.2032 m, A = 9.13 in^2, 31 lb/ft = 46.13 kg/m', () => {
    const w8x31 = W_SHAPES.find((entry) => entry.designation === 'W8X31');
    expect(w8x31).toBeDefined();
    const entry = w8x31 as SectionEntry;
    expect(iDimensions(entry).depth).toBeCloseTo(0.2032, 10);
    // 9.13 x 0.0254^2 = 5.890311e-3 m^2; 31 x 0.45359237 / 0.3048 = 46.1330 kg/m.
    expect(tabulated(entry, 'area')).toBeCloseTo(5.890311e-3, 9);
    expect(entry.massPerLength).toBeCloseTo(46.133, 3);
    // Root radius k_des - tf = 0.829 - 0.435 = 0.394 in = 0.0100076 m.
    expect(iDimensions(entry).rootRadius).toBeCloseTo(0.0100076, 7);
  });
});

describe('ASME B36.10M pipe, Schedules 40 and 80 (values from memory)', () => {
  it('holds NPS 1/8 to NPS 24 in both schedules, unique designations', () => {
    const names = PIPES.map((entry) => entry.designation);
    expect(new Set(names).size).toBe(names.length);
    expect(names).toContain('NPS 1/8 SCH 40');
    expect(names).toContain('NPS 2 SCH 40');
    expect(names).toContain('NPS 24 SCH 80');
    const sizes = new Set(PIPE_SCHEDULE_ROWS.map((row) => row[0]));
    for (const size of sizes) {
      const schedules = PIPE_SCHEDULE_ROWS.filter((row) => row[0] === size).map((row) => row[3]);
      expect(schedules.sort()).toEqual([40, 80]);
    }
  });

  it.each(PIPES.map((entry) => [entry.designation, entry] as const))(
    '%s: area pi/4 (D^2 - (D - 2t)^2) within 0.5 % of the tabulated metal area',
    (_name, entry) => {
      const { outerDiameter: D, wallThickness: t } = tubeDimensions(entry);
      const area = (Math.PI / 4) * (D ** 2 - (D - 2 * t) ** 2);
      // The small sizes' areas are printed to 0.001 in^2, which alone can be 0.54 % (NPS 1/8 SCH 80).
      const tolerance = Math.max(0.005 * area, in2(0.0005));
      expect(Math.abs(tabulated(entry, 'area') - area)).toBeLessThanOrEqual(tolerance);
    },
  );

  it.each(PIPE_SCHEDULE_ROWS.map((row, index) => [`NPS ${row[0]} SCH ${row[3]}`, row, PIPES[index]] as const))(
    '%s: mass within 1 % of the standard\'s (D - t) t x 0.0246615 kg/m, i.e. 7850 kg/m^3',
    (_name, row, entry) => {
      const [, , outsideMm, , , wallMm, massKgPerM] = row;
      // ASME B36.10M computes the metric mass from the mm columns; 0.0246615 = 7850 x pi x 1e-6.
      const massFromFormula = (outsideMm - wallMm) * wallMm * 7850 * Math.PI * 1e-6;
      // The masses are printed to 0.01 kg/m, which alone is 1.4 % for NPS 1/8 SCH 40 (0.37 kg/m).
      const tolerance = Math.max(0.01 * massFromFormula, 0.005);
      expect(Math.abs(massKgPerM - massFromFormula)).toBeLessThanOrEqual(tolerance);
      expect(entry?.massPerLength).toBe(massKgPerM);
    },
  );

  it.each(PIPE_SCHEDULE_ROWS.map((row) => [`NPS ${row[0]} SCH ${row[3]}`, row] as const))(
    '%s: the mm columns are the inch columns rounded as the standard prints them',
    (_name, row) => {
      const [, outsideIn, outsideMm, , wallIn, wallMm] = row;
      const roundingSlack = 1e-9;
      // OD is printed to 0.1 mm up to NPS 16 and to whole millimetres from NPS 18 (457 mm) up.
      const outsideStep = outsideMm >= 457 ? 1 : 0.1;
      expect(Math.abs(outsideMm - outsideIn * 25.4)).toBeLessThanOrEqual(outsideStep / 2 + roundingSlack);
      // Walls are printed to 0.01 mm.
      expect(Math.abs(wallMm - wallIn * 25.4)).toBeLessThanOrEqual(0.005 + roundingSlack);
    },
  );

  it('Schedule 80 has the same OD and a thicker wall than Schedule 40 at every size', () => {
    for (const row40 of PIPE_SCHEDULE_ROWS.filter((row) => row[3] === 40)) {
      const row80 = PIPE_SCHEDULE_ROWS.find((row) => row[0] === row40[0] && row[3] === 80);
      expect(row80).toBeDefined();
      if (row80 === undefined) continue;
      expect(row80[1]).toBe(row40[1]);
      expect(row80[4]).toBeGreaterThan(row40[4]);
    }
  });

  it('NPS 2 SCH 40 converts to SI: OD 2.375 in = 0.060325 m, wall 0.154 in = 3.9116 mm', () => {
    const pipe = PIPES.find((entry) => entry.designation === 'NPS 2 SCH 40');
    expect(pipe).toBeDefined();
    const d = tubeDimensions(pipe as SectionEntry);
    expect(d.outerDiameter).toBeCloseTo(0.060325, 10);
    expect(d.wallThickness).toBeCloseTo(0.0039116, 10);
    expect((pipe as SectionEntry).family).toBe('PIPE');
  });
});
