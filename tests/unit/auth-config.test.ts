import { afterEach, describe, expect, it } from 'vitest';
import { ConfigurationError, sessionOptions, sessionSecret } from '@/lib/auth/config';
import { temporaryPassword } from '@/lib/auth/password';

const saved = { ...process.env };
afterEach(() => {
  process.env = { ...saved };
});

describe('session configuration', () => {
  it('refuses a missing secret and one under 32 characters', () => {
    delete process.env.SESSION_SECRET;
    expect(() => sessionSecret()).toThrow(ConfigurationError);
    process.env.SESSION_SECRET = 'x'.repeat(31);
    expect(() => sessionSecret()).toThrow(/at least 32 characters; it has 31/);
    process.env.SESSION_SECRET = 'x'.repeat(32);
    expect(sessionSecret()).toHaveLength(32);
  });

  it('uses httpOnly, SameSite=Lax cookies for eight hours, Secure in production', () => {
    process.env.SESSION_SECRET = 'y'.repeat(40);
    (process.env as Record<string, string>).NODE_ENV = 'production';
    const opts = sessionOptions();
    expect(opts.ttl).toBe(8 * 3600);
    expect(opts.cookieOptions).toMatchObject({ httpOnly: true, sameSite: 'lax', secure: true });
    (process.env as Record<string, string>).NODE_ENV = 'development';
    expect(sessionOptions().cookieOptions?.secure).toBe(false);
  });
});

describe('temporary passwords', () => {
  it('are 14 characters from an alphabet without look-alike characters', () => {
    const seen = new Set<string>();
    for (let i = 0; i < 200; i++) {
      const p = temporaryPassword();
      expect(p).toMatch(/^[a-km-np-zA-HJ-NP-Z2-9]{14}$/);
      seen.add(p);
    }
    expect(seen.size).toBe(200);
  });
});
