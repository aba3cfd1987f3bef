import 'server-only';
import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import path from 'node:path';
import { Piscina } from 'piscina';
import { UnavailableError } from '@/lib/errors';
import { DROP_COST_LIMIT } from './drop-cost';
import type { DropOutcome, DropTask } from './drop-worker';

/**
 * Server-only: solves drop requests on worker threads, so a heavy request costs a solver thread, never the thread
 * that answers every other request. One thread fewer than the cores (at least one) leaves a core for that thread.
 */
const WORKER_FILE = path.join(process.cwd(), '.build', 'drop-worker.mjs');
const THREADS = Math.max(1, availableParallelism() - 1);

/**
 * Work admitted at once (running and queued), in cost units: four requests at the per-request limit, at most about
 * 1.6 s of solving and usually far less; fifty calculator-sized requests take a twentieth of it. Beyond it a
 * request is answered 503 at once rather than queued behind an unbounded backlog.
 */
export const QUEUE_COST_LIMIT = 4 * DROP_COST_LIMIT;
const RETRY_AFTER_S = 2;

interface PoolState {
  pool: Piscina<DropTask, DropOutcome>;
  admitted: number;
}

// One pool per process, like the database's: module reloading in development would otherwise start more threads.
const holder = globalThis as unknown as { plumblineDropPool?: PoolState };

function state(): PoolState {
  if (!holder.plumblineDropPool) {
    if (!existsSync(WORKER_FILE)) throw new Error(`${WORKER_FILE} is missing: run "node scripts/bundle.mjs" from the project root`);
    const pool = new Piscina<DropTask, DropOutcome>({
      filename: WORKER_FILE,
      minThreads: THREADS,
      maxThreads: THREADS,
      idleTimeout: 60_000,
      // A runaway case costs its worker (restarted by the pool), not the server's memory.
      resourceLimits: { maxOldGenerationSizeMb: 256 },
    });
    holder.plumblineDropPool = { pool, admitted: 0 };
  }
  return holder.plumblineDropPool;
}

/** Solves the task off the request thread; `cost` (lib/compute/drop-cost.ts) is what the task counts against the queue. */
export async function solveOffThread(task: DropTask, cost: number): Promise<DropOutcome> {
  const s = state();
  if (s.admitted + cost > QUEUE_COST_LIMIT) {
    throw new UnavailableError(`The drop solver is busy with other requests: try again in ${RETRY_AFTER_S} seconds.`, RETRY_AFTER_S);
  }
  s.admitted += cost;
  try {
    return await s.pool.run(task);
  } finally {
    s.admitted -= cost;
  }
}

export async function closeDropPool(): Promise<void> {
  const s = holder.plumblineDropPool;
  holder.plumblineDropPool = undefined;
  if (s) await s.pool.destroy();
}
