/**
 * What the one-dimensional problems of a member share: the axial and torsion bars and the two planes
 * of bending are each solved on the structural nodes (ends, supports, hinges), with loads between
 * them carried into the stiffness equations by exact fixed-end actions.
 */

import type { MemberNodes } from './member-nodes.js';

/** A loaded problem whose stiffness matrix is singular: the member moves there without deforming. */
export interface LineMechanism {
  readonly kind: 'mechanism';
  readonly motion: 'translation' | 'rotation';
  /** Index into the member nodes. */
  readonly node: number;
}

export function anyNonZero(...arrays: readonly Float64Array[]): boolean {
  for (const array of arrays) for (let i = 0; i < array.length; i++) if (array[i] !== 0) return true;
  return false;
}

/** Indices of the structural nodes, ascending. */
export function structuralNodeIndices(nodes: MemberNodes): Int32Array {
  let count = 0;
  for (let i = 0; i < nodes.count; i++) count += nodes.structural[i] as number;
  const indices = new Int32Array(count);
  for (let i = 0, k = 0; i < nodes.count; i++) if (nodes.structural[i] === 1) indices[k++] = i;
  return indices;
}

/**
 * The structural node where a mechanism's motion is largest, from the null vector of the stiffness
 * matrix: `dofOfNode[k]` is the unknown of structural node k to compare. The first of equal
 * amplitudes (within 1e-9) wins. Returns -1 when that motion is absent from the null vector.
 */
export function largestMotionNode(nullVector: Float64Array, dofOfNode: Int32Array): number {
  let largest = 0;
  for (const dof of dofOfNode) largest = Math.max(largest, Math.abs(nullVector[dof] as number));
  if (largest === 0) return -1;
  for (let k = 0; k < dofOfNode.length; k++) {
    if (Math.abs(nullVector[dofOfNode[k] as number] as number) >= (1 - 1e-9) * largest) return k;
  }
  return -1;
}
