import type { Knex } from 'knex';

/** Pruning old sign-in attempts (db/sign-in-attempts.ts) deletes by age alone: it needs an index on created_at. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('sign_in_attempts', (t) => t.index(['created_at']));
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('sign_in_attempts', (t) => t.dropIndex(['created_at']));
}
