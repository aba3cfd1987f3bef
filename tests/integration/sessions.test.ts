import { createHash } from 'node:crypto';
import { sealData, unsealData } from 'iron-session';
import { beforeEach, describe, expect, it } from 'vitest';
import ProfilePage from '@/app/(app)/profile/page';
import { DELETE as deleteSession, GET as getSessionRoute, POST as postSession } from '@/app/api/v1/session/route';
import { getDb } from '@/db/knex';
import { signOutAction } from '@/lib/actions/auth';
import { changePasswordAction, signOutEverywhereAction } from '@/lib/actions/profile';
import { SESSION_COOKIE, sessionSecret } from '@/lib/auth/config';
import { requestContext } from './harness/context';
import { createOrg, ctx, jsonRequest, PASSWORD, resetDatabase, runAction, signInAs, signOutLocally, type OrgFixture } from './harness';

let org: OrgFixture;

beforeEach(async () => {
  await resetDatabase();
  signOutLocally();
  org = await createOrg('Ness', 'ness');
});

const whoAmI = async () => (await getSessionRoute(jsonRequest('GET'), ctx({}))).status;

/** Signs in and returns the browser's cookie jar, as a second device (or a thief's copy) would hold it. */
async function device(email = org.users.engineer.email): Promise<Map<string, string>> {
  await signInAs(email);
  return requestContext.cookies.snapshot();
}

async function as(jar: Map<string, string>): Promise<number> {
  requestContext.cookies.restore(jar);
  return whoAmI();
}

describe('ending sessions', () => {
  it('keeps only the SHA-256 of the token in the table, and the cookie holds nothing else', async () => {
    await device();
    const sealed = requestContext.cookies.get(SESSION_COOKIE)!.value;
    const data = await unsealData<Record<string, unknown>>(sealed, { password: sessionSecret() });
    expect(Object.keys(data).sort()).toEqual(['sid']);
    const rows = await getDb()('sessions').select('id_hash', 'user_id');
    expect(rows).toEqual([{ id_hash: createHash('sha256').update(String(data.sid)).digest('hex'), user_id: org.users.engineer.id }]);
  });

  it('ends a copied cookie at sign-out, through the route and through the action', async () => {
    const copy = await device();
    expect((await deleteSession(jsonRequest('DELETE'))).status).toBe(204);
    expect(await as(copy)).toBe(401);

    const second = await device();
    expect(await runAction(async () => signOutAction())).toEqual({ kind: 'redirect', to: '/sign-in' });
    expect(await as(second)).toBe(401);
  });

  it('refuses a cross-site sign-out and leaves the session working', async () => {
    await device();
    const request = new Request('http://127.0.0.1/api/v1/session', { method: 'DELETE', headers: { origin: 'https://evil.example' } });
    expect((await deleteSession(request)).status).toBe(403);
    expect(await whoAmI()).toBe(200);
  });

  it('ends every other session at a password change, and keeps the one that changed it', async () => {
    const laptop = await device();
    const phone = await device();
    const changed = await runAction(changePasswordAction, { currentPassword: PASSWORD, newPassword: 'a-brand-new-password', confirmPassword: 'a-brand-new-password' });
    expect(changed).toMatchObject({ kind: 'state', state: { ok: true } });
    expect(await as(laptop)).toBe(401);
    expect(await as(phone)).toBe(200);
  });

  it('ends every session of the user, this one too, with "sign out on every device"; other users keep theirs', async () => {
    const laptop = await device();
    const colleague = await device(org.users.viewer.email);
    const phone = await device();
    expect(await runAction(async () => signOutEverywhereAction())).toEqual({ kind: 'redirect', to: '/sign-in' });
    expect(await as(laptop)).toBe(401);
    expect(await as(phone)).toBe(401);
    expect(await as(colleague)).toBe(200);
  });

  it('asks a signed-out visitor to sign in rather than ending anything', async () => {
    const laptop = await device();
    signOutLocally();
    expect(await runAction(async () => signOutEverywhereAction())).toEqual({ kind: 'redirect', to: '/sign-in' });
    expect(await as(laptop)).toBe(200);
  });

  it('ends a session whose row has expired, whatever the cookie says', async () => {
    const laptop = await device();
    await getDb()('sessions').update({ expires_at: getDb().raw(`now() - interval '1 second'`) });
    expect(await as(laptop)).toBe(401);
  });
});

describe('forged and malformed cookies', () => {
  const cookies = async () => ({
    garbage: 'not-a-session-at-all',
    'iron-shaped garbage': 'Fe26.2*1*abc*def*ghi*jkl*mno*pqr',
    'sealed with another secret': await sealData({ sid: 'A'.repeat(43) }, { password: 'x'.repeat(32) }),
    // What cookies held before sessions were stored: sealed right, but naming a user rather than a session.
    'an old cookie with a user id': await sealData({ userId: org.users.admin.id, organisationId: org.id }, { password: sessionSecret() }),
    'a well-sealed unknown session': await sealData({ sid: 'B'.repeat(43) }, { password: sessionSecret() }),
    'a well-sealed non-string session': await sealData({ sid: { $ne: null } }, { password: sessionSecret() }),
  });

  it('reads each as signed out: 401 on the route, a redirect to sign-in on a page', async () => {
    for (const [name, value] of Object.entries(await cookies())) {
      signOutLocally();
      requestContext.cookies.set(SESSION_COOKIE, value);
      expect([name, await whoAmI()]).toEqual([name, 401]);
      requestContext.cookies.set(SESSION_COOKIE, value);
      const page = await runAction(async () => {
        await ProfilePage();
        return { ok: true };
      });
      expect([name, page]).toEqual([name, { kind: 'redirect', to: '/sign-in' }]);
    }
  });

  it('replaces a bad cookie at the next sign-in', async () => {
    requestContext.cookies.set(SESSION_COOKIE, 'Fe26.2*1*abc*def*ghi*jkl*mno*pqr');
    expect((await postSession(jsonRequest('POST', { email: org.users.admin.email, password: PASSWORD }))).status).toBe(200);
    expect(await whoAmI()).toBe(200);
  });
});
