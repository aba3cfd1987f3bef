import type { Knex } from 'knex';

/**
 * The last line of defence behind the schemas: no quantity column can hold NaN or ±Infinity. PostgreSQL sorts NaN
 * above Infinity, so `col < 'Infinity' AND col > '-Infinity'` excludes all three; NULL passes a CHECK, so nullable
 * columns stay nullable.
 */
export const FINITE_COLUMNS: Record<string, readonly string[]> = {
  sites: ['water_depth_m', 'altitude_m', 'design_wind_m_s', 'current_m_s'],
  site_levels: ['floor_height_m', 'water_depth_m'],
  items: ['mass_kg', 'cd', 'area_m2', 'volume_m3', 'height_m', 'fall_time_s', 'impact_speed_m_s', 'impact_energy_j', 'effective_energy_j', 'drift_m'],
  consequence_levels: ['lower_bound_j'],
};

/** An item's stored result, which the next save or recompute writes again: a non-finite one is cleared, not kept. */
const RESULTS = ['fall_time_s', 'impact_speed_m_s', 'impact_energy_j', 'effective_energy_j', 'drift_m'];

const nonFinite = (column: string) => `(${column} = 'NaN' OR ${column} IN ('Infinity', '-Infinity'))`;
const constraint = (table: string, column: string) => `${table}_${column}_finite`;

export async function up(knex: Knex): Promise<void> {
  await knex.raw(
    `UPDATE items SET ${[...RESULTS, 'sinks', 'consequence_level_id'].map((c) => `${c} = NULL`).join(', ')},
            compute_error = 'The stored result was not a finite number: save the item to compute it again.'
      WHERE ${RESULTS.map(nonFinite).join(' OR ')}`,
  );
  // An input no one can know the right value of: the migration stops and names the rows rather than guess.
  const bad: string[] = [];
  for (const [table, columns] of Object.entries(FINITE_COLUMNS)) {
    for (const column of columns) {
      const rows: { id: string }[] = await knex(table).whereRaw(nonFinite(column)).select('id');
      for (const { id } of rows) bad.push(`${table}.${column} of ${id}`);
    }
  }
  if (bad.length) {
    throw new Error(`Non-finite values must be corrected by hand before this migration can run: ${bad.join('; ')}.`);
  }
  for (const [table, columns] of Object.entries(FINITE_COLUMNS)) {
    await knex.raw(
      `ALTER TABLE ${table} ${columns
        .map((c) => `ADD CONSTRAINT ${constraint(table, c)} CHECK (${c} < 'Infinity' AND ${c} > '-Infinity')`)
        .join(', ')}`,
    );
  }
}

export async function down(knex: Knex): Promise<void> {
  for (const [table, columns] of Object.entries(FINITE_COLUMNS)) {
    await knex.raw(`ALTER TABLE ${table} ${columns.map((c) => `DROP CONSTRAINT ${constraint(table, c)}`).join(', ')}`);
  }
}
