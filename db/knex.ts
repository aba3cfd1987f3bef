import knex, { type Knex } from 'knex';
import type { Socket } from 'node:net';
import { types } from 'pg';
import config from '../knexfile';

// A DATE is a calendar day, not an instant: as a Date object it would shift with the server's time zone.
types.setTypeParser(types.builtins.DATE, (value: string) => value);

/**
 * A dead or unreachable database must give a quick 503, not a request that hangs (knex waits a minute for a
 * connection by default, and a query on a connection whose host vanished waits for TCP to give up, many minutes):
 * - a new connection gets CONNECT_TIMEOUT_MS, and a request waits at most ACQUIRE_TIMEOUT_MS for one from the pool;
 * - a connection on which nothing arrives or leaves for SILENCE_MS is dropped, which fails the query it carries.
 *   Idle connections leave the pool after IDLE_MS, sooner, so only a connection in use can fall silent that long;
 *   the longest quiet spell in normal work (computing a 20,000-row import inside its transaction) is a few seconds.
 */
const CONNECT_TIMEOUT_MS = 3000;
const ACQUIRE_TIMEOUT_MS = 5000;
const IDLE_MS = 10_000;
const SILENCE_MS = 20_000;

type PgClient = { connection: { stream: Socket } };

function dropWhenSilent(client: PgClient, done: (error: Error | null, client: PgClient) => void): void {
  const socket = client.connection.stream;
  socket.setTimeout(SILENCE_MS, () => socket.destroy(new Error(`Connection terminated: nothing from the database for ${SILENCE_MS / 1000} s`)));
  done(null, client);
}

function appConfig(databaseUrl: string): Knex.Config {
  return {
    ...config,
    connection: { connectionString: databaseUrl, connectionTimeoutMillis: CONNECT_TIMEOUT_MS, keepAlive: true },
    acquireConnectionTimeout: ACQUIRE_TIMEOUT_MS,
    pool: { ...config.pool, createTimeoutMillis: CONNECT_TIMEOUT_MS, idleTimeoutMillis: IDLE_MS, afterCreate: dropWhenSilent },
  };
}

// One pool per process: Next's module reloading in development would otherwise open a pool per reload.
const globalForDb = globalThis as unknown as { plumblineDb?: Knex };

export function getDb(): Knex {
  if (!globalForDb.plumblineDb) {
    if (!process.env.DATABASE_URL) throw new Error('DATABASE_URL is not set');
    globalForDb.plumblineDb = knex(appConfig(process.env.DATABASE_URL));
  }
  return globalForDb.plumblineDb;
}

export async function closeDb(): Promise<void> {
  if (globalForDb.plumblineDb) {
    await globalForDb.plumblineDb.destroy();
    globalForDb.plumblineDb = undefined;
  }
}
