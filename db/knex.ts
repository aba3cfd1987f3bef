import knex, { type Knex } from 'knex';
import config from '../knexfile';

// One pool per process: Next's module reloading in development would otherwise open a pool per reload.
const globalForDb = globalThis as unknown as { plumblineDb?: Knex };

export function getDb(): Knex {
  if (!globalForDb.plumblineDb) {
    if (!process.env.DATABASE_URL) throw new Error('DATABASE_URL is not set');
    globalForDb.plumblineDb = knex(config);
  }
  return globalForDb.plumblineDb;
}

export async function closeDb(): Promise<void> {
  if (globalForDb.plumblineDb) {
    await globalForDb.plumblineDb.destroy();
    globalForDb.plumblineDb = undefined;
  }
}
