/**
 * The search for the cut where Q / b, and so the transverse shear stress V Q / (I b), is largest.
 * Q is the first moment about the centroid of the part of the region beyond the cut, b the width the
 * cut crosses. Candidates: the centroid (from both sides) and the ends of every stretch between part
 * edges. Within a stretch the chord is smooth; where only rectangles span it the chord is constant
 * and Q peaks at the centroid, so Q / b peaks at an end or at the centroid. Where a curved part spans
 * it, the stretch is sampled and the best sample refined by golden-section search, unless a bound
 * shows Q / b to stay below the best candidate throughout (the search could not change the result).
 */

import type { ShearCut } from './composite-region.js';
import type { RegionAlong } from './region-along.js';

const GOLDEN = (Math.sqrt(5) - 1) / 2;
const SAMPLES = 24;
/** How often a stretch is halved to show that its Q / b stays below the best cut before it is searched. */
const BOUND_HALVINGS = 3;
/** Relative allowance for the rounding of a computed Q, against the terms it is summed from. */
const FIRST_MOMENT_ROUNDING = 1e-9;

function ascending(a: number, b: number): number {
  return a - b;
}

interface Stretch {
  readonly start: number;
  readonly end: number;
  readonly atStart: ShearCut;
  readonly atEnd: ShearCut;
}

export class ShearCutSearch {
  private readonly wholeArea: number;
  private readonly wholeFirstMoment: number;
  /** The extent of the region along the coordinate. */
  private readonly scale: number;
  /** Rounding allowance of a computed Q. */
  private readonly roundingQ: number;
  /** The largest Q / b among the centroid cuts and the stretch ends, once known. */
  private reached = 0;

  constructor(
    private readonly region: RegionAlong,
    private readonly centroid: number,
  ) {
    const whole = region.totalBelow(Infinity);
    this.wholeArea = whole.area;
    this.wholeFirstMoment = whole.firstMoment;
    this.scale = region.max - region.min;
    this.roundingQ = FIRST_MOMENT_ROUNDING * region.firstMomentScale(centroid);
  }

  /** The cut with the largest Q / b; of equal ones, the first found. */
  governing(): ShearCut {
    const { region, centroid } = this;
    const stretches = this.stretches();
    let best = this.better(this.cutAt(centroid, 'above'), this.cutAt(centroid, 'below'));
    // A stretch bounded below the largest Q / b at the centroid and at the stretch ends needs no search.
    let reached = this.ratio(best);
    for (const stretch of stretches) reached = Math.max(reached, this.ratio(stretch.atStart), this.ratio(stretch.atEnd));
    this.reached = reached;
    for (const { start, end, atStart, atEnd } of stretches) {
      best = this.better(this.better(best, atStart), atEnd);
      if (!region.profiles.some((profile) => profile.kind === 'circle' && profile.min <= start && profile.max >= end)) continue;
      if ((end <= centroid || start >= centroid) && this.boundedBelow(start, end, BOUND_HALVINGS)) continue;
      best = this.better(best, this.cutAt(this.searchedPosition(start, end), 'above'));
    }
    return best;
  }

  /** The candidate if its Q / b is larger, else the best so far. */
  private better(best: ShearCut, candidate: ShearCut): ShearCut {
    return this.ratio(candidate) > this.ratio(best) ? candidate : best;
  }

  /** The stretches between consecutive part edges (and the centroid), each with its end cuts. */
  private stretches(): Stretch[] {
    const { region, scale } = this;
    const edges = new Set<number>([region.min, region.max, this.centroid]);
    for (const profile of region.profiles) {
      edges.add(profile.min);
      edges.add(profile.max);
    }
    const sorted = [...edges].filter((edge) => edge >= region.min && edge <= region.max).sort(ascending);
    const stretches: Stretch[] = [];
    for (let index = 0; index + 1 < sorted.length; index += 1) {
      const start = sorted[index] as number;
      const end = sorted[index + 1] as number;
      if (end - start > scale * 1e-12) stretches.push({ start, end, atStart: this.cutAt(start, 'above'), atEnd: this.cutAt(end, 'below') });
    }
    return stretches;
  }

  /** The best of 23 samples inside the stretch, refined by golden section between its neighbours. */
  private searchedPosition(start: number, end: number): number {
    let bestIndex = 0;
    let bestValue = -Infinity;
    for (let k = 1; k < SAMPLES; k += 1) {
      const value = this.ratioAbove(start + ((end - start) * k) / SAMPLES);
      if (value > bestValue) {
        bestValue = value;
        bestIndex = k - 1;
      }
    }
    // The samples next to the best one, or the stretch's ends beyond the first and last sample.
    let low = bestIndex - 1 >= 0 ? start + ((end - start) * bestIndex) / SAMPLES : start;
    let high = bestIndex + 1 < SAMPLES - 1 ? start + ((end - start) * (bestIndex + 2)) / SAMPLES : end;
    let left = high - GOLDEN * (high - low);
    let right = low + GOLDEN * (high - low);
    let leftValue = this.ratioAbove(left);
    let rightValue = this.ratioAbove(right);
    for (let step = 0; step < 200 && high - low > this.scale * 1e-10; step += 1) {
      if (leftValue >= rightValue) {
        high = right;
        right = left;
        rightValue = leftValue;
        left = high - GOLDEN * (high - low);
        leftValue = this.ratioAbove(left);
      } else {
        low = left;
        left = right;
        leftValue = rightValue;
        right = low + GOLDEN * (high - low);
        rightValue = this.ratioAbove(right);
      }
    }
    return (low + high) / 2;
  }

  /**
   * Whether Q / b stays below the best end cut on [low, high], a stretch (or part of one) on one side
   * of the centroid: with a positive chord throughout, Q grows towards the centroid, so there
   * Q / b <= Q(end nearer the centroid) / (least chord), the allowances covering rounding; halved up
   * to `halvings` times where that bound is too coarse.
   */
  private boundedBelow(low: number, high: number, halvings: number): boolean {
    const leastChord = this.region.leastChordBetween(low, high);
    const firstMoment = this.firstMomentBeyond(high <= this.centroid ? high : low);
    if (leastChord > 0 && (firstMoment + this.roundingQ) / leastChord < this.reached) return true;
    if (halvings === 0) return false;
    const middle = (low + high) / 2;
    return this.boundedBelow(low, middle, halvings - 1) && this.boundedBelow(middle, high, halvings - 1);
  }

  private firstMomentBeyond(cut: number): number {
    const { centroid } = this;
    const below = this.region.totalBelow(cut);
    const q =
      cut >= centroid
        ? this.wholeFirstMoment - below.firstMoment - centroid * (this.wholeArea - below.area)
        : centroid * below.area - below.firstMoment;
    return Math.max(0, q);
  }

  private cutAt(at: number, side: 'below' | 'above'): ShearCut {
    return { firstMoment: this.firstMomentBeyond(at), width: this.region.chordAt(at, side) };
  }

  private ratioOf(firstMoment: number, width: number): number {
    return width > this.scale * 1e-12 ? firstMoment / width : 0;
  }

  private ratio(cut: ShearCut): number {
    return this.ratioOf(cut.firstMoment, cut.width);
  }

  /** Q / b of the cut at `at` taken from above, without making the cut. */
  private ratioAbove(at: number): number {
    const firstMoment = this.firstMomentBeyond(at);
    return this.ratioOf(firstMoment, this.region.chordAt(at, 'above'));
  }
}
