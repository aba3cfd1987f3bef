/**
 * The drop solver's worker thread: scripts/bundle.mjs bundles it to .build/drop-worker.mjs and lib/compute/drop-pool.ts
 * runs it. Physics errors come back as values, because an error's class does not survive the thread boundary; the
 * answer comes back as the JSON text the route sends, so the request thread neither copies nor serialises it.
 */
import { PhysicsInputError, PhysicsSolveError, simulateDrop, type DropCase } from '@/lib/physics';

export interface DropTask {
  cases: DropCase[];
  /** Answer an array (the request was an array) or the one result. */
  batch: boolean;
}

export type DropOutcome =
  | { ok: true; json: string }
  | { ok: false; index: number; kind: 'input'; field: string; detail: string }
  | { ok: false; index: number; kind: 'solve'; message: string };

export default function solveDrops({ cases, batch }: DropTask): DropOutcome {
  const results = [];
  for (const [index, c] of cases.entries()) {
    try {
      results.push(simulateDrop(c));
    } catch (error) {
      if (error instanceof PhysicsInputError) return { ok: false, index, kind: 'input', field: error.field, detail: error.detail };
      if (error instanceof PhysicsSolveError) return { ok: false, index, kind: 'solve', message: error.message };
      throw error;
    }
  }
  return { ok: true, json: JSON.stringify(batch ? results : results[0]) };
}
