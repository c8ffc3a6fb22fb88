/**
 * The exact linear-elastic analysis of a straight prismatic member: reactions, and every internal
 * force and displacement as a polynomial on each piece between nodes.
 *
 * analyseMember(model) -> MemberAnalysis. Example: a 6 m simple span (pin at 0, roller at 6) under
 * qy = -10 kN/m gives fy = 30 kN at each support and momentZ = 45 kN*m (sagging) at x = 3 m (wL^2/8).
 * Throws EngineError 'outside-member' for a model outside its own length (see validateMemberModel)
 * and 'unstable-member' with details { direction, position } for a loaded mechanism: a problem
 * (axial, torsion, either bending plane) that carries load and whose stiffness has a vanishing pivot.
 * An unloaded problem is not solved and its fields are zero, so rollers alone are fine without
 * axial load. Reaction components at or below ZERO_TOLERANCE of the equilibrium scales are reported
 * as 0.
 */

import { EngineError } from '../engine-error.js';
import type { Direction, MemberModel } from '../member/model.js';
import { validateMemberModel } from '../member/validate-model.js';
import { equilibriumResidual, equilibriumScales } from './equilibrium.js';
import { fieldExtremes } from './field-extremes.js';
import type { LineMechanism } from './line-problem.js';
import { buildMemberNodes, type MemberNodes } from './member-nodes.js';
import { memberPieces } from './member-pieces.js';
import { memberProblems } from './member-problems.js';
import type { MemberAnalysis, Mechanism, SupportReaction } from './result.js';
import { solveBar, type BarSolution } from './solve-bar.js';
import { solveBending, type BendingSolution } from './solve-bending.js';
import { supportReactions } from './support-reactions.js';
import { roundedToZero } from './tolerances.js';

function mechanismError(mechanism: Mechanism): EngineError {
  return new EngineError(
    'unstable-member',
    `The member is a mechanism: it can move in ${mechanism.direction} at x = ${mechanism.position} m without ` +
      'deforming. Add or stiffen a support in that direction, or remove a hinge.' +
      (mechanism.direction === 'rx'
        ? ' Nothing holds it against twist: for a shaft on bearings, add a support of type torsion-restraint where a coupling, drive or brake holds it.'
        : ''),
    ['member', 'supports'],
    { ...mechanism },
  );
}

function solvedOrThrow<T extends BarSolution | BendingSolution>(
  result: T | LineMechanism,
  nodes: MemberNodes,
  translation: Direction,
  rotation: Direction,
): T {
  if (result.kind === 'solved') return result;
  const direction = result.motion === 'translation' ? translation : rotation;
  throw mechanismError({ direction, position: nodes.positions[result.node] as number });
}

/** A pin cannot take a bending couple: a point moment my or mz at a hinge turns it freely. */
function rejectCouplesAtHinges(model: MemberModel, nodes: MemberNodes): void {
  model.loads.forEach((load, i) => {
    if (load.kind !== 'point') return;
    const node = nodes.loadStartNode[i] as number;
    if (nodes.hinge[node] !== 1 || (load.mz === 0 && load.my === 0)) return;
    const component = load.mz !== 0 ? 'mz' : 'my';
    const position = nodes.positions[node] as number;
    throw new EngineError(
      'unstable-member',
      `Load ${i + 1} applies the moment ${component} at the hinge at x = ${position} m, which the hinge cannot carry. ` +
        'Move the moment to one side of the hinge.',
      ['loads', i, component],
      { direction: component === 'mz' ? 'rz' : 'ry', position },
    );
  });
}

/** The numbers of a typed array in a plain array (Array.from of a typed array is slow in Node 20). */
function plainNumbers(values: Float64Array): number[] {
  const plain: number[] = [];
  for (let i = 0; i < values.length; i++) plain.push(values[i] as number);
  return plain;
}

export function analyseMember(model: MemberModel): MemberAnalysis {
  validateMemberModel(model);
  const nodes = buildMemberNodes(model);
  rejectCouplesAtHinges(model, nodes);
  const problems = memberProblems(model, nodes);
  const solutions = {
    axial: solvedOrThrow(solveBar(nodes, problems.axial), nodes, 'ux', 'ux'),
    vertical: solvedOrThrow(solveBending(nodes, problems.vertical), nodes, 'uy', 'rz'),
    horizontal: solvedOrThrow(solveBending(nodes, problems.horizontal), nodes, 'uz', 'ry'),
    torsion: solvedOrThrow(solveBar(nodes, problems.torsion), nodes, 'rx', 'rx'),
  };
  const pieces = memberPieces(nodes, solutions);
  const exactReactions = supportReactions(model, nodes, problems, solutions);
  const scales = equilibriumScales(model, exactReactions);
  const reactions = exactReactions.map(
    (r): SupportReaction => ({
      position: r.position,
      fx: roundedToZero(r.fx, scales.forceScale),
      fy: roundedToZero(r.fy, scales.forceScale),
      fz: roundedToZero(r.fz, scales.forceScale),
      mx: roundedToZero(r.mx, scales.momentScale),
      my: roundedToZero(r.my, scales.momentScale),
      mz: roundedToZero(r.mz, scales.momentScale),
    }),
  );
  return {
    length: model.length,
    nodes: plainNumbers(nodes.positions),
    pieces,
    reactions,
    extremes: fieldExtremes(pieces),
    equilibrium: equilibriumResidual(model, reactions, scales),
  };
}
