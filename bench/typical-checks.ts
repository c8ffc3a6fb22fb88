/** The request bodies the request-path benchmarks send: invented members of a fictional shelving maker. */

/** A 4 m rectangular bar on a pinned and a roller support: two point loads and a uniform load, SI numbers. */
export const TYPICAL_CHECK = {
  member: { length: 4, supports: [{ position: 0, type: 'pinned' }, { position: 4, type: 'roller' }] },
  section: { shape: 'rectangle', width: 0.05, depth: 0.15 },
  material: { elasticModulus: 200e9, shearModulus: 77e9, yieldStrength: 250e6, ultimateStrength: 400e6, density: 7850 },
  loads: [
    { type: 'point', position: 1, fy: -4000 },
    { type: 'point', position: 3, fy: -2500 },
    { type: 'distributed', from: 0, to: 4, qy: -1500 },
  ],
};

/** A shelf beam of catalogue section and grade with unit strings and self-weight, 11 samples. */
export const CATALOGUE_CHECK = {
  member: { length: '2.7 m', supports: [{ position: 0, type: 'pinned' }, { position: '2.7 m', type: 'roller' }] },
  section: { designation: 'IPE 160' },
  material: { grade: 'S355' },
  loads: [
    { type: 'distributed', from: 0, to: '2.7 m', qy: '-5 kN/m' },
    { type: 'point', position: '0.9 m', fy: '-3 kN' },
  ],
  selfWeight: true,
  output: { samples: 11 },
};

/** A 3 m work-platform joist to be sized (no section): a uniform load, a point load and self-weight, 11 samples. */
export const PLATFORM_JOIST = {
  member: { length: 3, supports: [{ position: 0, type: 'pinned' }, { position: 3, type: 'roller' }] },
  material: { grade: 'S355' },
  loads: [
    { type: 'distributed', from: 0, to: 3, qy: -6000 },
    { type: 'point', position: 1.1, fy: -4000 },
  ],
  selfWeight: true,
  output: { samples: 11 },
};
