/**
 * Saint-Venant torsion of a solid rectangle by the exact series solution (Timoshenko & Goodier,
 * Theory of Elasticity, 3rd ed., Chapter 10, torsion of a bar of rectangular cross section; from
 * memory), with long side a and short side b:
 *
 *   J = (a b^3 / 3) [1 - (192 / pi^5) (b / a) sum_{n odd} tanh(n pi a / 2b) / n^5]
 *   tau max = G theta b [1 - (8 / pi^2) sum_{n odd} 1 / (n^2 cosh(n pi a / 2b))], at mid long side
 *
 * and T = G theta J. The tanh sum is written as sum 1/n^5 (a constant) less sum (1 - tanh) / n^5,
 * whose terms fall off like exp(-n pi a / b): both sums are taken until a term no longer changes them.
 */

/** Sum over odd n of 1 / n^5 = (31 / 32) zeta(5), zeta(5) = 1.036927755143369926... (standard constant). */
export const ODD_RECIPROCAL_FIFTH_POWERS = (31 / 32) * 1.03692775514337;

export interface RectangleTorsion {
  readonly torsionConstant: number;
  /** Largest shear stress per unit torque, 1/m^3. */
  readonly torsionalShearPerTorque: number;
}

/** Sum over odd n of term(n), stopped once a term is below the last bit of the sum so far. */
function sumOverOdd(term: (n: number) => number, base: number): number {
  let sum = base;
  for (let n = 1; n < 10_000; n += 2) {
    const value = term(n);
    if (Math.abs(value) <= Number.EPSILON * Math.abs(sum) * 0.01) break;
    sum += value;
  }
  return sum;
}

export function rectangleTorsion(sideOne: number, sideTwo: number): RectangleTorsion {
  const long = Math.max(sideOne, sideTwo);
  const short = Math.min(sideOne, sideTwo);
  const halfAngle = (Math.PI * long) / (2 * short);
  // 1 - tanh x = 2 / (e^(2x) + 1); 1 / cosh x = 2 / (e^x + e^-x).
  const tanhSum = sumOverOdd((n) => -2 / ((Math.exp(2 * n * halfAngle) + 1) * n ** 5), ODD_RECIPROCAL_FIFTH_POWERS);
  const coshSum = sumOverOdd((n) => 2 / ((Math.exp(n * halfAngle) + Math.exp(-n * halfAngle)) * n * n), 0);
  const torsionConstant = ((long * short ** 3) / 3) * (1 - (192 / Math.PI ** 5) * (short / long) * tanhSum);
  const stressPerTwist = short * (1 - (8 / (Math.PI * Math.PI)) * coshSum);
  return { torsionConstant, torsionalShearPerTorque: stressPerTwist / torsionConstant };
}
