import 'server-only';
import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import path from 'node:path';
import { Piscina } from 'piscina';
import { UnavailableError } from '@/lib/errors';
import type { HashTask } from './hash-worker';

/**
 * Server-only: bcrypt on worker threads, so a flood of sign-ins costs hashing threads, never the event loop. One or
 * two threads (one fewer than the cores): hashing competes with the drop solver's pool for the same cores.
 */
const WORKER_FILE = path.join(process.cwd(), '.build', 'hash-worker.mjs');
const HASH_THREADS = Math.max(1, Math.min(2, availableParallelism() - 1));

/**
 * Hashes admitted at once, running and waiting. At cost 12 one hash takes about a quarter of a second on one thread
 * here, so a full queue is a few seconds of work; beyond it a sign-in is answered 503 at once rather than queued.
 */
export const HASH_QUEUE_LIMIT = HASH_THREADS + 16;
const HASH_RETRY_AFTER_S = 2;
const HASH_BUSY = `Plumbline is busy checking other sign-ins: try again in ${HASH_RETRY_AFTER_S} seconds.`;

interface PoolState {
  pool: Piscina<HashTask, string | boolean>;
  admitted: number;
}

// One pool per process, like the drop solver's: module reloading in development would otherwise start more threads.
const holder = globalThis as unknown as { plumblineHashPool?: PoolState };

function state(): PoolState {
  if (!holder.plumblineHashPool) {
    if (!existsSync(WORKER_FILE)) throw new Error(`${WORKER_FILE} is missing: run "node scripts/bundle.mjs" from the project root`);
    const pool = new Piscina<HashTask, string | boolean>({
      filename: WORKER_FILE,
      minThreads: HASH_THREADS,
      maxThreads: HASH_THREADS,
      idleTimeout: 60_000,
    });
    holder.plumblineHashPool = { pool, admitted: 0 };
  }
  return holder.plumblineHashPool;
}

/** The error a full pool answers with (HTTP 503 and Retry-After). */
export function busyError(): UnavailableError {
  return new UnavailableError(HASH_BUSY, HASH_RETRY_AFTER_S);
}

/** True when the next task would be refused: callers with database work before the hash check this first. */
export function hashPoolFull(): boolean {
  return hashesInHand() >= HASH_QUEUE_LIMIT;
}

/** Runs one task off the event loop, or throws UnavailableError (HTTP 503) when HASH_QUEUE_LIMIT are in hand. */
export async function runHash<T extends string | boolean>(task: HashTask): Promise<T> {
  const s = state();
  if (s.admitted >= HASH_QUEUE_LIMIT) throw busyError();
  s.admitted += 1;
  try {
    return (await s.pool.run(task)) as T;
  } finally {
    s.admitted -= 1;
  }
}

/** Hashes in hand (running and waiting): for tests and the bench. */
export function hashesInHand(): number {
  return holder.plumblineHashPool?.admitted ?? 0;
}

/** Stops the threads; scripts that hash call it before they exit, as they close the database. */
export async function closeHashPool(): Promise<void> {
  const s = holder.plumblineHashPool;
  holder.plumblineHashPool = undefined;
  if (s) await s.pool.destroy();
}
