import type { Knex } from 'knex';

const FIRST_LADDER = [
  {
    rank: 1,
    name: 'Under debris threshold',
    lower_bound_j: 0,
    colour: 'haze',
    guidance: 'Good housekeeping and tool tethering where practical; hard hats in the area as site rules require.',
    source: 'Floor of the ladder: every impact energy has a level.',
  },
  {
    rank: 2,
    name: 'Injury possible',
    lower_bound_j: 14.9,
    colour: 'cord',
    guidance: 'Tether or contain the item during work; mark the area below and keep through-traffic out while work goes on.',
    source: '14 CFR Part 417, Appendix C: hazardous-debris threshold, 11 ft·lbf = 14.9 J',
  },
  {
    rank: 3,
    name: 'Beyond helmet test',
    lower_bound_j: 49,
    colour: 'brass',
    guidance: 'Barricade the drop zone below during work; tether, contain or fit secondary retention; nobody beneath while the item is handled.',
    source: 'EN 397:2012 shock-absorption test: 5 kg from 1 m, about 49 J',
  },
  {
    rank: 4,
    name: 'Hazardous fragment',
    lower_bound_j: 79,
    colour: 'flare',
    guidance: 'Hard barricade at the computed radius, permit-controlled access, secondary retention on fixed items and an inspection interval.',
    source: 'DDESB Technical Paper 12: hazardous-fragment criterion, 58 ft·lbf = 79 J',
  },
  {
    rank: 5,
    name: 'Beyond net test',
    lower_bound_j: 6867,
    colour: 'plum',
    guidance: 'Eliminate or engineer out: a lift plan, no one in the fall zone, and protection designed for the load, not a net or a helmet.',
    source: 'EN 1263-1:2014 safety-net dynamic test: 100 kg from 7 m, about 6.87 kJ',
  },
];;

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('consequence_levels', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('organisation_id').notNullable().references('organisations.id').onDelete('CASCADE');
    t.integer('rank').notNullable();
    t.string('name', 60).notNullable();
    t.double('lower_bound_j').notNullable();
    t.string('colour', 16).notNullable();
    t.text('guidance').notNullable().defaultTo('');
    t.string('source', 300).notNullable().defaultTo('');
    t.timestamps(true, true);
    t.unique(['organisation_id', 'rank']);
  });
  await knex.raw('ALTER TABLE consequence_levels ADD CONSTRAINT consequence_levels_bound_check CHECK (lower_bound_j >= 0)');
  // Organisations created before the register existed get the ladder a new one started with when this migration
  // was written. The values are frozen here: a later change to the live default ladder must not rewrite history.
  const organisations: { id: string }[] = await knex('organisations').select('id');
  for (const { id } of organisations) {
    await knex('consequence_levels').insert(FIRST_LADDER.map((l) => ({ ...l, organisation_id: id })));
  }

  await knex.schema.createTable('sites', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('organisation_id').notNullable().references('organisations.id').onDelete('CASCADE');
    t.string('name', 120).notNullable();
    t.string('kind', 20).notNullable();
    t.string('location', 200).notNullable().defaultTo('');
    t.string('surface', 10).notNullable();
    t.double('water_depth_m');
    t.double('altitude_m').notNullable().defaultTo(0);
    t.double('design_wind_m_s').notNullable();
    t.double('current_m_s').notNullable().defaultTo(0);
    t.text('notes').notNullable().defaultTo('');
    t.timestamps(true, true);
    t.index(['organisation_id']);
  });
  await knex.raw('CREATE UNIQUE INDEX sites_org_name_unique ON sites (organisation_id, lower(name))');
  await knex.raw(
    `ALTER TABLE sites ADD CONSTRAINT sites_kind_check CHECK (kind IN ('building', 'crane', 'wind_turbine', 'offshore_deck', 'bridge', 'other')),
       ADD CONSTRAINT sites_surface_check CHECK (surface IN ('ground', 'deck', 'water')),
       ADD CONSTRAINT sites_water_check CHECK ((surface = 'water') = (water_depth_m IS NOT NULL))`,
  );

  await knex.schema.createTable('site_levels', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('organisation_id').notNullable().references('organisations.id').onDelete('CASCADE');
    t.uuid('site_id').notNullable().references('sites.id').onDelete('CASCADE');
    t.string('name', 80).notNullable();
    t.double('floor_height_m').notNullable();
    t.string('surface', 10).notNullable();
    t.double('water_depth_m');
    t.text('notes').notNullable().defaultTo('');
    t.timestamps(true, true);
    t.index(['site_id']);
  });
  await knex.raw('CREATE UNIQUE INDEX site_levels_site_name_unique ON site_levels (site_id, lower(name))');
  await knex.raw(
    `ALTER TABLE site_levels ADD CONSTRAINT site_levels_surface_check CHECK (surface IN ('ground', 'deck', 'water')),
       ADD CONSTRAINT site_levels_water_check CHECK ((surface = 'water') = (water_depth_m IS NOT NULL)),
       ADD CONSTRAINT site_levels_height_check CHECK (floor_height_m >= 0)`,
  );

  await knex.schema.createTable('items', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('organisation_id').notNullable().references('organisations.id').onDelete('CASCADE');
    t.uuid('site_id').notNullable().references('sites.id').onDelete('CASCADE');
    // A level with items cannot be deleted: the register would silently lose them.
    t.uuid('level_id').notNullable().references('site_levels.id').onDelete('RESTRICT');
    t.string('tag', 40).notNullable();
    t.string('description', 200).notNullable();
    t.string('category', 24).notNullable();
    t.integer('quantity').notNullable().defaultTo(1);
    t.double('mass_kg').notNullable();
    t.string('shape', 24).notNullable();
    t.jsonb('dimensions_m').notNullable().defaultTo('{}');
    t.double('cd');
    t.double('area_m2');
    t.double('volume_m3');
    t.double('height_m');
    t.string('securing', 24).notNullable();
    t.date('last_inspected');
    t.text('notes').notNullable().defaultTo('');
    // The stored result: what the physics core gave for exactly the inputs hashed in inputs_hash.
    t.double('fall_time_s');
    t.double('impact_speed_m_s');
    t.double('impact_energy_j');
    t.double('effective_energy_j');
    t.double('drift_m');
    t.boolean('sinks');
    t.uuid('consequence_level_id').references('consequence_levels.id').onDelete('SET NULL');
    t.string('model_version', 40);
    t.string('inputs_hash', 64);
    t.timestamp('computed_at', { useTz: true });
    t.text('compute_error');
    t.timestamps(true, true);
    t.index(['site_id', 'level_id']);
    t.index(['organisation_id']);
  });
  await knex.raw('CREATE UNIQUE INDEX items_site_tag_unique ON items (site_id, lower(tag))');
  await knex.raw(
    `ALTER TABLE items ADD CONSTRAINT items_mass_check CHECK (mass_kg > 0),
       ADD CONSTRAINT items_quantity_check CHECK (quantity >= 1),
       ADD CONSTRAINT items_securing_check CHECK (securing IN ('unsecured', 'tethered', 'contained', 'fixed_with_secondary', 'fixed_without_secondary'))`,
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('items');
  await knex.schema.dropTable('site_levels');
  await knex.schema.dropTable('sites');
  await knex.schema.dropTable('consequence_levels');
}
