/**
 * The largest value of a function of one variable on [a, b], by Brent's method: parabolic
 * interpolation where the function is smooth, golden-section steps where it is not (R. P. Brent,
 * Algorithms for Minimization without Derivatives, 1973, chapter 5, procedure localmin; applied to -f).
 * Exact in a few steps for a quadratic; for a piecewise-smooth function it converges to a local maximum
 * within `tolerance` of its position.
 */

export interface LocalMaximum {
  readonly x: number;
  readonly value: number;
}

/** (3 - sqrt(5)) / 2: the golden-section fraction. */
const GOLDEN = 0.5 * (3 - Math.sqrt(5));
const MAX_ITERATIONS = 100;

export function brentMaximum(f: (x: number) => number, a: number, b: number, tolerance: number): LocalMaximum {
  let lo = Math.min(a, b);
  let hi = Math.max(a, b);
  // Brent minimises; g = -f.
  let x = lo + GOLDEN * (hi - lo);
  let w = x;
  let v = x;
  let gx = -f(x);
  let gw = gx;
  let gv = gx;
  let d = 0;
  let e = 0;
  for (let iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
    const middle = 0.5 * (lo + hi);
    const tol1 = 1e-12 * Math.abs(x) + tolerance / 3;
    const tol2 = 2 * tol1;
    if (Math.abs(x - middle) <= tol2 - 0.5 * (hi - lo)) break;
    let golden = true;
    if (Math.abs(e) > tol1) {
      // A parabola through x, w and v.
      const r = (x - w) * (gx - gv);
      let q = (x - v) * (gx - gw);
      let p = (x - v) * q - (x - w) * r;
      q = 2 * (q - r);
      if (q > 0) p = -p;
      else q = -q;
      const previous = e;
      e = d;
      if (Math.abs(p) < Math.abs(0.5 * q * previous) && p > q * (lo - x) && p < q * (hi - x)) {
        d = p / q;
        const u = x + d;
        if (u - lo < tol2 || hi - u < tol2) d = middle >= x ? tol1 : -tol1;
        golden = false;
      }
    }
    if (golden) {
      e = (x >= middle ? lo : hi) - x;
      d = GOLDEN * e;
    }
    const u = Math.abs(d) >= tol1 ? x + d : x + (d > 0 ? tol1 : -tol1);
    const gu = -f(u);
    if (gu <= gx) {
      if (u >= x) lo = x;
      else hi = x;
      v = w;
      gv = gw;
      w = x;
      gw = gx;
      x = u;
      gx = gu;
    } else {
      if (u < x) lo = u;
      else hi = u;
      if (gu <= gw || w === x) {
        v = w;
        gv = gw;
        w = u;
        gw = gu;
      } else if (gu <= gv || v === x || v === w) {
        v = u;
        gv = gu;
      }
    }
  }
  return { x, value: -gx };
}
