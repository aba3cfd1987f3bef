import type { Knex } from 'knex';

/**
 * Server-side sessions, so sign-out, a password change and "sign out on every device" end a cookie at once. The
 * cookie holds a random token; the table keeps only its SHA-256, so a copy of the table signs no one in.
 * The sign-in limits count failures per account and per address as well as per pair: they need those indexes.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('sessions', (t) => {
    t.string('id_hash', 64).primary();
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE');
    t.uuid('organisation_id').notNullable().references('organisations.id').onDelete('CASCADE');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('last_seen_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('revoked_at', { useTz: true });
    t.index(['user_id']);
  });
  await knex.schema.alterTable('sign_in_attempts', (t) => {
    t.index(['email', 'created_at']);
    t.index(['address', 'created_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('sign_in_attempts', (t) => {
    t.dropIndex(['email', 'created_at']);
    t.dropIndex(['address', 'created_at']);
  });
  await knex.schema.dropTable('sessions');
}
