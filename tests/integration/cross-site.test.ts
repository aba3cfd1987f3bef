import { afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { POST as postSession } from '@/app/api/v1/session/route';
import { PUT as putLadder } from '@/app/api/v1/consequence-levels/route';
import { POST as postDrops } from '@/app/api/v1/drops/route';
import { DELETE as deleteItemRoute, PATCH as patchItem } from '@/app/api/v1/items/[id]/route';
import { GET as getSites, POST as postSite } from '@/app/api/v1/sites/route';
import { DELETE as deleteSiteRoute, PATCH as patchSite } from '@/app/api/v1/sites/[id]/route';
import { POST as postLevel } from '@/app/api/v1/sites/[id]/levels/route';
import { POST as postItem } from '@/app/api/v1/sites/[id]/items/route';
import { POST as importItemsRoute } from '@/app/api/v1/sites/[id]/items/import/route';
import { listSites } from '@/db/sites';
import { startSession } from '@/lib/auth';
import { itemsTemplateCsv } from '@/lib/register/csv-write';
import { DEFAULT_LADDER } from '@/lib/domain/default-ladder';
import { requestContext } from './harness/context';
import { createOrg, ctx, PASSWORD, resetDatabase, signOutLocally, type OrgFixture } from './harness';
import { createRegister, databaseState, type RegisterFixture } from './harness/register-fixture';

/**
 * The probe's cross-site writes (issue 9, defect 5). What a browser sends is the Fetch standard's: Origin on every
 * cross-origin request and on same-origin writes, Sec-Fetch-Site (W3C Fetch Metadata) "same-origin", "same-site",
 * "cross-site" or "none". A page elsewhere can post text/plain or form data without a preflight, never JSON.
 */
const APP = 'http://127.0.0.1';

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

afterEach(() => {
  delete process.env.APP_ORIGIN;
});

type Route = (request: Request, context: { params: Promise<{ id: string }> }) => Promise<Response>;
type Body = { kind: 'json'; value: unknown } | { kind: 'multipart' } | { kind: 'none' };

function request(method: string, body: Body, headers: Record<string, string> = {}, contentType?: string): Request {
  const init: RequestInit & { headers: Record<string, string> } = { method, headers: { ...headers } };
  if (body.kind === 'json') {
    init.body = JSON.stringify(body.value);
    init.headers['content-type'] = contentType ?? 'application/json';
  } else if (body.kind === 'multipart') {
    const form = new FormData();
    form.set('file', new File([itemsTemplateCsv('si', ['Roof'])], 'items.csv'));
    form.set('mode', 'valid-only');
    if (contentType) {
      init.body = 'file=items.csv';
      init.headers['content-type'] = contentType;
    } else {
      init.body = form;
    }
  }
  return new Request(`${APP}/api/v1/x`, init);
}

const ladder = { levels: DEFAULT_LADDER.map(({ name, lower_bound_j, colour }) => ({ name, lower_bound_j, colour })) };
const WRITES: [string, string, Route, () => { id: string }, () => Body][] = [
  ['POST /api/v1/session', 'POST', postSession as unknown as Route, () => ({ id: '' }), () => ({ kind: 'json', value: { email: home.users.admin.email, password: PASSWORD } })],
  ['POST /api/v1/sites', 'POST', postSite as unknown as Route, () => ({ id: '' }), () => ({ kind: 'json', value: { name: 'Evil Site', kind: 'building', surface: 'ground', design_wind: 10 } })],
  ['PATCH /api/v1/sites/:id', 'PATCH', patchSite, () => ({ id: reg.siteId }), () => ({ kind: 'json', value: { notes: 'changed' } })],
  ['DELETE /api/v1/sites/:id', 'DELETE', deleteSiteRoute, () => ({ id: reg.siteId }), () => ({ kind: 'none' })],
  ['POST /api/v1/sites/:id/levels', 'POST', postLevel, () => ({ id: reg.siteId }), () => ({ kind: 'json', value: { name: 'Evil', floor_height: 3 } })],
  [
    'POST /api/v1/sites/:id/items',
    'POST',
    postItem,
    () => ({ id: reg.siteId }),
    () => ({ kind: 'json', value: { tag: 'E-1', description: 'Evil', category: 'fastener', mass: 1, shape: 'sphere', dimensions: { diameter: 0.1 }, level_id: reg.levelId, securing: 'unsecured' } }),
  ],
  ['PATCH /api/v1/items/:id', 'PATCH', patchItem, () => ({ id: reg.itemId }), () => ({ kind: 'json', value: { notes: 'changed' } })],
  ['DELETE /api/v1/items/:id', 'DELETE', deleteItemRoute, () => ({ id: reg.itemId }), () => ({ kind: 'none' })],
  ['PUT /api/v1/consequence-levels', 'PUT', putLadder as unknown as Route, () => ({ id: '' }), () => ({ kind: 'json', value: ladder })],
  ['POST /api/v1/drops', 'POST', postDrops as unknown as Route, () => ({ id: '' }), () => ({ kind: 'json', value: { object: { mass_kg: 5 }, drag_model: 'none', medium: { preset: 'isa' }, release: { height_m: 1 } } })],
  ['POST /api/v1/sites/:id/items/import', 'POST', importItemsRoute, () => ({ id: reg.siteId }), () => ({ kind: 'multipart' })],
];

const CROSS_SITE: [string, Record<string, string>][] = [
  ['another origin', { origin: 'https://evil.example' }],
  ['another port of the same host (same site, not same origin)', { origin: 'http://127.0.0.1:8080', 'sec-fetch-site': 'same-site' }],
  ['an opaque origin', { origin: 'null' }],
  ['Sec-Fetch-Site cross-site alone', { 'sec-fetch-site': 'cross-site' }],
  ['Sec-Fetch-Site same-site alone', { 'sec-fetch-site': 'same-site' }],
  ['the right origin but a cross-site fetch', { origin: APP, 'sec-fetch-site': 'cross-site' }],
];

describe('every write route', () => {
  for (const [name, method, route, params, body] of WRITES) {
    it(`${name}: refuses cross-site requests with 403 JSON and writes nothing`, async () => {
      for (const [, headers] of CROSS_SITE) {
        const before = await databaseState();
        const cookies = requestContext.cookies.snapshot();
        const response = await route(request(method, body(), headers), ctx(params()));
        expect(response.status).toBe(403);
        expect(await response.json()).toEqual({ error: 'Cross-site requests are refused: send this request from Plumbline itself.' });
        expect(await databaseState()).toEqual(before);
        expect(requestContext.cookies.snapshot()).toEqual(cookies);
      }
    });

    if (method !== 'DELETE') {
      it(`${name}: refuses a body of another content type with 415 and writes nothing`, async () => {
        const b = body();
        const wrong = b.kind === 'json' ? ['text/plain', 'application/x-www-form-urlencoded', 'multipart/form-data; boundary=x', ''] : ['application/json', 'text/plain'];
        for (const type of wrong) {
          const before = await databaseState();
          const req = request(method, b, { origin: APP }, type || 'x');
          if (!type) req.headers.delete('content-type');
          const response = await route(req, ctx(params()));
          expect(response.status).toBe(415);
          expect((await response.json()).error).toMatch(b.kind === 'json' ? /^Send the body as application\/json/ : /^Send the body as multipart\/form-data/);
          expect(await databaseState()).toEqual(before);
        }
      });
    }
  }
});

describe('same-origin and non-browser requests', () => {
  it('pass from the app itself, with Origin and Sec-Fetch-Site as a browser sends them', async () => {
    const headers = { origin: APP, 'sec-fetch-site': 'same-origin', 'content-type': 'application/json; charset=utf-8' };
    const response = await postSite(new Request(`${APP}/api/v1/sites`, { method: 'POST', headers, body: JSON.stringify({ name: 'Own Site', kind: 'building', surface: 'ground', design_wind: 10 }) }), ctx({}));
    expect(response.status).toBe(201);
  });

  it('pass with neither header (curl, scripts), and a DELETE needs no content type', async () => {
    const site = await postSite(request('POST', { kind: 'json', value: { name: 'Script Site', kind: 'building', surface: 'ground', design_wind: 10 } }), ctx({}));
    expect(site.status).toBe(201);
    const { site: created } = await site.json();
    expect((await deleteSiteRoute(request('DELETE', { kind: 'none' }), ctx({ id: created.id }))).status).toBe(204);
  });

  it('a typed navigation (Sec-Fetch-Site none) passes', async () => {
    const response = await postDrops(request('POST', WRITES[9][4](), { 'sec-fetch-site': 'none' }), ctx({}));
    expect(response.status).toBe(200);
  });

  it('reads are not refused for their origin: the browser keeps another site from reading the answer', async () => {
    const response = await getSites(new Request(`${APP}/api/v1/sites`, { headers: { origin: 'https://evil.example', 'sec-fetch-site': 'cross-site' } }), ctx({}));
    expect(response.status).toBe(200);
  });

  it('behind a proxy, the forwarded host is the origin too', async () => {
    const headers = { host: '127.0.0.1:3000', 'x-forwarded-host': 'plumbline.internal', origin: 'http://plumbline.internal', 'sec-fetch-site': 'same-origin' };
    expect((await postDrops(request('POST', WRITES[9][4](), headers), ctx({}))).status).toBe(200);
  });

  it('with APP_ORIGIN set, only that origin passes', async () => {
    process.env.APP_ORIGIN = 'https://plumbline.example.com';
    expect((await postDrops(request('POST', WRITES[9][4](), { origin: 'https://plumbline.example.com' }), ctx({}))).status).toBe(200);
    expect((await postDrops(request('POST', WRITES[9][4](), { origin: APP }), ctx({}))).status).toBe(403);
  });

  it('the probe’s attack: a signed-in engineer’s browser on another site creates no site', async () => {
    signOutLocally();
    await startSession(home.users.engineer.id, home.id);
    const before = (await listSites(home.id)).length;
    const headers = { origin: 'https://evil.example', 'sec-fetch-site': 'cross-site', 'content-type': 'text/plain' };
    const response = await postSite(new Request(`${APP}/api/v1/sites`, { method: 'POST', headers, body: JSON.stringify({ name: 'Planted', kind: 'other', surface: 'ground', design_wind: 1 }) }), ctx({}));
    expect(response.status).toBe(403);
    expect((await listSites(home.id)).length).toBe(before);
  });
});
