/**
 * Properties of a member's cross-section, in SI units, about axes through its centroid.
 *
 * Axes: y up (depth), z horizontal (width). For an upright I-section, z is the strong axis.
 */

export type SectionShape =
  | 'rectangle'
  | 'round'
  | 'tube'
  | 'box'
  | 'i-section'
  | 'channel'
  | 'tee'
  | 'angle'
  | 'custom';

/** A point of the outline, relative to the centroid (m), where a stress extreme can occur. */
export interface StressPoint {
  readonly y: number;
  readonly z: number;
  /** Plain words for a report: "top flange tip, +z", "bottom fibre"... */
  readonly label: string;
}

export interface SectionProperties {
  readonly shape: SectionShape;
  /** Overall depth along y and width along z, m. */
  readonly depth: number;
  readonly width: number;
  /** m^2 */
  readonly area: number;
  /** Centroid from the bottom-left corner of the bounding box (min y, min z), m. */
  readonly centroidY: number;
  readonly centroidZ: number;
  /** About the centroidal z axis (horizontal), m^4. */
  readonly secondMomentZ: number;
  /** About the centroidal y axis (vertical), m^4. */
  readonly secondMomentY: number;
  /** Product moment Iyz = integral of y z dA about the centroid, m^4 (0 for a symmetric section). */
  readonly productMoment: number;
  /** Principal second moments, m^4, and the angle from +z to the major principal axis, rad. */
  readonly secondMomentMajor: number;
  readonly secondMomentMinor: number;
  readonly principalAngle: number;
  /** Fibre distances from the centroid to the outline on each side, m (all positive). */
  readonly fibreDistanceTop: number;
  readonly fibreDistanceBottom: number;
  readonly fibreDistancePositiveZ: number;
  readonly fibreDistanceNegativeZ: number;
  /** Least elastic section moduli: I / largest fibre distance, m^3. */
  readonly sectionModulusZ: number;
  readonly sectionModulusY: number;
  /** Plastic section moduli, m^3. */
  readonly plasticModulusZ: number;
  readonly plasticModulusY: number;
  /** Radii of gyration sqrt(I / A), m; minor is about the minor principal axis. */
  readonly radiusOfGyrationZ: number;
  readonly radiusOfGyrationY: number;
  readonly radiusOfGyrationMinor: number;
  /** Saint-Venant torsion constant J, m^4. */
  readonly torsionConstant: number;
  /** Largest torsional shear stress per unit torque, Pa / (N*m) = 1/m^3. */
  readonly torsionalShearPerTorque: number;
  /**
   * For transverse shear along y (bending about z): the first moment of area Q, m^3, about the
   * centroidal z axis of the part cut off by the line where Vy Q / (Iz b) peaks, and the width b cut
   * there, m. Largest tau = Vy Q / (Iz b). The cut is the neutral axis for most shapes; where the
   * width narrows away from it (a tee whose neutral axis lies in the flange, the fillet toes of an
   * angle) it is the cut with the largest Q / b.
   */
  readonly shearFirstMomentY: number;
  readonly shearWidthY: number;
  /** The same for shear along z (bending about y). */
  readonly shearFirstMomentZ: number;
  readonly shearWidthZ: number;
  /** Warping constant Iw, m^6; 0 where negligible (closed, solid, angles, tees). */
  readonly warpingConstant: number;
  /** Closed sections (tube, box, round) do not buckle laterally-torsionally in practice. */
  readonly closed: boolean;
  /**
   * How bending stresses combine: 'resultant' for circles (sigma = sqrt(My^2 + Mz^2) c / I),
   * 'points' to evaluate M c / I at each stress point.
   */
  readonly bendingCombination: 'resultant' | 'points';
  /** Points to evaluate stresses at under biaxial bending. */
  readonly stressPoints: readonly StressPoint[];
  /** The thickest plate element, m: it picks the yield strength's thickness band. */
  readonly thickestElement: number;
  /**
   * Which values describe the section itself. Every shape computed from its dimensions knows them
   * all; a 'custom' section may leave some unknown, and then the value beside it is only the stand-in
   * named in KnownSectionProperties. Absent means all known.
   */
  readonly known?: KnownSectionProperties;
}

/**
 * For each group of values, true when it comes from the geometry or was given, false when it is a
 * stand-in (documented per field) that a check must not rely on or must report as an assumption.
 */
export interface KnownSectionProperties {
  /**
   * Fibre distances along y, sectionModulusZ and the stress points' y: false when neither depth nor
   * sectionModulusZ was given; the stand-in fibre distance is the radius of gyration, the smallest
   * any section can have, so the stand-in modulus is an upper bound (unconservative).
   */
  readonly bendingStressZ: boolean;
  /** The same for z, sectionModulusY and width. */
  readonly bendingStressY: boolean;
  /** False when the plastic modulus is the elastic one standing in (a lower bound, conservative). */
  readonly plasticModulusZ: boolean;
  readonly plasticModulusY: boolean;
  /**
   * False when no shear area was given: Q / b stand for a solid rectangle (tau = 1.5 V / A), which
   * underestimates the peak in a thin web.
   */
  readonly shearStressY: boolean;
  readonly shearStressZ: boolean;
  /**
   * False when no torsional modulus was given: the stand-in is T R / J with R the half diagonal of
   * the fibre distances, which bounds circles, rectangles and thin-walled sections from above.
   */
  readonly torsionalShearStress: boolean;
  /** False when no warping constant was given: the stand-in 0 is conservative for lateral buckling. */
  readonly warpingConstant: boolean;
  /**
   * False when not given: the stand-in is the smaller of depth and width (no plate is thicker than
   * the box it fits in), else the square root of the area; conservative for the thickness bands.
   */
  readonly thickestElement: boolean;
  /** False for custom sections: the given axes are taken as principal (product moment 0). */
  readonly productMoment: boolean;
}
