/**
 * Principal second moments and the angle of the major principal axis, from Iz, Iy and Iyz about
 * centroidal axes (Mohr's circle for an area; Roark 8th ed., Appendix A, from memory).
 *
 * I(theta) about an axis at theta from +z towards +y is Iz cos^2 + Iy sin^2 - 2 Iyz sin cos, so the
 * extremes lie at tan(2 theta) = -2 Iyz / (Iz - Iy).
 */

export interface PrincipalAxes {
  readonly secondMomentMajor: number;
  readonly secondMomentMinor: number;
  /** From +z to the major principal axis, rad, in (-pi/2, pi/2]; 0 when every axis is principal. */
  readonly principalAngle: number;
}

export function principalAxes(secondMomentZ: number, secondMomentY: number, productMoment: number): PrincipalAxes {
  const mean = (secondMomentZ + secondMomentY) / 2;
  const radius = Math.hypot((secondMomentZ - secondMomentY) / 2, productMoment);
  const major = mean + radius;
  // major * minor = Iz Iy - Iyz^2: the product keeps the minor value accurate for thin angles.
  const minor = Math.max(0, (secondMomentZ * secondMomentY - productMoment * productMoment) / major);
  const isotropic = radius <= mean * 1e-13;
  const raw = isotropic ? 0 : Math.atan2(-2 * productMoment, secondMomentZ - secondMomentY) / 2;
  const angle = raw <= -Math.PI / 2 ? raw + Math.PI : raw;
  return {
    secondMomentMajor: major,
    secondMomentMinor: Math.min(minor, major),
    principalAngle: angle === 0 ? 0 : angle,
  };
}
