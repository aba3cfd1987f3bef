import { beforeEach, describe, expect, it } from 'vitest';
import { POST as postSession } from '@/app/api/v1/session/route';
import { getDb } from '@/db/knex';
import { signInAction, signUpAction } from '@/lib/actions/auth';
import { inviteMemberAction, organisationSettingsAction } from '@/lib/actions/members';
import { setUnitSystemAction, updateProfileAction } from '@/lib/actions/profile';
import { startSession } from '@/lib/auth';
import { createOrg, jsonRequest, resetDatabase, runAction, signOutLocally, type OrgFixture } from './harness';

let org: OrgFixture;
const long = (n: number) => 'x'.repeat(n);

async function rowCounts(): Promise<Record<string, string>> {
  const db = getDb();
  const out: Record<string, string> = {};
  for (const t of ['organisations', 'users', 'memberships', 'audit_log']) {
    out[t] = String((await db(t).count('* as n').first())?.n);
  }
  return out;
}

beforeEach(async () => {
  await resetDatabase();
  org = await createOrg('Ness', 'ness');
  signOutLocally();
});

describe('POST /api/v1/session with bad bodies', () => {
  const cases: [string, unknown, string][] = [
    ['JSON that is not an object', '[1,2]', '(body)'],
    ['a bare string', '"hello"', '(body)'],
    ['text that is not JSON', 'email=a', '(body)'],
    ['an empty e-mail', { email: '', password: 'x' }, 'email'],
    ['a malformed e-mail', { email: 'not-an-address', password: 'x' }, 'email'],
    ['an overlong e-mail', { email: `${long(250)}@x.example`, password: 'x' }, 'email'],
    ['an empty password', { email: 'a@b.example', password: '' }, 'password'],
    ['a number for a password', { email: 'a@b.example', password: 42 }, 'password'],
  ];
  for (const [name, body, field] of cases) {
    it(`answers 400 naming ${field} for ${name}`, async () => {
      const response = await postSession(jsonRequest('POST', body));
      expect(response.status).toBe(400);
      const json = await response.json();
      expect(json.errors.map((e: { path: string }) => e.path)).toContain(field);
    });
  }
});

describe('server actions with bad fields write nothing', () => {
  it('sign-up: empty, overlong and malformed fields', async () => {
    const before = await rowCounts();
    const outcome = await runAction(signUpAction, {
      organisationName: '',
      displayName: long(121),
      email: 'someone@',
      password: 'short',
    });
    expect(outcome.kind).toBe('state');
    if (outcome.kind !== 'state') return;
    expect(Object.keys(outcome.state.errors ?? {}).sort()).toEqual(['displayName', 'email', 'organisationName', 'password']);
    expect(outcome.state.errors?.displayName).toBe('Name must be at most 120 characters.');
    expect(await rowCounts()).toEqual(before);
  });

  it('sign-in: malformed e-mail', async () => {
    expect(await runAction(signInAction, { email: 'nobody', password: 'x' })).toMatchObject({
      state: { errors: { email: expect.stringMatching(/valid address/) } },
    });
  });

  it('invite, organisation settings and profile', async () => {
    await startSession(org.users.admin.id, org.id);
    const before = await rowCounts();
    expect(await runAction(inviteMemberAction, { displayName: '', email: 'x@y.example', role: 'owner' })).toMatchObject({
      state: { errors: { displayName: 'Name is required.', role: expect.stringMatching(/Role must be/) } },
    });
    expect(await runAction(organisationSettingsAction, { name: long(121) })).toMatchObject({
      state: { errors: { name: 'Organisation name must be at most 120 characters.' } },
    });
    expect(await runAction(updateProfileAction, { displayName: 'Ok', unitSystem: 'imperial' })).toMatchObject({
      state: { errors: { unitSystem: 'Unit system must be SI or US customary.' } },
    });
    expect(await runAction(async () => setUnitSystemAction('imperial'))).toMatchObject({
      state: { errors: { unitSystem: 'Unit system must be SI or US customary.' } },
    });
    expect(await rowCounts()).toEqual(before);
  });
});
