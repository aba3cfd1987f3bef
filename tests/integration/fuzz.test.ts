import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import { GET as getLadder, PUT as putLadder } from '@/app/api/v1/consequence-levels/route';
import { POST as postDrops } from '@/app/api/v1/drops/route';
import { DELETE as deleteItem, GET as getItem, PATCH as patchItem } from '@/app/api/v1/items/[id]/route';
import { DELETE as deleteSession, GET as getSession, POST as postSession } from '@/app/api/v1/session/route';
import { GET as exportCsv } from '@/app/api/v1/sites/[id]/items.csv/route';
import { POST as importItems } from '@/app/api/v1/sites/[id]/items/import/route';
import { GET as getItems, POST as postItem } from '@/app/api/v1/sites/[id]/items/route';
import { GET as getLevels, POST as postLevel } from '@/app/api/v1/sites/[id]/levels/route';
import { DELETE as deleteSite, GET as getSite, PATCH as patchSite } from '@/app/api/v1/sites/[id]/route';
import { GET as getSites, POST as postSite } from '@/app/api/v1/sites/route';
import { listSites } from '@/db/sites';
import { signInAction, signOutAction, signUpAction } from '@/lib/actions/auth';
import { changeRoleAction, inviteMemberAction, organisationSettingsAction, removeMemberAction } from '@/lib/actions/members';
import { changePasswordAction, updateProfileAction } from '@/lib/actions/profile';
import { deleteItemAction, deleteLevelAction, deleteSiteAction, saveItemAction, saveLadderAction, saveLevelAction, saveSiteAction } from '@/lib/actions/register';
import type { ActionState } from '@/lib/actions/state';
import { startSession } from '@/lib/auth';
import { SESSION_COOKIE } from '@/lib/auth/config';
import { createOrg, ctx, resetDatabase, signOutLocally, type OrgFixture } from './harness';
import { requestContext } from './harness/context';
import { contentType, cookieMode, formFields, idArbitrary, jsonBody, oddActionArguments, type CookieMode } from './harness/fuzz-inputs';
import { createRegister, databaseState, type RegisterFixture } from './harness/register-fixture';

/**
 * The probe's malformed requests kept as a property (issue 9): every route in the README's table and every server
 * action gets bodies of the wrong types, missing and extra fields, prototype keys, non-finite and huge numbers, NUL
 * and lone surrogates, huge strings, deep nesting, wrong content types, bad and foreign ids and forged cookies.
 * Whatever comes in: no 5xx and no throw; a 400 names the field at fault; a refusal writes nothing; and another
 * organisation is untouched. RUNS_PER_TARGET × the targets below is over 2,000 cases per run.
 */
const RUNS_PER_TARGET = 64;
const prototypeNames = Object.getOwnPropertyNames(Object.prototype).sort();

let home: OrgFixture;
let foreign: OrgFixture;
let reg: RegisterFixture;
let foreignReg: RegisterFixture;
let foreignBefore: string[];

beforeAll(async () => {
  await resetDatabase();
  home = await createOrg('Fuzz Home', 'fuzz-home');
  foreign = await createOrg('Fuzz Foreign', 'fuzz-foreign');
  reg = await createRegister(home, 'Harbour Gantry');
  foreignReg = await createRegister(foreign, 'Inland Depot');
  foreignBefore = await foreignRows();
});

async function foreignRows(): Promise<string[]> {
  return (await listSites(foreign.id)).map((s) => `${s.id}:${s.name}:${s.item_count}`);
}

async function arrange(mode: CookieMode): Promise<void> {
  signOutLocally();
  if (mode === 'member') await startSession(home.users.admin.id, home.id);
  if (mode === 'forged') requestContext.cookies.set(SESSION_COOKIE, `Fe26.2*1*${'A'.repeat(40)}*forged`);
}

/** Sign-in failures are recorded on purpose (the limits count them); every other table must be unchanged. */
const unchanged = (before: Record<string, string>, after: Record<string, string>, signIn: boolean) => {
  const strip = (s: Record<string, string>) => Object.fromEntries(Object.entries(s).filter(([t]) => !signIn || t !== 'sign_in_attempts'));
  expect(strip(after)).toEqual(strip(before));
};

/** A 400 from the JSON API names what is wrong: field issues with paths, or the import's lines and columns. */
async function expectNamedFault(response: Response): Promise<void> {
  const body = await response.json();
  if (Array.isArray(body.problems)) {
    expect(body.problems.length).toBeGreaterThan(0);
    for (const p of body.problems) expect(typeof p.column === 'string' || typeof p.line === 'number').toBe(true);
    return;
  }
  expect(Array.isArray(body.errors) && body.errors.length > 0, JSON.stringify(body)).toBe(true);
  for (const issue of body.errors) {
    expect(typeof issue.path).toBe('string');
    expect(issue.path.length).toBeGreaterThan(0);
    expect(issue.message.length).toBeGreaterThan(0);
  }
}

type Route = (request: Request, context: { params: Promise<{ id: string }> }) => Promise<Response>;
interface RouteTarget {
  name: string;
  method: string;
  route: Route;
  fields: readonly string[];
  /** Which ids this route may be given: a delete never gets the home register's own, so it stays to be fuzzed. */
  ids: () => { own: string[]; foreign: string[] };
}

const SITE = ['name', 'kind', 'location', 'surface', 'water_depth', 'altitude', 'design_wind', 'current', 'notes', 'units'];
const LEVEL = ['name', 'floor_height', 'surface', 'water_depth', 'notes', 'units'];
const ITEM = ['tag', 'description', 'category', 'quantity', 'mass', 'shape', 'dimensions', 'cd', 'area', 'volume', 'level_id', 'height', 'securing', 'last_inspected', 'notes', 'units'];
const DROP = ['object', 'release', 'medium', 'drag_model', 'layers', 'wind', 'samples', 'gravity_m_s2'];
const siteIds = () => ({ own: [reg.siteId], foreign: [foreignReg.siteId, foreignReg.itemId] });
const itemIds = () => ({ own: [reg.itemId], foreign: [foreignReg.itemId, foreignReg.siteId] });
const foreignOnly = (ids: () => { own: string[]; foreign: string[] }) => () => ({ own: [ids().foreign[0]], foreign: ids().foreign });
const none = () => ({ own: [''], foreign: [''] });
const as = (r: unknown) => r as Route;

const ROUTES: RouteTarget[] = [
  { name: 'POST /api/v1/session', method: 'POST', route: as(postSession), fields: ['email', 'password'], ids: none },
  { name: 'GET /api/v1/session', method: 'GET', route: as(getSession), fields: [], ids: none },
  { name: 'DELETE /api/v1/session', method: 'DELETE', route: as(deleteSession), fields: [], ids: none },
  { name: 'POST /api/v1/drops', method: 'POST', route: as(postDrops), fields: DROP, ids: none },
  { name: 'GET /api/v1/sites', method: 'GET', route: as(getSites), fields: [], ids: none },
  { name: 'POST /api/v1/sites', method: 'POST', route: as(postSite), fields: SITE, ids: none },
  { name: 'GET /api/v1/sites/:id', method: 'GET', route: getSite, fields: [], ids: siteIds },
  { name: 'PATCH /api/v1/sites/:id', method: 'PATCH', route: patchSite, fields: SITE, ids: siteIds },
  { name: 'DELETE /api/v1/sites/:id', method: 'DELETE', route: deleteSite, fields: [], ids: foreignOnly(siteIds) },
  { name: 'GET /api/v1/sites/:id/levels', method: 'GET', route: getLevels, fields: [], ids: siteIds },
  { name: 'POST /api/v1/sites/:id/levels', method: 'POST', route: postLevel, fields: LEVEL, ids: siteIds },
  { name: 'GET /api/v1/sites/:id/items', method: 'GET', route: getItems, fields: [], ids: siteIds },
  { name: 'POST /api/v1/sites/:id/items', method: 'POST', route: postItem, fields: ITEM, ids: siteIds },
  { name: 'GET /api/v1/items/:id', method: 'GET', route: getItem, fields: [], ids: itemIds },
  { name: 'PATCH /api/v1/items/:id', method: 'PATCH', route: patchItem, fields: ITEM, ids: itemIds },
  { name: 'DELETE /api/v1/items/:id', method: 'DELETE', route: deleteItem, fields: [], ids: foreignOnly(itemIds) },
  { name: 'GET /api/v1/sites/:id/items.csv', method: 'GET', route: exportCsv, fields: [], ids: siteIds },
  { name: 'GET /api/v1/consequence-levels', method: 'GET', route: as(getLadder), fields: [], ids: none },
  { name: 'PUT /api/v1/consequence-levels', method: 'PUT', route: as(putLadder), fields: ['levels'], ids: none },
];

function request(method: string, type: string, body: string | undefined, query: string): Request {
  const headers: Record<string, string> = type ? { 'content-type': type } : {};
  const send = method === 'GET' || method === 'DELETE' ? undefined : body;
  return new Request(`http://127.0.0.1/api${query}`, { method, headers, body: send });
}

const query = fc.oneof(fc.constant(''), fc.constantFrom('?units=us', '?units=%00', '?units=__proto__', '?units=' + 'x'.repeat(3000), '?a=1&a=2'));

describe('every JSON route, given malformed requests', () => {
  for (const target of ROUTES) {
    it(`${target.name}: never a 5xx; a 400 names the field; a refusal writes nothing`, async () => {
      const ids = target.ids();
      const body = target.fields.length ? jsonBody(target.fields) : fc.constant('{}');
      await fc.assert(
        fc.asyncProperty(cookieMode, contentType, body, idArbitrary(ids.own, ids.foreign), query, async (mode, type, text, id, q) => {
          await arrange(mode);
          const before = await databaseState();
          const response = await target.route(request(target.method, type, text, q), ctx({ id }));
          expect(response.status, `${target.name} ${text.slice(0, 200)}`).toBeLessThan(500);
          if (response.status === 400) await expectNamedFault(response);
          if (response.status >= 400) unchanged(before, await databaseState(), target.name === 'POST /api/v1/session');
        }),
        { numRuns: RUNS_PER_TARGET },
      );
    });
  }

  it('POST /api/v1/sites/:id/items/import: hostile CSV text and modes never give a 5xx and a refusal writes nothing', async () => {
    const csv = fc.oneof(
      fc.string({ maxLength: 200 }),
      fc.constantFrom('tag,__proto__\nA,x', 'tag,mass_kg\nA,1e309', `tag\n${'a\u0000'.repeat(10)}`, '\ud800,\n', '"unterminated\n', 'tag,description\n' + 'x,y\n'.repeat(2000)),
    );
    const mode = fc.constantFrom('check', 'valid-only', 'all-or-nothing', '', '__proto__', 'x'.repeat(1000));
    const { own, foreign: other } = siteIds();
    await fc.assert(
      fc.asyncProperty(cookieMode, csv, mode, idArbitrary(own, other), fc.boolean(), async (who, text, m, id, asFile) => {
        await arrange(who);
        const form = new FormData();
        form.set('file', asFile ? new File([text], 'items.csv') : text);
        form.set('mode', m);
        const before = await databaseState();
        const response = await importItems(new Request('http://127.0.0.1/api', { method: 'POST', body: form }), ctx({ id }));
        expect(response.status).toBeLessThan(500);
        if (response.status === 400) await expectNamedFault(response);
        if (response.status >= 400) unchanged(before, await databaseState(), false);
      }),
      { numRuns: RUNS_PER_TARGET },
    );
  });
});

type Action = (prev: ActionState, form: FormData) => Promise<ActionState | void>;
interface ActionTarget {
  name: string;
  action: Action;
  fields: readonly string[];
}

const ACTIONS: ActionTarget[] = [
  { name: 'sign-in', action: signInAction, fields: ['email', 'password'] },
  { name: 'sign-up', action: signUpAction, fields: ['organisationName', 'displayName', 'email', 'password'] },
  { name: 'sign-out', action: signOutAction as Action, fields: [] },
  { name: 'invite member', action: inviteMemberAction, fields: ['displayName', 'email', 'role'] },
  { name: 'change role', action: changeRoleAction, fields: ['userId', 'role'] },
  { name: 'remove member', action: removeMemberAction, fields: ['userId'] },
  { name: 'organisation settings', action: organisationSettingsAction, fields: ['name'] },
  { name: 'profile', action: updateProfileAction, fields: ['displayName', 'unitSystem'] },
  { name: 'password', action: changePasswordAction, fields: ['currentPassword', 'newPassword', 'confirmPassword'] },
  { name: 'save site', action: saveSiteAction, fields: ['id', ...SITE] },
  { name: 'delete site', action: deleteSiteAction, fields: ['id'] },
  { name: 'save level', action: saveLevelAction, fields: ['id', 'site_id', ...LEVEL] },
  { name: 'delete level', action: deleteLevelAction, fields: ['id', 'site_id'] },
  { name: 'save item', action: saveItemAction, fields: ['id', 'site_id', ...ITEM.filter((f) => f !== 'dimensions'), 'dimensions.length', 'dimensions.diameter'] },
  { name: 'delete item', action: deleteItemAction, fields: ['id', 'site_id'] },
  { name: 'save ladder', action: saveLadderAction, fields: ['levels.0.name', 'levels.0.lower_bound_j', 'levels.0.colour', 'levels.1.name', 'levels.1.lower_bound_j'] },
];

/** What Next would make of an action's end: its state, or an interrupt (redirect, 401/403/404). Anything else fails. */
async function runLoose(action: Action, argument: unknown): Promise<ActionState | 'interrupt'> {
  try {
    return (await action({}, argument as FormData)) ?? {};
  } catch (error) {
    const digest = (error as { digest?: string }).digest ?? '';
    if (digest.startsWith('NEXT_REDIRECT') || digest.startsWith('NEXT_HTTP_ERROR_FALLBACK')) return 'interrupt';
    throw error;
  }
}

/** Field ids an action is given never include the home register's own or its members, so what it can delete survives. */
function withForeignIds(fields: [string, string][], ids: string[]): fc.Arbitrary<[string, string][]> {
  return fc.constantFrom(...ids).map((id) => fields.map(([k, v]): [string, string] => (/^(id|site_id|userId|level_id)$/.test(k) && v.length % 2 ? [k, id] : [k, v])));
}

describe('every server action, given malformed forms and arguments', () => {
  for (const target of ACTIONS) {
    it(`${target.name}: never throws; refused fields are named; a refusal writes nothing`, async () => {
      const foreignIds = [foreignReg.siteId, foreignReg.levelId, foreignReg.itemId, foreign.users.admin.id, foreign.users.viewer.id];
      const form = (target.fields.length ? formFields(target.fields) : fc.constant([] as [string, string][])).chain((f) => withForeignIds(f, foreignIds));
      const argument = fc.oneof({ weight: 5, arbitrary: form.map(toFormData) }, { weight: 1, arbitrary: oddActionArguments });
      await fc.assert(
        fc.asyncProperty(cookieMode, argument, async (mode, arg) => {
          await arrange(mode);
          const before = await databaseState();
          const outcome = await runLoose(target.action, arg);
          if (outcome !== 'interrupt' && outcome.errors) {
            for (const [field, message] of Object.entries(outcome.errors)) {
              expect(field.length).toBeGreaterThan(0);
              expect(String(message).length).toBeGreaterThan(0);
            }
            unchanged(before, await databaseState(), target.name === 'sign-in');
          }
        }),
        { numRuns: RUNS_PER_TARGET },
      );
    });
  }
});

function toFormData(fields: [string, string][]): FormData {
  const data = new FormData();
  for (const [k, v] of fields) data.append(k, v);
  return data;
}

describe('after every malformed request', () => {
  it('nothing reached the prototype every object shares', () => {
    expect(({} as Record<string, unknown>).notes).toBeUndefined();
    expect(Object.getOwnPropertyNames(Object.prototype).sort()).toEqual(prototypeNames);
  });

  it('the other organisation is untouched and still served', async () => {
    expect(await foreignRows()).toEqual(foreignBefore);
    signOutLocally();
    await startSession(foreign.users.admin.id, foreign.id);
    const response = await getItems(new Request('http://127.0.0.1/api'), ctx({ id: foreignReg.siteId }));
    expect(response.status).toBe(200);
    expect((await response.json()).items.map((i: { tag: string }) => i.tag)).toEqual(['S-1']);
  });
});
