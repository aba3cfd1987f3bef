import { describe, expect, it } from 'vitest';
import type { AttemptHistory } from '@/db/sign-in-attempts';
import { accountBackoffS, limitWindows, refusalFor, waitText } from '@/lib/auth/rate-limit';

// The limits are Plumbline's own policy (issue 9's brief: 10 per pair and 30 per address in 15 minutes, 2^(n-5) s per
// account capped at 5 minutes): common practice for sign-in throttling, not taken from a standard.
const NOW = new Date('2026-12-04T12:00:00Z');
const ago = (s: number) => new Date(NOW.getTime() - s * 1000);
const quiet: AttemptHistory = {
  pair: { count: 0, oldest: null },
  account: { count: 0, last: null },
  address: { count: 0, oldest: null },
  knownAddress: false,
};
const withHistory = (change: Partial<AttemptHistory>): AttemptHistory => ({ ...quiet, ...change });

describe('the account back-off', () => {
  it('is free for the first five failures, then doubles from one second', () => {
    expect([0, 4, 5, 6, 7, 10, 13].map(accountBackoffS)).toEqual([0, 0, 1, 2, 4, 32, 256]);
  });

  it('stops at five minutes however many failures, so the owner is never locked out for good', () => {
    expect(accountBackoffS(14)).toBe(300);
    expect(accountBackoffS(1000)).toBe(300);
  });

  it('refuses until the back-off after the latest failure has passed, and then allows', () => {
    const refusal = refusalFor(withHistory({ account: { count: 8, last: ago(3) } }), NOW);
    expect(refusal).toMatchObject({ reason: 'account', retryAfterS: 5 });
    expect(refusal?.message).toBe('Too many failed sign-ins to this account. Try again in 5 seconds.');
    expect(refusalFor(withHistory({ account: { count: 8, last: ago(8) } }), NOW)).toBeNull();
  });

  it('does not apply from an address that signed in to the account before', () => {
    expect(refusalFor(withHistory({ account: { count: 40, last: ago(1) }, knownAddress: true }), NOW)).toBeNull();
  });
});

describe('the window limits', () => {
  it('refuses the pair at ten failures until the oldest is fifteen minutes old, in whole minutes', () => {
    expect(refusalFor(withHistory({ pair: { count: 9, oldest: ago(60) } }), NOW)).toBeNull();
    const refusal = refusalFor(withHistory({ pair: { count: 10, oldest: ago(61) } }), NOW);
    // 900 s - 61 s = 839 s, rounded up to 14 minutes.
    expect(refusal).toMatchObject({ reason: 'pair', retryAfterS: 840, message: 'Too many failed sign-ins. Try again in 14 minutes.' });
  });

  it('refuses an address at thirty failures across accounts, even one it signed in to before', () => {
    expect(refusalFor(withHistory({ address: { count: 29, oldest: ago(10) } }), NOW)).toBeNull();
    const refusal = refusalFor(withHistory({ address: { count: 30, oldest: ago(850) }, knownAddress: true }), NOW);
    expect(refusal).toMatchObject({ reason: 'address', retryAfterS: 50 });
    expect(refusal?.message).toBe('Too many failed sign-ins from your network. Try again in 50 seconds.');
  });

  it('counts over the last fifteen minutes and knows addresses for thirty days', () => {
    const { windowStart, knownSince } = limitWindows(NOW);
    expect(NOW.getTime() - windowStart.getTime()).toBe(15 * 60_000);
    expect(NOW.getTime() - knownSince.getTime()).toBe(30 * 86_400_000);
  });
});

describe('waitText', () => {
  it('says seconds below a minute and whole minutes, rounded up, above', () => {
    expect([1, 2, 59, 60, 61, 300].map(waitText)).toEqual(['1 second', '2 seconds', '59 seconds', '1 minute', '2 minutes', '5 minutes']);
  });
});
