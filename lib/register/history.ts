import { CATEGORY_LABELS, DIMENSION_LABELS, SECURING_LABELS, SHAPE_LABELS, type DimensionKey, type UnitSystem } from '@/lib/domain';
import { formatQuantity, type Quantity } from '@/lib/units';

/** An audit row as the item page reads it: who, when, what, and the stored SI inputs before and after. */
export interface HistoryRow {
  id: number | string;
  action: string;
  entity_type: string;
  created_at: Date;
  actor_name: string | null;
  before: unknown;
  after: unknown;
}

export interface HistoryChange {
  label: string;
  from: string;
  to: string;
}

export interface HistoryEntry {
  id: string;
  at: Date;
  what: string;
  by: string;
  changes: HistoryChange[];
}

type Shown = (value: unknown, units: UnitSystem, levels: ReadonlyMap<string, string>) => string;

const NONE = '—';
const text: Shown = (v) => (v === null || v === undefined || v === '' ? NONE : String(v));
const measured = (quantity: Quantity): Shown => (v, units) => (typeof v === 'number' ? formatQuantity(quantity, v, units, 4) : NONE);
const labelled = (labels: Record<string, string>): Shown => (v) => (typeof v === 'string' ? (labels[v] ?? v) : NONE);

/** The audited inputs of an item, in the order of its form, with the words and units a reader uses. */
const FIELDS: [key: string, label: string, show: Shown][] = [
  ['tag', 'Tag', text],
  ['description', 'Description', text],
  ['category', 'Category', labelled(CATEGORY_LABELS)],
  ['quantity', 'Quantity', text],
  ['mass_kg', 'Mass', measured('mass')],
  ['shape', 'Shape', labelled(SHAPE_LABELS)],
  ['cd', 'Drag coefficient', text],
  ['area_m2', 'Reference area', measured('area')],
  ['volume_m3', 'Volume', measured('volume')],
  ['level_id', 'Level', (v, _u, levels) => (typeof v === 'string' ? (levels.get(v) ?? 'a level since deleted') : NONE)],
  ['height_m', 'Release height', (v, units) => (typeof v === 'number' ? formatQuantity('length', v, units, 4) : "the level's floor height")],
  ['securing', 'Securing', labelled(SECURING_LABELS)],
  ['last_inspected', 'Last inspected', text],
  ['notes', 'Notes', text],
];

const same = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);
const record = (v: unknown): Record<string, unknown> => (v && typeof v === 'object' ? (v as Record<string, unknown>) : {});

function changes(before: unknown, after: unknown, units: UnitSystem, levels: ReadonlyMap<string, string>): HistoryChange[] {
  const b = record(before);
  const a = record(after);
  if (!before || !after) return [];
  const out: HistoryChange[] = [];
  for (const [key, label, show] of FIELDS) {
    if (key in a && !same(a[key], b[key])) out.push({ label, from: show(b[key], units, levels), to: show(a[key], units, levels) });
  }
  const dimsBefore = record(b.dimensions_m);
  const dimsAfter = record(a.dimensions_m);
  for (const key of new Set([...Object.keys(dimsBefore), ...Object.keys(dimsAfter)])) {
    if (same(dimsBefore[key], dimsAfter[key])) continue;
    const show = measured('length');
    out.push({ label: DIMENSION_LABELS[key as DimensionKey] ?? key, from: show(dimsBefore[key], units, levels), to: show(dimsAfter[key], units, levels) });
  }
  return out;
}

const ITEM_ACTIONS: Record<string, string> = { 'item.created': 'Added', 'item.updated': 'Changed', 'item.deleted': 'Deleted' };

/** Why a level or site entry is in an item's history: it changed what the item's fall was computed from. */
function recomputation(row: HistoryRow): string {
  const after = record(row.after);
  const name = typeof after.name === 'string' ? `“${after.name}”` : '';
  return row.entity_type === 'level'
    ? `Result recomputed: its level ${name} changed (floor height, surface or water depth)`
    : `Result recomputed: the site ${name} changed its conditions (altitude, design wind or current)`;
}

/** The item's history as a reader sees it: labelled fields in their units, and recomputations with their cause. */
export function historyEntries(rows: readonly HistoryRow[], units: UnitSystem, levels: ReadonlyMap<string, string>): HistoryEntry[] {
  return rows.map((r) => {
    const isItem = r.entity_type === 'item';
    return {
      id: String(r.id),
      at: r.created_at,
      what: isItem ? (ITEM_ACTIONS[r.action] ?? r.action) : recomputation(r),
      by: r.actor_name ?? 'a former member',
      changes: isItem ? changes(r.before, r.after, units, levels) : [],
    };
  });
}
