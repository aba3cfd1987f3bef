import 'server-only';
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
 * - a connection whose query has had no byte back for SILENCE_MS is dropped, which fails that query. Only a query
 *   waiting for its answer counts: a transaction computing between statements (a 20,000-row import) stays quiet
 *   for as long as it needs. pg's own query_timeout is not enough: it fails the query but leaves the connection
 *   waiting for the lost reply, so the pool would hand the dead connection to the next request.
 */
const CONNECT_TIMEOUT_MS = 3000;
const ACQUIRE_TIMEOUT_MS = 5000;
const IDLE_MS = 10_000;
const SILENCE_MS = 30_000;

type PgClient = { connection: { stream: Socket }; _getActiveQuery?: () => unknown };

function dropWhenSilent(client: PgClient, done: (error: Error | null, client: PgClient) => void): void {
  const socket = client.connection.stream;
  socket.setTimeout(SILENCE_MS);
  // A listener with `on`, not setTimeout's callback (a `once`): the timer re-arms at the next byte after firing.
  socket.on('timeout', () => {
    // A pg without this hook is treated as always waiting for an answer.
    const waiting = typeof client._getActiveQuery === 'function' ? client._getActiveQuery() != null : true;
    if (waiting) socket.destroy(new Error(`Connection terminated: no answer from the database for ${SILENCE_MS / 1000} s`));
  });
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
