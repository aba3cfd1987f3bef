import { afterAll, describe, expect, it } from 'vitest';
import { closeDb, getDb } from '@/db/knex';
import { MAX_FAILURES } from '@/lib/auth/rate-limit';
import { base, logLines, member, PASSWORD, signIn } from './helpers';

const emails: string[] = [];

afterAll(async () => {
  // Every HTTP test signs in from the loopback address: these failures must not count against the next run's.
  await getDb()('sign_in_attempts').whereIn('email', emails).delete();
  await closeDb();
});

const attempt = (email: string, password: string, headers: Record<string, string> = {}) =>
  fetch(`${base}/api/v1/session`, { method: 'POST', headers: { 'content-type': 'application/json', ...headers }, body: JSON.stringify({ email, password }) });

describe('the sign-in limits on the real server (TRUST_PROXY_HOPS=0)', () => {
  it('gives no extra guesses for a rotated X-Forwarded-For or a forged client-address header', async () => {
    const { email } = await member('viewer');
    emails.push(email);
    // Signed in from here before, so the account's back-off does not apply: only the pair limit is left to test.
    await signIn(email);
    const spoofed = (i: number): Record<string, string> =>
      i % 2 ? { 'x-forwarded-for': `192.0.2.${i + 1}` } : { 'x-plumbline-client-address': `198.51.100.${i + 1}`, 'x-real-ip': `198.51.100.${i + 1}` };
    const guesses = await Promise.all(Array.from({ length: MAX_FAILURES }, (_, i) => attempt(email, `wrong-${i}`, spoofed(i))));
    expect(guesses.map((g) => g.status)).toEqual(Array(MAX_FAILURES).fill(401));

    const next = await attempt(email, PASSWORD, { 'x-forwarded-for': '203.0.113.250' });
    expect(next.status).toBe(429);
    expect(Number(next.headers.get('retry-after'))).toBeGreaterThan(60);
    expect(await next.json()).toEqual({ error: expect.stringMatching(/Too many failed sign-ins\. Try again in 1[45] minutes\./) });

    const refusals = await logLines((l) => l.event === 'sign_in_refused' && l.email === email);
    expect(refusals.map((l) => l.reason).sort()).toEqual(['pair', ...Array(MAX_FAILURES).fill('wrong credentials')]);
    // The socket's address, whatever the client claimed; and no password in any of them.
    for (const line of refusals) expect(line.address).toBe('127.0.0.1');
    expect(JSON.stringify(refusals)).not.toMatch(/wrong-\d|http-test-password/);
  });

  it('refuses a cross-site sign-out', async () => {
    const { email } = await member('viewer');
    emails.push(email);
    const cookie = await signIn(email);
    const refused = await fetch(`${base}/api/v1/session`, { method: 'DELETE', headers: { cookie, origin: 'https://evil.example' } });
    expect(refused.status).toBe(403);
    expect((await fetch(`${base}/api/v1/session`, { headers: { cookie } })).status).toBe(200);
    expect((await fetch(`${base}/api/v1/session`, { method: 'DELETE', headers: { cookie } })).status).toBe(204);
    expect((await fetch(`${base}/api/v1/session`, { headers: { cookie } })).status).toBe(401);
  });
});
