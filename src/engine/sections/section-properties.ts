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
   * For transverse shear along y (bending about z): first moment of area Q about the z axis of the
   * part above the neutral axis, m^3, and the width b cut there, m. Largest tau = Vy Q / (Iz b).
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
}
