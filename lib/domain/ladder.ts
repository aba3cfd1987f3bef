import type { ConsequenceLevel } from './register';

/**
 * The one rule that puts an energy on the ladder: the level whose bound is the highest at or below it. Ladders
 * start at 0 J, so every finite energy has a level; no energy (no result) has none. Stored items are classified by
 * this function only, when their fall is computed and when the ladder is replaced (db/consequence-levels.ts).
 */
export function classify(energyJ: number | null, ladder: readonly Pick<ConsequenceLevel, 'id' | 'lower_bound_j'>[]): string | null {
  if (energyJ === null || !Number.isFinite(energyJ)) return null;
  let found: string | null = null;
  let bound = -Infinity;
  for (const level of ladder) {
    if (level.lower_bound_j <= energyJ && level.lower_bound_j > bound) {
      found = level.id;
      bound = level.lower_bound_j;
    }
  }
  return found;
}
