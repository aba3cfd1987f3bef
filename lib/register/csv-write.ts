import Papa from 'papaparse';
import { writeNumberText } from '@/lib/units/number-text';
import type { RegisterExportRow } from '@/db/types';
import type { ConsequenceLevel, UnitSystem } from '@/lib/domain';
import { fromSI, type Quantity } from '@/lib/units';
import { escapeCell } from './csv-cells';
import { ALL_COLUMNS, columnName, ITEM_COLUMNS } from './csv-columns';

/** Writing the register as CSV: the import template in either unit system, and the export that reads back. */

/** Enough digits to read back what was stored, none of the noise of a unit conversion, and no thousands separators. */
function plain(value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '';
  return writeNumberText(value, 6);
}

function inUnits(quantity: Quantity, value: number | null | undefined, units: UnitSystem): string {
  return value === null || value === undefined ? '' : plain(fromSI(quantity, value, units));
}

function toCsv(fields: string[], data: string[][]): string {
  // The byte-order mark makes spreadsheet programs read the file as UTF-8; parseItemsCsv skips it.
  return `\uFEFF${Papa.unparse({ fields, data: data.map((row) => row.map(escapeCell)) }, { escapeFormulae: false, newline: '\r\n' })}\r\n`;
}

interface ItemCells {
  tag: string;
  description: string;
  category: string;
  quantity: string;
  mass: string;
  shape: string;
  dimensions: Partial<Record<string, string>>;
  cd: string;
  area: string;
  volume: string;
  level: string;
  height: string;
  securing: string;
  last_inspected: string;
  notes: string;
}

function itemRow(item: ItemCells): string[] {
  return ITEM_COLUMNS.map((def) => {
    if (def.key.startsWith('dim_')) return item.dimensions[def.key.slice(4)] ?? '';
    return item[def.key as Exclude<keyof ItemCells, 'dimensions'>];
  });
}

interface Example {
  tag: string;
  description: string;
  category: string;
  quantity: string;
  shape: string;
  securing: string;
  last_inspected: string;
  notes: string;
  mass: Record<UnitSystem, string>;
  dimensions: Record<UnitSystem, Record<string, string>>;
}

// Invented demonstration items with round numbers in each system, rather than one set converted into awkward decimals.
const EXAMPLES: Example[] = [
  {
    tag: 'T-001',
    description: 'Spanner, 24 mm',
    category: 'hand_tool',
    quantity: '1',
    shape: 'long_bar',
    securing: 'tethered',
    last_inspected: '2025-03-10',
    notes: 'Lanyard to the harness D-ring',
    mass: { si: '0.45', us: '1' },
    dimensions: { si: { length: '0.3', width: '0.03' }, us: { length: '1', width: '0.1' } },
  },
  {
    tag: 'B-002',
    description: 'Box of M12 bolts',
    category: 'fastener',
    quantity: '2',
    shape: 'tumbling_box',
    securing: 'unsecured',
    last_inspected: '',
    notes: 'Kept on the grating by the handrail',
    mass: { si: '6', us: '13' },
    dimensions: { si: { length: '0.3', width: '0.2', height: '0.12' }, us: { length: '1', width: '0.66', height: '0.4' } },
  },
  {
    tag: 'L-003',
    description: 'Linear LED light fitting',
    category: 'light_fitting',
    quantity: '4',
    shape: 'cylinder_side_on',
    securing: 'fixed_with_secondary',
    last_inspected: '2025-01-22',
    notes: 'Safety wire to the cable tray',
    mass: { si: '4', us: '9' },
    dimensions: { si: { length: '1.2', diameter: '0.08' }, us: { length: '4', diameter: '0.25' } },
  },
  {
    tag: 'P-004',
    description: 'Aluminium cladding panel',
    category: 'structural_part',
    quantity: '1',
    shape: 'flat_plate',
    securing: 'fixed_without_secondary',
    last_inspected: '2024-11-05',
    notes: 'Four rivets, no secondary fixing',
    mass: { si: '6', us: '13' },
    dimensions: { si: { width: '1.2', height: '0.6', thickness: '0.003' }, us: { width: '4', height: '2', thickness: '0.01' } },
  },
];

export function itemsTemplateCsv(units: UnitSystem, levelNames: string[]): string {
  const levels = levelNames.length ? levelNames : ['Level 1'];
  const data = EXAMPLES.map((e, i) =>
    itemRow({
      tag: e.tag,
      description: e.description,
      category: e.category,
      quantity: e.quantity,
      mass: e.mass[units],
      shape: e.shape,
      dimensions: e.dimensions[units],
      cd: '',
      area: '',
      volume: '',
      level: levels[i % levels.length],
      height: '',
      securing: e.securing,
      last_inspected: e.last_inspected,
      notes: e.notes,
    }),
  );
  return toCsv(
    ITEM_COLUMNS.map((d) => columnName(d, units)),
    data,
  );
}

export function registerCsv(rows: RegisterExportRow[], options: { units: UnitSystem; ladder: ConsequenceLevel[]; siteName: string }): string {
  const { units, ladder, siteName } = options;
  const rungName = new Map(ladder.map((l) => [l.id, l.name]));
  const data = rows.map((r) => [
    ...itemRow({
      tag: r.tag,
      description: r.description,
      category: r.category,
      quantity: String(r.quantity),
      mass: inUnits('mass', r.mass_kg, units),
      shape: r.shape,
      dimensions: Object.fromEntries(Object.entries(r.dimensions_m).map(([k, v]) => [k, inUnits('length', v, units)])),
      cd: plain(r.cd),
      area: inUnits('area', r.area_m2, units),
      volume: inUnits('volume', r.volume_m3, units),
      level: r.level_name,
      height: inUnits('length', r.height_override_m, units),
      securing: r.securing,
      last_inspected: r.last_inspected ?? '',
      notes: r.notes,
    }),
    siteName,
    inUnits('length', r.height_m, units),
    r.height_overridden ? 'item' : 'level',
    plain(r.fall_time_s),
    inUnits('speed', r.impact_speed_m_s, units),
    inUnits('energy', r.impact_energy_j, units),
    inUnits('energy', r.effective_energy_j, units),
    inUnits('length', r.drift_m, units),
    r.consequence_level_id ? (rungName.get(r.consequence_level_id) ?? '') : '',
    r.computed_at ?? '',
    r.model_version ?? '',
    r.compute_error ?? '',
  ]);
  return toCsv(
    ALL_COLUMNS.map((d) => columnName(d, units)),
    data,
  );
}
