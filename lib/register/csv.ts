import Papa from 'papaparse';
import type { z } from 'zod';
import { DIMENSIONS, SHAPE_LABELS, type UnitSystem } from '@/lib/domain';
import { dimensionsOf, type ShapeChoice } from '@/lib/shape-choice';
import { fromSI, type Quantity } from '@/lib/units';
import { itemSchema, type ItemInput } from '@/lib/validation/item';
import { isRefusedKey } from '@/lib/validation/input';
import { writeNumberText } from '@/lib/units/number-text';
import { quantityField } from '@/lib/validation/quantity';
import { escapeCell, unescapeCell } from './csv-cells';
import {
  CATEGORY_LABELS,
  ITEM_CATEGORIES,
  SECURING,
  SECURING_LABELS,
  type ConsequenceLevel,
  type RegisterRow,
} from '@/lib/domain';

/**
 * CSV import and export of the register of items at height. Units travel in the header ("mass_lb"), so a file says
 * what its numbers mean and each quantity column may use either system.
 */
export const CSV_LIMITS = { maxBytes: 5 * 1024 * 1024, maxRows: 20_000 } as const;

export interface CsvProblem {
  /** Physical line in the file, 1-based (1 is the header); 0 for the file as a whole. */
  line: number;
  /** The header name as given, or '' for whole-row and file problems. */
  column: string;
  message: string;
}

export interface CsvImport {
  columns: string[];
  total_rows: number;
  valid: { line: number; item: ItemInput }[];
  problems: CsvProblem[];
  invalid_lines: number;
  preview: { line: number; cells: Record<string, string> }[];
  fatal: boolean;
}

/** A register line with the item inputs the table does not show, so an export can be re-imported. */
export type RegisterExportRow = RegisterRow & {
  dimensions_m: Record<string, number>;
  cd: number | null;
  area_m2: number | null;
  volume_m3: number | null;
  notes: string;
  height_override_m: number | null;
};

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

const ITEM_COLUMNS: ColumnDef[] = [
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

/** Stored results and the site name: written on export, accepted and ignored on import so an export reads back. */
const OUTPUT_COLUMNS: ColumnDef[] = [
  { key: 'site', label: 'Site' },
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

const ALL_COLUMNS = [...ITEM_COLUMNS, ...OUTPUT_COLUMNS];
const ITEM_COLUMN_BY_KEY = new Map(ITEM_COLUMNS.map((d) => [d.key, d]));
const REQUIRED = ['tag', 'description', 'category', 'mass', 'shape', 'level', 'securing'];

function columnName(def: ColumnDef, units: UnitSystem): string {
  return def.quantity ? `${def.key}_${UNIT_SUFFIX[def.quantity]![units]}` : def.key;
}

function bothNames(def: ColumnDef): string {
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

function resolveHeader(raw: string): Resolved {
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

const CHOICES: Record<'category' | 'shape' | 'securing', { label: string; ids: readonly string[]; map: Map<string, string> }> = {
  category: { label: 'Category', ids: ITEM_CATEGORIES, map: choiceMap(ITEM_CATEGORIES, CATEGORY_LABELS) },
  shape: { label: 'Shape', ids: Object.keys(SHAPE_LABELS), map: choiceMap(Object.keys(SHAPE_LABELS), SHAPE_LABELS) },
  securing: { label: 'Securing', ids: SECURING, map: choiceMap(SECURING, SECURING_LABELS) },
};

function utf8Bytes(text: string): number {
  // Every UTF-16 unit is at most 3 UTF-8 bytes, so most files need no encoding to be measured.
  if (text.length * 3 <= CSV_LIMITS.maxBytes) return text.length;
  return new TextEncoder().encode(text).length;
}

/** Rows arrive in order, so each line break is counted once as the text is walked forward. */
function lineCounter(text: string) {
  const newline = text.includes('\n') ? '\n' : '\r';
  let offset = 0;
  let line = 1;
  return (to: number): number => {
    for (let i = text.indexOf(newline, offset); i !== -1 && i < to; i = text.indexOf(newline, i + 1)) line += 1;
    offset = Math.max(offset, to);
    return line;
  };
}

interface RawRow {
  line: number;
  cells: string[];
}

type Readout = { rows: RawRow[]; problem?: CsvProblem };

function readRows(text: string): Readout {
  const rows: RawRow[] = [];
  const lineAt = lineCounter(text);
  let start = 0;
  let dataRows = 0;
  let problem: CsvProblem | undefined;
  Papa.parse<string[]>(text, {
    delimiter: ',',
    step(result, parser) {
      const line = lineAt(start);
      start = result.meta.cursor;
      const quoteError = result.errors.find((e) => e.type === 'Quotes');
      if (quoteError) {
        const where = lineCounter(text)(quoteError.index ?? start);
        problem = {
          line: where,
          column: '',
          message:
            quoteError.code === 'MissingQuotes'
              ? `The file could not be read as CSV: a quoted cell opened on line ${where} is never closed.`
              : `The file could not be read as CSV: a quoted cell on line ${where} has text after its closing quote (a quote inside a cell is written "").`,
        };
        parser.abort();
        return;
      }
      const cells = result.data;
      if (cells.every((c) => c.trim() === '')) return;
      if (rows.length > 0) dataRows += 1;
      if (dataRows > CSV_LIMITS.maxRows) {
        problem = { line: 0, column: '', message: `The file has more than ${CSV_LIMITS.maxRows.toLocaleString('en-GB')} rows: split it into smaller files.` };
        parser.abort();
        return;
      }
      rows.push({ line, cells });
    },
  });
  return { rows, problem };
}

interface Layout {
  columns: string[];
  /** By column key (tag, mass, dim_length …): where it is and which unit system its name declares. */
  at: Map<string, { index: number; units: UnitSystem }>;
  majority: UnitSystem;
  problems: CsvProblem[];
}

function readHeader(header: string[], line: number): Layout {
  let width = header.length;
  while (width > 0 && header[width - 1].trim() === '') width -= 1;
  const columns = header.slice(0, width);
  const at = new Map<string, { index: number; units: UnitSystem }>();
  const problems: CsvProblem[] = [];
  /** Keys whose column is there but with a unit we do not read: not also reported as missing. */
  const misnamed = new Set<string>();
  columns.forEach((raw, index) => {
    if (raw.trim() === '') {
      problems.push({ line, column: '', message: `Column ${index + 1} has no name in the header.` });
      return;
    }
    const resolved = resolveHeader(raw);
    if (resolved.kind === 'problem') {
      if (resolved.key) misnamed.add(resolved.key);
      problems.push({ line, column: raw, message: resolved.message });
      return;
    }
    const seen = at.get(resolved.def.key);
    if (seen) {
      const first = columns[seen.index];
      const message = resolved.def.quantity
        ? `${resolved.def.label} is given twice (${first} and ${raw}): keep one column.`
        : `Column ${raw} is given twice: keep one.`;
      problems.push({ line, column: raw, message });
      return;
    }
    at.set(resolved.def.key, { index, units: resolved.units });
  });
  for (const key of REQUIRED) {
    if (at.has(key) || misnamed.has(key)) continue;
    const def = ITEM_COLUMN_BY_KEY.get(key)!;
    problems.push({ line, column: '', message: `Required column missing: ${bothNames(def)}.` });
  }
  const count = { si: 0, us: 0 };
  for (const def of ITEM_COLUMNS) {
    const place = def.quantity ? at.get(def.key) : undefined;
    if (place) count[place.units] += 1;
  }
  const majority: UnitSystem = count.si === count.us ? (at.get('mass')?.units ?? 'si') : count.si > count.us ? 'si' : 'us';
  return { columns, at, majority, problems };
}

const OTHER: Record<UnitSystem, UnitSystem> = { si: 'us', us: 'si' };
type Issue = z.ZodError['issues'][number];

const SI_FIELD = { mass: 'mass_kg', area: 'area_m2', volume: 'volume_m3', height: 'height_m' } as const;

/** Where each unit column lands in the parsed item. */
const UNIT_FIELDS = ITEM_COLUMNS.filter((d) => d.quantity).map((def) => ({
  def,
  dimension: def.key.startsWith('dim_') ? def.key.slice(4) : null,
  siField: def.key in SI_FIELD ? SI_FIELD[def.key as keyof typeof SI_FIELD] : null,
}));

// Reads a number as the project's forms do (decimal comma, blanks), without limits: limits are the item schema's.
const READERS = new Map(
  UNIT_FIELDS.map(({ def }) => {
    const rule = { label: def.label, quantity: def.quantity! };
    return [def.key, { si: quantityField(rule, 'si', false), us: quantityField(rule, 'us', false) }];
  }),
);

function pathKey(path: readonly PropertyKey[]): string {
  if (path[0] === 'dimensions' && path.length > 1) return `dimensions.${String(path[1])}`;
  if (path[0] === 'level_id') return 'level';
  return path.length ? String(path[0]) : '';
}

function columnKeyOf(path: string): string {
  return path.startsWith('dimensions.') ? `dim_${path.slice(11)}` : path;
}

/** A row's cells by column name, for the preview; a refused column name is left out rather than made a key. */
function previewCells(columns: string[], cells: string[]): Record<string, string> {
  const out: Record<string, string> = Object.create(null);
  columns.forEach((column, i) => {
    if (!isRefusedKey(column.trim().toLowerCase())) out[column] = cells[i] ?? '';
  });
  return out;
}

export function parseItemsCsv(text: string, options: { levels: { id: string; name: string }[]; existingTags: string[] }): CsvImport {
  const empty = (problem: CsvProblem): CsvImport => ({
    columns: [],
    total_rows: 0,
    valid: [],
    problems: [problem],
    invalid_lines: 0,
    preview: [],
    fatal: true,
  });
  if (utf8Bytes(text) > CSV_LIMITS.maxBytes) {
    return empty({ line: 0, column: '', message: `The file is larger than ${CSV_LIMITS.maxBytes / 1024 / 1024} MB: split it into smaller files.` });
  }
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const { rows, problem: readProblem } = readRows(body);
  if (rows.length === 0 && !readProblem) return empty({ line: 0, column: '', message: 'The file is empty.' });

  const header = readHeader(rows[0]?.cells ?? [], rows[0]?.line ?? 1);
  const dataRows = rows.slice(1);
  const preview = dataRows.slice(0, 10).map((r) => ({
    line: r.line,
    cells: previewCells(header.columns, r.cells),
  }));
  const base = { columns: header.columns, total_rows: dataRows.length, preview };
  const fileProblems = [...(readProblem ? [readProblem] : []), ...(rows.length ? header.problems : [])];
  if (!readProblem && dataRows.length === 0) fileProblems.push({ line: 0, column: '', message: 'The file has a header but no rows of items below it.' });
  if (fileProblems.length) return { ...base, valid: [], problems: sortProblems(fileProblems, header.columns), invalid_lines: 0, fatal: true };

  const { at, majority } = header;
  const fromExport = at.has('model_version');
  const minority = OTHER[majority];
  const schemas: Record<UnitSystem, ReturnType<typeof itemSchema>> = { si: itemSchema('si'), us: itemSchema('us') };
  const levelIds = new Map<string, string>();
  for (const level of options.levels) {
    const key = level.name.trim().toLowerCase();
    if (!levelIds.has(key)) levelIds.set(key, level.id);
  }
  const levelList =
    options.levels.length === 0
      ? 'the site has no levels yet'
      : `the site has ${options.levels
          .slice(0, 8)
          .map((l) => l.name)
          .join(', ')}${options.levels.length > 8 ? ` and ${options.levels.length - 8} more` : ''}`;
  const existing = new Set(options.existingTags.map((t) => t.trim().toLowerCase()));
  const firstLineOfTag = new Map<string, number>();

  const valid: CsvImport['valid'] = [];
  const problems: CsvProblem[] = [];
  const badLines = new Set<number>();

  for (const row of dataRows) {
    // Only an export escaped its cells; any other file is read exactly as typed, apostrophes and all.
    const cells = fromExport ? row.cells.map(unescapeCell) : row.cells;
    const cell = (key: string): string | undefined => {
      const place = at.get(key);
      return place ? cells[place.index] : undefined;
    };
    const found: CsvProblem[] = [];
    const add = (key: string, message: string) => {
      const place = at.get(key);
      found.push({ line: row.line, column: place ? header.columns[place.index] : '', message });
    };
    /** Schema fields this file already judged, whose schema message would only repeat the point less clearly. */
    const judged = new Set<string>();

    if (cells.slice(header.columns.length).some((c) => c.trim() !== '')) {
      found.push({ line: row.line, column: '', message: `This row has more cells than the header has columns (${header.columns.length}).` });
    }

    const choice = (key: 'category' | 'shape' | 'securing'): string | undefined => {
      const typed = (cell(key) ?? '').trim();
      const { label, ids, map } = CHOICES[key];
      const id = map.get(typed.toLowerCase());
      if (id) return id;
      judged.add(key);
      add(key, typed ? `${label} "${typed}" not recognised: use one of ${ids.join(', ')}, or its label as Plumbline shows it.` : `${label} is required.`);
      return undefined;
    };
    const category = choice('category');
    const shape = choice('shape');
    const securing = choice('securing');

    const levelName = (cell('level') ?? '').trim();
    // The template escapes level names as an export does, though it is no export.
    const levelId = levelIds.get(levelName.toLowerCase()) ?? levelIds.get(unescapeCell(levelName).toLowerCase());
    if (!levelId) {
      judged.add('level');
      add('level', levelName ? `Unknown level "${levelName}": ${levelList}.` : 'Level is required.');
    }

    const tag = (cell('tag') ?? '').trim();
    if (tag) {
      const key = tag.toLowerCase();
      const first = firstLineOfTag.get(key);
      if (first !== undefined) add('tag', `Tag "${tag}" is repeated: it first appears on line ${first}.`);
      else if (existing.has(key)) add('tag', `Tag "${tag}" is already in this site's register.`);
      if (first === undefined) firstLineOfTag.set(key, row.line);
    }

    const siValue = (key: string, from: UnitSystem): number | undefined => {
      const r = READERS.get(key)![from].safeParse(cell(key));
      return r.success ? r.data : undefined;
    };
    /** A unit cell expressed in `units`: as typed when the header declares that system, converted otherwise. */
    const quantityIn = (key: string, units: UnitSystem): unknown => {
      const place = at.get(key);
      if (!place) return undefined;
      const raw = cells[place.index];
      if (place.units === units) return raw;
      const si = siValue(key, place.units);
      return si === undefined ? raw : fromSI(ITEM_COLUMN_BY_KEY.get(key)!.quantity!, si, units);
    };
    const input = (units: UnitSystem) => ({
      tag: cell('tag'),
      description: cell('description'),
      category,
      quantity: cell('quantity'),
      mass: quantityIn('mass', units),
      shape,
      dimensions: Object.fromEntries(DIMENSIONS.map((k) => [k, quantityIn(`dim_${k}`, units)])),
      cd: cell('cd'),
      area: quantityIn('area', units),
      volume: quantityIn('volume', units),
      level_id: levelId,
      height: quantityIn('height', units),
      securing,
      last_inspected: cell('last_inspected'),
      notes: cell('notes'),
    });
    const where = (issue: Issue): string => {
      const path = pathKey(issue.path);
      // A shape's dimensions that fail together are shown on the first of them.
      const first = path === 'dimensions' && shape ? dimensionsOf(shape as ShapeChoice)[0] : undefined;
      return first ? `dimensions.${first}` : path;
    };
    const inMinority = (issue: Issue) => at.get(columnKeyOf(where(issue)))?.units === minority;
    const schemaProblems = (issues: Issue[]) => {
      for (const issue of issues) {
        const path = where(issue);
        if (judged.has(path)) continue;
        const key = columnKeyOf(path);
        const def = ITEM_COLUMN_BY_KEY.get(key);
        if (def && !at.has(key)) add(key, `${issue.message} Add a column ${bothNames(def)}.`);
        else add(key, issue.message);
      }
    };

    const result = schemas[majority].safeParse(input(majority));
    if (!result.success) {
      schemaProblems(result.error.issues.filter((i) => !inMinority(i)));
      const minorityIssues = result.error.issues.filter(inMinority);
      if (minorityIssues.length) {
        // Limits are stated in the units of the column the user typed, so those cells are judged in their own system.
        const again = schemas[minority].safeParse(input(minority));
        const retyped = again.success ? [] : again.error.issues.filter(inMinority);
        schemaProblems(retyped.length ? retyped : minorityIssues);
      }
    }

    if (found.length) {
      const seen = new Set<string>();
      for (const p of found) {
        const id = `${p.column}\u0000${p.message}`;
        if (seen.has(id)) continue;
        seen.add(id);
        problems.push(p);
      }
      badLines.add(row.line);
      continue;
    }
    if (!result.success) continue;
    const item = result.data;
    // Cells typed in the other system are read straight to SI, so no round trip through the majority units blurs them.
    for (const f of UNIT_FIELDS) {
      const place = at.get(f.def.key);
      if (!place || place.units !== minority) continue;
      const si = siValue(f.def.key, minority);
      if (si === undefined) continue;
      if (f.dimension) {
        if (f.dimension in item.dimensions_m) item.dimensions_m[f.dimension] = si;
      } else if (f.siField) {
        item[f.siField] = si;
      }
    }
    valid.push({ line: row.line, item });
  }

  return { ...base, valid, problems: sortProblems(problems, header.columns), invalid_lines: badLines.size, fatal: false };
}

function sortProblems(problems: CsvProblem[], columns: string[]): CsvProblem[] {
  const order = new Map(columns.map((c, i) => [c, i] as const));
  return problems
    .map((p, i) => ({ p, i }))
    .sort((a, b) => a.p.line - b.p.line || (order.get(a.p.column) ?? -1) - (order.get(b.p.column) ?? -1) || a.i - b.i)
    .map(({ p }) => p);
}

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
