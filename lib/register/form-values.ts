import { DIMENSIONS, REGISTER_RULES, type ItemCategory, type Securing, type SiteKind, type Surface, type UnitSystem } from '@/lib/domain';
import { dimensionsOf, type ShapeChoice } from '@/lib/shape-choice';
import type { ItemRow, LevelRow, SiteRow } from '@/db/types';
import { massSI } from '@/lib/calculator/drop-case';
import type { CalculatorValues } from '@/lib/calculator/values';
import { fromSI, type Quantity } from '@/lib/units';
import { writeNumberText } from '@/lib/units/number-text';

/**
 * Stored SI rows as the text a form (or a PATCH merge) holds in a unit system. Forms round for reading; a merge
 * keeps full precision so an untouched value comes back exactly as stored.
 */
function show(quantity: Quantity | null, value: number | null | undefined, units: UnitSystem, precise: boolean): string {
  if (value === null || value === undefined) return '';
  const v = quantity ? fromSI(quantity, value, units) : value;
  return writeNumberText(v, precise ? undefined : 6);
}

/** Text in the user's units for every number; the enums as the schema names them. */
export type SiteValues = Record<'name' | 'location' | 'water_depth' | 'altitude' | 'design_wind' | 'current' | 'notes', string> & {
  kind: SiteKind;
  surface: Surface;
};

export function siteValues(site: SiteRow | null, units: UnitSystem, precise = false): SiteValues {
  return {
    name: site?.name ?? '',
    kind: site?.kind ?? 'building',
    location: site?.location ?? '',
    surface: site?.surface ?? 'ground',
    water_depth: show('length', site?.water_depth_m, units, precise),
    altitude: show('length', site?.altitude_m ?? 0, units, precise),
    design_wind: show('speed', site?.design_wind_m_s ?? 10, units, precise),
    current: show('speed', site?.current_m_s ?? 0, units, precise),
    notes: site?.notes ?? '',
  };
}

export type LevelValues = Record<'name' | 'floor_height' | 'water_depth' | 'notes', string> & { surface: Surface };

/** A new level takes what is below, and the water depth, from its site. */
export function levelValues(level: LevelRow | null, site: Pick<SiteRow, 'surface' | 'water_depth_m'>, units: UnitSystem, precise = false): LevelValues {
  return {
    name: level?.name ?? '',
    floor_height: show('length', level?.floor_height_m, units, precise),
    surface: level?.surface ?? site.surface,
    water_depth: show('length', level ? level.water_depth_m : site.water_depth_m, units, precise),
    notes: level?.notes ?? '',
  };
}

export type ItemValues = {
  tag: string;
  description: string;
  category: ItemCategory;
  quantity: string;
  mass: string;
  shape: ShapeChoice;
  dimensions: Record<(typeof DIMENSIONS)[number], string>;
  cd: string;
  area: string;
  volume: string;
  level_id: string;
  height: string;
  securing: Securing;
  last_inspected: string;
  notes: string;
};

export function itemValues(item: Partial<ItemRow> | null, units: UnitSystem, precise = false): ItemValues {
  const dims = (item?.dimensions_m ?? {}) as Record<string, number>;
  return {
    tag: item?.tag ?? '',
    description: item?.description ?? '',
    category: item?.category ?? 'hand_tool',
    quantity: String(item?.quantity ?? 1),
    mass: show('mass', item?.mass_kg, units, precise),
    // Stored shapes passed the item schema, so they are among the choices.
    shape: (item?.shape as ShapeChoice | undefined) ?? 'tumbling_box',
    dimensions: Object.fromEntries(DIMENSIONS.map((k) => [k, show(REGISTER_RULES[k].quantity, dims[k], units, precise)])) as ItemValues['dimensions'],
    cd: show(null, item?.cd, units, precise),
    area: show('area', item?.area_m2, units, precise),
    volume: show('volume', item?.volume_m3, units, precise),
    level_id: item?.level_id ?? '',
    height: show('length', item?.height_m, units, precise),
    securing: item?.securing ?? 'unsecured',
    last_inspected: item?.last_inspected ?? '',
    notes: item?.notes ?? '',
  };
}

/**
 * "Add to register" from the calculator: the object and its height carry over; the medium and wind do not,
 * because a register item falls in its site's conditions.
 */
export function itemValuesFromCalculator(v: CalculatorValues): ItemValues {
  const base = itemValues(null, v.units);
  const dims = dimensionsOf(v.shape);
  let mass = v.mass;
  if (v.massSource === 'material' && v.shape !== 'direct') {
    try {
      mass = writeNumberText(fromSI('mass', massSI(v), v.units), 6);
    } catch {
      mass = '';
    }
  }
  return {
    ...base,
    shape: v.shape,
    dimensions: { ...base.dimensions, ...Object.fromEntries(dims.map((k) => [k, v[k]])) },
    mass,
    cd: v.cd,
    area: v.area,
    volume: v.volume,
    height: v.path === 'deck_to_sea' ? v.airGap : v.dropHeight,
  };
}
