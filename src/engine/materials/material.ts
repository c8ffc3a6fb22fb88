/** A material's properties in SI units (Pa, kg/m^3). */
export interface Material {
  readonly grade: string;
  readonly standard: string;
  readonly elasticModulus: number;
  readonly shearModulus: number;
  readonly poissonRatio: number;
  /** Yield (or 0.2 % proof) strength in tension and in compression, Pa. */
  readonly yieldStrength: number;
  readonly compressiveYieldStrength: number;
  /** Ultimate strength in tension and in compression, Pa. */
  readonly ultimateStrength: number;
  readonly compressiveUltimateStrength: number;
  /** Shear yield strength / tensile yield strength; 1/sqrt(3) by the distortion-energy theory. */
  readonly shearYieldRatio: number;
  readonly density: number;
  readonly behaviour: 'ductile' | 'brittle';
  /** Where the values come from (standard and clause), or "user" for values given in a request. */
  readonly source: string;
}

/** Distortion-energy (von Mises) shear yield ratio, Shigley 10th ed., eq. 5-21. */
export const DISTORTION_ENERGY_SHEAR_RATIO = 1 / Math.sqrt(3);
