import knex, { type Knex } from 'knex';
import { types } from 'pg';
import config from '../knexfile';

// A DATE is a calendar day, not an instant: as a Date object it would shift with the server's time zone.
types.setTypeParser(types.builtins.DATE, (value: string) => value);

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
