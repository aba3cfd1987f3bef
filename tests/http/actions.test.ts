import { describe, expect, it } from 'vitest';
import { actionId, base, rawRequest } from './helpers';

// What Next does with each of these on its own, found on this build (Next 16.4.6): an unknown id answers 404/400
// with x-nextjs-action-not-found; every other case below answered 500. The server now refuses them with a 4xx.
const SIGN_IN = actionId('signInAction');
const post = (path: string, headers: Record<string, string>, body: string) => fetch(`${base}${path}`, { method: 'POST', headers, body });
const multipart = (parts: [string, string][]) =>
  parts.map(([name, value]) => `--XX\r\nContent-Disposition: form-data; name="${name}"\r\n\r\n${value}\r\n`).join('') + '--XX--\r\n';
const MULTIPART = { 'content-type': 'multipart/form-data; boundary=XX' };

async function expectRefusal(res: Response, status: number, why: RegExp) {
  expect(res.status).toBe(status);
  const body = await res.json();
  expect(body.error).toMatch(why);
  expect(body.request_id).toBe(res.headers.get('x-request-id'));
}

describe('malformed server actions end as a 4xx', () => {
  it('an unknown action id: Next\'s own "not found" answer, which its client understands', async () => {
    const res = await post('/sign-in', { 'next-action': '60' + 'f'.repeat(40), 'content-type': 'text/plain' }, '[]');
    expect(res.status).toBeGreaterThanOrEqual(400);
    expect(res.status).toBeLessThan(500);
    expect(res.headers.get('x-nextjs-action-not-found')).toBe('1');
  });

  it('a text body that is not a JSON argument list, or holds references the app never sends', async () => {
    await expectRefusal(await post('/sign-in', { 'next-action': SIGN_IN, 'content-type': 'text/plain' }, 'garbage'), 400, /not valid JSON/);
    await expectRefusal(await post('/sign-in', { 'next-action': SIGN_IN, 'content-type': 'text/plain' }, '{"0":1}'), 400, /JSON array/);
    await expectRefusal(await post('/sign-in', { 'next-action': SIGN_IN, 'content-type': 'text/plain' }, '["$Q1"]'), 400, /reference/);
  });

  it('an argument list of the wrong shape reaches the action, which reads it as an empty form and names the fields', async () => {
    for (const args of ['[1,2]', '[]', '[null,"x"]', '[{},{}]']) {
      const res = await post('/sign-in', { 'next-action': SIGN_IN, accept: 'text/x-component', 'content-type': 'text/plain' }, args);
      expect(res.status, args).toBeLessThan(500);
      if (res.status === 200) expect(await res.text(), args).toMatch(/email/i);
    }
  });

  it('a broken multipart body, with or without the action header', async () => {
    const broken = multipart([['0', '[{},"$K1"]']]).slice(0, -12);
    await expectRefusal(await post('/sign-in', { 'next-action': SIGN_IN, ...MULTIPART }, broken), 400, /Unexpected end of form/);
    await expectRefusal(await post('/sign-in', { 'next-action': SIGN_IN, 'content-type': 'multipart/form-data' }, 'abc'), 400, /Boundary not found/);
    await expectRefusal(await post('/sign-in', { 'next-action': SIGN_IN, ...MULTIPART }, multipart([['0', 'not json']])), 400, /not valid JSON/);
    await expectRefusal(await post('/sign-in', MULTIPART, '--XX\r\nContent-Dispo'), 400, /cannot be read/);
  });

  it('an action posted from another origin: 403', async () => {
    await expectRefusal(await post('/sign-in', { 'next-action': SIGN_IN, 'content-type': 'text/plain', origin: 'https://evil.example' }, '[]'), 403, /pages of this site/);
  });

  it('an action body over its limit: 413 (checked with the other limits in limits.test.ts)', async () => {
    const answer = await rawRequest({ path: '/sign-in', headers: { 'next-action': SIGN_IN, 'content-type': 'text/plain' }, total: 64 * 1024 });
    expect(answer.status).toBe(413);
  });

  it('while a well-formed sign-in action still works as a browser sends it', async () => {
    const body = multipart([['1_email', 'nobody@test.example'], ['1_password', 'wrong-password-1'], ['0', '[{},"$K1"]']]);
    const res = await post('/sign-in', { 'next-action': SIGN_IN, accept: 'text/x-component', ...MULTIPART }, body);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toMatch(/text\/x-component/);
    expect(await res.text()).toMatch(/"message":/);
  });
});
