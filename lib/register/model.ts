import type { ConsequenceLevel, ItemCategory, RegisterRow, RegisterViewRow, Securing, SiteLevelRef } from '@/lib/domain/register';

/** The register's rows packed for the wire, and back. The vocabulary and row shapes live in lib/domain/register.ts. */
const round = (v: number | null) => (v === null ? null : Number(v.toPrecision(6)));

/**
 * The register as the site page sends it to the browser: one array per row, levels and consequence levels as
 * indices. Thousands of rows as objects repeat every key and every UUID; packed, the page is a third of the size.
 */
export type PackedRow = [
  id: string,
  tag: string,
  description: string,
  category: ItemCategory,
  quantity: number,
  mass_kg: number,
  shape: string,
  level: number,
  height_m: number,
  height_overridden: 0 | 1,
  securing: Securing,
  last_inspected: string | null,
  fall_time_s: number | null,
  impact_speed_m_s: number | null,
  impact_energy_j: number | null,
  effective_energy_j: number | null,
  drift_m: number | null,
  sinks: 0 | 1 | null,
  consequence: number,
  computed_at: string | null,
  compute_error: string | null,
];

export interface PackedRegister {
  levels: SiteLevelRef[];
  consequence_ids: string[];
  rows: PackedRow[];
}

export function packRegister(rows: RegisterRow[], levels: SiteLevelRef[], ladder: Pick<ConsequenceLevel, 'id'>[]): PackedRegister {
  const levelIndex = new Map(levels.map((l, i) => [l.id, i]));
  const consequenceIndex = new Map(ladder.map((l, i) => [l.id, i]));
  return {
    levels: levels.map(({ id, name, floor_height_m }) => ({ id, name, floor_height_m })),
    consequence_ids: ladder.map((l) => l.id),
    rows: rows.map((r) => [
      r.id,
      r.tag,
      r.description,
      r.category,
      r.quantity,
      round(r.mass_kg)!,
      r.shape,
      levelIndex.get(r.level_id) ?? -1,
      round(r.height_m)!,
      r.height_overridden ? 1 : 0,
      r.securing,
      r.last_inspected,
      round(r.fall_time_s),
      round(r.impact_speed_m_s),
      round(r.impact_energy_j),
      round(r.effective_energy_j),
      round(r.drift_m),
      r.sinks === null ? null : r.sinks ? 1 : 0,
      r.consequence_level_id === null ? -1 : (consequenceIndex.get(r.consequence_level_id) ?? -1),
      r.computed_at,
      r.compute_error,
    ]),
  };
}

export function unpackRegister(packed: PackedRegister): RegisterViewRow[] {
  return packed.rows.map((p) => {
    const level = packed.levels[p[7]];
    return {
      id: p[0],
      tag: p[1],
      description: p[2],
      category: p[3],
      quantity: p[4],
      mass_kg: p[5],
      shape: p[6],
      level_id: level?.id ?? '',
      level_name: level?.name ?? '',
      height_m: p[8],
      height_overridden: p[9] === 1,
      securing: p[10],
      last_inspected: p[11],
      fall_time_s: p[12],
      impact_speed_m_s: p[13],
      impact_energy_j: p[14],
      effective_energy_j: p[15],
      drift_m: p[16],
      sinks: p[17] === null ? null : p[17] === 1,
      consequence_level_id: p[18] < 0 ? null : packed.consequence_ids[p[18]],
      computed_at: p[19],
      compute_error: p[20],
    };
  });
}
