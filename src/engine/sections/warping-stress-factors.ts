/**
 * Warping stress factors of thin-walled open sections, taken on the plate mid-lines: the largest
 * normalised unit warping omega_n (m^2) and the largest warping statical moment S_w (m^4) over the
 * thickness t where it acts, so that
 *   sigma_w = B omega_n / Iw            (warping normal stress)
 *   tau_w   = T_w S_w / (Iw t)          (warping shear stress)
 * (AISC Design Guide 9, 2nd ed., sections 4.2-4.3 and Appendix A; Timoshenko & Gere, Theory of
 * Elastic Stability, 2nd ed., ch. 5; from memory). omega_n is the sectorial coordinate about the
 * shear centre with zero mean; S_w(s) = integral of omega_n t ds from a free edge.
 *
 * Doubly symmetric I (h_s = h - tf between flange mid-lines; the web lies on omega = 0):
 *   omega_n,max = h_s b / 4 at the flange tips;  S_w,max = h_s b^2 tf / 16 at mid-flange;
 *   Iw = tf b^3 h_s^2 / 24.
 * Channel (b' = b - tw / 2, h' = h - tf; e0 the shear centre's distance from the web mid-line, on the
 * side away from the flanges), derived here from the definitions with the pole at the shear centre:
 *   e0 = 3 b'^2 tf / (6 b' tf + h' tw)                       (DG9, Appendix A, E_o; from memory)
 *   omega_n = e0 h' / 2 at the web-flange junction, (b' - e0) h' / 2 at the flange tips;
 *   S_w = tf h' (b' - e0)^2 / 4 in the flange where omega_n = 0 (z = e0),
 *         tf h' b' (b' - 2 e0) / 4 at the junction, and
 *         that - tw e0 h'^2 / 8 at mid-web (thickness tw);
 *   Iw = tw e0^2 h'^3 / 12 + tf h'^2 ((b' - e0)^3 + e0^3) / 6,
 * which with e0 as above equals DG9's tf b'^3 h'^2 / 12 (3 b' tf + 2 h' tw) / (6 b' tf + h' tw).
 * These match the forms DG9 tabulates for channels (W_no, W_n1, S_w1..S_w3) as far as remembered.
 * Fillets and the flanges' taper are ignored (thin-walled theory).
 *
 * @example iSectionWarpingStressFactors({ depth: 0.2, flangeWidth: 0.1, flangeThickness: 0.0085, webThickness: 0.0056 }).normalisedWarpingMax // 4.7875e-3 m^2 (IPE 200)
 */

import { EngineError } from '../engine-error.js';
import { channelShearCentreDistance } from './shear-centre.js';

export interface ThinWalledFlangedDimensions {
  /** h, m */
  readonly depth: number;
  /** b, m (for a channel from the back of the web) */
  readonly flangeWidth: number;
  readonly flangeThickness: number;
  readonly webThickness: number;
}

export interface ChannelWarpingDimensions extends ThinWalledFlangedDimensions {
  /** e0, m from the web mid-line; the thin-walled value when absent. */
  readonly shearCentreFromWeb?: number;
}

export interface WarpingStressFactors {
  /** omega_n,max, m^2 */
  readonly normalisedWarpingMax: number;
  /** S_w,max, m^4: the largest |S_w| / t times the thickness where it occurs. */
  readonly warpingStaticalMomentMax: number;
  /** The wall thickness at S_w,max, m. */
  readonly thicknessAtStaticalMomentMax: number;
  /** Iw of the same thin-walled model, m^6 (for comparison with a tabulated Iw). */
  readonly warpingConstant: number;
  /** omega_n,max / Iw (thin-walled Iw), 1/m^4: sigma_w,max = B x this. */
  readonly normalStressPerBimoment: number;
  /** S_w,max / (Iw t) (thin-walled Iw), 1/m^3: tau_w,max = T_w x this. */
  readonly shearStressPerWarpingTorque: number;
}

function requirePositive(value: number, field: string): void {
  if (!(Number.isFinite(value) && value > 0)) {
    throw new EngineError('impossible-geometry', `The ${field} must be a positive length, not ${value}.`, ['section', field]);
  }
}

function requireFlanged(d: ThinWalledFlangedDimensions): void {
  requirePositive(d.depth, 'depth');
  requirePositive(d.flangeWidth, 'flangeWidth');
  requirePositive(d.flangeThickness, 'flangeThickness');
  requirePositive(d.webThickness, 'webThickness');
  if (!(2 * d.flangeThickness < d.depth)) {
    throw new EngineError('impossible-geometry', 'The two flanges must be thinner together than the depth.', ['section', 'flangeThickness']);
  }
  if (!(d.webThickness < d.flangeWidth)) {
    throw new EngineError('impossible-geometry', 'The web must be thinner than the flange width.', ['section', 'webThickness']);
  }
}

function factors(omega: number, staticalMoment: number, thickness: number, warpingConstant: number): WarpingStressFactors {
  return {
    normalisedWarpingMax: omega,
    warpingStaticalMomentMax: staticalMoment,
    thicknessAtStaticalMomentMax: thickness,
    warpingConstant,
    normalStressPerBimoment: omega / warpingConstant,
    shearStressPerWarpingTorque: staticalMoment / (warpingConstant * thickness),
  };
}

/** Doubly symmetric I (DG9 2nd ed., Appendix A, I-shapes; from memory). */
export function iSectionWarpingStressFactors(d: ThinWalledFlangedDimensions): WarpingStressFactors {
  requireFlanged(d);
  const { flangeWidth: b, flangeThickness: tf } = d;
  const hs = d.depth - tf;
  return factors((hs * b) / 4, (hs * b * b * tf) / 16, tf, (tf * b ** 3 * hs ** 2) / 24);
}

/** Channel, omega_n about the shear centre (derivation in the module comment). */
export function channelWarpingStressFactors(d: ChannelWarpingDimensions): WarpingStressFactors {
  requireFlanged(d);
  const { flangeThickness: tf, webThickness: tw } = d;
  const bm = d.flangeWidth - tw / 2;
  const hm = d.depth - tf;
  const e0 = d.shearCentreFromWeb ?? channelShearCentreDistance(d);
  if (!(Number.isFinite(e0) && e0 >= 0 && e0 < bm)) {
    throw new EngineError('impossible-geometry', `The shear centre must lie between the web and the flange tips' width from it, not at ${e0} m.`, ['section', 'shearCentreFromWeb']);
  }
  const omega = Math.max((e0 * hm) / 2, ((bm - e0) * hm) / 2);
  const inFlange = (tf * hm * (bm - e0) ** 2) / 4;
  const atJunction = (tf * hm * bm * (bm - 2 * e0)) / 4;
  const atMidWeb = atJunction - (tw * e0 * hm * hm) / 8;
  const warpingConstant = (tw * e0 * e0 * hm ** 3) / 12 + (tf * hm * hm * ((bm - e0) ** 3 + e0 ** 3)) / 6;
  // Shear stress is S_w / t: compare the flange stations (tf) with mid-web (tw).
  const flangeStress = Math.max(inFlange, Math.abs(atJunction)) / tf;
  const webStress = Math.abs(atMidWeb) / tw;
  return webStress > flangeStress
    ? factors(omega, Math.abs(atMidWeb), tw, warpingConstant)
    : factors(omega, Math.max(inFlange, Math.abs(atJunction)), tf, warpingConstant);
}
