import { beforeAll, describe, expect, it } from 'vitest';
import { DELETE as deleteItemRoute, PATCH as patchItem } from '@/app/api/v1/items/[id]/route';
import { PATCH as patchSite } from '@/app/api/v1/sites/[id]/route';
import { POST as postLevel } from '@/app/api/v1/sites/[id]/levels/route';
import { POST as postItem } from '@/app/api/v1/sites/[id]/items/route';
import { POST as importRoute } from '@/app/api/v1/sites/[id]/items/import/route';
import { POST as postSite } from '@/app/api/v1/sites/route';
import { listLadder } from '@/db/consequence-levels';
import { findItem, RESULT_COLUMNS } from '@/db/items';
import { getDb } from '@/db/knex';
import { renameOrganisation } from '@/db/organisations';
import type { ItemRow } from '@/db/types';
import { saveLevelAction } from '@/lib/actions/register';
import { startSession } from '@/lib/auth';
import { computeItem } from '@/lib/register/compute';
import { createOrg, ctx, jsonRequest, resetDatabase, runAction, signOutLocally, type OrgFixture } from './harness';
import { replaceLadder } from '@/lib/register/commands';

// Every site and item below is invented. The edits race on purpose: if two write paths took row locks in different
// orders, PostgreSQL would break the cycle by failing one of them with SQLSTATE 40P01, which reaches the caller as a 500.

type Handler<P> = (request: Request, context: { params: Promise<P> }) => Promise<Response>;

async function call<P>(handler: Handler<P>, method: string, body: unknown, params: P): Promise<number> {
  const response = await handler(jsonRequest(method, body), ctx(params));
  return response.status;
}

let org: OrgFixture;
let siteId: string;
const levels: string[] = [];
const stable: string[] = [];

const wrench = (tag: string, levelId: string, mass: number) => ({
  tag,
  description: 'Torque wrench',
  category: 'hand_tool',
  mass,
  shape: 'long_bar',
  dimensions: { length: 0.6, width: 0.04 },
  level_id: levelId,
  securing: 'tethered',
});

beforeAll(async () => {
  await resetDatabase();
  org = await createOrg('Racing Rigging Ltd', 'race');
  signOutLocally();
  await startSession(org.users.engineer.id, org.id);
  const site = await postSite(jsonRequest('POST', { name: 'Race Quay', kind: 'offshore_deck', surface: 'water', water_depth: 60, design_wind: 10, current: 0.5 }), ctx({}));
  siteId = (await site.json()).site.id;
  const levelBodies = [
    { name: 'Crane boom', floor_height: 40, surface: 'water', water_depth: 60 },
    { name: 'Drill floor', floor_height: 25, surface: 'water', water_depth: 60 },
    { name: 'Main deck', floor_height: 12, surface: 'ground' },
  ];
  for (const body of levelBodies) {
    const response = await postLevel(jsonRequest('POST', body), ctx({ id: siteId }));
    levels.push((await response.json()).level.id);
  }
  for (let i = 0; i < 24; i++) {
    const response = await postItem(jsonRequest('POST', wrench(`S-${i}`, levels[i % levels.length], 1 + i / 10)), ctx({ id: siteId }));
    stable.push((await response.json()).item.id);
  }
});

/** A seeded generator, so a failing round can be replayed. */
function mulberry32(seed: number) {
  return () => {
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function importForm(tags: string[]): FormData {
  const lines = ['tag,description,category,quantity,mass_kg,shape,dim_length_m,dim_width_m,level,securing'];
  for (const tag of tags) lines.push(`${tag},Imported spanner,hand_tool,1,0.8,long_bar,0.3,0.03,Drill floor,unsecured`);
  const form = new FormData();
  form.set('mode', 'all-or-nothing');
  form.set('file', new File([lines.join('\n')], 'race.csv', { type: 'text/csv' }));
  return form;
}

const ladder = (bound: number) => ({
  levels: [
    { name: 'Low', lower_bound_j: 0, colour: 'haze' as const, guidance: '', source: '' },
    { name: 'High', lower_bound_j: bound, colour: 'ink' as const, guidance: '', source: '' },
  ],
});

describe('one lock order for every write path', () => {
  it('runs item, level, site-condition, import, delete and ladder edits at once without a deadlock or a 500', async () => {
    const random = mulberry32(20261209);
    const pick = <T>(list: T[]) => list[Math.floor(random() * list.length)];
    const outcomes: string[] = [];
    const record = (what: string, work: () => Promise<number | string>) =>
      work().then(
        (status) => outcomes.push(`${what} ${status}`),
        (error: { code?: string; message?: string }) => outcomes.push(`${what} threw ${error.code ?? ''} ${error.message}`),
      );

    for (let round = 0; round < 6; round++) {
      const churn: string[] = [];
      for (let i = 0; i < 3; i++) {
        const response = await postItem(jsonRequest('POST', wrench(`C-${round}-${i}`, pick(levels), 2)), ctx({ id: siteId }));
        churn.push((await response.json()).item.id);
      }
      const work: Promise<unknown>[] = [];
      for (const id of stable) {
        work.push(record('item', () => call(patchItem, 'PATCH', { mass: 0.5 + random() * 5, level_id: pick(levels) }, { id })));
      }
      for (let i = 0; i < 4; i++) {
        work.push(record('site', () => call(patchSite, 'PATCH', { design_wind: 5 + random() * 20, current: random() }, { id: siteId })));
      }
      levels.forEach((id, i) => {
        const body = { id, site_id: siteId, name: ['Crane boom', 'Drill floor', 'Main deck'][i], floor_height: String(10 + Math.round(random() * 40)), units: 'si' };
        const fields = i < 2 ? { ...body, surface: 'water', water_depth: '60' } : { ...body, surface: 'ground' };
        work.push(record('level', async () => ((await runAction(saveLevelAction, fields)) as { state?: { ok?: boolean } }).state?.ok ? 200 : 'refused'));
      });
      for (const id of churn) work.push(record('delete', () => call(deleteItemRoute, 'DELETE', undefined, { id })));
      work.push(record('create', () => call(postItem, 'POST', wrench(`N-${round}`, pick(levels), 3), { id: siteId })));
      work.push(
        record('import', async () => (await importRoute(new Request('http://127.0.0.1/import', { method: 'POST', body: importForm([`I-${round}-a`, `I-${round}-b`]) }), ctx({ id: siteId }))).status),
      );
      work.push(record('ladder', async () => (await replaceLadder(org.id, org.users.admin.id, ladder(20 + random() * 200)), 200)));
      // Every write above appends audit rows whose key refers to the organisation; a rename must not block them.
      work.push(record('rename', async () => (await renameOrganisation(org.id, `Race Org ${round}`, org.users.admin.id), 200)));
      await Promise.all(work);
    }

    const failures = outcomes.filter((o) => !/ (200|201|204)$/.test(o));
    expect(failures).toEqual([]);
    expect(outcomes.length).toBe(6 * (stable.length + 4 + levels.length + 3 + 4));
  }, 300_000);

  it('leaves every stored result equal to what its stored inputs give now', async () => {
    const ladderNow = await listLadder(org.id);
    const items: ItemRow[] = await getDb()('items').where({ site_id: siteId });
    expect(items.length).toBe(stable.length + 6 * 3);
    for (const item of items) {
      const detail = (await findItem(org.id, item.id))!;
      const expected = computeItem(detail, detail, ladderNow);
      const stored = Object.fromEntries(RESULT_COLUMNS.map((c) => [c, item[c]]));
      expect(stored, item.tag).toEqual(expected);
    }
  });
});
