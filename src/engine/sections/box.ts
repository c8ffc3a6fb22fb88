/**
 * Rectangular or square hollow section: width b along z, depth h along y, wall t, outer corner
 * radius ro (0 for sharp corners) and inner radius ri = max(ro - t, 0). The radii are inputs:
 * EN 10219-2 cold-formed sections use about ro = 2 t, ri = t for t <= 6 mm (more for thicker
 * walls); EN 10210-2 hot-finished ones ro = 1.5 t, ri = t (from memory).
 *
 * Area, second moments, plastic moduli and shear cuts are exact for that outline: the outer
 * rectangle less four corner spandrels, less the inner rectangle less its four spandrels.
 * Torsion by EN 10219-2:2006, Annex B (from memory), Bredt's closed-cell formula on the wall's
 * mid-line plus the open-wall part:
 *   Rc = (ro + ri) / 2, p = 2 [(b - t) + (h - t)] - 2 Rc (4 - pi), Ah = (b - t)(h - t) - Rc^2 (4 - pi),
 *   K = 2 Ah t / p, It = t^3 p / 3 + 2 K Ah, Wt = It / (t + K / t), tau max = T / Wt.
 * (2 K Ah = 4 Ah^2 t / p is Bredt's J; Wt is slightly below Bredt's 2 Ah t, so tau is on the safe side.)
 *
 * @example boxProperties({ shape: 'box', width: 0.1, depth: 0.1, wallThickness: 0.005, outerCornerRadius: 0.01 }).torsionConstant // 4.405e-6
 */

import { outlineValues, summariseRegion } from './composite-region.js';
import type { BoxDimensions } from './dimensions.js';
import { filletParts, negated, rectanglePart } from './region-parts.js';
import type { RegionPart } from './region-parts.js';
import { assembleSectionProperties } from './section-assembly.js';
import { requireAtMost, requireBelow, requireNonNegative, requirePositive } from './section-geometry-checks.js';
import type { SectionProperties, StressPoint } from './section-properties.js';

/** A rectangle [y0, y1] x [z0, z1] with its four corners rounded to radius r. */
function roundedRectangle(y0: number, y1: number, z0: number, z1: number, r: number): RegionPart[] {
  return [
    rectanglePart(y0, y1, z0, z1),
    ...negated([
      ...filletParts(y0, z0, r, 1, 1),
      ...filletParts(y0, z1, r, 1, -1),
      ...filletParts(y1, z0, r, -1, 1),
      ...filletParts(y1, z1, r, -1, -1),
    ]),
  ];
}

export function boxParts(h: number, b: number, t: number, ro: number): RegionPart[] {
  const ri = Math.max(ro - t, 0);
  return [...roundedRectangle(0, h, 0, b, ro), ...negated(roundedRectangle(t, h - t, t, b - t, ri))];
}

/** Corner arcs sampled every 15 degrees (a biaxial peak on an arc is missed by at most ro (1 - cos 7.5 deg)). */
function outlinePoints(h: number, b: number, ro: number): StressPoint[] {
  const corners = [
    { y: h, z: b, towardsY: 1, towardsZ: 1, name: 'top corner, +z' },
    { y: h, z: 0, towardsY: 1, towardsZ: -1, name: 'top corner, -z' },
    { y: 0, z: b, towardsY: -1, towardsZ: 1, name: 'bottom corner, +z' },
    { y: 0, z: 0, towardsY: -1, towardsZ: -1, name: 'bottom corner, -z' },
  ];
  const points: StressPoint[] = [];
  for (const corner of corners) {
    if (ro === 0) {
      points.push({ y: corner.y, z: corner.z, label: corner.name });
      continue;
    }
    const centreY = corner.y - corner.towardsY * ro;
    const centreZ = corner.z - corner.towardsZ * ro;
    for (let degrees = 0; degrees <= 90; degrees += 15) {
      const angle = (degrees * Math.PI) / 180;
      points.push({
        y: centreY + corner.towardsY * ro * Math.sin(angle),
        z: centreZ + corner.towardsZ * ro * Math.cos(angle),
        label: `${corner.name}, on the corner arc ${degrees} degrees from the side face`,
      });
    }
  }
  return points;
}

export function boxProperties(dimensions: BoxDimensions): SectionProperties {
  const { width: b, depth: h, wallThickness: t } = dimensions;
  requirePositive(b, 'width');
  requirePositive(h, 'depth');
  requirePositive(t, 'wallThickness');
  const ro = requireNonNegative(dimensions.outerCornerRadius, 'outerCornerRadius');
  requireBelow(2 * t, Math.min(b, h), 'wallThickness', 'the smaller outer dimension, for two walls');
  requireAtMost(2 * ro, Math.min(b, h), 'outerCornerRadius', 'the smaller outer dimension, for two corners');

  const parts = boxParts(h, b, t, ro);
  const region = summariseRegion(parts);
  const ri = Math.max(ro - t, 0);
  const meanRadius = (ro + ri) / 2;
  const perimeter = 2 * (b - t + (h - t)) - 2 * meanRadius * (4 - Math.PI);
  const enclosedArea = (b - t) * (h - t) - meanRadius * meanRadius * (4 - Math.PI);
  const k = (2 * enclosedArea * t) / perimeter;
  // The polar moment bounds J (J = Ip less the warping term); the formula just passes it for a thin
  // box rounded almost to a circle.
  const torsionConstant = Math.min((t ** 3 * perimeter) / 3 + 2 * k * enclosedArea, region.secondMomentZ + region.secondMomentY);
  const torsionalModulus = torsionConstant / (t + k / t);
  return assembleSectionProperties({
    shape: 'box',
    depth: h,
    width: b,
    ...outlineValues(parts, region, { centroidY: h / 2, centroidZ: b / 2 }),
    torsionConstant,
    torsionalShearPerTorque: 1 / torsionalModulus,
    warpingConstant: 0,
    closed: true,
    bendingCombination: 'points',
    outlinePoints: outlinePoints(h, b, ro),
    thickestElement: t,
  });
}
