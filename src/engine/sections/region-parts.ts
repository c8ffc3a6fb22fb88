/**
 * The signed pieces a composite cross-section is summed from: axis-aligned rectangles and quarter
 * discs. A root fillet or a rounded corner is a square less a quarter disc (the "spandrel"); a hollow
 * is a negative piece. Each piece gives its exact integrals of 1, s and s^2 over the part below a cut
 * s = c along y or z, so a sum of pieces has exact area, centroid, second moments, plastic modulus
 * and shear first moments.
 */

export type Coordinate = 'y' | 'z';
export type Sign = 1 | -1;

export interface RectanglePart {
  readonly kind: 'rectangle';
  readonly sign: Sign;
  readonly yMin: number;
  readonly yMax: number;
  readonly zMin: number;
  readonly zMax: number;
}

/** The quarter of the disc about (centreY, centreZ) that lies towards towardsY along y and towardsZ along z. */
export interface QuarterDiscPart {
  readonly kind: 'quarter-disc';
  readonly sign: Sign;
  readonly centreY: number;
  readonly centreZ: number;
  readonly radius: number;
  readonly towardsY: Sign;
  readonly towardsZ: Sign;
}

export type RegionPart = RectanglePart | QuarterDiscPart;

/** Integrals of s^0, s^1, s^2 dA over the part of a piece (or a region) with s below a cut. */
export interface CutIntegrals {
  readonly area: number;
  readonly firstMoment: number;
  readonly secondMoment: number;
}

export function rectanglePart(yMin: number, yMax: number, zMin: number, zMax: number, sign: Sign = 1): RectanglePart {
  return { kind: 'rectangle', sign, yMin, yMax, zMin, zMax };
}

export function quarterDiscPart(
  centreY: number,
  centreZ: number,
  radius: number,
  towardsY: Sign,
  towardsZ: Sign,
  sign: Sign = 1,
): QuarterDiscPart {
  return { kind: 'quarter-disc', sign, centreY, centreZ, radius, towardsY, towardsZ };
}

/**
 * The fillet in the right-angled corner at (cornerY, cornerZ) whose faces run towards towardsY and
 * towardsZ: the r x r square in the corner less the quarter disc of radius r centred r from both faces.
 * Area (1 - pi/4) r^2. The same region is what a rounded outer corner cuts off a rectangle.
 */
export function filletParts(
  cornerY: number,
  cornerZ: number,
  radius: number,
  towardsY: Sign,
  towardsZ: Sign,
  sign: Sign = 1,
): RegionPart[] {
  if (radius === 0) return [];
  const farY = cornerY + towardsY * radius;
  const farZ = cornerZ + towardsZ * radius;
  const opposite: Sign = sign === 1 ? -1 : 1;
  return [
    rectanglePart(Math.min(cornerY, farY), Math.max(cornerY, farY), Math.min(cornerZ, farZ), Math.max(cornerZ, farZ), sign),
    quarterDiscPart(farY, farZ, radius, towardsY === 1 ? -1 : 1, towardsZ === 1 ? -1 : 1, opposite),
  ];
}

export function negated(parts: readonly RegionPart[]): RegionPart[] {
  return parts.map((part) => ({ ...part, sign: part.sign === 1 ? -1 : 1 }));
}

/** Integrals of s^0, s^1, s^2 written in place, for loops over many cuts. */
export class MutableCutIntegrals implements CutIntegrals {
  area = 0;
  firstMoment = 0;
  secondMoment = 0;
}

/**
 * Antiderivatives in t = s - centre of w, t w and t^2 w with w = sqrt(r^2 - t^2) (standard
 * integrals), written to out as its area, firstMoment and secondMoment.
 */
function writeCircleAntiderivatives(t: number, radius: number, out: MutableCutIntegrals): MutableCutIntegrals {
  const clamped = Math.min(radius, Math.max(-radius, t));
  // (r - t)(r + t) and atan2 stay accurate near the rim, where r^2 - t^2 and asin(t / r) lose digits.
  const root = Math.sqrt((radius - clamped) * (radius + clamped));
  const angle = Math.atan2(clamped, root);
  const r2 = radius * radius;
  out.area = (clamped * root + r2 * angle) / 2;
  out.firstMoment = -(root * root * root) / 3;
  out.secondMoment = (clamped * (2 * clamped * clamped - r2) * root + r2 * r2 * angle) / 8;
  return out;
}

/**
 * A piece seen along one coordinate s: it spans [min, max] and its chord (the length cut by the line
 * s = constant) is either constant or that of a circle of the given radius about s = centre. A
 * circle keeps the antiderivatives at its near end, which every cut through it shares.
 */
export type Profile =
  | { readonly kind: 'constant'; readonly sign: Sign; readonly min: number; readonly max: number; readonly chord: number }
  | {
      readonly kind: 'circle';
      readonly sign: Sign;
      readonly min: number;
      readonly max: number;
      readonly centre: number;
      readonly radius: number;
      readonly atMin: CutIntegrals;
    };

export function profileAlong(part: RegionPart, coordinate: Coordinate): Profile {
  if (part.kind === 'rectangle') {
    return coordinate === 'y'
      ? { kind: 'constant', sign: part.sign, min: part.yMin, max: part.yMax, chord: part.zMax - part.zMin }
      : { kind: 'constant', sign: part.sign, min: part.zMin, max: part.zMax, chord: part.yMax - part.yMin };
  }
  const centre = coordinate === 'y' ? part.centreY : part.centreZ;
  const towards = coordinate === 'y' ? part.towardsY : part.towardsZ;
  const min = towards === 1 ? centre : centre - part.radius;
  const max = towards === 1 ? centre + part.radius : centre;
  return { kind: 'circle', sign: part.sign, min, max, centre, radius: part.radius, atMin: writeCircleAntiderivatives(min - centre, part.radius, new MutableCutIntegrals()) };
}

export function extentAlong(part: RegionPart, coordinate: Coordinate): readonly [number, number] {
  const profile = profileAlong(part, coordinate);
  return [profile.min, profile.max];
}

const circleScratch = new MutableCutIntegrals();

/**
 * Writes the signed integrals of 1, s, s^2 over the part of the piece with s < cut (cut = Infinity:
 * the whole piece) to out; false, writing nothing, when no part of the piece lies below the cut.
 */
export function writeIntegralsBelow(profile: Profile, cut: number, out: MutableCutIntegrals): boolean {
  const upper = Math.min(cut, profile.max);
  if (!(upper > profile.min)) return false;
  const lower = profile.min;
  if (profile.kind === 'constant') {
    const w = profile.chord * profile.sign;
    const span = upper - lower;
    out.area = w * span;
    out.firstMoment = (w * span * (upper + lower)) / 2;
    out.secondMoment = (w * span * (upper * upper + upper * lower + lower * lower)) / 3;
    return true;
  }
  const m = profile.centre;
  const atUpper = writeCircleAntiderivatives(upper - m, profile.radius, circleScratch);
  const { atMin } = profile;
  const area = atUpper.area - atMin.area;
  const firstAboutCentre = atUpper.firstMoment - atMin.firstMoment;
  const secondAboutCentre = atUpper.secondMoment - atMin.secondMoment;
  out.area = profile.sign * area;
  out.firstMoment = profile.sign * (m * area + firstAboutCentre);
  out.secondMoment = profile.sign * (m * m * area + 2 * m * firstAboutCentre + secondAboutCentre);
  return true;
}

const NOTHING: CutIntegrals = { area: 0, firstMoment: 0, secondMoment: 0 };

/** Signed integrals of 1, s, s^2 over the part of the piece with s < cut (cut = Infinity: the whole piece). */
export function integralsBelow(part: RegionPart, coordinate: Coordinate, cut: number): CutIntegrals {
  const out = new MutableCutIntegrals();
  if (!writeIntegralsBelow(profileAlong(part, coordinate), cut, out)) return NOTHING;
  return { area: out.area, firstMoment: out.firstMoment, secondMoment: out.secondMoment };
}

/**
 * Signed chord of the line s = at through the profile, as the limit from below or from above the
 * line (the two differ only on a straight edge of the piece).
 */
export function profileChordAt(profile: Profile, at: number, side: 'below' | 'above'): number {
  const inside = side === 'below' ? profile.min < at && at <= profile.max : profile.min <= at && at < profile.max;
  if (!inside) return 0;
  if (profile.kind === 'constant') return profile.sign * profile.chord;
  const t = Math.min(profile.radius, Math.abs(at - profile.centre));
  return profile.sign * Math.sqrt((profile.radius - t) * (profile.radius + t));
}

/** Signed chord of the line s = at through the piece (profileChordAt). */
export function chordAt(part: RegionPart, coordinate: Coordinate, at: number, side: 'below' | 'above'): number {
  return profileChordAt(profileAlong(part, coordinate), at, side);
}

/** Signed integral of y z dA over the piece, about the origin. */
export function productMomentAboutOrigin(part: RegionPart): number {
  if (part.kind === 'rectangle') {
    return (part.sign * ((part.yMax - part.yMin) * (part.yMax + part.yMin)) * ((part.zMax - part.zMin) * (part.zMax + part.zMin))) / 4;
  }
  const r = part.radius;
  const area = (Math.PI * r * r) / 4;
  // Quarter disc about its own centre: integral of t dA = r^3 / 3 and of t u dA = r^4 / 8 (towards +t, +u).
  const firstY = (part.towardsY * r * r * r) / 3;
  const firstZ = (part.towardsZ * r * r * r) / 3;
  const product = (part.towardsY * part.towardsZ * r * r * r * r) / 8;
  return part.sign * (part.centreY * part.centreZ * area + part.centreY * firstZ + part.centreZ * firstY + product);
}
