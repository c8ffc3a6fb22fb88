/**
 * Ranking sizing candidates: those that pass first, ordered by the objective; then those that fail,
 * closest to passing (lowest utilization) first. Ties fall back to mass, then to the given order.
 */

export type SizingObjective = 'lightest' | 'shallowest' | 'least-utilization';

export const SIZING_OBJECTIVES: readonly SizingObjective[] = ['lightest', 'shallowest', 'least-utilization'];

export interface RankableCandidate {
  /** Position in the candidate list as given. */
  readonly index: number;
  /** kg/m */
  readonly massPerLength: number;
  /** Overall depth along y, m; undefined when unknown (ranked last by 'shallowest'). */
  readonly depth: number | undefined;
  /** The governing utilization; 0 with no demand. */
  readonly utilization: number;
  readonly passes: boolean;
}

function objectiveKey(candidate: RankableCandidate, objective: SizingObjective): number {
  switch (objective) {
    case 'lightest':
      return candidate.massPerLength;
    case 'shallowest':
      return candidate.depth ?? Number.MAX_VALUE;
    case 'least-utilization':
      return candidate.utilization;
  }
}

export function rankCandidates<C extends RankableCandidate>(candidates: readonly C[], objective: SizingObjective): C[] {
  return [...candidates].sort((a, b) => {
    if (a.passes !== b.passes) return a.passes ? -1 : 1;
    const primary = a.passes ? objectiveKey(a, objective) - objectiveKey(b, objective) : a.utilization - b.utilization;
    return primary || a.massPerLength - b.massPerLength || a.utilization - b.utilization || a.index - b.index;
  });
}
