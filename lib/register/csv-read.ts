import Papa from 'papaparse';
import type { UnitSystem } from '@/lib/domain';
import { bothNames, ITEM_COLUMN_BY_KEY, ITEM_COLUMNS, REQUIRED, resolveHeader } from './csv-columns';
import { CSV_LIMITS, type CsvProblem } from './csv-limits';

/** Reading a CSV file into rows with their physical line numbers, and its header into the columns it names. */

export function utf8Bytes(text: string): number {
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

export function readRows(text: string): Readout {
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

export function readHeader(header: string[], line: number): Layout {
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
