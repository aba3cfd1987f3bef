/**
 * The password hashing worker thread: scripts/bundle.mjs bundles it to .build/hash-worker.mjs and
 * lib/auth/hash-pool.ts runs it. bcryptjs is pure JavaScript, so its synchronous calls are the cheapest here: they
 * block this thread only, never the one that answers requests.
 */
import bcrypt from 'bcryptjs';

export type HashTask = { op: 'hash'; plain: string; cost: number } | { op: 'compare'; plain: string; hash: string };

export default function runHashTask(task: HashTask): string | boolean {
  if (task.op === 'hash') return bcrypt.hashSync(task.plain, task.cost);
  return bcrypt.compareSync(task.plain, task.hash);
}
