import { describe, expect, it } from 'vitest';
import { base } from './helpers';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/;

// Header values: MDN Web Docs pages for Content-Security-Policy (frame-ancestors, strict-dynamic, nonce-source),
// X-Content-Type-Options ("nosniff" is its only value), Referrer-Policy and Strict-Transport-Security (sent only with
// NODE_ENV=production, which this server runs with).
function expectCommonHeaders(res: Response) {
  expect(res.headers.get('x-content-type-options')).toBe('nosniff');
  expect(res.headers.get('referrer-policy')).toBe('same-origin');
  expect(res.headers.get('strict-transport-security')).toBe('max-age=31536000');
  expect(res.headers.get('content-security-policy')).toMatch(/frame-ancestors 'none'/);
  expect(res.headers.get('x-request-id')).toMatch(UUID);
}

describe('security headers', () => {
  it("on a page: a per-request nonce that Next put on every script, and no 'unsafe-eval'", async () => {
    const [first, second] = await Promise.all([fetch(`${base}/sign-in`), fetch(`${base}/sign-in`)]);
    expectCommonHeaders(first);
    const policy = first.headers.get('content-security-policy') ?? '';
    const nonce = /'nonce-([^']+)'/.exec(policy)?.[1];
    expect(nonce).toBeTruthy();
    expect(policy).toContain("'strict-dynamic'");
    expect(policy).not.toMatch(/unsafe-eval/);
    expect(second.headers.get('content-security-policy')).not.toContain(nonce!);
    const html = await first.text();
    const scripts = [...html.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
    expect(scripts.length).toBeGreaterThan(3);
    for (const tag of scripts) expect(tag).toContain(`nonce="${nonce}"`);
    for (const tag of html.match(/<style\b[^>]*>/g) ?? []) expect(tag).toContain(`nonce="${nonce}"`);
  });

  it('on API answers: no-store, a policy that allows nothing, and the request id', async () => {
    for (const path of ['/api/v1/session', '/api/v1/sites', '/api/health']) {
      const res = await fetch(`${base}${path}`);
      expectCommonHeaders(res);
      expect(res.headers.get('cache-control')).toBe('no-store');
      expect(res.headers.get('content-security-policy')).toMatch(/^default-src 'none'/);
    }
  });

  it("never takes a client's request id, and gives each request its own", async () => {
    const res = await fetch(`${base}/api/health`, { headers: { 'x-request-id': 'chosen-by-client' } });
    expect(res.headers.get('x-request-id')).toMatch(UUID);
    const again = await fetch(`${base}/api/health`);
    expect(again.headers.get('x-request-id')).not.toBe(res.headers.get('x-request-id'));
  });
});

describe('malformed percent-escapes in the path', () => {
  it('answer 400 JSON before Next sees them (Next alone answered 500)', async () => {
    // %E0%A4%A is a truncated three-byte UTF-8 sequence; %ZZ is not hexadecimal (RFC 3986 section 2.1).
    for (const path of ['/api/v1/items/%E0%A4%A', '/sites/%E0%A4%A', '/api/v1/sites/%ZZ', '/%']) {
      const res = await fetch(`${base}${path}`);
      expect(res.status, path).toBe(400);
      const body = await res.json();
      expect(body).toEqual({ error: expect.stringMatching(/percent-escape/), request_id: res.headers.get('x-request-id') });
    }
  });
});
