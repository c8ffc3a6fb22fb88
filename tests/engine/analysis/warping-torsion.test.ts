import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { solveWarpingTorsion } from '../../../src/engine/analysis/warping-torsion.js';
import type { TwistRestraint, WarpingTorsionInput } from '../../../src/engine/analysis/warping-torsion.js';
import { EngineError } from '../../../src/engine/engine-error.js';
import { iSectionWarpingStressFactors } from '../../../src/engine/sections/warping-stress-factors.js';

const near = (actual: number, expected: number, relative = 1e-10) =>
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(relative * Math.abs(expected));
/** Absolute closeness against a scale of the problem (for values that are zero in exact arithmetic). */
const nearScale = (actual: number, expected: number, scale: number, relative = 1e-10) =>
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(relative * scale);

const fork = (position: number): TwistRestraint => ({ position, kind: 'fork' });
const fixed = (position: number): TwistRestraint => ({ position, kind: 'fixed' });
const sech = (u: number) => 1 / Math.cosh(u);

// IPE 200 (EN 10365 tabulated Iw = 12.99e3 cm^6, It = 6.98 cm^4), E = 210 GPa, G = 81 GPa.
const GJ = 81e9 * 6.98e-8; // 5653.8 N m^2
const EIw = 210e9 * 12.99e-9; // 2727.9 N m^4
const lambda = Math.sqrt(GJ / EIw); // sqrt(2.072583) = 1.439647 1/m

describe('fork ends, a torque T at midspan', () => {
  // Left half: T(x) = T/2, phi(0) = phi''(0) = 0, phi'(L/2) = 0 by symmetry. Solving
  // phi' - phi'''/lambda^2 = T/(2 GJ): phi = T/(2 GJ) [x - sinh(lambda x) / (lambda cosh(lambda L/2))],
  // so phi(L/2) = T/(2 GJ) [L/2 - tanh(lambda L/2)/lambda], B = -EIw phi'' = T sinh(lambda x) / (2 lambda cosh(lambda L/2)),
  // B(L/2) = T tanh(lambda L/2)/(2 lambda), T_w = T cosh(lambda x)/(2 cosh(lambda L/2)), T_sv = T/2 - T_w
  // (AISC Design Guide 9, 2nd ed., Appendix B, case 3; Roark 8th ed., Table 10.3-type case; from memory;
  // derived here by hand).
  const L = 3.6;
  const T = 1000;
  const result = solveWarpingTorsion({ length: L, torsionalRigidity: GJ, warpingRigidity: EIw, restraints: [fork(0), fork(L)], pointTorques: [{ position: L / 2, torque: T }] });
  const u = (lambda * L) / 2; // 2.591364

  it('twists by T/(2GJ) [L/2 - tanh(lambda L/2)/lambda] at midspan, its largest', () => {
    const phiMid = (T / (2 * GJ)) * (L / 2 - Math.tanh(u) / lambda); // 0.08844 x (1.8 - 0.68686) = 0.098442 rad
    near(result.at(L / 2).twist, phiMid);
    near(result.extremes.twist.value, phiMid);
    near(result.extremes.twist.position, L / 2);
    const x = 0.9;
    near(result.at(x).twist, (T / (2 * GJ)) * (x - Math.sinh(lambda * x) / (lambda * Math.cosh(u))));
  });

  it('has B(L/2) = T tanh(lambda L/2)/(2 lambda) = 343.43 N m^2, the largest bimoment', () => {
    const bMid = (T * Math.tanh(u)) / (2 * lambda); // 1000 x 0.988637 / 2.879294 = 343.43
    near(result.extremes.bimoment.value, bMid);
    near(result.extremes.bimoment.position, L / 2);
    near(result.at(0.9).bimoment, (T * Math.sinh(lambda * 0.9)) / (2 * lambda * Math.cosh(u)));
    nearScale(result.at(0).bimoment, 0, bMid);
  });

  it('carries T/2 as warping torque at midspan and T/2 (1 - sech(lambda L/2)) in Saint-Venant torsion at the forks', () => {
    near(result.at(L / 2, 'left').warpingTorque, T / 2);
    near(result.at(L / 2, 'right').warpingTorque, -T / 2);
    near(Math.abs(result.extremes.warpingTorque.value), T / 2);
    near(result.extremes.warpingTorque.position, L / 2);
    near(result.extremes.saintVenantTorque.value, (T / 2) * (1 - sech(u))); // 500 (1 - 0.14898) = 425.50
    expect(result.extremes.saintVenantTorque.position).toBe(0);
    near(result.at(1.2).torque, T / 2);
  });

  it('has each fork react -T/2 and hold no bimoment', () => {
    for (const reaction of result.reactions) {
      near(reaction.torque, -T / 2);
      nearScale(reaction.bimomentJump, 0, T / lambda);
    }
  });

  it('agrees with the closed form from lambda L = 0.01 to 50', () => {
    for (const lambdaL of [0.01, 0.3, 1, 2, 7, 20, 50]) {
      const l = lambdaL / L;
      const r = solveWarpingTorsion({ length: L, torsionalRigidity: l * l, warpingRigidity: 1, restraints: [fork(0), fork(L)], pointTorques: [{ position: L / 2, torque: T }] });
      near(r.lambdaLength, lambdaL, 1e-14);
      near(r.extremes.bimoment.value, (T * Math.tanh(lambdaL / 2)) / (2 * l), 1e-9);
      // Small lambda L: phi(L/2) written as its series, T L^3/(48 EIw) (1 - (lambda L)^2/10 + ...) avoids the cancellation.
      near(r.at(L / 2).twist, lambdaL < 0.1 ? ((T * L ** 3) / 48) * (1 - lambdaL ** 2 / 10) : (T / (2 * l * l)) * (L / 2 - Math.tanh(lambdaL / 2) / l), 1e-8);
    }
  });
});

describe('fork ends, a uniform torque m', () => {
  // EIw phi'''' - GJ phi'' = m, phi = phi'' = 0 at both ends:
  // phi = m/(GJ lambda^2) [lambda^2 (L x - x^2)/2 + cosh(lambda x) - tanh(lambda L/2) sinh(lambda x) - 1]
  // (checked by hand: phi'' = m/GJ [cosh - tanh(lambda L/2) sinh - 1] is 0 at 0 and at L since
  // cosh(lambda L) - tanh(lambda L/2) sinh(lambda L) = 1; DG9 2nd ed., Appendix B, case 4; from memory).
  // phi(L/2) = m/(GJ lambda^2) [lambda^2 L^2/8 + sech(lambda L/2) - 1], B(L/2) = m/lambda^2 (1 - sech(lambda L/2)),
  // T_w(0) = m tanh(lambda L/2)/lambda, T_sv(0) = m L/2 - T_w(0).
  const L = 3.6;
  const m = 500;
  const result = solveWarpingTorsion({ length: L, torsionalRigidity: GJ, warpingRigidity: EIw, restraints: [fork(0), fork(L)], distributedTorques: [{ from: 0, to: L, torquePerLength: m }] });
  const u = (lambda * L) / 2;

  it('twists and bends as the closed form says', () => {
    near(result.at(L / 2).twist, (m / (GJ * lambda ** 2)) * ((lambda ** 2 * L ** 2) / 8 + sech(u) - 1));
    near(result.extremes.twist.value, result.at(L / 2).twist);
    near(result.extremes.bimoment.value, (m / lambda ** 2) * (1 - sech(u))); // 500 / 2.072583 x 0.85102 = 205.31
    near(result.extremes.bimoment.position, L / 2, 1e-9);
    near(result.at(0).warpingTorque, (m * Math.tanh(u)) / lambda);
    near(result.at(0).saintVenantTorque, (m * L) / 2 - (m * Math.tanh(u)) / lambda);
    // T_w is antisymmetric: +m tanh(u)/lambda at 0 and the opposite at L.
    const { value, position } = result.extremes.warpingTorque;
    expect([0, L]).toContain(position);
    near(value, ((position === 0 ? 1 : -1) * m * Math.tanh(u)) / lambda);
    const x = 1.1;
    near(result.at(x).torque, m * (L / 2 - x));
  });

  it('finds the Saint-Venant torque largest at the forks, each reacting -m L/2', () => {
    near(Math.abs(result.extremes.saintVenantTorque.value), (m * L) / 2 - (m * Math.tanh(u)) / lambda);
    for (const reaction of result.reactions) near(reaction.torque, (-m * L) / 2);
  });
});

describe('fixed ends, a torque T at midspan', () => {
  // Left half: phi(0) = phi'(0) = 0, phi'(L/2) = 0: phi = T/(2 GJ lambda) [lambda x - sinh(lambda x) + tanh(lambda L/4)(cosh(lambda x) - 1)]
  // ((cosh(lambda L/2) - 1)/sinh(lambda L/2) = tanh(lambda L/4)). With v = lambda L/4, sinh 2v = 2 sinh v cosh v and
  // cosh 2v - 1 = 2 sinh^2 v: phi(L/2) = T/(2 GJ) [L/2 - 2 tanh(lambda L/4)/lambda]; B = -(T/(2 lambda)) [tanh v cosh(lambda x) - sinh(lambda x)]
  // gives B(0) = -T tanh(lambda L/4)/(2 lambda) and B(L/2) = +T tanh(lambda L/4)/(2 lambda); T_w(0) = T/2, T_sv(0) = 0
  // (DG9 2nd ed., Appendix B, fixed-end case; from memory; derived here by hand).
  const L = 3.6;
  const T = 1000;
  const result = solveWarpingTorsion({ length: L, torsionalRigidity: GJ, warpingRigidity: EIw, restraints: [fixed(0), fixed(L)], pointTorques: [{ position: L / 2, torque: T }] });
  const v = (lambda * L) / 4;
  const bEnd = (T * Math.tanh(v)) / (2 * lambda); // 1000 x 0.860 / 2.8793 = 298.8 N m^2

  it('twists by T/(2GJ) [L/2 - 2 tanh(lambda L/4)/lambda] at midspan', () => {
    near(result.at(L / 2).twist, (T / (2 * GJ)) * (L / 2 - (2 * Math.tanh(v)) / lambda));
  });

  it('has bimoments -+T tanh(lambda L/4)/(2 lambda) at the ends and midspan, held by the fixed ends', () => {
    near(result.at(0).bimoment, -bEnd);
    near(result.at(L).bimoment, -bEnd);
    near(result.at(L / 2).bimoment, bEnd);
    near(Math.abs(result.extremes.bimoment.value), bEnd);
    near(result.reactions[0]?.bimomentJump ?? NaN, -bEnd);
    near(result.reactions[1]?.bimomentJump ?? NaN, bEnd);
  });

  it('carries all of T/2 by warping at the fixed ends, where phi\' = 0', () => {
    near(result.at(0).warpingTorque, T / 2);
    nearScale(result.at(0).saintVenantTorque, 0, T);
    for (const reaction of result.reactions) near(reaction.torque, -T / 2);
  });
});

describe('fixed ends, a uniform torque m', () => {
  // T(x) = m (L/2 - x); phi(0) = phi'(0) = 0 and phi'(L/2) = 0 by symmetry. From phi' - phi'''/lambda^2 = T/GJ:
  // phi' = m/GJ [L/2 - x - (L/2) sinh(u - lambda x)/sinh u], u = lambda L/2 (cosh y - coth u sinh y = sinh(u - y)/sinh u).
  // phi'' = m/GJ [-1 + u cosh(u - lambda x)/sinh u] vanishes at cosh(u - lambda x*) = sinh(u)/u, where T_sv is largest:
  // T_sv(x*) = m [L/2 - x* - (L/2) sqrt((sinh u/u)^2 - 1)/sinh u]. B = m/lambda^2 [1 - u cosh(u - lambda x)/sinh u]:
  // B(0) = m/lambda^2 (1 - u coth u), B(L/2) = m/lambda^2 (1 - u/sinh u). phi(L/2) = m/GJ [L^2/8 - L tanh(lambda L/4)/(2 lambda)]
  // (integrating phi'; sinh u - coth u (cosh u - 1) = tanh(u/2)). Derived here by hand.
  const m = 400;
  for (const [L, gj, eiw] of [
    [3.6, GJ, EIw],
    [2, 0.09, 1],
  ] as const) {
    const lam = Math.sqrt(gj / eiw);
    const u = (lam * L) / 2;
    it(`matches the closed form with lambda L = ${(lam * L).toFixed(3)}`, () => {
      const r = solveWarpingTorsion({ length: L, torsionalRigidity: gj, warpingRigidity: eiw, restraints: [fixed(0), fixed(L)], distributedTorques: [{ from: 0, to: L, torquePerLength: m }] });
      const xStar = (u - Math.acosh(Math.sinh(u) / u)) / lam;
      const tsvStar = m * (L / 2 - xStar - ((L / 2) * Math.sqrt((Math.sinh(u) / u) ** 2 - 1)) / Math.sinh(u));
      // T_sv is antisymmetric about midspan: the extreme is at x* or at L - x*, with the matching sign.
      const { value, position } = r.extremes.saintVenantTorque;
      near(value, position < L / 2 ? tsvStar : -tsvStar, 1e-9);
      near(position < L / 2 ? position : L - position, xStar, 1e-7);
      near(r.at(xStar).saintVenantTorque, tsvStar, 1e-9);
      near(r.at(L / 2).twist, (m / gj) * (L ** 2 / 8 - (L * Math.tanh((lam * L) / 4)) / (2 * lam)), 1e-9);
      near(r.extremes.twist.value, r.at(L / 2).twist, 1e-12);
      near(r.at(0).bimoment, (m / lam ** 2) * (1 - u / Math.tanh(u)), 1e-9);
      near(r.at(L / 2).bimoment, (m / lam ** 2) * (1 - u / Math.sinh(u)), 1e-9);
      near(Math.abs(r.extremes.bimoment.value), Math.abs(r.at(0).bimoment), 1e-12);
      near(r.extremes.warpingTorque.value, (m * L) / 2, 1e-9);
      for (const reaction of r.reactions) near(reaction.torque, (-m * L) / 2, 1e-10);
    });
  }
});

describe('a cantilever fixed at 0 with a torque T at the free tip', () => {
  // T(x) = T: phi = T/(GJ lambda) [lambda x - sinh(lambda x) + tanh(lambda L)(cosh(lambda x) - 1)] from phi(0) = phi'(0) = 0,
  // phi''(L) = 0; phi(L) = T/GJ [L - tanh(lambda L)/lambda]; B = -(T/lambda)[tanh(lambda L) cosh(lambda x) - sinh(lambda x)],
  // so B(0) = -T tanh(lambda L)/lambda (magnitude T tanh(lambda L)/lambda, DG9 2nd ed., Appendix B, cantilever case; from memory);
  // T_w(0) = T, T_sv(L) = T (1 - sech(lambda L)).
  const L = 2;
  const T = 300;
  const result = solveWarpingTorsion({ length: L, torsionalRigidity: GJ, warpingRigidity: EIw, restraints: [fixed(0)], pointTorques: [{ position: L, torque: T }] });
  const w = lambda * L; // 2.879294

  it('twists by T/GJ [L - tanh(lambda L)/lambda] at the tip', () => {
    near(result.at(L).twist, (T / GJ) * (L - Math.tanh(w) / lambda));
    near(result.extremes.twist.value, result.at(L).twist);
    expect(result.extremes.twist.position).toBe(L);
  });

  it('has B(0) = -T tanh(lambda L)/lambda, the largest, and none at the tip', () => {
    near(result.at(0).bimoment, (-T * Math.tanh(w)) / lambda); // -300 x 0.99369 / 1.43965 = -207.07 N m^2
    near(result.extremes.bimoment.value, (-T * Math.tanh(w)) / lambda);
    expect(result.extremes.bimoment.position).toBe(0);
    nearScale(result.at(L).bimoment, 0, T / lambda);
    near(result.reactions[0]?.bimomentJump ?? NaN, (-T * Math.tanh(w)) / lambda);
  });

  it('splits the torque into T_w(0) = T and T_sv(L) = T (1 - sech(lambda L)), and the support reacts -T', () => {
    near(result.at(0).warpingTorque, T);
    near(result.at(L).saintVenantTorque, T * (1 - sech(w)));
    near(result.at(0.7).torque, T);
    near(result.reactions[0]?.torque ?? NaN, -T);
  });

  it('agrees with the closed form from lambda L = 0.05 to 40 (the free end takes the torque as k^2 phi\' - phi\'\'\')', () => {
    for (const lambdaL of [0.05, 0.5, 0.99, 1.01, 6, 40]) {
      const l = lambdaL / L;
      const r = solveWarpingTorsion({ length: L, torsionalRigidity: l * l, warpingRigidity: 1, restraints: [fixed(0)], pointTorques: [{ position: L, torque: T }] });
      // phi(L) = T/(GJ) [L - tanh(lambda L)/lambda]; for small lambda L its series T L^3/(3 EIw) (1 - 2 (lambda L)^2/5 + 17 (lambda L)^4/105).
      const tipTwist = lambdaL < 0.1 ? ((T * L ** 3) / 3) * (1 - (2 * lambdaL ** 2) / 5 + (17 * lambdaL ** 4) / 105) : (T / (l * l)) * (L - Math.tanh(lambdaL) / l);
      near(r.at(L).twist, tipTwist, 1e-8);
      near(r.at(0).bimoment, (-T * Math.tanh(lambdaL)) / l, 1e-10);
      near(r.at(L).saintVenantTorque, T * (1 - sech(lambdaL)), 1e-9);
    }
  });
});

describe('limits', () => {
  it('recovers Saint-Venant twist (phi\' = T/GJ) away from a fixed end when lambda L = 50', () => {
    // Cantilever as above: phi'(x) = T/GJ [1 - cosh(lambda x) + tanh(lambda L) sinh(lambda x)] = T/GJ [1 - e^{-lambda x}] to 1e-21
    // when lambda L = 50; at x = L/2, e^{-25} = 1.4e-11.
    const L = 10;
    const T = 100;
    const gj = 1000;
    const eiw = gj / 25; // lambda = 5 1/m, lambda L = 50
    const r = solveWarpingTorsion({ length: L, torsionalRigidity: gj, warpingRigidity: eiw, restraints: [fixed(0)], pointTorques: [{ position: L, torque: T }] });
    near(r.lambdaLength, 50, 1e-14);
    near(r.at(L / 2).twistRate, (T / gj) * (1 - Math.exp(-25)), 1e-12);
    near(r.at(L).twist, (T / gj) * (L - 1 / 5), 1e-12);
    near(r.extremes.bimoment.value, -T / 5, 1e-12); // -T tanh(50)/lambda
  });

  it('stays finite and tends to Saint-Venant torsion as E Iw tends to 0 (lambda L = 1e4 and 1e8)', () => {
    // Fork ends, midspan torque: phi(L/2) = T/(2GJ) [L/2 - 1/lambda] once tanh(lambda L/2) = 1.
    const L = 4;
    const T = 100;
    const gj = 1000;
    for (const lambdaL of [1e4, 1e8]) {
      const l = lambdaL / L;
      const r = solveWarpingTorsion({ length: L, torsionalRigidity: gj, warpingRigidity: gj / l ** 2, restraints: [fork(0), fork(L)], pointTorques: [{ position: L / 2, torque: T }] });
      near(r.at(L / 2).twist, (T / (2 * gj)) * (L / 2 - 1 / l), 1e-12);
      near(r.at(L / 4).twistRate, T / (2 * gj), 1e-12);
      near(r.extremes.bimoment.value, T / (2 * l), 1e-12);
      near(r.extremes.warpingTorque.value, T / 2, 1e-12);
    }
  });

  it('refuses E Iw = 0 with a clear error (uniform torsion is the line problem\'s)', () => {
    const input: WarpingTorsionInput = { length: 2, torsionalRigidity: 1000, warpingRigidity: 0, restraints: [fork(0), fork(2)] };
    expect(() => solveWarpingTorsion(input)).toThrow(EngineError);
    expect(() => solveWarpingTorsion(input)).toThrow(/warping rigidity E Iw must be positive/);
  });

  it('solves pure warping torsion (G J = 0) as a beam: phi(L/2) = T L^3/(48 EIw), B(L/2) = T L/4', () => {
    // EIw phi'''' = 0 with T_w = T/2 on the left half: B = T x/2, the simply supported beam analogy.
    const L = 3;
    const T = 200;
    const r = solveWarpingTorsion({ length: L, torsionalRigidity: 0, warpingRigidity: EIw, restraints: [fork(0), fork(L)], pointTorques: [{ position: L / 2, torque: T }] });
    near(r.at(L / 2).twist, (T * L ** 3) / (48 * EIw)); // 200 x 27 / 130939 = 0.041241 rad
    near(r.extremes.bimoment.value, (T * L) / 4);
  });

  it('refuses a mechanism', () => {
    expect(() => solveWarpingTorsion({ length: 2, torsionalRigidity: 1000, warpingRigidity: 100, restraints: [] })).toThrow(/no twist restraint/);
    expect(() => solveWarpingTorsion({ length: 2, torsionalRigidity: 0, warpingRigidity: 100, restraints: [fork(1)] })).toThrow(EngineError);
  });

  it('refuses loads outside the member and coincident restraints', () => {
    const base = { length: 2, torsionalRigidity: 1000, warpingRigidity: 100, restraints: [fork(0), fork(2)] };
    expect(() => solveWarpingTorsion({ ...base, pointTorques: [{ position: 2.5, torque: 1 }] })).toThrow(/outside the member/);
    expect(() => solveWarpingTorsion({ ...base, distributedTorques: [{ from: 1, to: 1, torquePerLength: 1 }] })).toThrow(/range is empty/);
    expect(() => solveWarpingTorsion({ ...base, restraints: [fork(1), fixed(1)] })).toThrow(/same place/);
  });
});

describe('the engineering case: IPE 200, 3.6 m, fork ends, 1 kN m at midspan', () => {
  // lambda = 1.439647 1/m, lambda L = 5.1827; B_max = 1000 tanh(2.591364)/(2 x 1.439647) = 343.43 N m^2.
  // omega_n = h_s b/4 = 0.1915 x 0.1/4 = 4.7875e-3 m^2; sigma_w = 343.43 x 4.7875e-3 / 12.99e-9 = 126.57 MPa.
  // Check by the flange analogy: M_f = B/h_s = 1793.4 N m on a flange tf b^2/6 = 1.41667e-5 m^3: 126.6 MPa.
  // S_w = h_s b^2 tf/16 = 1.01734e-6 m^4; tau_w = T_w S_w/(Iw tf) = 500 x 1.01734e-6 / (12.99e-9 x 0.0085) = 4.607 MPa
  // (= 1.5 (T_w/h_s)/(b tf) = 1.5 x 2611.0 / 8.5e-4).
  const L = 3.6;
  const result = solveWarpingTorsion({ length: L, torsionalRigidity: GJ, warpingRigidity: EIw, restraints: [fork(0), fork(L)], pointTorques: [{ position: L / 2, torque: 1000 }] });
  const factors = iSectionWarpingStressFactors({ depth: 0.2, flangeWidth: 0.1, flangeThickness: 0.0085, webThickness: 0.0056 });
  const Iw = 12.99e-9;

  it('has sigma_w,max = 126.6 MPa and tau_w,max = 4.61 MPa', () => {
    near(result.extremes.bimoment.value, 343.4305, 1e-6);
    const sigma = (result.extremes.bimoment.value * factors.normalisedWarpingMax) / Iw;
    near(sigma, 126.5722e6, 1e-6);
    // The flange analogy holds exactly with the thin-walled Iw = 1.298809e-8 (0.015 % below the tabulated one): 126.5909 MPa.
    near(result.extremes.bimoment.value * factors.normalStressPerBimoment, 343.4305 / 0.1915 / ((0.0085 * 0.1 ** 2) / 6), 1e-6);
    const tau = (result.extremes.warpingTorque.value * factors.warpingStaticalMomentMax) / (Iw * 0.0085);
    near(tau, 4.606909e6, 1e-6);
    near(result.extremes.warpingTorque.value * factors.shearStressPerWarpingTorque, (1.5 * (500 / 0.1915)) / (0.1 * 0.0085), 1e-12);
  });
});

describe('equilibrium and continuity', () => {
  const L = 5;
  const base = { length: L, torsionalRigidity: GJ, warpingRigidity: EIw };

  it('is continuous in phi, phi\', phi\'\' across a point torque, where T and T_w drop by the torque', () => {
    const T0 = 700;
    const r = solveWarpingTorsion({ ...base, restraints: [fixed(0), fork(L)], pointTorques: [{ position: 1.3, torque: T0 }, { position: 4, torque: -250 }], distributedTorques: [{ from: 0.5, to: 3, torquePerLength: 120 }] });
    const left = r.at(1.3, 'left');
    const right = r.at(1.3, 'right');
    const scale = Math.abs(r.extremes.twist.value);
    nearScale(right.twist, left.twist, scale, 1e-12);
    nearScale(right.twistRate, left.twistRate, scale / L, 1e-11);
    nearScale(right.twistSecondDerivative, left.twistSecondDerivative, scale / L ** 2, 1e-10);
    near(right.torque - left.torque, -T0, 1e-10);
    near(right.warpingTorque - left.warpingTorque, -T0, 1e-10);
    // Reactions: -(700 - 250 + 120 x 2.5) = -750 N m in all.
    near((r.reactions[0]?.torque ?? NaN) + (r.reactions[1]?.torque ?? NaN), -750, 1e-10);
  });

  it('has the reaction torques sum to minus the applied torques (any loads and restraints)', () => {
    const position = fc.double({ min: 0, max: L, noNaN: true });
    fc.assert(
      fc.property(
        fc.array(fc.record({ position, torque: fc.double({ min: -1000, max: 1000, noNaN: true }) }), { maxLength: 4 }),
        fc.array(fc.record({ a: position, b: position, torquePerLength: fc.double({ min: -500, max: 500, noNaN: true }) }), { maxLength: 3 }),
        fc.uniqueArray(fc.record({ position: fc.integer({ min: 0, max: 10 }).map((i) => (i * L) / 10), kind: fc.constantFrom('fork' as const, 'fixed' as const) }), { minLength: 1, maxLength: 3, selector: (r) => r.position }),
        (pointTorques, ranges, restraints) => {
          const distributedTorques = ranges.filter((d) => Math.abs(d.a - d.b) > 1e-3).map((d) => ({ from: Math.min(d.a, d.b), to: Math.max(d.a, d.b), torquePerLength: d.torquePerLength }));
          const r = solveWarpingTorsion({ ...base, restraints, pointTorques, distributedTorques });
          const applied = pointTorques.reduce((s, t) => s + t.torque, 0) + distributedTorques.reduce((s, d) => s + d.torquePerLength * (d.to - d.from), 0);
          const magnitude = pointTorques.reduce((s, t) => s + Math.abs(t.torque), 0) + distributedTorques.reduce((s, d) => s + Math.abs(d.torquePerLength) * (d.to - d.from), 0);
          const reacted = r.reactions.reduce((s, q) => s + q.torque, 0);
          expect(Math.abs(reacted + applied)).toBeLessThanOrEqual(1e-9 * (magnitude + 1));
          for (const q of r.reactions) if (q.kind === 'fork') expect(Math.abs(q.bimomentJump)).toBeLessThanOrEqual(1e-9 * (magnitude + 1));
        },
      ),
      { numRuns: 150, seed: 20240601 },
    );
  });

  it('is reciprocal: the twist at a from a torque at b equals the twist at b from the same torque at a', () => {
    // Maxwell-Betti for the symmetric operator EIw d4 - GJ d2 with self-adjoint restraints.
    const restraints = [fixed(0), fork(3.2)];
    const at = (load: number, read: number) => solveWarpingTorsion({ ...base, restraints, pointTorques: [{ position: load, torque: 1 }] }).at(read).twist;
    near(at(1.1, 4.6), at(4.6, 1.1), 1e-10);
    near(at(0.4, 2.5), at(2.5, 0.4), 1e-10);
  });

  it('handles a torque a hair from a fork: the fork takes nearly all of it', () => {
    const T = 1000;
    const r = solveWarpingTorsion({ ...base, restraints: [fork(0), fork(L)], pointTorques: [{ position: 1e-9 * L, torque: T }] });
    near((r.reactions[0]?.torque ?? NaN) + (r.reactions[1]?.torque ?? NaN), -T, 1e-12);
    expect(Math.abs(r.reactions[1]?.torque ?? NaN)).toBeLessThan(1e-7 * T);
    expect(Math.abs(r.extremes.twist.value)).toBeLessThan(1e-7 * (T * L) / GJ);
  });
});
