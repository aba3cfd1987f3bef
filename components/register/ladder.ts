import type { ConsequenceLevel, UnitSystem } from '@/lib/domain';
import { formatQuantity } from '@/lib/units';

/** Lowest level first: pages may pass the ladder in any order, but the band and the plot read upwards. */
export function ladderInOrder(ladder: ConsequenceLevel[]): ConsequenceLevel[] {
  return [...ladder].sort((a, b) => a.rank - b.rank);
}

export function ladderById(ladder: ConsequenceLevel[]): Map<string, ConsequenceLevel> {
  return new Map(ladder.map((level) => [level.id, level]));
}

/**
 * The energies a level covers, in the user's unit. The lowest level always starts at 0, so it reads better as
 * "below the next bound" than as "≥ 0".
 */
export function boundLabel(ordered: ConsequenceLevel[], index: number, units: UnitSystem): string {
  const level = ordered[index];
  const next = ordered[index + 1];
  if (level.lower_bound_j <= 0 && next) return `< ${formatQuantity('energy', next.lower_bound_j, units)}`;
  return `≥ ${formatQuantity('energy', level.lower_bound_j, units)}`;
}
