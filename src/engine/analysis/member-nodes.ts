/**
 * The nodes of a member: its ends, supports, hinges, point loads and the ends of distributed loads.
 * Ends, supports and hinges within POSITION_TOLERANCE x length of each other are one structural
 * node; a load position joins a node within LOAD_POSITION_TOLERANCE x length of it.
 */

import type { MemberModel } from '../member/model.js';
import { LOAD_POSITION_TOLERANCE, POSITION_TOLERANCE } from './tolerances.js';

export interface MemberNodes {
  readonly count: number;
  /** Ascending positions, m; the first is 0 and the last the length. */
  readonly positions: Float64Array;
  /** 1 at ends, supports and hinges: the nodes that carry degrees of freedom. */
  readonly structural: Uint8Array;
  /** 1 where a hinge releases the bending moment. */
  readonly hinge: Uint8Array;
  /** Node of each support, in model order. */
  readonly supportNode: Int32Array;
  /** Node of each point load, or of the start of each distributed load, in model order. */
  readonly loadStartNode: Int32Array;
  /** Node of each point load, or of the end of each distributed load, in model order. */
  readonly loadEndNode: Int32Array;
}

/** Positions with what put them there; a merged node takes the position of its highest-ranked item. */
class PositionList {
  readonly position: Float64Array;
  readonly rank: Uint8Array;
  readonly owner: Int32Array;
  count = 0;

  constructor(
    capacity: number,
    private readonly length: number,
  ) {
    this.position = new Float64Array(capacity);
    this.rank = new Uint8Array(capacity);
    this.owner = new Int32Array(capacity);
  }

  add(x: number, rank: number, owner: number): void {
    this.position[this.count] = Math.min(this.length, Math.max(0, x));
    this.rank[this.count] = rank;
    this.owner[this.count] = owner;
    this.count++;
  }

  /** Item indices by ascending position, then rank. */
  sorted(): Int32Array {
    const { position, rank } = this;
    const order = new Int32Array(this.count);
    for (let i = 0; i < this.count; i++) order[i] = i;
    return order.sort(
      (p, q) => (position[p] as number) - (position[q] as number) || (rank[p] as number) - (rank[q] as number),
    );
  }
}

const END = 0;
const SUPPORT = 1;
const HINGE = 2;
const LOAD_START = 0;
const LOAD_END = 1;

/** Clusters sorted items: a new cluster starts beyond `tolerance` of the current one's first item. */
function cluster(list: PositionList, order: Int32Array, tolerance: number): { positions: number[]; clusterOf: Int32Array } {
  const positions: number[] = [];
  const clusterOf = new Int32Array(list.count);
  let start = Number.NEGATIVE_INFINITY;
  let bestRank = Number.POSITIVE_INFINITY;
  for (const item of order) {
    const x = list.position[item] as number;
    if (x - start > tolerance) {
      start = x;
      bestRank = Number.POSITIVE_INFINITY;
      positions.push(x);
    }
    const node = positions.length - 1;
    if ((list.rank[item] as number) < bestRank) {
      bestRank = list.rank[item] as number;
      positions[node] = x;
    }
    clusterOf[item] = node;
  }
  return { positions, clusterOf };
}

/** Node s, else node s + 1, if it lies within the tolerance of x; -1 if neither does. */
function structuralNodeNear(positions: readonly number[], s: number, x: number, tolerance: number): number {
  for (let k = s; k <= s + 1; k++) {
    if (k < positions.length && Math.abs((positions[k] as number) - x) <= tolerance) return k;
  }
  return -1;
}

export function buildMemberNodes(model: MemberModel): MemberNodes {
  const { length, supports, hinges, loads } = model;

  const structuralItems = new PositionList(2 + supports.length + hinges.length, length);
  structuralItems.add(0, END, 0);
  structuralItems.add(length, END, 1);
  supports.forEach((support, i) => structuralItems.add(support.position, SUPPORT, i));
  hinges.forEach((hinge, i) => structuralItems.add(hinge.position, HINGE, i));
  const structuralClusters = cluster(structuralItems, structuralItems.sorted(), POSITION_TOLERANCE * length);
  const structuralPositions = structuralClusters.positions;

  // Load positions that fall on a structural node join it; the others form nodes of their own.
  const loadItems = new PositionList(2 * loads.length, length);
  loads.forEach((load, i) => {
    loadItems.add(load.kind === 'point' ? load.position : load.from, LOAD_START, i);
    loadItems.add(load.kind === 'point' ? load.position : load.to, LOAD_END, i);
  });
  const loadTolerance = LOAD_POSITION_TOLERANCE * length;
  const loadOrder = loadItems.sorted();
  const onStructural = new Int32Array(loadItems.count).fill(-1);
  const freeItems: number[] = [];
  let s = 0;
  for (const item of loadOrder) {
    const x = loadItems.position[item] as number;
    while (s + 1 < structuralPositions.length && (structuralPositions[s + 1] as number) <= x) s++;
    const nearest = structuralNodeNear(structuralPositions, s, x, loadTolerance);
    if (nearest < 0) freeItems.push(item);
    else onStructural[item] = nearest;
  }
  const loadClusters = cluster(loadItems, Int32Array.from(freeItems), loadTolerance);

  // Merge the two ascending node lists.
  const count = structuralPositions.length + loadClusters.positions.length;
  const positions = new Float64Array(count);
  const structural = new Uint8Array(count);
  const structuralIndex = new Int32Array(structuralPositions.length);
  const loadIndex = new Int32Array(loadClusters.positions.length);
  for (let i = 0, j = 0, k = 0; k < count; k++) {
    const takeStructural =
      j >= loadClusters.positions.length ||
      (i < structuralPositions.length && (structuralPositions[i] as number) <= (loadClusters.positions[j] as number));
    if (takeStructural) {
      positions[k] = structuralPositions[i] as number;
      structural[k] = 1;
      structuralIndex[i++] = k;
    } else {
      positions[k] = loadClusters.positions[j] as number;
      loadIndex[j++] = k;
    }
  }

  const hinge = new Uint8Array(count);
  const supportNode = new Int32Array(supports.length);
  for (let item = 0; item < structuralItems.count; item++) {
    const node = structuralIndex[structuralClusters.clusterOf[item] as number] as number;
    const rank = structuralItems.rank[item];
    if (rank === SUPPORT) supportNode[structuralItems.owner[item] as number] = node;
    else if (rank === HINGE) hinge[node] = 1;
  }
  const loadStartNode = new Int32Array(loads.length);
  const loadEndNode = new Int32Array(loads.length);
  for (let item = 0; item < loadItems.count; item++) {
    const node =
      (onStructural[item] as number) >= 0
        ? (structuralIndex[onStructural[item] as number] as number)
        : (loadIndex[loadClusters.clusterOf[item] as number] as number);
    const target = loadItems.rank[item] === LOAD_START ? loadStartNode : loadEndNode;
    target[loadItems.owner[item] as number] = node;
  }
  return { count, positions, structural, hinge, supportNode, loadStartNode, loadEndNode };
}
