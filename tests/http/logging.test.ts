import { afterAll, describe, expect, it } from 'vitest';
import { closeDb } from '@/db/knex';
import { actionId, base, logLines, member, PASSWORD, serverLogText, signIn } from './helpers';

afterAll(closeDb);

describe('the request log', () => {
  it('has one line per request: id, method, path without the query, status, duration, client address', async () => {
    // With TRUST_PROXY_HOPS=0 (this server) an X-Forwarded-For claim is ignored: the address is the socket's.
    const res = await fetch(`${base}/api/health?probe=1&secret=q`, { headers: { 'x-forwarded-for': '203.0.113.9' } });
    const id = res.headers.get('x-request-id');
    const lines = await logLines((l) => l.request_id === id && l.msg === 'request');
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatchObject({ level: 'info', method: 'GET', path: '/api/health', status: 200, client_address: '127.0.0.1' });
    expect(lines[0].duration_ms).toEqual(expect.any(Number));
    expect(JSON.stringify(lines[0])).not.toContain('secret=q');
  });

  it("carries Next's own warnings as JSON lines with the request id they belong to", async () => {
    // A form posted to a page that does not have the action it names: Next warns that it cannot find the action.
    const form = new FormData();
    form.set(`$ACTION_ID_${actionId('signOutAction')}`, '');
    const res = await fetch(`${base}/sign-in`, { method: 'POST', body: form, redirect: 'manual' });
    expect(res.status).toBeLessThan(500);
    const warning = await logLines((l) => l.request_id === res.headers.get('x-request-id') && l.source === 'console');
    expect(warning[0]).toMatchObject({ level: 'warn', msg: expect.stringMatching(/Failed to find Server Action/) });
  });

  it('never holds a password or a session cookie, from the route or the sign-in form', async () => {
    const { email } = await member('engineer');
    const cookie = await signIn(email);
    const page = await fetch(`${base}/sites`, { headers: { cookie } });
    expect(page.status).toBe(200);
    await fetch(`${base}/api/v1/session`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password: `${PASSWORD}-wrong` }) });
    await logLines((l) => l.request_id === page.headers.get('x-request-id'));
    const text = serverLogText();
    expect(text).toContain(page.headers.get('x-request-id'));
    expect(text).not.toContain(PASSWORD);
    // The sealed cookie value, not just its name.
    expect(text).not.toContain(cookie.split('=').slice(1).join('='));
    expect(text.toLowerCase()).not.toMatch(/"(authorization|cookie)":"(?!\[redacted\])/);
  });
});
