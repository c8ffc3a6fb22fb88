/**
 * A region of signed parts (region-parts.ts) seen along one coordinate: the integrals below a cut and
 * the chord at a line, for the many cuts the plastic axis and the shear cut search make.
 */

import { MutableCutIntegrals, profileAlong, profileChordAt, writeIntegralsBelow } from './region-parts.js';
import type { Coordinate, Profile, RegionPart } from './region-parts.js';

/**
 * A region seen along one coordinate, its parts' profiles worked out once for the many cuts the
 * plastic axis and the shear cut search make. Sums run part by part in the parts' order, as the
 * integrals of each part would be added one after another; a part wholly below a cut adds its whole
 * integrals, kept from the start (the same numbers: the cut then meets the part at its far end).
 */
export class RegionAlong {
  readonly profiles: readonly Profile[];
  readonly min: number;
  readonly max: number;
  /** The sums of the last totalBelow. */
  readonly below = new MutableCutIntegrals();
  private readonly part = new MutableCutIntegrals();
  /** Each part's whole integrals; null for a part of no extent, which adds nothing. */
  private readonly whole: (MutableCutIntegrals | null)[];

  constructor(parts: readonly RegionPart[], coordinate: Coordinate) {
    this.profiles = parts.map((part) => profileAlong(part, coordinate));
    let min = Infinity;
    let max = -Infinity;
    for (const profile of this.profiles) {
      min = Math.min(min, profile.min);
      max = Math.max(max, profile.max);
    }
    this.min = min;
    this.max = max;
    this.whole = this.profiles.map((profile) => {
      const integrals = new MutableCutIntegrals();
      return writeIntegralsBelow(profile, Infinity, integrals) ? integrals : null;
    });
  }

  /** Integrals of 1, s, s^2 over the region below the cut, into `below`. */
  totalBelow(cut: number): MutableCutIntegrals {
    const { below, part } = this;
    let area = 0;
    let firstMoment = 0;
    let secondMoment = 0;
    for (let i = 0; i < this.profiles.length; i++) {
      const profile = this.profiles[i] as Profile;
      let integrals: MutableCutIntegrals;
      if (cut >= profile.max) {
        const whole = this.whole[i] as MutableCutIntegrals | null;
        if (whole === null) continue;
        integrals = whole;
      } else if (writeIntegralsBelow(profile, cut, part)) {
        integrals = part;
      } else {
        continue;
      }
      area += integrals.area;
      firstMoment += integrals.firstMoment;
      secondMoment += integrals.secondMoment;
    }
    below.area = area;
    below.firstMoment = firstMoment;
    below.secondMoment = secondMoment;
    return below;
  }

  /**
   * A lower bound of the chord inside a stretch [start, end] that no part edge cuts: each part's
   * signed chord is monotonic there, so it is at least the lesser of its values at the two ends;
   * less 1e-12 of the sum of their sizes for rounding.
   */
  leastChordBetween(start: number, end: number): number {
    let least = 0;
    let size = 0;
    for (const profile of this.profiles) {
      if (!(profile.min <= start && profile.max >= end)) continue;
      const atStart = profileChordAt(profile, start, 'above');
      const atEnd = profileChordAt(profile, end, 'below');
      least += Math.min(atStart, atEnd);
      size += Math.max(Math.abs(atStart), Math.abs(atEnd));
    }
    return least - 1e-12 * size;
  }

  /** The size of the terms a first moment about `centroid` is summed from, for its rounding allowance. */
  firstMomentScale(centroid: number): number {
    let scale = 0;
    for (const whole of this.whole) {
      if (whole !== null) scale += Math.abs(whole.firstMoment) + Math.abs(centroid * whole.area);
    }
    return scale;
  }

  /** The chord of the line s = at, from below or from above it, never negative. */
  chordAt(at: number, side: 'below' | 'above'): number {
    let chord = 0;
    for (const profile of this.profiles) {
      if (profile.min <= at && at <= profile.max) chord += profileChordAt(profile, at, side);
    }
    return Math.max(0, chord);
  }
}
