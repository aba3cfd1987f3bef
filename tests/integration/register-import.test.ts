import Papa from 'papaparse';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { POST as importRoute } from '@/app/api/v1/sites/[id]/items/import/route';
import { GET as exportRoute } from '@/app/api/v1/sites/[id]/items.csv/route';
import { findItem } from '@/db/items';
import { getDb } from '@/db/knex';
import { createLevel, deleteLevel } from '@/db/levels';
import { createSite } from '@/db/sites';
import type { AuditRow, ItemRow } from '@/db/types';
import { startSession } from '@/lib/auth';
import { computeItem } from '@/lib/register/compute';
import { listLadder } from '@/db/consequence-levels';
import { itemsTemplateCsv } from '@/lib/register/csv-write';
import { itemSchema } from '@/lib/validation/item';
import { levelSchema } from '@/lib/validation/level';
import { siteSchema } from '@/lib/validation/site';
import { createOrg, ctx, resetDatabase, signOutLocally, type OrgFixture } from './harness';
import { createItem } from '@/lib/register/commands';

// Every site, company and item below is invented for these tests.

/**
 * Lets a test change the register after the import route has read and checked the file and before it writes, as
 * another user working at the same moment could.
 */
const between = vi.hoisted(() => ({ run: undefined as undefined | (() => Promise<void>) }));
vi.mock('@/db/items', async (importOriginal) => {
  const actual = await importOriginal<typeof import('@/db/items')>();
  return {
    ...actual,
    importItems: async (...args: Parameters<typeof actual.importItems>) => {
      await between.run?.();
      return actual.importItems(...args);
    },
  };
});

type Json = Record<string, any>;

let org: OrgFixture;
let siteId: string;
const LEVELS = ['Upper deck', 'Lower deck', 'Mast platform'];
let levelIds: Record<string, string>;

beforeEach(async () => {
  between.run = undefined;
  await resetDatabase();
  org = await createOrg('Saltmarsh Energy Ltd', 'imp');
  const admin = org.users.admin.id;
  const site = await createSite(org.id, admin, siteSchema('si').parse({ name: 'Saltmarsh Wind Farm T12', kind: 'wind_turbine', surface: 'ground', design_wind: 14 }));
  siteId = site.id;
  levelIds = {};
  for (const [i, name] of LEVELS.entries()) {
    levelIds[name] = (await createLevel(org.id, admin, siteId, levelSchema('si').parse({ name, floor_height: 20 + 30 * i, surface: 'ground' }))).id;
  }
  signOutLocally();
  await startSession(org.users.engineer.id, org.id);
});

/** The import header in a unit system, as the template gives it to users. */
function templateHeader(units: 'si' | 'us'): string[] {
  const first = itemsTemplateCsv(units, LEVELS).replace(/^\uFEFF/, '').split('\r\n')[0];
  return first.split(',');
}

function toCsv(rows: Record<string, string>[], header = templateHeader('si')): string {
  return Papa.unparse({ fields: header, data: rows.map((r) => header.map((h) => r[h] ?? '')) }, { newline: '\r\n' });
}

const SHAPES: [string, Record<string, string>][] = [
  ['tumbling_box', { dim_length_m: '0.3', dim_width_m: '0.2', dim_height_m: '0.1' }],
  ['long_bar', { dim_length_m: '0.6', dim_width_m: '0.04' }],
  ['sphere', { dim_diameter_m: '0.12' }],
];
const CATEGORIES = ['hand_tool', 'fastener', 'equipment', 'fitting'];
const SECURING = ['unsecured', 'tethered', 'contained'];
const FORMULAS = ['=HYPERLINK("http://example.invalid","open")', '+1 spare on the hook', '-2 missing since May', '@inspector note'];

const tagOf = (i: number) => `T12-${String(i + 1).padStart(5, '0')}`;
/** Physical line of row i: the header is line 1. */
const lineOf = (i: number) => i + 2;
const isBad = (i: number) => i % 20 === 19;
const isFormula = (i: number) => i % 1000 === 3;

function goodRow(i: number): Record<string, string> {
  const [shape, dims] = SHAPES[i % SHAPES.length];
  return {
    tag: tagOf(i),
    description: isFormula(i) ? FORMULAS[(i / 1000) % FORMULAS.length | 0] : `Nacelle item ${i + 1}`,
    category: CATEGORIES[i % CATEGORIES.length],
    quantity: String(1 + (i % 3)),
    mass_kg: (0.5 + (i % 40) / 10).toFixed(1),
    shape,
    ...dims,
    level: LEVELS[i % LEVELS.length],
    securing: SECURING[i % SECURING.length],
  };
}

/** Each bad row has exactly one fault, in the column given. */
function badRow(i: number): { row: Record<string, string>; column: string } {
  const row = goodRow(i);
  const kind = ((i - 19) / 20) % 3;
  if (kind === 0) return { row: { ...row, level: 'Basement' }, column: 'level' };
  if (kind === 1) return { row: { ...row, mass_kg: ['-2', '0', 'heavy'][((i - 19) / 60) % 3 | 0] }, column: 'mass_kg' };
  return { row: { ...row, shape: 'anvil' }, column: 'shape' };
}

const ROWS = 10_000;
const BIG = (() => {
  const rows: Record<string, string>[] = [];
  const problems: [number, string][] = [];
  for (let i = 0; i < ROWS; i++) {
    if (isBad(i)) {
      const { row, column } = badRow(i);
      rows.push(row);
      problems.push([lineOf(i), column]);
    } else {
      rows.push(goodRow(i));
    }
  }
  return { text: toCsv(rows), problems };
})();

async function postCsv(text: string, mode: string, name = 'items.csv'): Promise<{ status: number; json: Json }> {
  const form = new FormData();
  form.set('file', new File([text], name, { type: 'text/csv' }));
  form.set('mode', mode);
  const response = await importRoute(new Request(`http://127.0.0.1/api/v1/sites/${siteId}/items/import`, { method: 'POST', body: form }), ctx({ id: siteId }));
  return { status: response.status, json: await response.json() };
}

async function counts() {
  const db = getDb();
  const n = async (table: string) => Number((await db(table).count('* as n').first())?.n);
  return { items: await n('items'), site_levels: await n('site_levels'), audit_log: await n('audit_log') };
}

async function importAudits(): Promise<AuditRow[]> {
  return getDb()<AuditRow>('audit_log').where({ organisation_id: org.id, action: 'items.imported' });
}

describe('importing 10,000 rows of which 5% are bad', () => {
  it('mode=check writes nothing and reports the 500 bad lines with their line numbers and columns', async () => {
    expect(BIG.problems).toHaveLength(500);
    const before = await counts();
    const { status, json } = await postCsv(BIG.text, 'check');
    expect(status).toBe(200);
    expect(json).toMatchObject({ mode: 'check', total_rows: 10_000, valid_rows: 9_500, invalid_rows: 500, imported: 0 });
    expect(json.problems.map((p: Json) => [p.line, p.column])).toEqual(BIG.problems);
    expect(json.problems.find((p: Json) => p.column === 'level').message).toContain('Basement');
    expect(await counts()).toEqual(before);
  });

  it('mode=all-or-nothing answers 422 and writes nothing', async () => {
    const before = await counts();
    const { status, json } = await postCsv(BIG.text, 'all-or-nothing');
    expect(status).toBe(422);
    expect(json.imported).toBe(0);
    expect(json.errors).toHaveLength(500);
    expect(json.errors[0].path).toBe(`line ${BIG.problems[0][0]}.${BIG.problems[0][1]}`);
    expect(await counts()).toEqual(before);
  });

  it('mode=valid-only imports exactly the 9,500 good rows, each with its stored result, under one audit entry', async () => {
    const { status, json } = await postCsv(BIG.text, 'valid-only');
    expect(status).toBe(200);
    expect(json.imported).toBe(9_500);

    const db = getDb();
    const stored: ItemRow[] = await db('items').where({ site_id: siteId });
    expect(stored).toHaveLength(9_500);
    expect(stored.filter((r) => r.computed_at === null || r.inputs_hash === null || r.fall_time_s === null || r.compute_error !== null)).toEqual([]);
    const tags = new Set(stored.map((r) => r.tag));
    for (let i = 0; i < ROWS; i++) expect(tags.has(tagOf(i))).toBe(!isBad(i));

    // Spot checks against the physics core run here on the stored inputs: this checks the storage, not the physics.
    const ladder = await listLadder(org.id);
    for (const i of [0, 1, 2, 4_321, 9_998]) {
      const row = stored.find((r) => r.tag === tagOf(i))!;
      const detail = (await findItem(org.id, row.id))!;
      expect(detail.level_id).toBe(levelIds[LEVELS[i % LEVELS.length]]);
      const expected = computeItem(detail, detail, ladder);
      expect(row.fall_time_s).toBe(expected.fall_time_s);
      expect(row.effective_energy_j).toBe(expected.effective_energy_j);
      expect(row.consequence_level_id).toBe(expected.consequence_level_id);
    }

    const audits = await importAudits();
    expect(audits).toHaveLength(1);
    expect(audits[0].after).toMatchObject({ imported: 9_500, skipped_rows: 500, mode: 'valid-only', file_name: 'items.csv' });
    expect(audits[0].actor_user_id).toBe(org.users.engineer.id);
  });

  it('a tag added by someone else between the check and the write fails the import and leaves the register as it was', async () => {
    const late = 7_500;
    expect(isBad(late)).toBe(false);
    between.run = async () => {
      await createItem(
        org.id,
        org.users.admin.id,
        siteId,
        itemSchema('si').parse({
          tag: tagOf(late),
          description: 'Added by hand meanwhile',
          category: 'hand_tool',
          mass: 1,
          shape: 'sphere',
          dimensions: { diameter: 0.1 },
          level_id: levelIds['Upper deck'],
          securing: 'tethered',
        }),
      );
    };
    const { status, json } = await postCsv(BIG.text, 'valid-only');
    expect(status).toBe(409);
    expect(json.errors.map((e: Json) => e.path)).toEqual(['tag']);
    const left = await getDb()('items').where({ site_id: siteId }).select('tag');
    expect(left).toEqual([{ tag: tagOf(late) }]);
    expect(await importAudits()).toEqual([]);
  });

  it('a level deleted between the check and the write fails the import and leaves the register as it was', async () => {
    between.run = async () => {
      await deleteLevel(org.id, org.users.admin.id, levelIds['Mast platform']);
    };
    const { status, json } = await postCsv(BIG.text, 'valid-only');
    expect(status).toBe(422);
    expect(json.errors).toHaveLength(1);
    expect(json.errors[0].path).toMatch(/^line \d+\.level$/);
    expect((await counts()).items).toBe(0);
    expect(await importAudits()).toEqual([]);
  });
});

describe('a level deleted between the check and the write', () => {
  it('is reported as the CSV line and column of its first row (line 4.level), as the import’s other problems are', async () => {
    between.run = async () => {
      await deleteLevel(org.id, org.users.admin.id, levelIds['Mast platform']);
    };
    const { status, json } = await postCsv(toCsv(Array.from({ length: 6 }, (_, i) => goodRow(i))), 'valid-only');
    expect(status).toBe(422);
    // Row 2 (line 4) is the first on the Mast platform.
    expect(json.errors.map((e: Json) => e.path)).toEqual(['line 4.level']);
  });
});

describe('files the import refuses whole', () => {
  it('a file over 5 MB → 400 naming file; nothing written', async () => {
    const filler = 'x'.repeat(1_900);
    const rows = Array.from({ length: 2_800 }, (_, i) => ({ ...goodRow(i), notes: filler }));
    const text = toCsv(rows);
    expect(new TextEncoder().encode(text).length).toBeGreaterThan(5 * 1024 * 1024);
    const before = await counts();
    const { status, json } = await postCsv(text, 'valid-only');
    expect(status).toBe(400);
    expect(json.errors.map((e: Json) => e.path)).toEqual(['file']);
    expect(await counts()).toEqual(before);
  });

  it('20,001 rows → 400 naming file; nothing written', async () => {
    const text = toCsv(Array.from({ length: 20_001 }, (_, i) => goodRow(i)));
    const before = await counts();
    const { status, json } = await postCsv(text, 'valid-only');
    expect(status).toBe(400);
    expect(json.errors.map((e: Json) => e.path)).toEqual(['file']);
    expect(await counts()).toEqual(before);
  });

  it('a header with an unrecognised unit (mass_g) → 400 naming that column, in every mode; nothing written', async () => {
    const header = templateHeader('si').map((h) => (h === 'mass_kg' ? 'mass_g' : h));
    const text = toCsv(
      Array.from({ length: 5 }, (_, i) => {
        const { mass_kg, ...rest } = goodRow(i);
        return { ...rest, mass_g: String(Number(mass_kg) * 1000) };
      }),
      header,
    );
    const before = await counts();
    for (const mode of ['check', 'valid-only', 'all-or-nothing']) {
      const { status, json } = await postCsv(text, mode);
      expect(status).toBe(400);
      expect(json.problems).toContainEqual(expect.objectContaining({ line: 1, column: 'mass_g' }));
      expect(json.errors.map((e: Json) => e.path)).toContain('line 1.mass_g');
    }
    expect(await counts()).toEqual(before);
  });
});

describe('GET items.csv after the import', () => {
  async function exportCsv(query = ''): Promise<{ status: number; rows: string[][]; text: string }> {
    const response = await exportRoute(new Request(`http://127.0.0.1/api/v1/sites/${siteId}/items.csv${query}`), ctx({ id: siteId }));
    const text = await response.text();
    const rows = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: true }).data;
    return { status: response.status, rows, text };
  }

  it('writes the header in the member’s units, escapes formula cells, has a row per item, and follows ?units=', async () => {
    expect((await postCsv(BIG.text, 'valid-only')).status).toBe(200);

    const si = await exportCsv();
    expect(si.status).toBe(200);
    const [header, ...rows] = si.rows;
    expect(header).toEqual(expect.arrayContaining(['tag', 'mass_kg', 'dim_length_m', 'height_m', 'impact_energy_j', 'drift_m']));
    expect(header).not.toContain('mass_lb');
    expect(rows).toHaveLength(9_500);

    // OWASP, "CSV Injection": a cell starting with = + - @ is prefixed with ' so a spreadsheet shows it as text.
    const description = header.indexOf('description');
    const written = new Set(rows.map((r) => r[description]));
    for (let i = 0; i < ROWS; i++) {
      if (!isFormula(i) || isBad(i)) continue;
      const typed = goodRow(i).description;
      expect(written.has(`'${typed}`)).toBe(true);
      expect(written.has(typed)).toBe(false);
    }

    const askedUs = await exportCsv('?units=us');
    expect(askedUs.rows[0]).toEqual(expect.arrayContaining(['mass_lb', 'dim_length_ft', 'height_ft', 'impact_energy_ft_lbf', 'drift_ft']));
    expect(askedUs.rows[0]).not.toContain('mass_kg');
    expect(askedUs.rows).toHaveLength(9_501);

    await getDb()('users').where({ id: org.users.engineer.id }).update({ unit_system: 'us' });
    expect((await exportCsv()).rows[0]).toContain('mass_lb');
    expect((await exportCsv('?units=si')).rows[0]).toContain('mass_kg');
  });
});
