/**
 * The geometry of each section shape, SI (m). Depth along y, width along z, member axis x.
 * The shape functions in this folder turn these into SectionProperties.
 */

export interface RectangleDimensions {
  readonly shape: 'rectangle';
  readonly width: number;
  readonly depth: number;
}

export interface RoundDimensions {
  readonly shape: 'round';
  readonly diameter: number;
}

/** Circular hollow section. */
export interface TubeDimensions {
  readonly shape: 'tube';
  readonly outerDiameter: number;
  readonly wallThickness: number;
}

/** Rectangular (or square) hollow section; outer corner radius 0 means sharp corners. */
export interface BoxDimensions {
  readonly shape: 'box';
  readonly width: number;
  readonly depth: number;
  readonly wallThickness: number;
  readonly outerCornerRadius?: number;
}

/** Doubly symmetric I or H section with parallel flanges and root fillets (web along y). */
export interface ISectionDimensions {
  readonly shape: 'i-section';
  readonly depth: number;
  readonly flangeWidth: number;
  readonly webThickness: number;
  readonly flangeThickness: number;
  readonly rootRadius: number;
}

/** Parallel-flange channel, web along y at the -z side, flanges pointing to +z. */
export interface ChannelDimensions {
  readonly shape: 'channel';
  readonly depth: number;
  readonly flangeWidth: number;
  readonly webThickness: number;
  readonly flangeThickness: number;
  readonly rootRadius?: number;
}

/** Tee with the flange on top (+y) and the stem hanging down. */
export interface TeeDimensions {
  readonly shape: 'tee';
  readonly depth: number;
  readonly flangeWidth: number;
  readonly webThickness: number;
  readonly flangeThickness: number;
  readonly rootRadius?: number;
}

/** Angle with one leg along y (legY long) and one along z (legZ long), heel at the origin corner. */
export interface AngleDimensions {
  readonly shape: 'angle';
  readonly legY: number;
  readonly legZ: number;
  readonly thickness: number;
  readonly rootRadius?: number;
}

/** Properties given directly; what is not given is derived where it can be, else left out of checks. */
export interface CustomDimensions {
  readonly shape: 'custom';
  readonly area: number;
  readonly secondMomentZ: number;
  readonly secondMomentY: number;
  readonly torsionConstant: number;
  readonly depth?: number;
  readonly width?: number;
  readonly sectionModulusZ?: number;
  readonly sectionModulusY?: number;
  readonly plasticModulusZ?: number;
  readonly plasticModulusY?: number;
  readonly warpingConstant?: number;
  /** Area that carries shear along y at its peak: tau max = Vy / shearAreaY, m^2. */
  readonly shearAreaY?: number;
  readonly shearAreaZ?: number;
  /** Torsional section modulus Wt = T / tau max, m^3 (tabulated for hollow sections). */
  readonly torsionalModulus?: number;
  /** The thickest plate of the section, m, for the yield strength's thickness band. */
  readonly thickestElement?: number;
  /** True for a closed (hollow or solid) section that does not buckle laterally-torsionally. */
  readonly closed?: boolean;
}

export type SectionDimensions =
  | RectangleDimensions
  | RoundDimensions
  | TubeDimensions
  | BoxDimensions
  | ISectionDimensions
  | ChannelDimensions
  | TeeDimensions
  | AngleDimensions
  | CustomDimensions;
