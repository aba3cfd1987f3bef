import type { Knex } from 'knex';

// The start and test scripts export DATABASE_URL; the app never falls back to a built-in address.
const config: Knex.Config = {
  client: 'pg',
  connection: process.env.DATABASE_URL,
  pool: { min: 0, max: 10 },
  migrations: {
    directory: './db/migrations',
    extension: 'ts',
    loadExtensions: ['.ts'],
    tableName: 'knex_migrations',
  },
};

export default config;
