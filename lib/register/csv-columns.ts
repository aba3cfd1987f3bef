import { isRefusedKey } from '@/lib/validation/input';
import { CATEGORY_LABELS, DIMENSIONS, ITEM_CATEGORIES, SECURING, SECURING_LABELS, SHAPE_LABELS, type UnitSystem } from '@/lib/domain';
import type { Quantity } from '@/lib/units';

/**
 * The register's CSV columns: names with their unit suffix in either system, required ones, and the choice lists a
 * cell may name by id or label.
 */

const UNIT_SUFFIX: Partial<Record<Quantity, Record<UnitSystem, string>>> = {
  length: { si: 'm', us: 'ft' },
  mass: { si: 'kg', us: 'lb' },
  area: { si: 'm2', us: 'ft2' },
  volume: { si: 'm3', us: 'ft3' },
  speed: { si: 'm_s', us: 'ft_s' },
  energy: { si: 'j', us: 'ft_lbf' },
  time: { si: 's', us: 's' },
};

interface ColumnDef {
  key: string;
  /** Set for columns whose unit is part of the name. */
  quantity?: Quantity;
  label: string;
}

const DIMENSION_COLUMNS: ColumnDef[] = DIMENSIONS.map((k) => ({
  key: `dim_${k}`,
  quantity: 'length',
  label: k[0].toUpperCase() + k.slice(1),
}));

export const ITEM_COLUMNS: ColumnDef[] = [
  { key: 'tag', label: 'Tag' },
  { key: 'description', label: 'Description' },
  { key: 'category', label: 'Category' },
  { key: 'quantity', label: 'Quantity' },
  { key: 'mass', quantity: 'mass', label: 'Mass' },
  { key: 'shape', label: 'Shape' },
  ...DIMENSION_COLUMNS,
  { key: 'cd', label: 'Drag coefficient' },
  { key: 'area', quantity: 'area', label: 'Reference area' },
  { key: 'volume', quantity: 'volume', label: 'Volume' },
  { key: 'level', label: 'Level' },
  { key: 'height', quantity: 'length', label: 'Height' },
  { key: 'securing', label: 'Securing' },
  { key: 'last_inspected', label: 'Last inspection' },
  { key: 'notes', label: 'Notes' },
];

/**
 * Stored results and the site name: written on export, accepted and ignored on import so an export reads back.
 * drop_height is the height the result was computed at and height_from says whose it is (item or level); the
 * item's own height stays in the height column, so re-importing never turns a level's height into an override.
 */
const OUTPUT_COLUMNS: ColumnDef[] = [
  { key: 'site', label: 'Site' },
  { key: 'drop_height', quantity: 'length', label: 'Drop height' },
  { key: 'height_from', label: 'Height from' },
  { key: 'fall_time', quantity: 'time', label: 'Fall time' },
  { key: 'impact_speed', quantity: 'speed', label: 'Impact speed' },
  { key: 'impact_energy', quantity: 'energy', label: 'Impact energy' },
  { key: 'effective_energy', quantity: 'energy', label: 'Effective energy' },
  { key: 'drift', quantity: 'length', label: 'Drift' },
  { key: 'consequence_level', label: 'Consequence level' },
  { key: 'computed_at', label: 'Computed at' },
  { key: 'model_version', label: 'Model version' },
  { key: 'compute_error', label: 'Compute error' },
];

export const ALL_COLUMNS = [...ITEM_COLUMNS, ...OUTPUT_COLUMNS];
export const ITEM_COLUMN_BY_KEY = new Map(ITEM_COLUMNS.map((d) => [d.key, d]));
export const REQUIRED = ['tag', 'description', 'category', 'mass', 'shape', 'level', 'securing'];

export function columnName(def: ColumnDef, units: UnitSystem): string {
  return def.quantity ? `${def.key}_${UNIT_SUFFIX[def.quantity]![units]}` : def.key;
}

export function bothNames(def: ColumnDef): string {
  const si = columnName(def, 'si');
  const us = columnName(def, 'us');
  return si === us ? si : `${si} or ${us}`;
}

const BY_NAME = new Map<string, { def: ColumnDef; units: UnitSystem }>();
for (const def of ALL_COLUMNS) {
  // US first, so a name shared by both systems (fall_time_s) reads as SI.
  BY_NAME.set(columnName(def, 'us'), { def, units: 'us' });
  BY_NAME.set(columnName(def, 'si'), { def, units: 'si' });
}

const ITEM_COLUMN_LIST = ITEM_COLUMNS.filter((d) => !d.key.startsWith('dim_') || d.key === 'dim_diameter')
  .map((d) => {
    if (d.key === 'dim_diameter') return `${DIMENSION_COLUMNS.map((x) => x.key).join(', ')} (each _m or _ft)`;
    return d.quantity ? `${d.key} (_${UNIT_SUFFIX[d.quantity]!.si} or _${UNIT_SUFFIX[d.quantity]!.us})` : d.key;
  })
  .join(', ');

type Resolved = { kind: 'column'; def: ColumnDef; units: UnitSystem } | { kind: 'problem'; key?: string; message: string };

export function resolveHeader(raw: string): Resolved {
  const name = raw.trim().toLowerCase();
  if (isRefusedKey(name)) return { kind: 'problem', message: `Column name "${name}" is not accepted.` };
  const exact = BY_NAME.get(name);
  if (exact) return { kind: 'column', ...exact };
  const unitless = ALL_COLUMNS.find((d) => d.quantity && (name === d.key || name.startsWith(`${d.key}_`)));
  if (unitless) return { kind: 'problem', key: unitless.key, message: `Unit not recognised: use ${bothNames(unitless)}.` };
  if (name.startsWith('dim_')) {
    return { kind: 'problem', message: `Dimension not recognised: use one of ${DIMENSION_COLUMNS.map((d) => d.key).join(', ')}, ending in _m or _ft.` };
  }
  return { kind: 'problem', message: `Column not recognised. Item columns are: ${ITEM_COLUMN_LIST}.` };
}

/** Lower-cased id or label to id, so a cell may carry either. */
function choiceMap(ids: readonly string[], labels: Record<string, string>): Map<string, string> {
  const map = new Map<string, string>();
  for (const id of ids) {
    map.set(id.toLowerCase(), id);
    map.set(labels[id].toLowerCase(), id);
  }
  return map;
}

export const CHOICES: Record<'category' | 'shape' | 'securing', { label: string; ids: readonly string[]; map: Map<string, string> }> = {
  category: { label: 'Category', ids: ITEM_CATEGORIES, map: choiceMap(ITEM_CATEGORIES, CATEGORY_LABELS) },
  shape: { label: 'Shape', ids: Object.keys(SHAPE_LABELS), map: choiceMap(Object.keys(SHAPE_LABELS), SHAPE_LABELS) },
  securing: { label: 'Securing', ids: SECURING, map: choiceMap(SECURING, SECURING_LABELS) },
};
