import { once } from 'node:events';
import http, { type IncomingMessage } from 'node:http';
import type { AddressInfo } from 'node:net';
import { Writable } from 'node:stream';
import pino from 'pino';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { logOptions } from '@/lib/logger';
import { actionIndex } from '@/server/actions';
import { GuardedRequest } from '@/server/guarded-request';
import { createHandler, type NextHandler } from '@/server/handler';

// The server's own code runs for real here, on a real socket; only Next is a stand-in, so each test decides what
// "Next" does (throw, answer a 500 page, read the body) and checks what reaches the client and the log.
const SIGN_IN = 'aa01';
const SAVE = 'aa02';
const actions = actionIndex({
  node: { [SIGN_IN]: { exportedName: 'signInAction', filename: 'lib/actions/auth.ts' }, [SAVE]: { exportedName: 'saveSiteAction', filename: 'lib/actions/register.ts' } },
});

let lines: Record<string, unknown>[] = [];
const sink = new Writable({
  write(chunk, _enc, done) {
    for (const line of String(chunk).split('\n')) if (line) lines.push(JSON.parse(line));
    done();
  },
});
const log = pino({ ...logOptions(), level: 'info' }, sink);

let next: NextHandler = () => undefined;
let seen: { headers: IncomingMessage['headers']; body: string } | null = null;
let server: http.Server;
let base = '';

beforeAll(async () => {
  const handle = createHandler({ next: (req, res) => next(req, res), log, actions, trustProxyHops: 0, production: true });
  server = http.createServer({ IncomingMessage: GuardedRequest }, (req, res) => handle(req as GuardedRequest, res));
  server.on('checkContinue', (req, res) => handle(req as GuardedRequest, res, true));
  server.listen(0, '127.0.0.1');
  await once(server, 'listening');
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});
afterAll(() => server.close());
beforeEach(() => {
  lines = [];
  seen = null;
  next = async (req, res) => {
    let body = '';
    for await (const chunk of req) body += chunk;
    seen = { headers: req.headers, body };
    res.setHeader('Content-Type', 'text/plain');
    res.end('from next');
  };
});

async function requestLine(id: string) {
  for (let i = 0; i < 50 && !lines.some((l) => l.request_id === id && l.msg === 'request'); i++) await new Promise((r) => setTimeout(r, 10));
  return lines.find((l) => l.request_id === id && l.msg === 'request');
}

/** A raw request, so a test controls Content-Length, chunking and Expect exactly. */
function send(options: http.RequestOptions, write: (req: http.ClientRequest) => void): Promise<{ status: number; headers: IncomingMessage['headers']; body: string; continued: boolean }> {
  return new Promise((resolve, reject) => {
    let continued = false;
    const req = http.request({ host: '127.0.0.1', port: new URL(base).port, ...options }, async (res) => {
      let body = '';
      for await (const chunk of res) body += chunk;
      resolve({ status: res.statusCode ?? 0, headers: res.headers, body, continued });
    });
    req.on('continue', () => {
      continued = true;
    });
    req.on('error', reject);
    write(req);
  });
}

describe('the JSON 500', () => {
  it('answers a fault inside Next as {"error","request_id"} and logs it with its stack and request id', async () => {
    next = () => {
      throw new Error('database went away');
    };
    const res = await fetch(`${base}/api/v1/sites`);
    const body = await res.json();
    expect(res.status).toBe(500);
    expect(res.headers.get('content-type')).toMatch(/^application\/json/);
    expect(Object.keys(body).sort()).toEqual(['error', 'request_id']);
    expect(body.request_id).toBe(res.headers.get('x-request-id'));
    const fault = lines.find((l) => l.msg === 'request failed');
    expect(fault?.request_id).toBe(body.request_id);
    expect((fault?.err as { stack: string }).stack).toMatch(/database went away\n\s+at /);
    expect((await requestLine(body.request_id))?.level).toBe('error');
  });

  it("replaces Next's non-JSON 500 on API routes and on actions from other clients, keeps it for pages and Next's client", async () => {
    next = (_req, res) => {
      res.statusCode = 500;
      res.setHeader('Content-Type', 'text/x-component');
      res.setHeader('Content-Length', String(Buffer.byteLength('0:E{…}\n')));
      res.end('0:E{…}\n');
    };
    const api = await fetch(`${base}/api/v1/items/x`, { method: 'DELETE' });
    expect(api.status).toBe(500);
    expect((await api.json()).request_id).toBe(api.headers.get('x-request-id'));
    const action = await fetch(`${base}/sites`, { method: 'POST', headers: { 'next-action': 'ffff', 'content-type': 'text/plain' }, body: '[]' });
    expect(await action.json()).toMatchObject({ request_id: action.headers.get('x-request-id') });
    const fromNextClient = await fetch(`${base}/sites`, { method: 'POST', headers: { 'next-action': 'ffff', accept: 'text/x-component' }, body: '[]' });
    expect(await fromNextClient.text()).toBe('0:E{…}\n');
    const page = await fetch(`${base}/sites`);
    expect([page.status, await page.text()]).toEqual([500, '0:E{…}\n']);
  });

  it('keeps a JSON 5xx the app wrote itself, and marks every API answer no-store', async () => {
    next = (_req, res) => {
      res.writeHead(503, { 'Content-Type': 'application/json', 'Cache-Control': 'public, max-age=600' });
      res.end('{"status":"degraded"}');
    };
    const res = await fetch(`${base}/api/health`);
    expect([res.status, await res.text()]).toEqual([503, '{"status":"degraded"}']);
    expect(res.headers.get('cache-control')).toBe('no-store');
  });
});

describe('what Next is handed', () => {
  it('an id and address of ours, a nonce policy, and no client claim under those names', async () => {
    const res = await fetch(`${base}/calculator`, {
      headers: { 'x-request-id': 'mine', 'x-plumbline-client-address': '203.0.113.1', 'x-forwarded-for': '203.0.113.2', 'content-security-policy': "script-src 'nonce-abc'" },
    });
    expect(res.status).toBe(200);
    const id = res.headers.get('x-request-id');
    expect(id).not.toBe('mine');
    expect(seen?.headers['x-request-id']).toBe(id);
    expect(seen?.headers['x-plumbline-client-address']).toBe('127.0.0.1');
    expect(seen?.headers['x-forwarded-for']).toBeUndefined();
    const policy = res.headers.get('content-security-policy') ?? '';
    expect(seen?.headers['content-security-policy']).toBe(policy);
    expect(policy).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]{24}' 'strict-dynamic'/);
    expect(policy).not.toMatch(/unsafe-eval/);
    expect(res.headers.get('strict-transport-security')).toBe('max-age=31536000');
    expect(await requestLine(id!)).toMatchObject({ method: 'GET', path: '/calculator', status: 200, client_address: '127.0.0.1' });
  });

  it('a chunked body within its limit, whole; one over it never, with a 413', async () => {
    const small = await send({ method: 'POST', path: '/api/v1/sites', headers: { 'transfer-encoding': 'chunked' } }, (req) => {
      req.write('{"name":');
      req.end('"Pier 4"}');
    });
    expect(small.status).toBe(200);
    expect(seen?.body).toBe('{"name":"Pier 4"}');
    seen = null;
    const big = await send({ method: 'POST', path: '/api/v1/session', headers: { 'transfer-encoding': 'chunked' } }, (req) => {
      req.write('x'.repeat(8 * 1024));
      req.write('x');
    });
    expect(big.status).toBe(413);
    expect(JSON.parse(big.body).error).toMatch(/larger than the 8 KB/);
    expect(seen).toBeNull();
  });

  it('a declared length over the limit is refused before any body is asked for (Expect: 100-continue)', async () => {
    const res = await send({ method: 'POST', path: '/sign-in', headers: { 'content-length': String(9 * 1024), expect: '100-continue', 'next-action': SIGN_IN } }, () => undefined);
    expect(res.status).toBe(413);
    expect(res.continued).toBe(false);
    expect(res.headers.connection).toBe('close');
    const ok = await send({ method: 'POST', path: '/sites/x', headers: { 'content-length': '4', expect: '100-continue', 'content-type': 'text/plain' } }, (req) => req.once('continue', () => req.end('abcd')));
    expect([ok.status, ok.continued, seen?.body]).toEqual([200, true, 'abcd']);
  });

  it('a checked server action body, and a refused one not at all', async () => {
    const good = await fetch(`${base}/sites/x`, { method: 'POST', headers: { 'next-action': SAVE, 'content-type': 'text/plain' }, body: '[{},"$undefined"]' });
    expect(good.status).toBe(200);
    expect(seen?.body).toBe('[{},"$undefined"]');
    seen = null;
    const bad = await fetch(`${base}/sites/x`, { method: 'POST', headers: { 'next-action': SAVE, 'content-type': 'text/plain' }, body: 'not json' });
    expect(bad.status).toBe(400);
    expect(seen).toBeNull();
    expect((await requestLine(bad.headers.get('x-request-id')!))?.action).toBe('saveSiteAction');
  });

  it('a 400 for a malformed percent-escape, without Next', async () => {
    const res = await fetch(`${base}/api/v1/items/%E0%A4%A`);
    expect(res.status).toBe(400);
    expect((await res.json()).error).toMatch(/percent-escape/);
    expect(seen).toBeNull();
  });
});

describe('the logger', () => {
  it('never writes passwords, cookies, authorisation or bodies, at any of the first three levels', () => {
    log.info({ password: 'hunter2-long', user: { password: 'pw2', headers: { cookie: 'sid=1', authorization: 'Bearer t' } }, body: '{"x":1}' }, 'x');
    const text = JSON.stringify(lines.at(-1));
    for (const secret of ['hunter2-long', 'pw2', 'sid=1', 'Bearer t', '{\\"x\\":1}']) expect(text).not.toContain(secret);
    expect(text).toContain('[redacted]');
  });
});

