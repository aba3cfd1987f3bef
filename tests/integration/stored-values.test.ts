import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { POST as postSession } from '@/app/api/v1/session/route';
import { POST as postDrops } from '@/app/api/v1/drops/route';
import { PATCH as patchItem } from '@/app/api/v1/items/[id]/route';
import { PATCH as patchSite } from '@/app/api/v1/sites/[id]/route';
import { POST as postLevel } from '@/app/api/v1/sites/[id]/levels/route';
import { POST as postItem } from '@/app/api/v1/sites/[id]/items/route';
import { POST as importItemsRoute } from '@/app/api/v1/sites/[id]/items/import/route';
import { getDb } from '@/db/knex';
import { FINITE_COLUMNS, down, up } from '@/db/migrations/20261202000002_finite_quantities';
import { saveItemAction, saveSiteAction } from '@/lib/actions/register';
import { startSession } from '@/lib/auth';
import { createOrg, ctx, jsonRequest, resetDatabase, runAction, signOutLocally, type OrgFixture } from './harness';
import { createRegister, databaseState, siteFields, type RegisterFixture } from './harness/register-fixture';

/**
 * Values the database cannot or must not hold (issue 9, defects 4 and 11): NUL, which PostgreSQL's text refuses, and
 * lone surrogates, which its jsonb (the audit log) refuses (PostgreSQL 15 manual, 8.3 and 8.14); and numbers that
 * read as Infinity (IEEE 754 binary64's largest finite value is about 1.797e308).
 */
let home: OrgFixture;
let reg: RegisterFixture;

beforeAll(async () => {
  await resetDatabase();
  home = await createOrg('Home Org', 'home');
  reg = await createRegister(home, 'Ridgeway Plant Hall');
});

beforeEach(async () => {
  signOutLocally();
  await startSession(home.users.admin.id, home.id);
});

const item = (over: Record<string, unknown> = {}) => ({
  tag: 'N-1',
  description: 'Lamp',
  category: 'equipment',
  mass: 2,
  shape: 'sphere',
  dimensions: { diameter: 0.2 },
  level_id: reg.levelId,
  securing: 'tethered',
  ...over,
});

async function refused(response: Promise<Response>, path: string, message: RegExp) {
  const r = await response;
  expect(r.status).toBe(400);
  const { errors } = await r.json();
  expect(errors).toEqual([{ path, message: expect.stringMatching(message) }]);
}

describe('text the database cannot store', () => {
  it('answers 400 naming the field, for every kind of write, and writes nothing', async () => {
    const before = await databaseState();
    await refused(postItem(jsonRequest('POST', item({ notes: 'a\u0000b' })), ctx({ id: reg.siteId })), 'notes', /^Notes contains a NUL character/);
    // JSON.stringify writes a lone surrogate as the escape \ud800 (ECMA-262, well-formed JSON.stringify).
    await refused(postItem(jsonRequest('POST', item({ description: 'half \uD800' })), ctx({ id: reg.siteId })), 'description', /^Description contains a broken character/);
    await refused(patchItem(jsonRequest('PATCH', { tag: '\uDC00' }), ctx({ id: reg.itemId })), 'tag', /^Tag contains a broken character/);
    await refused(patchSite(jsonRequest('PATCH', { name: 'Pier\u0000' }), ctx({ id: reg.siteId })), 'name', /^Site name contains a NUL/);
    await refused(postLevel(jsonRequest('POST', { name: 'Deck', floor_height: 2, notes: '\uD800' }), ctx({ id: reg.siteId })), 'notes', /^Notes contains a broken/);
    signOutLocally();
    await refused(postSession(jsonRequest('POST', { email: 'a\u0000@x.example', password: 'x' })), 'email', /^E-mail contains a NUL/);
    await startSession(home.users.admin.id, home.id);
    expect(await runAction(saveSiteAction, { ...siteFields, notes: 'x\u0000' })).toMatchObject({ state: { errors: { notes: expect.stringMatching(/NUL/) } } });
    expect(await databaseState()).toEqual(before);
  });

  it('is a problem of its own cell in a CSV import, and the valid rows still import', async () => {
    const csv = [
      'tag,description,category,mass_kg,shape,dim_diameter_m,level,securing,notes',
      'C-1,Fine,fastener,1,sphere,0.1,Roof,unsecured,',
      'C-2,Has a \u0000 NUL,fastener,1,sphere,0.1,Roof,unsecured,',
      'C-3,Fine,fastener,1,sphere,0.1,Roof,unsecured,tab\tinside',
      'C-4,Fine too,fastener,1,sphere,0.1,Roof,unsecured,',
    ].join('\n');
    const form = new FormData();
    // A file name the audit log's jsonb would have refused. (A lone surrogate cannot survive the upload's UTF-8: the
    // encoder writes U+FFFD for it, WHATWG Encoding; the unit tests give the parser one directly.)
    form.set('file', new File([csv], 'items\u0000.csv'));
    form.set('mode', 'valid-only');
    const response = await importItemsRoute(new Request('http://127.0.0.1/api', { method: 'POST', body: form }), ctx({ id: reg.siteId }));
    expect(response.status).toBe(200);
    const body = await response.json();
    expect(body).toMatchObject({ imported: 3, invalid_rows: 1, file_name: 'items.csv' });
    expect(body.problems).toEqual([{ line: 3, column: 'description', message: expect.stringMatching(/NUL/) }]);
    const tags = await getDb()('items').where({ site_id: reg.siteId }).whereIn('tag', ['C-1', 'C-2', 'C-3', 'C-4']).pluck('tag');
    expect(tags.sort()).toEqual(['C-1', 'C-3', 'C-4']);
    const audit = await getDb()('audit_log').where({ action: 'items.imported', entity_id: reg.siteId }).first('after');
    expect(audit.after).toMatchObject({ imported: 3, file_name: 'items.csv' });
  });
});

describe('numbers that read as infinity', () => {
  it('are refused by the JSON routes, as text and as JSON numbers, naming the field', async () => {
    const before = await databaseState();
    await refused(postItem(jsonRequest('POST', item({ mass: '1e309' })), ctx({ id: reg.siteId })), 'mass', /^Mass must be at most 500,000 kg\.$/);
    await refused(postItem(jsonRequest('POST', JSON.stringify(item()).replace('"mass":2', '"mass":1e309')), ctx({ id: reg.siteId })), 'mass', /^Mass must be at most/);
    await refused(patchItem(jsonRequest('PATCH', { units: 'us', dimensions: { diameter: `1${'0'.repeat(400)}` } }), ctx({ id: reg.itemId })), 'dimensions.diameter', /^Diameter must be at most 164 ft\.$/);
    await refused(patchSite(jsonRequest('PATCH', '{"design_wind": -1e309}'), ctx({ id: reg.siteId })), 'design_wind', /^Design wind speed must be at least 0 m\/s\.$/);
    await refused(postDrops(jsonRequest('POST', '{"object": {"mass_kg": 1e309}, "drag_model": "none", "medium": {"preset": "isa"}, "release": {"height_m": 1}}'), ctx({})), 'object.mass_kg', /finite/);
    await refused(postDrops(jsonRequest('POST', '{"object": {"mass_kg": 5}, "drag_model": "none", "medium": {"preset": "isa"}, "release": {"height_m": 1e400}}'), ctx({})), 'release.height_m', /finite/);
    expect(await runAction(saveItemAction, { site_id: reg.siteId, ...Object.fromEntries(Object.entries(item()).map(([k, v]) => [k, typeof v === 'object' ? '' : String(v)])), 'dimensions.diameter': '0.2', mass: '1e309', units: 'si' })).toMatchObject({
      state: { errors: { mass: 'Mass must be at most 500,000 kg.' } },
    });
    expect(await databaseState()).toEqual(before);
  });
});

describe('the database itself', () => {
  const db = () => getDb();

  it('has a finite CHECK on every double precision column of the register, refusing NaN and ±Infinity', async () => {
    const columns: { table_name: string; column_name: string }[] = await db()('information_schema.columns')
      .where({ table_schema: 'public', data_type: 'double precision' })
      .whereIn('table_name', ['sites', 'site_levels', 'items', 'consequence_levels'])
      .select('table_name', 'column_name');
    expect(columns.length).toBeGreaterThan(0);
    expect(Object.fromEntries(Object.keys(FINITE_COLUMNS).map((t) => [t, columns.filter((c) => c.table_name === t).map((c) => c.column_name).sort()]))).toEqual(
      Object.fromEntries(Object.entries(FINITE_COLUMNS).map(([t, cs]) => [t, [...cs].sort()])),
    );
    const ids: Record<string, string> = {
      sites: reg.siteId,
      site_levels: reg.levelId,
      items: reg.itemId,
      consequence_levels: (await db()('consequence_levels').where({ organisation_id: home.id }).first('id')).id,
    };
    for (const { table_name: table, column_name: column } of columns) {
      for (const bad of ['NaN', 'Infinity', '-Infinity']) {
        const error = await db()
          .raw(`UPDATE ${table} SET ${column} = ?::float8 WHERE id = ?`, [bad, ids[table]])
          .then(() => null, (e: { code?: string; constraint?: string }) => e);
        // Refused whichever CHECK meets it first (the row's other checks, such as water depth only over water, may).
        expect({ table, column, bad, code: error?.code }).toEqual({ table, column, bad, code: '23514' });
      }
    }
  });

  it('states the finite CHECK itself for every such column', async () => {
    const { rows } = await db().raw(`SELECT conname, pg_get_constraintdef(oid) AS def FROM pg_constraint WHERE conname LIKE '%\\_finite'`);
    const defs = new Map(rows.map((r: { conname: string; def: string }) => [r.conname, r.def]));
    for (const [table, columns] of Object.entries(FINITE_COLUMNS)) {
      for (const column of columns) {
        expect(defs.get(`${table}_${column}_finite`)).toBe(`CHECK (((${column} < 'Infinity'::double precision) AND (${column} > '-Infinity'::double precision)))`);
      }
    }
  });

  /** Runs `work` in a transaction that is always rolled back, so the shared schema is left as it was. */
  async function rolledBack(work: (trx: Parameters<Parameters<ReturnType<typeof getDb>['transaction']>[0]>[0]) => Promise<void>) {
    const ROLLBACK = new Error('rollback');
    await expect(db().transaction(async (trx) => {
      await work(trx);
      throw ROLLBACK;
    })).rejects.toBe(ROLLBACK);
  }

  it('the migration clears a non-finite stored result, which is derived and computed again on the next save', async () => {
    await rolledBack(async (trx) => {
      await down(trx);
      await trx('items').where({ id: reg.itemId }).update({ impact_energy_j: trx.raw("'Infinity'::float8"), drift_m: trx.raw("'NaN'::float8") });
      await up(trx);
      const row = await trx('items').where({ id: reg.itemId }).first();
      expect(row).toMatchObject({ impact_energy_j: null, drift_m: null, fall_time_s: null, consequence_level_id: null, compute_error: expect.stringMatching(/not a finite number/) });
      expect(row.mass_kg).toBe(0.45);
    });
  });

  it('the migration refuses to guess a non-finite input, naming the row', async () => {
    await rolledBack(async (trx) => {
      await down(trx);
      await trx('sites').where({ id: reg.siteId }).update({ design_wind_m_s: trx.raw("'Infinity'::float8") });
      await expect(up(trx)).rejects.toThrow(`Non-finite values must be corrected by hand before this migration can run: sites.design_wind_m_s of ${reg.siteId}.`);
    });
  });
});
