import knex, { type Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GET as health } from '@/app/api/health/route';
import { PATCH as patchItem } from '@/app/api/v1/items/[id]/route';
import { POST as importRoute } from '@/app/api/v1/sites/[id]/items/import/route';
import { POST as postLevel } from '@/app/api/v1/sites/[id]/levels/route';
import { POST as postItem } from '@/app/api/v1/sites/[id]/items/route';
import { PATCH as patchSite } from '@/app/api/v1/sites/[id]/route';
import { GET as listSitesRoute, POST as postSite } from '@/app/api/v1/sites/route';
import { listLadder } from '@/db/consequence-levels';
import { findItem, RESULT_COLUMNS } from '@/db/items';
import { closeDb } from '@/db/knex';
import { DATABASE_UNREACHABLE_MESSAGE } from '@/lib/actions/outage';
import { saveSiteAction } from '@/lib/actions/register';
import { startSession } from '@/lib/auth';
import { computeItem } from '@/lib/register/compute';
import { createOrg, ctx, jsonRequest, resetDatabase, runAction, signOutLocally, type OrgFixture } from './harness';
import { requestContext } from './harness/context';
import { DatabaseProxy } from './harness/db-proxy';

// The database is cut with a TCP proxy between the app's pool and PostgreSQL rather than by stopping a cluster:
// the proxy can cut at an exact statement inside a write transaction the app has open (a stopped server cannot be
// timed that precisely), it can also go silent the way a vanished host does, and it leaves the shared test cluster
// running for the checks, which read PostgreSQL directly. Every site and item below is invented.

type Handler<P> = (request: Request, context: { params: Promise<P> }) => Promise<Response>;

async function call<P>(handler: Handler<P>, method: string, body: unknown, params: P) {
  const response = await handler(jsonRequest(method, body), ctx(params));
  const text = await response.text();
  return { status: response.status, retryAfter: response.headers.get('retry-after'), json: text ? JSON.parse(text) : null };
}

let org: OrgFixture;
let siteId: string;
let levelId: string;
const itemIds: string[] = [];
let proxy: DatabaseProxy;
let direct: Knex;
const directUrl = process.env.DATABASE_URL!;

/** Everything the register stores for the organisation, read straight from PostgreSQL. */
async function snapshot() {
  const where = { organisation_id: org.id };
  return {
    sites: await direct('sites').where(where).orderBy('id'),
    levels: await direct('site_levels').where(where).orderBy('id'),
    items: await direct('items').where(where).orderBy('id'),
    audit: await direct('audit_log').where(where).orderBy('id'),
  };
}

function expectUnavailable(response: { status: number; retryAfter: string | null; json: unknown }, id: string) {
  expect(response.status).toBe(503);
  expect(response.json).toEqual({ error: expect.stringContaining('database cannot be reached'), request_id: id });
  expect(Number(response.retryAfter)).toBeGreaterThan(0);
}

function importForm(rows: number): FormData {
  const lines = ['tag,description,category,quantity,mass_kg,shape,dim_length_m,dim_width_m,level,securing'];
  for (let i = 0; i < rows; i++) lines.push(`IMP-${i},Imported spanner,hand_tool,1,0.8,long_bar,0.3,0.03,Top deck,unsecured`);
  const form = new FormData();
  form.set('mode', 'all-or-nothing');
  form.set('file', new File([lines.join('\n')], 'outage.csv', { type: 'text/csv' }));
  return form;
}

beforeAll(async () => {
  await resetDatabase();
  org = await createOrg('Outage Rigging Ltd', 'outage');
  signOutLocally();
  await startSession(org.users.engineer.id, org.id);
  siteId = (await call(postSite, 'POST', { name: 'Outage Quay', kind: 'crane', surface: 'ground', design_wind: 10 }, {})).json.site.id;
  levelId = (await call(postLevel, 'POST', { name: 'Top deck', floor_height: 30 }, { id: siteId })).json.level.id;
  for (const [i, mass] of [1.2, 2.4, 4.8].entries()) {
    const body = { tag: `O-${i}`, description: 'Torque wrench', category: 'hand_tool', mass, shape: 'long_bar', dimensions: { length: 0.6, width: 0.04 }, level_id: levelId, securing: 'tethered' };
    itemIds.push((await call(postItem, 'POST', body, { id: siteId })).json.item.id);
  }
  direct = knex({ client: 'pg', connection: directUrl, pool: { min: 0, max: 2 } });
  const target = new URL(directUrl);
  proxy = await DatabaseProxy.start({ host: target.hostname, port: Number(target.port) });
  await closeDb();
  process.env.DATABASE_URL = proxy.url(directUrl);
});

afterAll(async () => {
  requestContext.headers.delete('x-request-id');
  await closeDb();
  process.env.DATABASE_URL = directUrl;
  await proxy.close();
  await direct.destroy();
});

describe('the database cut during writes', () => {
  it('a site-condition edit cut in the middle of its transaction answers 503 with a JSON error and writes nothing', async () => {
    const before = await snapshot();
    requestContext.headers.set('x-request-id', 'outage-site');
    proxy.cutAt('UPDATE items AS i SET');
    const response = await call(patchSite, 'PATCH', { design_wind: 25 }, { id: siteId });
    // The site row was already updated inside the transaction when the items' results were being written.
    expect(proxy.cutAtMarker).toBe(true);
    expectUnavailable(response, 'outage-site');
    expect(await snapshot()).toEqual(before);
  });

  it('while it is down: routes answer 503 JSON, /api/health says down, a server action answers a message, nothing is written', async () => {
    const before = await snapshot();
    requestContext.headers.set('x-request-id', 'outage-down');
    const down = await health();
    expect(down.status).toBe(503);
    expect(await down.json()).toMatchObject({ database: 'down' });
    expectUnavailable(await call(listSitesRoute, 'GET', undefined, {}), 'outage-down');
    expectUnavailable(await call(patchItem, 'PATCH', { mass: 9 }, { id: itemIds[0] }), 'outage-down');
    expectUnavailable(await call(postSite, 'POST', { name: 'Never stored', kind: 'crane', surface: 'ground', design_wind: 5 }, {}), 'outage-down');
    const action = await runAction(saveSiteAction, { id: siteId, name: 'Outage Quay', kind: 'crane', surface: 'ground', design_wind: '30', units: 'si' });
    expect(action).toEqual({ kind: 'state', state: { message: DATABASE_UNREACHABLE_MESSAGE } });
    expect(await snapshot()).toEqual(before);
  });

  it('recovers when the database returns: health is up and the same edit goes through whole', async () => {
    await proxy.restore();
    expect((await health()).status).toBe(200);
    const response = await call(patchSite, 'PATCH', { design_wind: 25 }, { id: siteId });
    expect(response.status).toBe(200);
    expect(response.json.recomputed_items).toBe(3);
    const ladder = await listLadder(org.id);
    for (const id of itemIds) {
      const item = (await findItem(org.id, id))!;
      expect(item.design_wind_m_s).toBe(25);
      expect(Object.fromEntries(RESULT_COLUMNS.map((c) => [c, item[c]]))).toEqual(computeItem(item, item, ladder));
    }
  });

  it('an item edit cut at its COMMIT answers 503 and writes nothing', async () => {
    const before = await snapshot();
    requestContext.headers.set('x-request-id', 'outage-commit');
    proxy.cutAt('COMMIT');
    expectUnavailable(await call(patchItem, 'PATCH', { mass: 7.5 }, { id: itemIds[1] }), 'outage-commit');
    expect(proxy.cutAtMarker).toBe(true);
    expect(await snapshot()).toEqual(before);
    await proxy.restore();
  });

  it('an import of 1,200 rows cut after its item inserts, at its audit entry, stores none of them', async () => {
    const before = await snapshot();
    requestContext.headers.set('x-request-id', 'outage-import');
    proxy.cutAt('insert into "audit_log"');
    const response = await importRoute(new Request('http://127.0.0.1/import', { method: 'POST', body: importForm(1200) }), ctx({ id: siteId }));
    expect(proxy.cutAtMarker).toBe(true);
    expectUnavailable({ status: response.status, retryAfter: response.headers.get('retry-after'), json: await response.json() }, 'outage-import');
    expect(await snapshot()).toEqual(before);
    await proxy.restore();
  });

  it('a database that goes silent (its host vanished) gives a 503 within the pool timeouts, not a hang', async () => {
    requestContext.headers.set('x-request-id', 'outage-silent');
    // One connection already in the pool, which falls silent, and new ones that connect to nothing that answers.
    expect((await health()).status).toBe(200);
    proxy.blackhole();
    const results = await Promise.all([health(), call(patchItem, 'PATCH', { mass: 3 }, { id: itemIds[2] })]);
    expect(results[0].status).toBe(503);
    expectUnavailable(results[1], 'outage-silent');
    await proxy.restore();
    expect((await health()).status).toBe(200);
  }, 60_000);
});
