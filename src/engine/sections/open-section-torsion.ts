/**
 * Saint-Venant torsion constants of rolled open sections as the sum of their plates plus a term for
 * each web-flange junction (Roark's Formulas for Stress and Strain, 8th ed., Table 10.7, the I-, T-
 * and L-section cases with fillets, after El Darwish & Johnston (1965); coefficients and case layout
 * from memory). D is the diameter of the largest circle inscribed at the junction, touching the
 * outer face(s) and the root fillet(s); with rootRadius 0 it is the sharp-cornered junction.
 */

import { rectangleTorsion } from './rectangle-torsion.js';

/** A plate a x b with both short ends free (Roark 8th ed., Table 10.7, case 4, written with full sides). */
export function plateTorsionConstant(sideOne: number, sideTwo: number): number {
  const a = Math.max(sideOne, sideTwo);
  const b = Math.min(sideOne, sideTwo);
  const ratio = b / a;
  return a * b ** 3 * (1 / 3 - 0.21 * ratio * (1 - ratio ** 4 / 12));
}

/**
 * A plate of length c beyond a junction, thickness d, with its far end free: half of the free plate
 * 2c x d (Roark's c d^3 [1/3 - 0.105 (d/c)(1 - d^4 / (192 c^4))] for c >= d / 2, the same expression).
 */
export function outstandTorsionConstant(length: number, thickness: number): number {
  return plateTorsionConstant(2 * length, thickness) / 2;
}

/**
 * The junction of a flange (thickness flangeThickness, its outer face free) with a web or stem
 * meeting it at right angles through two root fillets, as in an I or a tee: alpha D^4 with
 * alpha = (t_min / t_max)(0.15 + 0.10 r / t_flange), D = ((t_f + r)^2 + t_w (r + t_w / 4)) / (2 r + t_f).
 */
export function teeJunctionTorsionConstant(flangeThickness: number, webThickness: number, rootRadius: number): number {
  const tf = flangeThickness;
  const tw = webThickness;
  const alpha = (Math.min(tf, tw) / Math.max(tf, tw)) * (0.15 + (0.1 * rootRadius) / tf);
  return alpha * teeJunctionDiameter(tf, tw, rootRadius) ** 4;
}

/**
 * The largest circle at a tee or I junction. Roark's D touches the flange's outer face and both
 * fillets; it is inscribed only while its centre lies no deeper than the fillet centres (tf + r).
 * Deeper (a web more than 2 (tf + r) thick) the web's own sides bound it: D = tw, the same value
 * where the two meet.
 */
export function teeJunctionDiameter(flangeThickness: number, webThickness: number, rootRadius: number): number {
  const tf = flangeThickness;
  const tw = webThickness;
  const r = rootRadius;
  const touchingFillets = ((tf + r) ** 2 + tw * (r + tw / 4)) / (2 * r + tf);
  return touchingFillets / 2 <= tf + r ? touchingFillets : tw;
}

/**
 * The corner of two plates meeting at right angles with one root fillet, as in an angle or at the
 * back of a channel: alpha D^4 with alpha = (t_thin / t_thick)(0.07 + 0.076 r / t_thick),
 * D = 2 [(t_1 + t_2 + 3 r) - sqrt(2 (2 r + t_1)(2 r + t_2))].
 */
export function cornerJunctionTorsionConstant(thicknessOne: number, thicknessTwo: number, rootRadius: number): number {
  const thick = Math.max(thicknessOne, thicknessTwo);
  const thin = Math.min(thicknessOne, thicknessTwo);
  const alpha = (thin / thick) * (0.07 + (0.076 * rootRadius) / thick);
  return alpha * cornerJunctionDiameter(thick, thin, rootRadius) ** 4;
}

/**
 * The largest circle at a right-angled corner. Roark's D touches both outer faces and the fillet;
 * it is inscribed only while its centre lies within the thinner plate and its fillet (t_thin + r)
 * of the thinner plate's outer face. Farther (a thin plate on a thick one) the thick plate's own
 * faces bound it: D = t_thick, the same value where the two meet.
 */
export function cornerJunctionDiameter(thicknessOne: number, thicknessTwo: number, rootRadius: number): number {
  const r = rootRadius;
  const touchingFillet = 2 * (thicknessOne + thicknessTwo + 3 * r - Math.sqrt(2 * (2 * r + thicknessOne) * (2 * r + thicknessTwo)));
  return touchingFillet / 2 <= Math.min(thicknessOne, thicknessTwo) + r ? touchingFillet : Math.max(thicknessOne, thicknessTwo);
}

/**
 * Keeps an estimate of J for a solid (simply connected) section within rigorous bounds: at least the
 * exact J of a rectangle it contains and at most that of its bounding rectangle, since torsional
 * rigidity grows with the domain (Polya & Szego, Isoperimetric Inequalities in Mathematical
 * Physics, 1951), and at most the polar moment Iz + Iy (J = Ip less the warping term, Saint-Venant).
 * The plate-and-junction formulas hold for plates a few times longer than thick; for stubby
 * outlines (a leg or stem about as thick as long) they can overshoot, and the bounds then govern.
 */
export function torsionConstantWithinBounds(
  estimate: number,
  containedRectangles: readonly (readonly [number, number])[],
  boundingRectangle: readonly [number, number],
  polarMoment: number,
): number {
  const lower = Math.max(...containedRectangles.map(([a, b]) => rectangleTorsion(a, b).torsionConstant));
  const upper = Math.min(rectangleTorsion(...boundingRectangle).torsionConstant, polarMoment);
  return Math.min(upper, Math.max(lower, estimate));
}
