import { createHash } from 'node:crypto';
import { MODEL_VERSION, PhysicsInputError, PhysicsSolveError, simulateDrop, type DropCase, type DropResult, type ShapeId } from '@/lib/physics';
import { fallHeight, type FallSetting, type ItemPhysics, type LadderBound, type ResultColumns } from '@/db/results';
import { classify } from '@/lib/domain';

export { fallHeight, type FallSetting, type ItemPhysics } from '@/db/results';

/**
 * The drop case a register item stands for: released from rest at its height, through ISA air at the site's
 * altitude in the site's design wind, then (over the sea) through seawater in the site's current to the seabed.
 * Newton's quadratic law, the regime of practically every dropped object.
 */
export function itemDropCase(item: ItemPhysics, setting: FallSetting, samples = 0): DropCase {
  const object: DropCase['object'] = { mass_kg: item.mass_kg };
  if (item.shape !== 'direct') {
    object.shape = item.shape as ShapeId;
    object.dimensions_m = item.dimensions_m;
  }
  if (item.cd !== null) object.cd = item.cd;
  if (item.area_m2 !== null) object.area_m2 = item.area_m2;
  if (item.volume_m3 !== null) object.volume_m3 = item.volume_m3;
  const air = { preset: 'isa' as const, altitude_m: setting.altitude_m, temperature_offset_c: 0 };
  const height = fallHeight(item, setting);
  const base = { object, drag_model: 'quadratic' as const, ...(samples ? { samples } : {}) };
  if (setting.surface === 'water' && setting.water_depth_m) {
    const layers: NonNullable<DropCase['layers']> = [];
    if (height > 0) layers.push({ medium: air, thickness_m: height, flow_m_s: setting.design_wind_m_s });
    layers.push({ medium: { preset: 'seawater' }, thickness_m: setting.water_depth_m, flow_m_s: setting.current_m_s });
    return { ...base, layers, release: { velocity_m_s: [0, 0] } };
  }
  return { ...base, medium: air, wind_m_s: setting.design_wind_m_s, release: { height_m: height, velocity_m_s: [0, 0] } };
}

/** JSON with keys sorted at every depth: PostgreSQL's jsonb does not keep the order the keys were written in. */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>).filter(([, v]) => v !== undefined);
    return `{${entries
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
      .map(([k, v]) => `${JSON.stringify(k)}:${canonical(v)}`)
      .join(',')}}`;
  }
  return JSON.stringify(value);
}

/** Identifies the exact inputs of a stored result, model version included, so staleness can be checked. */
export function inputsHash(dropCase: DropCase): string {
  return createHash('sha256').update(canonical({ model: MODEL_VERSION, case: dropCase })).digest('hex');
}

export type ComputedResult = ResultColumns;
/** A fall solved for an item in its setting: everything stored but the consequence level, which the ladder gives. */
export type SolvedFall = Omit<ResultColumns, 'consequence_level_id'>;

function fromResult(result: DropResult, hash: string): SolvedFall {
  return {
    fall_time_s: result.fall_time_s,
    impact_speed_m_s: result.impact_speed_m_s,
    impact_energy_j: result.impact_energy_j,
    effective_energy_j: result.effective_impact_energy_j,
    drift_m: Math.abs(result.drift_m),
    sinks: result.sinks,
    model_version: result.model_version,
    inputs_hash: hash,
    compute_error: null,
  };
}

/** An item's fall with the physics core; a case the core refuses is stored as an error, never as a number. */
export function solveItem(item: ItemPhysics, setting: FallSetting): SolvedFall {
  const dropCase = itemDropCase(item, setting);
  const hash = inputsHash(dropCase);
  try {
    return fromResult(simulateDrop(dropCase), hash);
  } catch (error) {
    if (!(error instanceof PhysicsInputError) && !(error instanceof PhysicsSolveError)) throw error;
    return {
      fall_time_s: null,
      impact_speed_m_s: null,
      impact_energy_j: null,
      effective_energy_j: null,
      drift_m: null,
      sinks: null,
      model_version: MODEL_VERSION,
      inputs_hash: hash,
      compute_error: error.message,
    };
  }
}

export function classified(fall: SolvedFall, ladder: readonly LadderBound[]): ComputedResult {
  return { ...fall, consequence_level_id: classify(fall.effective_energy_j, ladder) };
}

export function computeItem(item: ItemPhysics, setting: FallSetting, ladder: readonly LadderBound[]): ComputedResult {
  return classified(solveItem(item, setting), ladder);
}
