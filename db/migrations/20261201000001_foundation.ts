import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('organisations', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.string('name', 120).notNullable();
    t.timestamps(true, true);
  });

  await knex.schema.createTable('users', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.string('email', 254).notNullable();
    t.string('password_hash', 100).notNullable();
    t.string('display_name', 120).notNullable();
    t.string('unit_system', 2).notNullable().defaultTo('si');
    t.boolean('must_change_password').notNullable().defaultTo(false);
    t.timestamps(true, true);
  });
  await knex.raw(`ALTER TABLE users ADD CONSTRAINT users_unit_system_check CHECK (unit_system IN ('si', 'us'))`);
  // E-mail addresses compare case-insensitively; the index makes that the uniqueness rule too.
  await knex.raw('CREATE UNIQUE INDEX users_email_lower_unique ON users (lower(email))');

  await knex.schema.createTable('memberships', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('organisation_id').notNullable().references('organisations.id').onDelete('CASCADE');
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE');
    t.string('role', 16).notNullable();
    t.timestamps(true, true);
    t.unique(['organisation_id', 'user_id']);
    t.index(['user_id']);
  });
  await knex.raw(
    `ALTER TABLE memberships ADD CONSTRAINT memberships_role_check CHECK (role IN ('admin', 'engineer', 'reviewer', 'viewer'))`,
  );

  await knex.schema.createTable('audit_log', (t) => {
    t.bigIncrements('id').primary();
    t.uuid('organisation_id').references('organisations.id').onDelete('SET NULL');
    t.uuid('actor_user_id').references('users.id').onDelete('SET NULL');
    t.string('action', 64).notNullable();
    t.string('entity_type', 64).notNullable();
    t.string('entity_id', 64);
    t.jsonb('before');
    t.jsonb('after');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['organisation_id', 'created_at']);
  });
  // Append-only: the foreign keys may still null a deleted actor, but no row is rewritten or removed by hand.
  await knex.raw(`
    CREATE FUNCTION audit_log_append_only() RETURNS trigger AS $$
    BEGIN
      IF TG_OP = 'DELETE' THEN
        RAISE EXCEPTION 'audit_log is append-only';
      END IF;
      IF NEW.action IS DISTINCT FROM OLD.action OR NEW.entity_type IS DISTINCT FROM OLD.entity_type
         OR NEW.entity_id IS DISTINCT FROM OLD.entity_id OR NEW.before IS DISTINCT FROM OLD.before
         OR NEW.after IS DISTINCT FROM OLD.after OR NEW.created_at IS DISTINCT FROM OLD.created_at THEN
        RAISE EXCEPTION 'audit_log is append-only';
      END IF;
      RETURN NEW;
    END $$ LANGUAGE plpgsql;
    CREATE TRIGGER audit_log_append_only BEFORE UPDATE OR DELETE ON audit_log
      FOR EACH ROW EXECUTE FUNCTION audit_log_append_only();
  `);

  await knex.schema.createTable('sign_in_attempts', (t) => {
    t.bigIncrements('id').primary();
    t.string('email', 254).notNullable();
    t.string('address', 64).notNullable();
    t.boolean('succeeded').notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['email', 'address', 'created_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('sign_in_attempts');
  await knex.schema.dropTable('audit_log');
  await knex.raw('DROP FUNCTION audit_log_append_only()');
  await knex.schema.dropTable('memberships');
  await knex.schema.dropTable('users');
  await knex.schema.dropTable('organisations');
}
