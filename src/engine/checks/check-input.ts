/**
 * What the failure checks need: the analysed member, its model (for the supports), its section and
 * material, and the options that shape the checks. SI units throughout: m, N, Pa, rad.
 */

import type { MemberAnalysis } from '../analysis/result.js';
import type { Material } from '../materials/material.js';
import type { MemberModel } from '../member/model.js';
import type { SectionDimensions } from '../sections/dimensions.js';
import type { SectionProperties } from '../sections/section-properties.js';
import type { CriteriaInput } from './criteria.js';
import type { LoadHeight } from './lateral-torsional-buckling.js';

/** The classic idealised ends of a column, each with its tabulated effective-length factor. */
export type EndConditions = 'fixed-fixed' | 'fixed-pinned' | 'pinned-pinned' | 'fixed-free';

export interface BucklingInput {
  /** K for buckling about both axes (dimensionless); the per-axis factors take precedence. */
  readonly effectiveLengthFactor?: number;
  /** K for buckling about the y axis (the member deflects along z). */
  readonly effectiveLengthFactorY?: number;
  /** K for buckling about the z axis (the member deflects along y). */
  readonly effectiveLengthFactorZ?: number;
  /** Used when no factor is given; without it the ends are read from the supports of the model. */
  readonly endConditions?: EndConditions;
  /** Take the recommended design K values for the end conditions instead of the theoretical ones. */
  readonly recommendedDesignValues?: boolean;
  /**
   * Length between the points that restrain lateral translation, m. Default: the member length, with K
   * chosen to cover any supports in between (see effective-length.ts).
   */
  readonly unbracedLength?: number;
  /** Also check the axial force with the bending moments amplified by 1 / (1 - P / P_cr). */
  readonly amplification?: boolean;
  /** Eccentricity of the axial load, m: adds the secant-formula check. */
  readonly eccentricity?: number;
}

export interface LateralTorsionalInput {
  /**
   * Length between points braced against lateral movement and twist, m. Default: the member is cut at
   * every support that restrains lateral translation (uz), each piece checked with its own length.
   */
  readonly unbracedLength?: number;
  /** The compression flange is braced continuously: no lateral-torsional buckling. */
  readonly braced?: boolean;
  /** C1 (Cb). Default: AISC 360-16 eq. F1-1 (from memory) from the moment diagram of each unbraced length, 1.0 with unbracedLength. */
  readonly momentGradientFactor?: number;
  /** Where the transverse loads act on the section; default the top flange (lateral-torsional-buckling.ts). */
  readonly loadHeight?: LoadHeight;
}

/** The pin through a support's connection, checked in shear and bearing. */
export interface PinInput {
  /** Index of the support in model.supports (and analysis.reactions). */
  readonly support: number;
  /** Pin diameter, m. */
  readonly diameter: number;
  readonly material: Material;
  /** 1: single shear, the load crosses one shear plane; 2: double shear (a clevis). */
  readonly shearPlanes: 1 | 2;
  /** Thickness of the plate that bears on the pin and carries the whole reaction, m. */
  readonly plateThickness: number;
  /** Thickness of each clevis plate (double shear) or of the other plate (single shear), m. */
  readonly clevisPlateThickness: number;
  /** Clear gap between the plates, m. */
  readonly gap: number;
}

export interface MemberCheckInput {
  readonly analysis: MemberAnalysis;
  readonly model: MemberModel;
  readonly section: SectionProperties;
  /** The section's geometry, when known: the plate checks (webs, outstands) read it. */
  readonly dimensions?: SectionDimensions;
  /** Hot-rolled (catalogue) or welded (built from plates): it selects the imperfection curves. Default welded (the lower curves). */
  readonly fabrication?: 'rolled' | 'welded';
  readonly material: Material;
  readonly criteria?: CriteriaInput;
  readonly buckling?: BucklingInput;
  readonly lateralTorsional?: LateralTorsionalInput;
  readonly pins?: readonly PinInput[];
  /** The loads along y act through the shear centre (stated by the caller); otherwise a channel's are taken through its web. */
  readonly loadsThroughShearCentre?: boolean;
}
