import { beforeEach, describe, expect, it } from 'vitest';
import { DELETE as deleteSession, GET as getSessionRoute, POST as postSession } from '@/app/api/v1/session/route';
import { getDb } from '@/db/knex';
import { signInAction, signOutAction, signUpAction } from '@/lib/actions/auth';
import { SESSION_COOKIE, SESSION_TTL_SECONDS } from '@/lib/auth/config';
import { requestContext } from './harness/context';
import { createOrg, ctx, jsonRequest, PASSWORD, resetDatabase, runAction, setClientAddress, signInAs, signOutLocally } from './harness';

const newOrg = {
  organisationName: 'Skerry Wind Services',
  displayName: 'Ilse Marr',
  email: 'Ilse.Marr@skerry.example',
  password: 'a-long-enough-password',
};

beforeEach(async () => {
  await resetDatabase();
  signOutLocally();
  setClientAddress('203.0.113.10');
});

describe('sign-up', () => {
  it('creates the organisation, makes its creator admin, audits it and signs in', async () => {
    const outcome = await runAction(signUpAction, newOrg);
    expect(outcome).toEqual({ kind: 'redirect', to: '/' });
    const db = getDb();
    const user = await db('users').where({ email: 'ilse.marr@skerry.example' }).first();
    // bcrypt's modular-crypt prefix carries the cost: "$2b$12$" is cost 12 (the minimum).
    expect(user.password_hash).toMatch(/^\$2[aby]\$1[2-9]\$/);
    const membership = await db('memberships').where({ user_id: user.id }).first();
    expect(membership.role).toBe('admin');
    const audit = await db('audit_log').where({ organisation_id: membership.organisation_id });
    expect(audit.map((a) => a.action)).toEqual(['organisation.created']);
    expect(requestContext.cookies.has(SESSION_COOKIE)).toBe(true);
  });

  it('sets an httpOnly, SameSite=Lax cookie that lives eight hours', async () => {
    await runAction(signUpAction, newOrg);
    const opts = requestContext.cookies.lastOptions;
    expect(opts.httpOnly).toBe(true);
    expect(String(opts.sameSite).toLowerCase()).toBe('lax');
    // iron-session sets the cookie to expire 60 s before the seal does, so a stale cookie never reaches it.
    expect(opts.maxAge).toBe(SESSION_TTL_SECONDS - 60);
  });

  it('refuses a second account with the same e-mail, in any letter case, and writes nothing', async () => {
    await runAction(signUpAction, newOrg);
    signOutLocally();
    const outcome = await runAction(signUpAction, { ...newOrg, organisationName: 'Other', email: 'ILSE.MARR@skerry.example' });
    expect(outcome.kind).toBe('state');
    if (outcome.kind === 'state') expect(outcome.state.errors?.email).toMatch(/exists already/);
    expect(await getDb()('organisations').count('* as n').first()).toEqual({ n: '1' });
  });
});

describe('sign-in and sign-out', () => {
  it('signs in through the action and lands on the overview', async () => {
    const org = await createOrg('Ness', 'ness');
    const outcome = await runAction(signInAction, { email: org.users.engineer.email, password: PASSWORD });
    expect(outcome).toEqual({ kind: 'redirect', to: '/' });
    const me = await getSessionRoute(jsonRequest('GET'), ctx({}));
    expect(me.status).toBe(200);
    expect((await me.json()).role).toBe('engineer');
  });

  it('returns to the page asked for, and only to a path of this app', async () => {
    const org = await createOrg('Ness', 'ness');
    const email = org.users.engineer.email;
    const back = await runAction(signInAction, { email, password: PASSWORD, next: '/calculator?shape=sphere&mass=3' });
    expect(back).toEqual({ kind: 'redirect', to: '/calculator?shape=sphere&mass=3' });
    // Open-redirect forms from the OWASP Unvalidated Redirects and Forwards Cheat Sheet all land on the overview.
    for (const next of ['//evil.example', '/\\evil.example', 'https://x', 'javascript:alert(1)']) {
      signOutLocally();
      expect(await runAction(signInAction, { email, password: PASSWORD, next })).toEqual({ kind: 'redirect', to: '/' });
    }
  });

  it('answers a wrong password and an unknown e-mail with the same message', async () => {
    const org = await createOrg('Ness', 'ness');
    const wrong = await runAction(signInAction, { email: org.users.admin.email, password: 'not-the-password' });
    const unknown = await runAction(signInAction, { email: 'nobody@test.example', password: 'not-the-password' });
    expect(wrong).toEqual(unknown);
    expect(wrong).toEqual({ kind: 'state', state: { message: 'That e-mail and password do not match an account.' } });
    const api = await postSession(jsonRequest('POST', { email: org.users.admin.email, password: 'nope' }));
    expect(api.status).toBe(401);
  });

  it('locks an e-mail and address after 10 failures in 15 minutes, and says when to try again', async () => {
    const org = await createOrg('Ness', 'ness');
    const email = org.users.viewer.email;
    // The owner's own address (signed in here before) skips the account's back-off, so only the pair limit is left.
    await signInAs(email);
    signOutLocally();
    for (let i = 0; i < 10; i++) await runAction(signInAction, { email, password: `wrong-${i}` });
    const locked = await runAction(signInAction, { email, password: PASSWORD });
    expect(locked).toEqual({ kind: 'state', state: { message: 'Too many failed sign-ins. Try again in 15 minutes.' } });
    const api = await postSession(jsonRequest('POST', { email, password: PASSWORD }));
    expect(api.status).toBe(429);
    expect(api.headers.get('retry-after')).toBe('900');
    // From another address the pair limit does not apply, but the account's back-off does: 10 failures since the
    // last success wait 2^(10-5) = 32 s after the latest (lib/auth/rate-limit.ts; common practice, not a standard).
    setClientAddress('198.51.100.7');
    const backedOff = await postSession(jsonRequest('POST', { email, password: PASSWORD }));
    expect(backedOff.status).toBe(429);
    expect(Number(backedOff.headers.get('retry-after'))).toBeGreaterThan(20);
    expect(Number(backedOff.headers.get('retry-after'))).toBeLessThanOrEqual(32);
    await getDb().raw(`UPDATE sign_in_attempts SET created_at = created_at - interval '40 seconds'`);
    expect(await runAction(signInAction, { email, password: PASSWORD })).toEqual({ kind: 'redirect', to: '/' });
  });

  it('lets the lock lapse once the oldest failure is 15 minutes old', async () => {
    const org = await createOrg('Ness', 'ness');
    const email = org.users.viewer.email;
    await signInAs(email);
    signOutLocally();
    for (let i = 0; i < 10; i++) await runAction(signInAction, { email, password: `wrong-${i}` });
    await getDb().raw(`UPDATE sign_in_attempts SET created_at = now() - interval '16 minutes'`);
    expect(await runAction(signInAction, { email, password: PASSWORD })).toEqual({ kind: 'redirect', to: '/' });
  });

  it('signs out through the action and through DELETE /api/v1/session', async () => {
    const org = await createOrg('Ness', 'ness');
    await signInAs(org.users.admin.email);
    expect(await runAction(async () => signOutAction())).toEqual({ kind: 'redirect', to: '/sign-in' });
    expect(requestContext.cookies.has(SESSION_COOKIE)).toBe(false);
    expect((await getSessionRoute(jsonRequest('GET'), ctx({}))).status).toBe(401);

    await signInAs(org.users.admin.email);
    expect((await deleteSession(jsonRequest('DELETE'))).status).toBe(204);
    expect((await getSessionRoute(jsonRequest('GET'), ctx({}))).status).toBe(401);
  });

  it('ends a removed member’s session at their next request', async () => {
    const org = await createOrg('Ness', 'ness');
    await signInAs(org.users.viewer.email);
    await getDb()('memberships').where({ user_id: org.users.viewer.id }).delete();
    expect((await getSessionRoute(jsonRequest('GET'), ctx({}))).status).toBe(401);
  });
});
