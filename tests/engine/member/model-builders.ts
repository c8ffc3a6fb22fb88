/** Small builders for member models in engine tests (invented demo members, SI units). */

import type {
  Direction,
  DistributedLoadModel,
  LinearIntensity,
  LoadModel,
  MemberModel,
  MemberStiffness,
  PointLoadModel,
  Restraint,
  SupportModel,
} from '../../../src/engine/member/model.js';

/**
 * A demo shelving beam: E = 210 GPa with A = 2.0e-3 m^2, Iz = 2.0e-5 m^4, Iy = 1.5e-6 m^4 and, with
 * G = 81 GPa, J = 7.0e-8 m^4 (invented section, for tests only).
 */
export const DEMO_STIFFNESS: MemberStiffness = {
  axial: 210e9 * 2.0e-3,
  bendingZ: 210e9 * 2.0e-5,
  bendingY: 210e9 * 1.5e-6,
  torsional: 81e9 * 7.0e-8,
};

export function supportAt(position: number, restrained: Partial<Record<Direction, Restraint>>): SupportModel {
  return {
    position,
    restraints: {
      ux: restrained.ux ?? 'free',
      uy: restrained.uy ?? 'free',
      uz: restrained.uz ?? 'free',
      rx: restrained.rx ?? 'free',
      ry: restrained.ry ?? 'free',
      rz: restrained.rz ?? 'free',
    },
  };
}

/** Every direction held. */
export const fixedAt = (position: number): SupportModel =>
  supportAt(position, { ux: 'rigid', uy: 'rigid', uz: 'rigid', rx: 'rigid', ry: 'rigid', rz: 'rigid' });

/** Translations and the twist held, both bending rotations free. */
export const pinnedAt = (position: number): SupportModel =>
  supportAt(position, { ux: 'rigid', uy: 'rigid', uz: 'rigid', rx: 'rigid' });

/** Only the two transverse translations held. */
export const rollerAt = (position: number): SupportModel => supportAt(position, { uy: 'rigid', uz: 'rigid' });

export function pointLoad(
  position: number,
  actions: Partial<Record<'fx' | 'fy' | 'fz' | 'mx' | 'my' | 'mz', number>>,
): PointLoadModel {
  return {
    kind: 'point',
    position,
    fx: actions.fx ?? 0,
    fy: actions.fy ?? 0,
    fz: actions.fz ?? 0,
    mx: actions.mx ?? 0,
    my: actions.my ?? 0,
    mz: actions.mz ?? 0,
  };
}

type Intensity = number | LinearIntensity;
const linear = (value: Intensity | undefined): LinearIntensity =>
  value === undefined ? [0, 0] : typeof value === 'number' ? [value, value] : value;

export function distributedLoad(
  from: number,
  to: number,
  intensities: Partial<Record<'qx' | 'qy' | 'qz' | 'mx', Intensity>>,
): DistributedLoadModel {
  return {
    kind: 'distributed',
    from,
    to,
    qx: linear(intensities.qx),
    qy: linear(intensities.qy),
    qz: linear(intensities.qz),
    mx: linear(intensities.mx),
  };
}

export function memberModel(
  length: number,
  supports: readonly SupportModel[],
  loads: readonly LoadModel[],
  options: { hinges?: readonly number[]; stiffness?: MemberStiffness } = {},
): MemberModel {
  return {
    length,
    supports,
    hinges: (options.hinges ?? []).map((position) => ({ position })),
    loads,
    stiffness: options.stiffness ?? DEMO_STIFFNESS,
  };
}
