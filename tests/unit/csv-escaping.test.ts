import fc from 'fast-check';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { escapeCell, unescapeCell } from '@/lib/register/csv-cells';
import { parseItemsCsv } from '@/lib/register/csv-import';
import { itemsTemplateCsv, registerCsv } from '@/lib/register/csv-write';
import type { RegisterExportRow } from '@/db/types';

// What a spreadsheet may run as a formula, written out here independently of the code: = + - @ and a leading tab or
// line break (OWASP, "CSV Injection", recalled from memory), their full-width forms ＝ ＋ － ＠ and a leading | (the
// probe of issue 9), each possibly after leading spaces (common practice: some spreadsheets trim cells on import).
const RUNS = /^\s*[=+\-@|\uFF1D\uFF0B\uFF0D\uFF20\uFF5C\t\r\n]/;

// Invented demo site.
const LEVELS = [
  { id: '0b6f4c2e-8d1a-4f3b-9c7e-2a5d6e8f1b3c', name: 'Level 1' },
  { id: '1c7a5d3f-9e2b-4a4c-8d8f-3b6e7f9a2c4d', name: '-1 Basement' },
];
const SITE = { levels: LEVELS, existingTags: [] as string[] };

function row(over: Partial<RegisterExportRow>): RegisterExportRow {
  return {
    id: 'r1',
    tag: 'S-1',
    description: 'Spanner',
    category: 'hand_tool',
    quantity: 1,
    mass_kg: 0.5,
    shape: 'long_bar',
    level_id: LEVELS[0].id,
    level_name: 'Level 1',
    height_m: 30,
    height_overridden: false,
    securing: 'tethered',
    last_inspected: null,
    updated_at: '2025-01-01T00:00:00Z',
    fall_time_s: 2.5,
    impact_speed_m_s: 24,
    impact_energy_j: 143,
    effective_energy_j: 143,
    drift_m: 0.3,
    sinks: null,
    consequence_level_id: null,
    model_version: 'demo-1',
    inputs_hash: null,
    computed_at: '2025-01-01T00:00:00Z',
    compute_error: null,
    dimensions_m: { length: 0.3, width: 0.03 },
    cd: null,
    area_m2: null,
    volume_m3: null,
    notes: '',
    height_override_m: null,
    ...over,
  };
}

function exportedCells(rows: RegisterExportRow[]): string[][] {
  const text = registerCsv(rows, { units: 'si', ladder: [], siteName: 'Pier 4' });
  return Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { delimiter: ',', skipEmptyLines: true }).data;
}

const HEADER = 'tag,description,category,mass_kg,shape,dim_length_m,dim_width_m,level,securing,notes';
const line = (tag: string, description: string, notes = '') =>
  Papa.unparse([[tag, description, 'hand_tool', '0.5', 'long_bar', '0.3', '0.03', 'Level 1', 'tethered', notes]]);

describe('formula escaping on export', () => {
  it.each(['＝1+1', '＋1', '－1', '＠SUM(A1)', '|cmd', '｜cmd', '  =1+1', '\t=1', '=HYPERLINK("x")', '-2', "'=2+2"])(
    'escapes %j so no spreadsheet runs it',
    (text) => {
      const [header, cells] = exportedCells([row({ description: text })]);
      const written = cells[header.indexOf('description')];
      expect(written).toBe(`'${text}`);
      expect(RUNS.test(written)).toBe(false);
    },
  );

  it('leaves other text, numbers and apostrophes before ordinary text as they are', () => {
    for (const text of ['Spanner, 24 mm', "'quoted", 'a=b', '5 kg', '']) expect(escapeCell(text)).toBe(text);
  });

  it('is undone exactly by unescapeCell, and never leaves a cell a spreadsheet runs (any text)', () => {
    const risky = fc.constantFrom('', "'", "''", '=', '+', '-', '@', '|', '＝', '＋', '－', '＠', '｜', ' ', '\t', '\n', '\r', 'x');
    const text = fc.tuple(fc.array(risky, { maxLength: 4 }), fc.string()).map(([start, rest]) => start.join('') + rest);
    fc.assert(
      fc.property(text, (s) => {
        const written = escapeCell(s);
        expect(unescapeCell(written)).toBe(s);
        expect(RUNS.test(written)).toBe(false);
      }),
      { numRuns: 2000 },
    );
  });
});

describe('import keeps what the user typed', () => {
  it('stores a hand-written leading apostrophe as typed', () => {
    const r = parseItemsCsv([HEADER, line("'=2+2", "'+1 spare", "'@note")].join('\n'), SITE);
    expect(r.problems).toEqual([]);
    expect(r.valid[0].item).toMatchObject({ tag: "'=2+2", description: "'+1 spare", notes: "'@note" });
  });

  it('reads an export back to exactly the text that was stored, whatever it starts with', () => {
    const typed = fc
      .tuple(fc.constantFrom('', "'", "''", '=', '＝', '-', '|', '@', '+', ' ='), fc.string({ unit: 'binary', maxLength: 30 }))
      .map(([start, rest]) => (start + rest).trim())
      .filter((s) => s.length > 0 && !/[\u0000]/.test(s));
    fc.assert(
      fc.property(typed, typed, fc.string({ unit: 'binary', maxLength: 60 }), (tag, description, notes) => {
        const stored = { tag: tag.slice(0, 40).trim() || 'T', description: description.slice(0, 200).trim() || 'D', notes: notes.replace(/\u0000/g, '').trim() };
        const r = parseItemsCsv(registerCsv([row(stored)], { units: 'si', ladder: [], siteName: '=Pier' }), SITE);
        expect(r.problems).toEqual([]);
        expect(r.valid[0].item).toMatchObject(stored);
      }),
      { numRuns: 200 },
    );
    // Each run parses a whole file; 5,000 runs found nothing here either. The bound is for a loaded 2-core machine.
  }, 60_000);

  it('imports a template whose level names the export escapes, as it stands', () => {
    const r = parseItemsCsv(itemsTemplateCsv('si', ['-1 Basement']), SITE);
    expect(r.problems).toEqual([]);
    expect(r.valid.map((v) => v.item.level_id)).toEqual(Array(4).fill(LEVELS[1].id));
  });
});

describe('cells that cannot be stored', () => {
  it('are problems of their own cell, so the other rows still import', () => {
    const r = parseItemsCsv([HEADER, line('A-1', 'Fine'), line('A-2', 'Has a \u0000 NUL'), line('A-3', 'Lone \uD800 half'), line('A-4', 'Fine too')].join('\n'), SITE);
    expect(r.fatal).toBe(false);
    expect(r.valid.map((v) => v.item.tag)).toEqual(['A-1', 'A-4']);
    expect(r.problems).toEqual([
      { line: 3, column: 'description', message: expect.stringMatching(/^Description contains a NUL character/) },
      { line: 4, column: 'description', message: expect.stringMatching(/^Description contains a broken character/) },
    ]);
  });

  it('include a prototype key as a column name, which makes no preview key', () => {
    const r = parseItemsCsv([`${HEADER},__proto__,Constructor`, `${line('A-1', 'Fine')},x,y`].join('\n'), SITE);
    expect(r.fatal).toBe(true);
    expect(r.problems).toEqual([
      { line: 1, column: '__proto__', message: 'Column name "__proto__" is not accepted.' },
      { line: 1, column: 'Constructor', message: 'Column name "constructor" is not accepted.' },
    ]);
    expect(Object.keys(r.preview[0].cells)).not.toContain('__proto__');
    expect(({} as Record<string, unknown>).x).toBeUndefined();
  });
});
