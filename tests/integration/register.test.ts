import { beforeEach, describe, expect, it } from 'vitest';
import type { ConsequenceLevel } from '@/lib/domain';
import { GET as getLadder, PUT as putLadder } from '@/app/api/v1/consequence-levels/route';
import { DELETE as deleteItemRoute, PATCH as patchItem } from '@/app/api/v1/items/[id]/route';
import { POST as postSite } from '@/app/api/v1/sites/route';
import { DELETE as deleteSiteRoute, PATCH as patchSite } from '@/app/api/v1/sites/[id]/route';
import { POST as postLevel } from '@/app/api/v1/sites/[id]/levels/route';
import { POST as postItem } from '@/app/api/v1/sites/[id]/items/route';
import { POST as importRoute } from '@/app/api/v1/sites/[id]/items/import/route';
import { listLadder } from '@/db/consequence-levels';
import { findItem, RESULT_COLUMNS } from '@/db/items';
import { createLevel } from '@/db/levels';
import { getDb } from '@/db/knex';
import { createSite } from '@/db/sites';
import type { AuditRow, ItemRow } from '@/db/types';
import { deleteLevelAction, saveLevelAction } from '@/lib/actions/register';
import { startSession } from '@/lib/auth';
import { STANDARD_GRAVITY } from '@/lib/physics';
import { computeItem, inputsHash, itemDropCase, type FallSetting, type ItemPhysics } from '@/lib/register/compute';
import { itemsTemplateCsv } from '@/lib/register/csv-write';
import { itemSchema } from '@/lib/validation/item';
import { levelSchema } from '@/lib/validation/level';
import { siteSchema } from '@/lib/validation/site';
import { createOrg, ctx, jsonRequest, resetDatabase, runAction, signOutLocally, type OrgFixture } from './harness';
import { createItem } from '@/lib/register/commands';

// Every site, company and item below is invented for these tests.

type Json = Record<string, any>;
type Handler<P> = (request: Request, context: { params: Promise<P> }) => Promise<Response>;

async function call<P>(handler: Handler<P>, method: string, body: unknown, params: P): Promise<{ status: number; json: Json }> {
  const response = await handler(jsonRequest(method, body), ctx(params));
  return { status: response.status, json: response.status === 204 ? {} : await response.json() };
}

const paths = (json: Json): string[] => (json.errors ?? []).map((e: { path: string }) => e.path);

const INPUT_FIELDS = [
  'tag',
  'description',
  'category',
  'quantity',
  'mass_kg',
  'shape',
  'dimensions_m',
  'cd',
  'area_m2',
  'volume_m3',
  'level_id',
  'height_m',
  'securing',
  'last_inspected',
  'notes',
] as const;
const SITE_FIELDS = ['name', 'kind', 'location', 'surface', 'water_depth_m', 'altitude_m', 'design_wind_m_s', 'current_m_s', 'notes'] as const;

function only<T extends object, K extends keyof T>(row: T, keys: readonly K[]): Pick<T, K> {
  return Object.fromEntries(keys.map((k) => [k, row[k]])) as Pick<T, K>;
}

async function storedItem(id: string): Promise<ItemRow> {
  return getDb()('items').where({ id }).first();
}

/** What the physics core gives for the item as stored now: the reference these tests hold the stored result to. */
async function freshResult(id: string) {
  const detail = (await findItem(org.id, id))!;
  return computeItem(detail, detail, await listLadder(org.id));
}

async function rowCounts(): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const table of ['sites', 'site_levels', 'items', 'audit_log', 'consequence_levels']) {
    out[table] = Number((await getDb()(table).count('* as n').first())?.n);
  }
  return out;
}

async function auditActions(): Promise<AuditRow[]> {
  return getDb()<AuditRow>('audit_log').where({ organisation_id: org.id }).orderBy('id');
}

let org: OrgFixture;

async function actAs(role: 'admin' | 'engineer' | 'reviewer' | 'viewer') {
  signOutLocally();
  await startSession(org.users[role].id, org.id);
}

beforeEach(async () => {
  await resetDatabase();
  org = await createOrg('Northwind Rigging Ltd', 'reg');
  await actAs('engineer');
});

const siteBody = { name: 'North Quay Crane 3', kind: 'crane', surface: 'ground', altitude: 20, design_wind: 12 };
const wrench = (levelId: string, extra: Json = {}) => ({
  tag: 'W-01',
  description: 'Torque wrench',
  category: 'hand_tool',
  mass: 2.4,
  shape: 'long_bar',
  dimensions: { length: 0.6, width: 0.04 },
  level_id: levelId,
  securing: 'tethered',
  ...extra,
});

async function newSite(body: Json = siteBody): Promise<string> {
  const { status, json } = await call(postSite, 'POST', body, {});
  expect(status).toBe(201);
  return json.site.id;
}

async function newLevel(siteId: string, body: Json): Promise<string> {
  const { status, json } = await call(postLevel, 'POST', body, { id: siteId });
  expect(status).toBe(201);
  return json.level.id;
}

async function newItem(siteId: string, body: Json): Promise<string> {
  const { status, json } = await call(postItem, 'POST', body, { id: siteId });
  expect(status).toBe(201);
  return json.item.id;
}

describe('site → level → item through the API stores the physics core’s result', () => {
  it('stores exactly what computeItem gives for the inputs sent, with the hash of their drop case', async () => {
    const siteId = await newSite();
    const levelId = await newLevel(siteId, { name: 'Jib walkway', floor_height: 42 });
    const body = wrench(levelId);
    const { status, json } = await call(postItem, 'POST', body, { id: siteId });
    expect(status).toBe(201);

    // The expected result is the physics core run here on the inputs the test sent: this checks the storage, not the physics.
    const physics: ItemPhysics = { mass_kg: 2.4, shape: 'long_bar', dimensions_m: { length: 0.6, width: 0.04 }, cd: null, area_m2: null, volume_m3: null, height_m: null };
    const setting: FallSetting = { floor_height_m: 42, surface: 'ground', water_depth_m: null, altitude_m: 20, design_wind_m_s: 12, current_m_s: 0 };
    const ladder = (await call(getLadder, 'GET', undefined, {})).json.levels as ConsequenceLevel[];
    const expected = computeItem(physics, setting, ladder);
    const stored = await storedItem(json.item.id);
    expect(only(stored, RESULT_COLUMNS)).toEqual(expected);
    expect(only(json.item, RESULT_COLUMNS)).toEqual(expected);
    expect(stored.inputs_hash).toBe(inputsHash(itemDropCase(physics, setting)));
    expect(stored.compute_error).toBeNull();
    expect(stored.computed_at).toBeInstanceOf(Date);
    expect(stored.consequence_level_id).not.toBeNull();

    // Work–energy theorem with standard gravity g_n = 9.80665 m/s² (3rd CGPM, 1901; NIST SP 330): drag can only take
    // vertical energy away, and a horizontal wind can give at most its own speed, so E ≤ m·g·h + ½·m·w².
    expect(STANDARD_GRAVITY).toBe(9.80665);
    expect(stored.impact_energy_j!).toBeLessThanOrEqual(2.4 * 9.80665 * 42 + 0.5 * 2.4 * 12 ** 2);
    // Free fall in a vacuum, h = ½·g·t² (any introductory mechanics text, e.g. OpenStax University Physics vol. 1,
    // §3.5): drag only lengthens the fall.
    expect(stored.fall_time_s!).toBeGreaterThanOrEqual(Math.sqrt((2 * 42) / 9.80665));
  });

  it('stores an inputs_hash that the stored inputs reproduce, whatever order the dimensions come back in', async () => {
    const siteId = await newSite();
    const levelId = await newLevel(siteId, { name: 'Jib walkway', floor_height: 42 });
    const id = await newItem(siteId, wrench(levelId));
    const stored = (await findItem(org.id, id))!;
    // PostgreSQL's jsonb hands keys back in its own order ({width, length}); the hash must not depend on it.
    expect(stored.inputs_hash).toBe(inputsHash(itemDropCase(stored, stored)));
  });

  it('stores an item over the sea through air then seawater to the seabed', async () => {
    const siteId = await newSite({ name: 'Gannet Alpha', kind: 'offshore_deck', surface: 'water', water_depth: 80, design_wind: 15, current: 1 });
    const levelId = await newLevel(siteId, { name: 'Cellar deck', floor_height: 25 });
    const body = { ...wrench(levelId), tag: 'V-07', description: 'Valve handwheel', shape: 'disc', dimensions: { diameter: 0.4, thickness: 0.05 }, mass: 9 };
    const id = await newItem(siteId, body);

    // The expected result is the physics core run here on the inputs sent: this checks the storage, not the physics.
    const physics: ItemPhysics = { mass_kg: 9, shape: 'disc', dimensions_m: { diameter: 0.4, thickness: 0.05 }, cd: null, area_m2: null, volume_m3: null, height_m: null };
    const setting: FallSetting = { floor_height_m: 25, surface: 'water', water_depth_m: 80, altitude_m: 0, design_wind_m_s: 15, current_m_s: 1 };
    const stored = await storedItem(id);
    expect(only(stored, RESULT_COLUMNS)).toEqual(computeItem(physics, setting, await listLadder(org.id)));
    expect(stored.inputs_hash).toBe(inputsHash(itemDropCase(physics, setting)));
    expect(stored.sinks).toBe(true);
  });
});

describe('recomputation when what a fall depends on changes', () => {
  let siteId: string;
  let upper: string;
  let lower: string;
  let onUpper: string;
  let overridden: string;
  let onLower: string;

  beforeEach(async () => {
    siteId = await newSite({ ...siteBody, design_wind: 10 });
    upper = await newLevel(siteId, { name: 'Upper deck', floor_height: 30 });
    lower = await newLevel(siteId, { name: 'Lower deck', floor_height: 10 });
    onUpper = await newItem(siteId, wrench(upper, { tag: 'U-1' }));
    overridden = await newItem(siteId, wrench(upper, { tag: 'U-2', height: 50 }));
    onLower = await newItem(siteId, wrench(lower, { tag: 'L-1' }));
  });

  it('a new design wind rewrites every item’s drift and inputs_hash within the PATCH', async () => {
    const before = await Promise.all([onUpper, overridden, onLower].map(storedItem));
    const { status, json } = await call(patchSite, 'PATCH', { design_wind: 20 }, { id: siteId });
    expect(status).toBe(200);
    expect(json.recomputed_items).toBe(3);
    for (const [i, id] of [onUpper, overridden, onLower].entries()) {
      const after = await storedItem(id);
      expect(after.drift_m).not.toBe(before[i].drift_m);
      expect(after.inputs_hash).not.toBe(before[i].inputs_hash);
      // Against the physics core run here on the stored inputs: this checks the storage, not the physics.
      expect(only(after, RESULT_COLUMNS)).toEqual(await freshResult(id));
    }
  });

  it('a new floor height recomputes that level’s items only, and not an item with its own height', async () => {
    const before = Object.fromEntries(await Promise.all([onUpper, overridden, onLower].map(async (id) => [id, await storedItem(id)] as const)));
    const outcome = await runAction(saveLevelAction, { id: upper, site_id: siteId, name: 'Upper deck', floor_height: '36', surface: 'ground', units: 'si' });
    expect(outcome).toMatchObject({ kind: 'state', state: { ok: true } });

    const moved = await storedItem(onUpper);
    expect(moved.fall_time_s).not.toBe(before[onUpper].fall_time_s);
    expect(only(moved, RESULT_COLUMNS)).toEqual(await freshResult(onUpper));

    expect(only(await storedItem(overridden), RESULT_COLUMNS)).toEqual(only(before[overridden], RESULT_COLUMNS));
    expect(await storedItem(onLower)).toEqual(before[onLower]);
  });

  it('the design wind does change an item with its own height', async () => {
    const before = await storedItem(overridden);
    await call(patchSite, 'PATCH', { design_wind: 4 }, { id: siteId });
    const after = await storedItem(overridden);
    expect(after.drift_m).not.toBe(before.drift_m);
    expect(after.height_m).toBe(50);
    expect(only(after, RESULT_COLUMNS)).toEqual(await freshResult(overridden));
  });
});

describe('reclassification when the ladder changes', () => {
  it('moves items to the level their stored energy now falls in, and audits the change', async () => {
    const siteId = await newSite();
    const levelId = await newLevel(siteId, { name: 'Top', floor_height: 30 });
    const heavy = await newItem(siteId, wrench(levelId, { tag: 'H-1', mass: 6 }));
    const light = await newItem(siteId, wrench(levelId, { tag: 'L-1', mass: 0.2, dimensions: { length: 0.15, width: 0.02 } }));
    const eHeavy = (await storedItem(heavy)).effective_energy_j!;
    const eLight = (await storedItem(light)).effective_energy_j!;
    expect(eLight).toBeLessThan(eHeavy);

    const elsewhere = await createOrg('Other Rigging Ltd', 'other');
    const theirSite = await createSite(elsewhere.id, elsewhere.users.admin.id, siteSchema('si').parse(siteBody));
    const theirLevel = await createLevel(elsewhere.id, elsewhere.users.admin.id, theirSite.id, levelSchema('si').parse({ name: 'Top', floor_height: 30, surface: 'ground' }));
    const theirs = await createItem(elsewhere.id, elsewhere.users.admin.id, theirSite.id, itemSchema('si').parse(wrench(theirLevel.id, { mass: 6 })));

    await actAs('admin');
    const ladder = (bound: number) => ({
      levels: [
        { name: 'Low', lower_bound_j: 0, colour: 'haze' },
        { name: 'High', lower_bound_j: bound, colour: 'ink' },
      ],
    });
    const first = await call(putLadder, 'PUT', ladder(eHeavy * 2), {});
    expect(first.status).toBe(200);
    const [low, high] = first.json.levels as ConsequenceLevel[];
    expect((await storedItem(heavy)).consequence_level_id).toBe(low.id);

    const second = await call(putLadder, 'PUT', ladder((eLight + eHeavy) / 2), {});
    expect(second.status).toBe(200);
    const [low2, high2] = second.json.levels as ConsequenceLevel[];
    expect(high2.name).toBe(high.name);
    expect((await storedItem(heavy)).consequence_level_id).toBe(high2.id);
    expect((await storedItem(light)).consequence_level_id).toBe(low2.id);
    expect(second.json.reclassified_items).toBe(2);
    expect((await getDb()('items').where({ id: theirs.id }).first()).consequence_level_id).toBe(theirs.consequence_level_id);

    const entries = (await auditActions()).filter((a) => a.action === 'ladder.changed');
    expect(entries).toHaveLength(2);
    // Every item of the organisation is pointed at a level of the new ladder, so both count as reclassified.
    expect(entries[1].after).toMatchObject({ reclassified_items: 2 });
    expect(entries[1].actor_user_id).toBe(org.users.admin.id);
  });
});

describe('audit entries', () => {
  it('are written for site, level and item create, update and delete, and for an import', async () => {
    const siteId = await newSite();
    const levelId = await newLevel(siteId, { name: 'Upper deck', floor_height: 30 });
    const itemId = await newItem(siteId, wrench(levelId));
    expect((await call(patchItem, 'PATCH', { description: 'Torque wrench, 1/2 in drive' }, { id: itemId })).status).toBe(200);
    expect(await runAction(saveLevelAction, { id: levelId, site_id: siteId, name: 'Upper deck', floor_height: '31', surface: 'ground' })).toMatchObject({
      state: { ok: true },
    });
    const spare = await newLevel(siteId, { name: 'Spare', floor_height: 5 });
    expect(await runAction(deleteLevelAction, { id: spare, site_id: siteId })).toMatchObject({ state: { ok: true } });
    const form = new FormData();
    form.set('file', new File([itemsTemplateCsv('si', ['Upper deck'])], 'items.csv', { type: 'text/csv' }));
    form.set('mode', 'valid-only');
    expect((await importRoute(new Request('http://127.0.0.1/import', { method: 'POST', body: form }), ctx({ id: siteId }))).status).toBe(200);
    expect((await call(deleteItemRoute, 'DELETE', undefined, { id: itemId })).status).toBe(204);
    expect((await call(patchSite, 'PATCH', { notes: 'Surveyed from the jib walkway.' }, { id: siteId })).status).toBe(200);
    expect((await call(deleteSiteRoute, 'DELETE', undefined, { id: siteId })).status).toBe(204);

    const entries = await auditActions();
    expect(entries.map((e) => [e.action, e.entity_id])).toEqual([
      ['site.created', siteId],
      ['level.created', levelId],
      ['item.created', itemId],
      ['item.updated', itemId],
      ['level.updated', levelId],
      ['level.created', spare],
      ['level.deleted', spare],
      ['items.imported', siteId],
      ['item.deleted', itemId],
      ['site.updated', siteId],
      ['site.deleted', siteId],
    ]);
    expect(new Set(entries.map((e) => e.actor_user_id))).toEqual(new Set([org.users.engineer.id]));
    expect(entries[3].before).toMatchObject({ description: 'Torque wrench' });
    expect(entries[3].after).toMatchObject({ description: 'Torque wrench, 1/2 in drive' });
    expect(entries[7].after).toMatchObject({ imported: 4, file_name: 'items.csv', mode: 'valid-only', skipped_rows: 0 });
    expect(entries[10].before).toMatchObject({ name: siteBody.name, items: 4 });
  });
});

describe('bad input through the API names the field and writes nothing', () => {
  let siteId: string;
  let levelId: string;
  let itemId: string;

  beforeEach(async () => {
    siteId = await newSite();
    levelId = await newLevel(siteId, { name: 'Upper deck', floor_height: 30 });
    itemId = await newItem(siteId, wrench(levelId));
  });

  const itemCases: [string, (level: string) => Json, string][] = [
    ['a negative mass', (l) => wrench(l, { tag: 'N', mass: -1 }), 'mass'],
    ['a mass in words', (l) => wrench(l, { tag: 'N', mass: 'heavy' }), 'mass'],
    ['no mass', (l) => ({ ...wrench(l, { tag: 'N' }), mass: undefined }), 'mass'],
    ['a bar without its length', (l) => wrench(l, { tag: 'N', dimensions: { width: 0.04 } }), 'dimensions.length'],
    ['a zero width', (l) => wrench(l, { tag: 'N', dimensions: { length: 0.6, width: 0 } }), 'dimensions.width'],
    ['dimensions that are not an object', (l) => wrench(l, { tag: 'N', dimensions: 'large' }), 'dimensions'],
    ['a level id that is not an id', (l) => wrench(l, { tag: 'N', level_id: 'upper deck' }), 'level_id'],
    ['an unknown shape', (l) => wrench(l, { tag: 'N', shape: 'anvil' }), 'shape'],
    ['an unknown category', (l) => wrench(l, { tag: 'N', category: 'gadget' }), 'category'],
    ['a blank tag', (l) => wrench(l, { tag: '  ' }), 'tag'],
    ['a direct shape without a drag coefficient', (l) => wrench(l, { tag: 'N', shape: 'direct', area: 0.02 }), 'cd'],
    ['a fractional quantity', (l) => wrench(l, { tag: 'N', quantity: 1.5 }), 'quantity'],
    ['an inspection in the year 2999', (l) => wrench(l, { tag: 'N', last_inspected: '2999-01-01' }), 'last_inspected'],
    ['an unknown securing', (l) => wrench(l, { tag: 'N', securing: 'glued' }), 'securing'],
    ['an unknown unit system', (l) => wrench(l, { tag: 'N', units: 'metric' }), 'units'],
  ];
  for (const [name, body, field] of itemCases) {
    it(`POST item with ${name} → 400 on ${field}`, async () => {
      const before = await rowCounts();
      const { status, json } = await call(postItem, 'POST', body(levelId), { id: siteId });
      expect(status).toBe(400);
      expect(paths(json)).toContain(field);
      expect(await rowCounts()).toEqual(before);
    });
  }

  const siteCases: [string, Json, string][] = [
    ['the sea below and no water depth', { ...siteBody, name: 'Rig', surface: 'water' }, 'water_depth'],
    ['a negative water depth', { ...siteBody, name: 'Rig', surface: 'water', water_depth: -5 }, 'water_depth'],
    ['a design wind of 80 m/s', { ...siteBody, name: 'Rig', design_wind: 80 }, 'design_wind'],
    ['an unknown kind', { ...siteBody, name: 'Rig', kind: 'tower' }, 'kind'],
    ['a blank name', { ...siteBody, name: '' }, 'name'],
  ];
  for (const [name, body, field] of siteCases) {
    it(`POST site with ${name} → 400 on ${field}`, async () => {
      const before = await rowCounts();
      const { status, json } = await call(postSite, 'POST', body, {});
      expect(status).toBe(400);
      expect(paths(json)).toContain(field);
      expect(await rowCounts()).toEqual(before);
    });
  }

  const levelCases: [string, Json, string][] = [
    ['a negative floor height', { name: 'Pit', floor_height: -2 }, 'floor_height'],
    ['no floor height', { name: 'Pit' }, 'floor_height'],
    ['the sea below and no water depth', { name: 'Jetty', floor_height: 6, surface: 'water' }, 'water_depth'],
  ];
  for (const [name, body, field] of levelCases) {
    it(`POST level with ${name} → 400 on ${field}`, async () => {
      const before = await rowCounts();
      const { status, json } = await call(postLevel, 'POST', body, { id: siteId });
      expect(status).toBe(400);
      expect(paths(json)).toContain(field);
      expect(await rowCounts()).toEqual(before);
    });
  }

  it('PATCH item and site with bad fields → 400 naming them; nothing changes', async () => {
    const before = await rowCounts();
    const item = await storedItem(itemId);
    for (const [body, field] of [
      [{ mass: 0 }, 'mass'],
      [{ level_id: 'x' }, 'level_id'],
      [{ dimensions: { length: -1 } }, 'dimensions.length'],
    ] as const) {
      const { status, json } = await call(patchItem, 'PATCH', body, { id: itemId });
      expect(status).toBe(400);
      expect(paths(json)).toContain(field);
    }
    const site = await getDb()('sites').where({ id: siteId }).first();
    const { status, json } = await call(patchSite, 'PATCH', { surface: 'water' }, { id: siteId });
    expect(status).toBe(400);
    expect(paths(json)).toContain('water_depth');
    expect(await storedItem(itemId)).toEqual(item);
    expect(await getDb()('sites').where({ id: siteId }).first()).toEqual(site);
    expect(await rowCounts()).toEqual(before);
  });

  it('a ladder that does not start at 0 J → 400 on levels.0.lower_bound_j', async () => {
    await actAs('admin');
    const before = await rowCounts();
    const { status, json } = await call(
      putLadder,
      'PUT',
      { levels: [{ name: 'Low', lower_bound_j: 5, colour: 'haze' }, { name: 'High', lower_bound_j: 50, colour: 'ink' }] },
      {},
    );
    expect(status).toBe(400);
    expect(paths(json)).toContain('levels.0.lower_bound_j');
    expect(await rowCounts()).toEqual(before);
  });

  it('a level of another site → 422 on level_id, for POST and PATCH', async () => {
    const otherSite = await newSite({ ...siteBody, name: 'South Quay Crane 1' });
    const otherLevel = await newLevel(otherSite, { name: 'Upper deck', floor_height: 30 });
    const before = await rowCounts();
    const item = await storedItem(itemId);
    const created = await call(postItem, 'POST', wrench(otherLevel, { tag: 'N' }), { id: siteId });
    expect(created.status).toBe(422);
    expect(paths(created.json)).toEqual(['level_id']);
    const patched = await call(patchItem, 'PATCH', { level_id: otherLevel }, { id: itemId });
    expect(patched.status).toBe(422);
    expect(paths(patched.json)).toEqual(['level_id']);
    expect(await storedItem(itemId)).toEqual(item);
    expect(await rowCounts()).toEqual(before);
  });

  it('a level of another organisation → 422 on level_id', async () => {
    const elsewhere = await createOrg('Other Rigging Ltd', 'other');
    const theirSite = await createSite(elsewhere.id, elsewhere.users.admin.id, siteSchema('si').parse(siteBody));
    const theirLevel = await createLevel(elsewhere.id, elsewhere.users.admin.id, theirSite.id, levelSchema('si').parse({ name: 'Top', floor_height: 9, surface: 'ground' }));
    const before = await rowCounts();
    const { status, json } = await call(postItem, 'POST', wrench(theirLevel.id, { tag: 'N' }), { id: siteId });
    expect(status).toBe(422);
    expect(paths(json)).toEqual(['level_id']);
    expect(await rowCounts()).toEqual(before);
  });

  it('a duplicate tag, in any letter case → 409 on tag, for POST and PATCH', async () => {
    const second = await newItem(siteId, wrench(levelId, { tag: 'W-02' }));
    const before = await rowCounts();
    const created = await call(postItem, 'POST', wrench(levelId, { tag: 'w-01' }), { id: siteId });
    expect(created.status).toBe(409);
    expect(paths(created.json)).toEqual(['tag']);
    const patched = await call(patchItem, 'PATCH', { tag: 'W-01' }, { id: second });
    expect(patched.status).toBe(409);
    expect(paths(patched.json)).toEqual(['tag']);
    expect((await storedItem(second)).tag).toBe('W-02');
    expect(await rowCounts()).toEqual(before);
  });

  it('a duplicate site name → 409 on name', async () => {
    const before = await rowCounts();
    const { status, json } = await call(postSite, 'POST', { ...siteBody, name: siteBody.name.toUpperCase() }, {});
    expect(status).toBe(409);
    expect(paths(json)).toEqual(['name']);
    expect(await rowCounts()).toEqual(before);
  });

  it('deleting a level that has items is refused and the item kept', async () => {
    const before = await rowCounts();
    const outcome = await runAction(deleteLevelAction, { id: levelId, site_id: siteId });
    expect(outcome.kind).toBe('state');
    if (outcome.kind !== 'state') return;
    expect(outcome.state.ok).toBeFalsy();
    expect(Object.keys(outcome.state.errors ?? {})).toEqual(['level']);
    expect(await getDb()('site_levels').where({ id: levelId }).first()).toBeDefined();
    expect(await storedItem(itemId)).toBeDefined();
    expect(await rowCounts()).toEqual(before);
  });
});

describe('US units', () => {
  it('a body in US units is stored in SI', async () => {
    // NIST SP 811 (2008), Appendix B: 1 lb = 0.45359237 kg and 1 ft = 0.3048 m, both exact.
    const siteId = await newSite({ ...siteBody, units: 'us', design_wind: 50 });
    const levelId = await newLevel(siteId, { units: 'us', name: 'Jib walkway', floor_height: 120 });
    const id = await newItem(siteId, { ...wrench(levelId), units: 'us', mass: 10, dimensions: { length: 2, width: 0.125 }, height: 100 });
    const site = await getDb()('sites').where({ id: siteId }).first();
    const level = await getDb()('site_levels').where({ id: levelId }).first();
    const item = await storedItem(id);
    expect(site.design_wind_m_s).toBeCloseTo(15.24, 12);
    expect(level.floor_height_m).toBeCloseTo(36.576, 12);
    expect(item.mass_kg).toBeCloseTo(4.5359237, 12);
    expect(item.height_m).toBeCloseTo(30.48, 12);
    expect(item.dimensions_m.length).toBeCloseTo(0.6096, 12);
    expect(item.dimensions_m.width).toBeCloseTo(0.0381, 12);
    expect(only(item, RESULT_COLUMNS)).toEqual(await freshResult(id));
  });
});

describe('PATCH with a subset of the fields', () => {
  let siteId: string;
  let itemId: string;

  beforeEach(async () => {
    siteId = await newSite({ ...siteBody, altitude: 2.9, design_wind: 1.5, location: 'Berth 7', notes: 'Tower crane, 60 m jib' });
    const levelId = await newLevel(siteId, { name: 'Jib walkway', floor_height: 41.3 });
    itemId = await newItem(siteId, {
      ...wrench(levelId),
      mass: 7.3,
      dimensions: { length: 0.61, width: 0.037 },
      height: 44.7,
      quantity: 3,
      last_inspected: '2025-02-14',
      notes: 'Kept in the tool bag',
    });
  });

  it('keeps an item’s other fields and stored result exactly (SI body)', async () => {
    const before = await storedItem(itemId);
    const { status } = await call(patchItem, 'PATCH', { description: 'Torque wrench, relabelled' }, { id: itemId });
    expect(status).toBe(200);
    const after = await storedItem(itemId);
    expect(after.description).toBe('Torque wrench, relabelled');
    expect(only(after, INPUT_FIELDS)).toEqual({ ...only(before, INPUT_FIELDS), description: 'Torque wrench, relabelled' });
    expect(only(after, RESULT_COLUMNS)).toEqual(only(before, RESULT_COLUMNS));
  });

  it('merges one dimension and keeps the other', async () => {
    await call(patchItem, 'PATCH', { dimensions: { width: 0.05 } }, { id: itemId });
    expect((await storedItem(itemId)).dimensions_m).toEqual({ length: 0.61, width: 0.05 });
  });

  it('keeps a site’s other fields exactly and recomputes nothing when only its notes change (SI body)', async () => {
    const before = await getDb()('sites').where({ id: siteId }).first();
    const item = await storedItem(itemId);
    const { status, json } = await call(patchSite, 'PATCH', { notes: 'Jib parked at night' }, { id: siteId });
    expect(status).toBe(200);
    expect(json.recomputed_items).toBe(0);
    const after = await getDb()('sites').where({ id: siteId }).first();
    expect(only(after, SITE_FIELDS)).toEqual({ ...only(before, SITE_FIELDS), notes: 'Jib parked at night' });
    expect(await storedItem(itemId)).toEqual(item);
  });

  it('keeps an item’s unnamed fields exactly when the body is in US units', async () => {
    const before = await storedItem(itemId);
    const { status } = await call(patchItem, 'PATCH', { units: 'us', description: 'Torque wrench, relabelled' }, { id: itemId });
    expect(status).toBe(200);
    const after = await storedItem(itemId);
    expect(only(after, INPUT_FIELDS)).toEqual({ ...only(before, INPUT_FIELDS), description: 'Torque wrench, relabelled' });
    expect(after.inputs_hash).toBe(before.inputs_hash);
  });

  it('keeps a site’s unnamed fields exactly, and recomputes nothing, when the body is in US units', async () => {
    const before = await getDb()('sites').where({ id: siteId }).first();
    const { status, json } = await call(patchSite, 'PATCH', { units: 'us', notes: 'Jib parked at night' }, { id: siteId });
    expect(status).toBe(200);
    const after = await getDb()('sites').where({ id: siteId }).first();
    expect(only(after, SITE_FIELDS)).toEqual({ ...only(before, SITE_FIELDS), notes: 'Jib parked at night' });
    expect(json.recomputed_items).toBe(0);
  });
});
