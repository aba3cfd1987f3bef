import { monitorEventLoopDelay } from 'node:perf_hooks';
import bcrypt from 'bcryptjs';
import { beforeEach, describe, expect, it } from 'vitest';
import { POST as postSession } from '@/app/api/v1/session/route';
import { getDb } from '@/db/knex';
import { signInAction } from '@/lib/actions/auth';
import { HASH_QUEUE_LIMIT, hashesInHand, runHash } from '@/lib/auth/hash-pool';
import { BCRYPT_COST, hashPassword, UNKNOWN_USER_HASH, verifyPassword } from '@/lib/auth/password';
import { createOrg, jsonRequest, PASSWORD, resetDatabase, runAction, setClientAddress, signOutLocally } from './harness';

beforeEach(async () => {
  await resetDatabase();
  signOutLocally();
  setClientAddress('203.0.113.10');
});

describe('hashing on the worker pool', () => {
  it('makes hashes bcryptjs itself accepts, at cost 12, and checks them both ways', async () => {
    const hash = await hashPassword('pool-made-password');
    // The modular-crypt prefix carries the cost (bcrypt's published format): "$2b$12$".
    expect(hash.startsWith(`$2b$${BCRYPT_COST}$`)).toBe(true);
    // bcryptjs on this thread, independent of the pool, agrees.
    expect(bcrypt.compareSync('pool-made-password', hash)).toBe(true);
    expect(await verifyPassword('pool-made-password', hash)).toBe(true);
    expect(await verifyPassword('another-password', hash)).toBe(false);
    expect(bcrypt.getRounds(UNKNOWN_USER_HASH)).toBe(BCRYPT_COST);
  });

  it('answers 503 with Retry-After and a JSON error when the pool is full, and counts no attempt', async () => {
    const org = await createOrg('Ness', 'ness');
    const filling = Array.from({ length: HASH_QUEUE_LIMIT }, () => runHash({ op: 'hash', plain: 'filler', cost: BCRYPT_COST }));
    expect(hashesInHand()).toBe(HASH_QUEUE_LIMIT);
    const route = await postSession(jsonRequest('POST', { email: org.users.admin.email, password: PASSWORD }));
    expect(route.status).toBe(503);
    expect(Number(route.headers.get('retry-after'))).toBeGreaterThanOrEqual(1);
    expect((await route.json()).error).toMatch(/busy checking other sign-ins/);
    const form = await runAction(signInAction, { email: org.users.admin.email, password: PASSWORD });
    expect(form).toMatchObject({ kind: 'state', state: { message: expect.stringMatching(/try again in \d+ seconds/) } });
    expect(Number((await getDb()('sign_in_attempts').count('* as n').first())?.n)).toBe(0);
    await Promise.all(filling);
    expect(hashesInHand()).toBe(0);
    expect((await postSession(jsonRequest('POST', { email: org.users.admin.email, password: PASSWORD }))).status).toBe(200);
  });

  it('keeps the event loop free while 20 sign-ins with random e-mails run at once', async () => {
    const delay = monitorEventLoopDelay({ resolution: 10 });
    delay.enable();
    // The checks must be on the pool, not merely fast: it holds several of them at once during the flood.
    let mostInHand = 0;
    const sampler = setInterval(() => (mostInHand = Math.max(mostInHand, hashesInHand())), 5);
    const answers = await Promise.all(
      Array.from({ length: 20 }, (_, i) => postSession(jsonRequest('POST', { email: `flood-${i}-${Math.random()}@test.example`, password: 'guess' }))),
    );
    clearInterval(sampler);
    delay.disable();
    expect(mostInHand).toBeGreaterThan(1);
    // Wrong credentials, or the pool's 503 for the few beyond its queue: never anything else.
    for (const a of answers) expect([401, 503]).toContain(a.status);
    expect(answers.filter((a) => a.status === 401).length).toBeGreaterThanOrEqual(HASH_QUEUE_LIMIT - 2);
    // Twenty cost-12 hashes on this thread would block it for seconds; the bound is deliberately loose.
    expect(delay.max / 1e6).toBeLessThan(1000);
  });
});
