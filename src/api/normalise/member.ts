/** The member, supports, hinges and loads of a request, in SI, as the engine's model. */

import { DIRECTIONS, type Direction, type LinearIntensity, type LoadModel, type Restraint, type SupportModel } from '../../engine/member/model.js';
import type { LoadInput, MemberInput, SupportInput } from '../schemas/member-input.js';
import type { QuantityInput } from '../schemas/quantity.js';
import type { Path, QuantityReader } from './quantity-reader.js';

const PRESET_RESTRAINED: Record<'fixed' | 'pinned' | 'roller' | 'bearing' | 'torsion-restraint', readonly Direction[]> = {
  fixed: DIRECTIONS,
  pinned: ['ux', 'uy', 'uz', 'rx'],
  roller: ['uy', 'uz', 'rx'],
  // A shaft's bearing holds it in place but lets it turn; a coupling or a drive holds it against twist.
  bearing: ['ux', 'uy', 'uz'],
  'torsion-restraint': ['rx'],
};

export interface NormalisedMember {
  readonly length: number;
  readonly supports: SupportModel[];
  readonly hinges: { position: number }[];
}

export function normaliseMember(member: MemberInput, reader: QuantityReader, base: Path): NormalisedMember {
  const length = reader.positive(member.length, 'length', [...base, 'length']);
  const supports = member.supports.map((support, i) => normaliseSupport(support, reader, [...base, 'supports', i]));
  const hinges = (member.hinges ?? []).map((hinge, i) => ({
    position: reader.read(hinge.position, 'length', [...base, 'hinges', i, 'position']),
  }));
  return { length, supports, hinges };
}

/** A stiff bearing length: a length, zero or more; absent when not given. */
function bearingLengthOf(given: QuantityInput | undefined, reader: QuantityReader, path: Path): { bearingLength?: number } {
  if (given === undefined) return {};
  const value = reader.read(given, 'length', path);
  if (Number.isFinite(value) && value < 0) reader.fail(path, 'a bearing length cannot be negative');
  return { bearingLength: value };
}

function normaliseSupport(support: SupportInput, reader: QuantityReader, path: Path): SupportModel {
  const position = reader.read(support.position, 'length', [...path, 'position']);
  const restraints = Object.fromEntries(DIRECTIONS.map((d) => [d, 'free'])) as Record<Direction, Restraint>;
  const bearing = bearingLengthOf(support.bearingLength, reader, [...path, 'bearingLength']);
  if (support.type !== 'general') {
    for (const d of PRESET_RESTRAINED[support.type]) restraints[d] = 'rigid';
    return { position, restraints, ...bearing };
  }
  for (const d of support.restrained) restraints[d] = 'rigid';
  for (const [d, stiffness] of Object.entries(support.springs ?? {}) as [Direction, QuantityInput | undefined][]) {
    if (stiffness === undefined) continue;
    const springPath = [...path, 'springs', d];
    if (restraints[d] === 'rigid') {
      reader.fail(springPath, `${d} is already restrained rigidly; give it as a spring or as restrained, not both`);
      continue;
    }
    const kind = d.startsWith('u') ? 'translationalStiffness' : 'rotationalStiffness';
    const value = reader.read(stiffness, kind, springPath);
    if (Number.isFinite(value) && !(value > 0)) reader.fail(springPath, 'a spring stiffness must be greater than zero');
    restraints[d] = { spring: value };
  }
  return { position, restraints, ...bearing };
}

export function normaliseLoads(loads: readonly LoadInput[], reader: QuantityReader, base: Path): LoadModel[] {
  return loads.map((load, i) => normaliseLoad(load, reader, [...base, i]));
}

function normaliseLoad(load: LoadInput, reader: QuantityReader, path: Path): LoadModel {
  if (load.type === 'point') {
    const force = (value: QuantityInput | undefined, key: string) => reader.optional(value, 'force', [...path, key], 0);
    const moment = (value: QuantityInput | undefined, key: string) => reader.optional(value, 'moment', [...path, key], 0);
    return {
      kind: 'point',
      position: reader.read(load.position, 'length', [...path, 'position']),
      fx: force(load.fx, 'fx'),
      fy: force(load.fy, 'fy'),
      fz: force(load.fz, 'fz'),
      mx: moment(load.mx, 'mx'),
      my: moment(load.my, 'my'),
      mz: moment(load.mz, 'mz'),
      ...bearingLengthOf(load.bearingLength, reader, [...path, 'bearingLength']),
    };
  }
  const intensity = (
    value: QuantityInput | readonly [QuantityInput, QuantityInput] | undefined,
    kind: 'forcePerLength' | 'momentPerLength',
    key: string,
  ): LinearIntensity => {
    if (value === undefined) return [0, 0];
    if (Array.isArray(value)) {
      return [reader.read(value[0], kind, [...path, key, 0]), reader.read(value[1], kind, [...path, key, 1])];
    }
    const uniform = reader.read(value as QuantityInput, kind, [...path, key]);
    return [uniform, uniform];
  };
  return {
    kind: 'distributed',
    from: reader.read(load.from, 'length', [...path, 'from']),
    to: reader.read(load.to, 'length', [...path, 'to']),
    qx: intensity(load.qx, 'forcePerLength', 'qx'),
    qy: intensity(load.qy, 'forcePerLength', 'qy'),
    qz: intensity(load.qz, 'forcePerLength', 'qz'),
    mx: intensity(load.mx, 'momentPerLength', 'mx'),
  };
}
