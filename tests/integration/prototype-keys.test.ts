import SitesPage from '@/app/(app)/sites/page';
import SitePage from '@/app/(app)/sites/[siteId]/page';
import { beforeAll, describe, expect, it } from 'vitest';
import { POST as postSession } from '@/app/api/v1/session/route';
import { PUT as putLadder } from '@/app/api/v1/consequence-levels/route';
import { POST as postDrops } from '@/app/api/v1/drops/route';
import { PATCH as patchItem } from '@/app/api/v1/items/[id]/route';
import { GET as getSites, POST as postSite } from '@/app/api/v1/sites/route';
import { PATCH as patchSite } from '@/app/api/v1/sites/[id]/route';
import { POST as postLevel } from '@/app/api/v1/sites/[id]/levels/route';
import { GET as getItems, POST as postItem } from '@/app/api/v1/sites/[id]/items/route';
import { POST as importItemsRoute } from '@/app/api/v1/sites/[id]/items/import/route';
import { listSites } from '@/db/sites';
import { signInAction, signUpAction } from '@/lib/actions/auth';
import { changeRoleAction, inviteMemberAction, organisationSettingsAction, removeMemberAction } from '@/lib/actions/members';
import { changePasswordAction, updateProfileAction } from '@/lib/actions/profile';
import {
  deleteItemAction,
  deleteLevelAction,
  deleteSiteAction,
  saveItemAction,
  saveLadderAction,
  saveLevelAction,
  saveSiteAction,
} from '@/lib/actions/register';
import type { ActionState } from '@/lib/actions/state';
import { startSession } from '@/lib/auth';
import { DEFAULT_LADDER } from '@/lib/domain/default-ladder';
import { createOrg, ctx, jsonRequest, PASSWORD, resetDatabase, runAction, signOutLocally, type OrgFixture } from './harness';
import { createRegister, databaseState, siteFields, type RegisterFixture } from './harness/register-fixture';

/**
 * The probe's attack (issue 9, defect 1): a field named "__proto__.notes" posted to the site action polluted
 * Object.prototype, and every later query of every organisation failed. Every action and every JSON route gets such
 * names; each must refuse them naming the field and write nothing, and the other organisation must still work.
 */
const FORM_NAMES = ['__proto__.notes', '__proto__', 'constructor.prototype.notes', 'dimensions.__proto__.length', 'levels.0.constructor'];
const prototypeNames = Object.getOwnPropertyNames(Object.prototype).sort();

let home: OrgFixture;
let foreign: OrgFixture;
let reg: RegisterFixture;
let foreignReg: RegisterFixture;

beforeAll(async () => {
  await resetDatabase();
  home = await createOrg('Home Org', 'home');
  foreign = await createOrg('Foreign Org', 'foreign');
  reg = await createRegister(home, 'Ridgeway Plant Hall');
  foreignReg = await createRegister(foreign, 'Foreign Yard');
});

async function asAdmin(org: OrgFixture = home) {
  signOutLocally();
  await startSession(org.users.admin.id, org.id);
}

type Action = (prev: ActionState, form: FormData) => Promise<ActionState | void>;
const ladderFields = () =>
  Object.fromEntries(DEFAULT_LADDER.flatMap((l, i) => [[`levels.${i}.name`, l.name], [`levels.${i}.lower_bound_j`, String(l.lower_bound_j)], [`levels.${i}.colour`, l.colour]]));

const ACTIONS: [string, Action, () => Record<string, string>, boolean][] = [
  ['sign-in', signInAction, () => ({ email: home.users.admin.email, password: PASSWORD }), false],
  ['sign-up', signUpAction, () => ({ organisationName: 'New Org', displayName: 'Ann', email: 'ann@new.example', password: 'long-enough-pw-1' }), false],
  ['invite member', inviteMemberAction, () => ({ displayName: 'Bo', email: 'bo@x.example', role: 'viewer' }), true],
  ['change role', changeRoleAction, () => ({ userId: home.users.viewer.id, role: 'reviewer' }), true],
  ['remove member', removeMemberAction, () => ({ userId: home.users.viewer.id }), true],
  ['organisation settings', organisationSettingsAction, () => ({ name: 'Renamed Org' }), true],
  ['profile', updateProfileAction, () => ({ displayName: 'Renamed', unitSystem: 'us' }), true],
  ['password', changePasswordAction, () => ({ currentPassword: PASSWORD, newPassword: 'another-long-pw', confirmPassword: 'another-long-pw' }), true],
  ['save site', saveSiteAction, () => siteFields, true],
  ['delete site', deleteSiteAction, () => ({ id: reg.siteId }), true],
  ['save level', saveLevelAction, () => ({ site_id: reg.siteId, name: 'Deck 2', floor_height: '9', surface: 'ground', units: 'si' }), true],
  ['delete level', deleteLevelAction, () => ({ id: reg.levelId, site_id: reg.siteId }), true],
  [
    'save item',
    saveItemAction,
    () => ({ site_id: reg.siteId, tag: 'N-1', description: 'Lamp', category: 'equipment', mass: '2', shape: 'sphere', 'dimensions.diameter': '0.2', level_id: reg.levelId, securing: 'tethered', units: 'si' }),
    true,
  ],
  ['delete item', deleteItemAction, () => ({ id: reg.itemId, site_id: reg.siteId }), true],
  ['save ladder', saveLadderAction, ladderFields, true],
];

describe('server actions', () => {
  for (const [name, action, fields, signedIn] of ACTIONS) {
    it(`${name}: refuses every prototype field name, naming it, and writes nothing`, async () => {
      for (const bad of FORM_NAMES) {
        if (signedIn) await asAdmin();
        else signOutLocally();
        const before = await databaseState();
        const outcome = await runAction(action, { ...fields(), [bad]: 'polluted' });
        expect(outcome).toMatchObject({ kind: 'state', state: { errors: { [bad]: `The field name "${bad}" is not accepted.` } } });
        if (outcome.kind === 'state') expect(Object.keys(outcome.state.errors ?? {})).toEqual([bad]);
        expect(await databaseState()).toEqual(before);
      }
    });
  }
});

const siteBody = '"name": "Quayside Store", "kind": "building", "surface": "ground", "design_wind": 15';
const itemBody = () =>
  `"tag": "N-2", "description": "Lamp", "category": "equipment", "mass": 2, "shape": "sphere", "level_id": "${reg.levelId}", "securing": "tethered"`;
const dropBody = '"drag_model": "none", "medium": {"preset": "isa"}, "release": {"height_m": 1}';
const ladderBody = () => `"levels": ${JSON.stringify(DEFAULT_LADDER.map(({ name, lower_bound_j, colour }) => ({ name, lower_bound_j, colour })))}`;

type Route = (request: Request, context: { params: Promise<{ id: string }> }) => Promise<Response>;
const ROUTES: [string, string, Route, () => { id: string }, () => string, () => [string, string][]][] = [
  ['POST /api/v1/session', 'POST', postSession as unknown as Route, () => ({ id: '' }), () => `"email": "${home.users.admin.email}", "password": "${PASSWORD}"`, () => []],
  ['POST /api/v1/sites', 'POST', postSite as unknown as Route, () => ({ id: '' }), () => siteBody, () => []],
  ['PATCH /api/v1/sites/:id', 'PATCH', patchSite, () => ({ id: reg.siteId }), () => '"notes": "x"', () => []],
  ['POST /api/v1/sites/:id/levels', 'POST', postLevel, () => ({ id: reg.siteId }), () => '"name": "Deck 3", "floor_height": 4', () => []],
  ['POST /api/v1/sites/:id/items', 'POST', postItem, () => ({ id: reg.siteId }), () => `${itemBody()}, "dimensions": {"diameter": 0.2}`, () => [['dimensions.__proto__', `${itemBody()}, "dimensions": {"__proto__": {"diameter": 0.2}}`]]],
  ['PATCH /api/v1/items/:id', 'PATCH', patchItem, () => ({ id: reg.itemId }), () => '"notes": "x"', () => [['dimensions.constructor', '"dimensions": {"constructor": {"prototype": {"length": 1}}}']]],
  ['PUT /api/v1/consequence-levels', 'PUT', putLadder as unknown as Route, () => ({ id: '' }), ladderBody, () => [['levels.0.__proto__', '"levels": [{"__proto__": {"name": "x"}}]']]],
  ['POST /api/v1/drops', 'POST', postDrops as unknown as Route, () => ({ id: '' }), () => `"object": {"mass_kg": 5}, ${dropBody}`, () => [['object.prototype', `"object": {"mass_kg": 5, "prototype": {}}, ${dropBody}`]]],
];

describe('JSON routes', () => {
  for (const [name, method, route, params, body, nested] of ROUTES) {
    it(`${name}: refuses a prototype key at the top and nested, naming it, and writes nothing`, async () => {
      const cases: [string, string][] = [
        ['__proto__', `{${body()}, "__proto__": {"notes": "polluted"}}`],
        ['constructor', `{${body()}, "constructor": {"prototype": {"notes": "polluted"}}}`],
        ...nested().map(([path, inner]): [string, string] => [path, `{${inner}}`]),
      ];
      if (name === 'POST /api/v1/drops') cases.push(['1.__proto__', `[{${body()}}, {${body()}, "__proto__": {}}]`]);
      for (const [path, text] of cases) {
        if (name === 'POST /api/v1/session') signOutLocally();
        else await asAdmin();
        const before = await databaseState();
        const response = await route(jsonRequest(method, text), ctx(params()));
        expect(response.status).toBe(400);
        expect((await response.json()).errors).toEqual([{ path, message: `The field name "${path}" is not accepted.` }]);
        expect(await databaseState()).toEqual(before);
      }
    });
  }

  it('POST /api/v1/sites/:id/items/import: refuses a prototype column name and writes nothing', async () => {
    await asAdmin();
    const before = await databaseState();
    const form = new FormData();
    form.set('file', new File([`tag,description,category,mass_kg,shape,level,securing,__proto__\nA,B,fastener,1,sphere,Roof,tethered,x`], 'items.csv'));
    form.set('mode', 'valid-only');
    const response = await importItemsRoute(new Request('http://127.0.0.1/api', { method: 'POST', body: form }), ctx({ id: reg.siteId }));
    expect(response.status).toBe(400);
    expect((await response.json()).problems).toContainEqual({ line: 1, column: '__proto__', message: 'Column name "__proto__" is not accepted.' });
    expect(await databaseState()).toEqual(before);
  });
});

describe('after every attempt', () => {
  it('nothing reached the prototype every object shares', () => {
    expect(({} as Record<string, unknown>).notes).toBeUndefined();
    expect(Object.getOwnPropertyNames(Object.prototype).sort()).toEqual(prototypeNames);
  });

  it("another organisation's queries, routes, pages and writes still work", async () => {
    expect((await listSites(foreign.id)).map((s) => s.name)).toEqual(['Foreign Yard']);
    await asAdmin(foreign);
    const sites = await getSites(jsonRequest('GET'), ctx({}));
    expect(sites.status).toBe(200);
    expect((await sites.json()).sites.map((s: { name: string }) => s.name)).toEqual(['Foreign Yard']);
    const items = await getItems(jsonRequest('GET'), ctx({ id: foreignReg.siteId }));
    expect((await items.json()).items.map((i: { tag: string }) => i.tag)).toEqual(['S-1']);
    await expect(SitesPage()).resolves.toBeTruthy();
    await expect(SitePage({ params: Promise.resolve({ siteId: foreignReg.siteId }) })).resolves.toBeTruthy();
    expect((await postSite(jsonRequest('POST', { name: 'Second Yard', kind: 'crane', surface: 'ground', design_wind: 9, notes: 'ok' }), ctx({}))).status).toBe(201);
    expect(await runAction(saveSiteAction, { ...siteFields, name: 'Third Yard' })).toMatchObject({ kind: 'redirect' });
    expect((await listSites(foreign.id)).map((s) => s.name).sort()).toEqual(['Foreign Yard', 'Second Yard', 'Third Yard']);
  });
});
