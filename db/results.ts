import type { StoredResult } from '@/lib/domain';
import type { ItemRow, LevelRow } from './types';

/**
 * What db/ needs to know of a stored fall without knowing how it is computed: the register (lib/register) solves
 * the falls and hands the write functions a ResultSource; the write functions call it for the rows they hold locked.
 */

/** The columns of an item the fall depends on. */
export type ItemPhysics = Pick<ItemRow, 'mass_kg' | 'shape' | 'dimensions_m' | 'cd' | 'area_m2' | 'volume_m3' | 'height_m'>;

/** The columns of its level and site the fall depends on. */
export interface FallSetting {
  floor_height_m: number;
  surface: LevelRow['surface'];
  water_depth_m: number | null;
  altitude_m: number;
  design_wind_m_s: number;
  current_m_s: number;
}

/** The height an item falls from: its own where one is given, else its level's floor height. */
export function fallHeight(item: Pick<ItemPhysics, 'height_m'>, setting: Pick<FallSetting, 'floor_height_m'>): number {
  return item.height_m ?? setting.floor_height_m;
}

export interface LadderBound {
  id: string;
  lower_bound_j: number;
}

/** The stored result's columns, written together whenever an item's fall is computed; the database sets computed_at. */
export type ResultColumns = Omit<StoredResult, 'computed_at'>;

/**
 * The result to store for an item in its setting, classified on the ladder. Callers solve the falls before the
 * transaction, so inside it this is a lookup; only a row changed by a concurrent writer since is solved there.
 */
export type ResultSource = (item: ItemPhysics, setting: FallSetting, ladder: readonly LadderBound[]) => ResultColumns;
