import type { z } from 'zod';
import { isRefusedKey } from '@/lib/validation/input';
import { quantityField } from '@/lib/validation/quantity';
import { DIMENSIONS, type UnitSystem } from '@/lib/domain';
import { dimensionsOf, type ShapeChoice } from '@/lib/shape-choice';
import { fromSI } from '@/lib/units';
import { itemSchema } from '@/lib/validation/item';
import { unescapeCell } from './csv-cells';
import { bothNames, CHOICES, ITEM_COLUMN_BY_KEY, ITEM_COLUMNS } from './csv-columns';
import { CSV_LIMITS, type CsvImport, type CsvProblem } from './csv-limits';
import { readHeader, readRows, utf8Bytes } from './csv-read';

/**
 * A CSV file's rows as items: each cell read in its column's units and converted to SI once, then checked by the item
 * schema.
 */

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
