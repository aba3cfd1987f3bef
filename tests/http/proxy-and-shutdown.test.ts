import { spawn } from 'node:child_process';
import { once } from 'node:events';
import http from 'node:http';
import path from 'node:path';
import { describe, expect, inject, it } from 'vitest';

// A second server, started as `npm start` would behind one trusted proxy (TRUST_PROXY_HOPS=1), then stopped with
// SIGTERM while a request is in flight.
const root = path.resolve(__dirname, '../..');
const port = Number(process.env.PLUMBLINE_HTTP_TEST_PORT ?? 3300) + 1;
const base = `http://127.0.0.1:${port}`;

describe('behind a trusted proxy, and stopping', () => {
  it("takes the proxy's client address and request id, and finishes requests in flight on SIGTERM", async () => {
    let log = '';
    const server = spawn(process.execPath, ['.build/server.mjs'], {
      cwd: root,
      env: { ...process.env, NODE_ENV: 'production', PORT: String(port), PLUMBLINE_DIST_DIR: path.relative(root, inject('distDir')), TRUST_PROXY_HOPS: '1', LOG_LEVEL: 'info' },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    server.stdout!.on('data', (d) => (log += d));
    server.stderr!.on('data', (d) => (log += d));
    for (let i = 0; i < 240 && !(await fetch(`${base}/api/health`).then((r) => r.ok, () => false)); i++) await new Promise((r) => setTimeout(r, 250));

    // The proxy appended 192.0.2.44 (what it saw); the client had written 203.0.113.9 itself (see client-address.test.ts).
    const res = await fetch(`${base}/api/health`, { headers: { 'x-forwarded-for': '203.0.113.9, 192.0.2.44', 'x-request-id': 'proxy-req-7' } });
    expect(res.headers.get('x-request-id')).toBe('proxy-req-7');
    await new Promise((r) => setTimeout(r, 200));
    const line = log.split('\n').find((l) => l.includes('"request_id":"proxy-req-7"'));
    expect(JSON.parse(line!)).toMatchObject({ client_address: '192.0.2.44', status: 200 });

    // A chunked sign-in body, half sent when SIGTERM arrives, still gets its answer before the server exits.
    const answer = new Promise<number>((resolve, reject) => {
      const req = http.request({ host: '127.0.0.1', port, method: 'POST', path: '/api/v1/session', headers: { 'content-type': 'application/json' } }, (r) => {
        r.resume();
        resolve(r.statusCode ?? 0);
      });
      req.on('error', reject);
      req.write('{"email":"nobody@test.example",');
      setTimeout(() => {
        server.kill('SIGTERM');
        setTimeout(() => req.end('"password":"not-the-password"}'), 300);
      }, 300);
    });
    expect(await answer).toBe(401);
    const [code] = await once(server, 'exit');
    expect(code).toBe(0);
    expect(log).toContain('"msg":"stopped"');
    expect(await fetch(`${base}/api/health`).then(() => 'up', () => 'down')).toBe('down');
  });
});
