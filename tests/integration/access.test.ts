import { beforeEach, describe, expect, it } from 'vitest';
import HomePage from '@/app/(app)/page';
import MembersPage from '@/app/(app)/members/page';
import ProfilePage from '@/app/(app)/profile/page';
import { GET as health } from '@/app/api/health/route';
import { POST as postDrops } from '@/app/api/v1/drops/route';
import CalculatorPage from '@/app/(app)/calculator/page';
import { DELETE as deleteSession, GET as getSessionRoute } from '@/app/api/v1/session/route';
import {
  changeRoleAction,
  inviteMemberAction,
  organisationSettingsAction,
  removeMemberAction,
} from '@/lib/actions/members';
import { changePasswordAction, setUnitSystemAction, updateProfileAction } from '@/lib/actions/profile';
import { startSession } from '@/lib/auth';
import { createOrg, ctx, jsonRequest, PASSWORD, resetDatabase, runAction, signOutLocally, type OrgFixture } from './harness';

type Subject = 'anonymous' | 'admin' | 'engineer' | 'reviewer' | 'viewer' | 'foreign admin';
const SUBJECTS: Subject[] = ['anonymous', 'admin', 'engineer', 'reviewer', 'viewer', 'foreign admin'];

let home: OrgFixture;
let foreign: OrgFixture;

async function actAs(subject: Subject) {
  signOutLocally();
  if (subject === 'anonymous') return;
  const org = subject === 'foreign admin' ? foreign : home;
  const role = subject === 'foreign admin' ? 'admin' : subject;
  await startSession(org.users[role].id, org.id);
}

type Outcome = string;
const SIGN_IN = 'redirect /sign-in';
const OK = 'ok';
const FORBIDDEN = '403';

async function outcomeOfAction(run: () => ReturnType<typeof runAction>): Promise<Outcome> {
  const o = await run();
  if (o.kind === 'redirect') return `redirect ${o.to}`;
  if (o.kind === 'status') return String(o.status);
  if (o.state.ok) return OK;
  return `refused: ${o.state.message ?? JSON.stringify(o.state.errors)}`;
}

async function pageOutcome(render: () => Promise<unknown>): Promise<Outcome> {
  return outcomeOfAction(() =>
    runAction(async () => {
      await render();
      return { ok: true };
    }),
  );
}

async function status(response: Promise<Response>): Promise<Outcome> {
  return String((await response).status);
}

const NOT_FOUND = 'refused: That member is no longer in the organisation.';
const everyoneSignedIn = (value: Outcome) => ({ admin: value, engineer: value, reviewer: value, viewer: value, 'foreign admin': value });
const adminOnly = (foreignOutcome: Outcome = OK) => ({
  anonymous: SIGN_IN,
  admin: OK,
  engineer: FORBIDDEN,
  reviewer: FORBIDDEN,
  viewer: FORBIDDEN,
  'foreign admin': foreignOutcome,
});

const CASES: { name: string; run: () => Promise<Outcome>; expected: Record<Subject, Outcome> }[] = [
  { name: 'GET /api/health', run: () => status(health()), expected: { anonymous: '200', ...everyoneSignedIn('200') } },
  {
    name: 'GET /api/v1/session',
    run: () => status(getSessionRoute(jsonRequest('GET'), ctx({}))),
    expected: { anonymous: '401', ...everyoneSignedIn('200') },
  },
  { name: 'DELETE /api/v1/session', run: () => status(deleteSession()), expected: { anonymous: '204', ...everyoneSignedIn('204') } },
  { name: 'page /', run: () => pageOutcome(() => HomePage()), expected: { anonymous: SIGN_IN, ...everyoneSignedIn(OK) } },
  { name: 'page /members', run: () => pageOutcome(() => MembersPage()), expected: adminOnly() },
  { name: 'page /profile', run: () => pageOutcome(() => ProfilePage()), expected: { anonymous: SIGN_IN, ...everyoneSignedIn(OK) } },
  {
    name: 'page /calculator',
    run: () => pageOutcome(() => CalculatorPage({ searchParams: Promise.resolve({ mass: '12' }) })),
    expected: { anonymous: SIGN_IN, ...everyoneSignedIn(OK) },
  },
  {
    name: 'POST /api/v1/drops',
    run: () =>
      status(
        postDrops(
          jsonRequest('POST', { object: { mass_kg: 5 }, drag_model: 'none', medium: { preset: 'isa' }, release: { height_m: 1 } }),
          ctx({}),
        ),
      ),
    expected: { anonymous: '401', ...everyoneSignedIn('200') },
  },
  {
    name: 'action setUnitSystem',
    run: () => outcomeOfAction(() => runAction(async () => setUnitSystemAction('us'))),
    expected: { anonymous: SIGN_IN, ...everyoneSignedIn(OK) },
  },
  {
    name: 'action inviteMember',
    run: () => outcomeOfAction(() => runAction(inviteMemberAction, { displayName: 'New Person', email: 'new@test.example', role: 'viewer' })),
    expected: adminOnly(),
  },
  {
    name: 'action changeRole (of a home-organisation engineer)',
    run: () => outcomeOfAction(() => runAction(changeRoleAction, { userId: home.users.engineer.id, role: 'reviewer' })),
    expected: adminOnly(NOT_FOUND),
  },
  {
    name: 'action removeMember (a home-organisation viewer)',
    run: () => outcomeOfAction(() => runAction(removeMemberAction, { userId: home.users.viewer.id })),
    expected: adminOnly(NOT_FOUND),
  },
  {
    name: 'action organisationSettings',
    run: () => outcomeOfAction(() => runAction(organisationSettingsAction, { name: 'Renamed Ltd' })),
    expected: adminOnly(),
  },
  {
    name: 'action updateProfile',
    run: () => outcomeOfAction(() => runAction(updateProfileAction, { displayName: 'Someone', unitSystem: 'us' })),
    expected: { anonymous: SIGN_IN, ...everyoneSignedIn(OK) },
  },
  {
    name: 'action changePassword',
    run: () =>
      outcomeOfAction(() =>
        runAction(changePasswordAction, { currentPassword: PASSWORD, newPassword: 'another-long-one', confirmPassword: 'another-long-one' }),
      ),
    expected: { anonymous: SIGN_IN, ...everyoneSignedIn(OK) },
  },
];

beforeEach(async () => {
  await resetDatabase();
  home = await createOrg('Home Org', 'home');
  foreign = await createOrg('Foreign Org', 'foreign');
});

describe('every route, page and action against every role', () => {
  for (const c of CASES) {
    for (const subject of SUBJECTS) {
      it(`${c.name} as ${subject} → ${c.expected[subject]}`, async () => {
        await actAs(subject);
        expect(await c.run()).toBe(c.expected[subject]);
      });
    }
  }
});
