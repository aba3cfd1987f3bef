import { describe, expect, it } from 'vitest';
import { BODY_LIMITS, NEXT_ACTION_BODY_LIMIT, formatBytes } from '@/lib/http/limits';
import { actionIndex } from '@/server/actions';
import { bodyLimit } from '@/server/limits';
import { readConfig, ServerConfigError } from '@/server/config';

// The manifest shape is Next's .next/server/server-reference-manifest.json (node → id → exportedName, filename).
const actions = actionIndex({
  node: {
    aa01: { exportedName: 'signInAction', filename: 'lib/actions/auth.ts' },
    aa02: { exportedName: 'saveSiteAction', filename: 'lib/actions/register.ts' },
  },
});

describe('body limits by route', () => {
  it('gives the import its 5 MB file plus the multipart wrapping', () => {
    expect(bodyLimit('/api/v1/sites/0b1e/items/import', undefined, actions)).toBe(5 * 1024 * 1024 + 64 * 1024);
  });

  it('gives sign-in a few KB, by route, page and action id', () => {
    for (const path of ['/api/v1/session', '/sign-in', '/sign-up', '/sign-in/']) expect(bodyLimit(path, undefined, actions)).toBe(BODY_LIMITS.signIn);
    expect(bodyLimit('/', 'aa01', actions)).toBe(BODY_LIMITS.signIn);
    expect(BODY_LIMITS.signIn).toBeLessThanOrEqual(16 * 1024);
  });

  it('gives everything else, other actions included, the standard 1 MB', () => {
    expect(bodyLimit('/sites/x', 'aa02', actions)).toBe(1024 * 1024);
    expect(bodyLimit('/api/v1/sites', undefined, actions)).toBe(1024 * 1024);
    expect(bodyLimit('/api/v1/sites/x/items/import/more', undefined, actions)).toBe(1024 * 1024);
  });

  it("keeps Next's own action limit above every limit of ours", () => {
    // Next parses the limit with the "bytes" package: "2mb" is 2 × 1024 × 1024 bytes (bytes' README).
    expect(NEXT_ACTION_BODY_LIMIT).toBe('2mb');
    expect(2 * 1024 * 1024).toBeGreaterThan(Math.max(BODY_LIMITS.standard, BODY_LIMITS.signIn));
    expect(formatBytes(BODY_LIMITS.standard)).toBe('1 MB');
    expect(formatBytes(BODY_LIMITS.signIn)).toBe('8 KB');
  });
});

describe('server configuration', () => {
  it('defaults to 127.0.0.1:3000 and no trusted proxy', () => {
    expect(readConfig({})).toMatchObject({ host: '127.0.0.1', port: 3000, trustProxyHops: 0, distDir: '.next' });
  });

  it('refuses a TRUST_PROXY_HOPS or PORT that is not a small whole number, naming the variable', () => {
    expect(readConfig({ TRUST_PROXY_HOPS: '2' }).trustProxyHops).toBe(2);
    for (const bad of ['-1', '1.5', 'one', '11']) {
      expect(() => readConfig({ TRUST_PROXY_HOPS: bad })).toThrow(ServerConfigError);
      expect(() => readConfig({ TRUST_PROXY_HOPS: bad })).toThrow(/TRUST_PROXY_HOPS/);
    }
    expect(() => readConfig({ PORT: '70000' })).toThrow(/PORT must be a whole number from 1 to 65535/);
  });
});
