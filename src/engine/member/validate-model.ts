/**
 * The checks a member model must pass before analysis: a positive length, at least one support,
 * every support, hinge and load inside [0, length] (within POSITION_TOLERANCE x length), distributed
 * ranges that are not empty, and positive rigidities. Paths follow the request body layout
 * { member: { length, supports, hinges }, loads }.
 */

import { EngineError, type InputPath } from '../engine-error.js';
import { POSITION_TOLERANCE } from '../analysis/tolerances.js';
import type { MemberModel, MemberStiffness } from './model.js';

const RIGIDITY_NAMES: Record<keyof MemberStiffness, string> = {
  axial: 'axial rigidity EA',
  bendingZ: 'bending rigidity EIz',
  bendingY: 'bending rigidity EIy',
  torsional: 'torsional rigidity GJ',
};

/** Within [0, length], give or take POSITION_TOLERANCE x length. */
function isInside(x: number, length: number): boolean {
  const tolerance = POSITION_TOLERANCE * length;
  return x >= -tolerance && x <= length + tolerance;
}

/** The error for a position outside the member; its words are only made for a model that fails. */
function outsideMember(x: number, length: number, what: string, path: InputPath): EngineError {
  return new EngineError('outside-member', `${what} at x = ${x} m lies outside the member (0 to ${length} m).`, path);
}

export function validateMemberModel(model: MemberModel): void {
  const { length } = model;
  if (!(Number.isFinite(length) && length > 0)) {
    throw new EngineError('outside-member', `The member length must be a positive number of metres, not ${length}.`, [
      'member',
      'length',
    ]);
  }
  if (model.supports.length === 0) {
    throw new EngineError('outside-member', 'The member has no support, so nothing holds it.', ['member', 'supports']);
  }
  model.supports.forEach((support, i) => {
    if (!isInside(support.position, length)) {
      throw outsideMember(support.position, length, `Support ${i + 1}`, ['member', 'supports', i, 'position']);
    }
  });
  model.hinges.forEach((hinge, i) => {
    if (!isInside(hinge.position, length)) throw outsideMember(hinge.position, length, `Hinge ${i + 1}`, ['member', 'hinges', i, 'position']);
  });
  model.loads.forEach((load, i) => {
    if (load.kind === 'point') {
      if (!isInside(load.position, length)) throw outsideMember(load.position, length, `Load ${i + 1}`, ['loads', i, 'position']);
      return;
    }
    if (!isInside(load.from, length)) throw outsideMember(load.from, length, `The start of load ${i + 1}`, ['loads', i, 'from']);
    if (!isInside(load.to, length)) throw outsideMember(load.to, length, `The end of load ${i + 1}`, ['loads', i, 'to']);
    if (!(load.from < load.to)) {
      throw new EngineError(
        'outside-member',
        `Load ${i + 1} ends at x = ${load.to} m, not after its start at x = ${load.from} m: its range is empty.`,
        ['loads', i, 'to'],
      );
    }
  });
  for (const key of Object.keys(RIGIDITY_NAMES) as (keyof MemberStiffness)[]) {
    const value = model.stiffness[key];
    if (!(Number.isFinite(value) && value > 0)) {
      throw new EngineError('impossible-geometry', `The ${RIGIDITY_NAMES[key]} must be positive, not ${value}.`, [
        'stiffness',
        key,
      ]);
    }
  }
}
