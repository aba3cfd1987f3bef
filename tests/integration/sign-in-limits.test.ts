import { beforeEach, describe, expect, it } from 'vitest';
import { POST as postSession } from '@/app/api/v1/session/route';
import { getDb } from '@/db/knex';
import { HASH_QUEUE_LIMIT } from '@/lib/auth/hash-pool';
import { ACCOUNT_BACKOFF_CAP_S, ACCOUNT_FREE_FAILURES, MAX_ADDRESS_FAILURES } from '@/lib/auth/rate-limit';
import { createOrg, jsonRequest, PASSWORD, resetDatabase, setClientAddress, signInAs, signOutLocally } from './harness';

// The limits are Plumbline's own policy (lib/auth/rate-limit.ts), common practice for sign-in throttling.
const ATTACKER = '198.51.100.66';
const OWNER = '203.0.113.10';

beforeEach(async () => {
  await resetDatabase();
  signOutLocally();
  setClientAddress(OWNER);
});

const signIn = (email: string, password: string) => postSession(jsonRequest('POST', { email, password }));

/** Failures as the limits would have recorded them, `secondsAgo` old: the state a slow attack leaves behind. */
async function pastFailures(rows: { email: string; address: string; secondsAgo: number }[]) {
  const db = getDb();
  await db('sign_in_attempts').insert(
    rows.map((r) => ({ email: r.email, address: r.address, succeeded: false, created_at: db.raw(`now() - make_interval(secs => ?)`, [r.secondsAgo]) })),
  );
}

const checkedAttempts = async (where: Record<string, string>) => Number((await getDb()('sign_in_attempts').where(where).count('* as n').first())?.n);

describe('the per-account back-off', () => {
  it('keeps an attacker elsewhere from locking the owner out: the owner’s own address signs in at once', async () => {
    const org = await createOrg('Ness', 'ness');
    const email = org.users.engineer.email;
    await signInAs(email);
    signOutLocally();
    await getDb().raw(`UPDATE sign_in_attempts SET created_at = now() - interval '1 day' WHERE succeeded`);
    // Forty guesses from forty addresses: neither the pair nor the per-address limit sees more than one.
    await pastFailures(Array.from({ length: 40 }, (_, i) => ({ email, address: `198.51.100.${i + 100}`, secondsAgo: 5 + i })));

    setClientAddress(ATTACKER);
    const attacker = await signIn(email, 'guess');
    expect(attacker.status).toBe(429);
    // 40 failures: 2^35 s, capped at 5 minutes after the latest (5 s ago).
    expect(Number(attacker.headers.get('retry-after'))).toBe(ACCOUNT_BACKOFF_CAP_S - 5);
    expect((await attacker.json()).error).toMatch(/to this account/);

    setClientAddress(OWNER);
    expect((await signIn(email, PASSWORD)).status).toBe(200);
  });

  it('makes a new address wait the back-off at most, never longer, then lets the right password in', async () => {
    const org = await createOrg('Ness', 'ness');
    const email = org.users.viewer.email;
    await pastFailures(Array.from({ length: 40 }, (_, i) => ({ email, address: `198.51.100.${i + 100}`, secondsAgo: 2 + i })));
    setClientAddress('192.0.2.80');
    const waiting = await signIn(email, PASSWORD);
    expect(waiting.status).toBe(429);
    expect(Number(waiting.headers.get('retry-after'))).toBeLessThanOrEqual(ACCOUNT_BACKOFF_CAP_S);
    await getDb().raw(`UPDATE sign_in_attempts SET created_at = created_at - interval '301 seconds'`);
    expect((await signIn(email, PASSWORD)).status).toBe(200);
  });
});

describe('the per-address limit', () => {
  it(`refuses an address after ${MAX_ADDRESS_FAILURES} failures across accounts, and no other address`, async () => {
    const org = await createOrg('Ness', 'ness');
    await pastFailures(Array.from({ length: MAX_ADDRESS_FAILURES }, (_, i) => ({ email: `sprayed-${i}@test.example`, address: ATTACKER, secondsAgo: 60 })));
    setClientAddress(ATTACKER);
    const refused = await signIn(org.users.admin.email, PASSWORD);
    expect(refused.status).toBe(429);
    expect((await refused.json()).error).toMatch(/from your network/);
    // The oldest failure is 60 s old: 900 - 60 = 840 s left in the window.
    expect(Number(refused.headers.get('retry-after'))).toBeGreaterThan(800);
    expect(Number(refused.headers.get('retry-after'))).toBeLessThanOrEqual(840);
    setClientAddress(OWNER);
    expect((await signIn(org.users.admin.email, PASSWORD)).status).toBe(200);
  });
});

describe('check and record under concurrency', () => {
  it('lets at most the free failures of 20 parallel wrong guesses at one account reach the password check', async () => {
    const org = await createOrg('Ness', 'ness');
    const email = org.users.reviewer.email;
    setClientAddress(ATTACKER);
    const answers = await Promise.all(Array.from({ length: 20 }, (_, i) => signIn(email, `parallel-${i}`)));
    const statuses = answers.map((a) => a.status);
    expect(statuses.filter((s) => s === 401).length).toBe(ACCOUNT_FREE_FAILURES);
    // The rest are refused by the back-off, or (beyond HASH_QUEUE_LIMIT in hand at once) answered 503 unchecked.
    expect(statuses.filter((s) => s === 429 || s === 503).length).toBe(20 - ACCOUNT_FREE_FAILURES);
    expect(statuses.filter((s) => s === 503).length).toBe(Math.max(0, 20 - HASH_QUEUE_LIMIT));
    for (const a of answers.filter((x) => x.status === 429)) expect(Number(a.headers.get('retry-after'))).toBeGreaterThanOrEqual(1);
    expect(await checkedAttempts({ email })).toBe(ACCOUNT_FREE_FAILURES);
  });

  it('lets at most what is left of the per-address limit through when 20 accounts are guessed at once', async () => {
    await pastFailures(Array.from({ length: MAX_ADDRESS_FAILURES - 3 }, (_, i) => ({ email: `earlier-${i}@test.example`, address: ATTACKER, secondsAgo: 30 })));
    setClientAddress(ATTACKER);
    const answers = await Promise.all(Array.from({ length: 20 }, (_, i) => signIn(`spray-${i}@test.example`, 'guess')));
    expect(answers.filter((a) => a.status === 401).length).toBe(3);
    expect(answers.filter((a) => a.status === 429).length).toBe(17 - Math.max(0, 20 - HASH_QUEUE_LIMIT));
    expect(await checkedAttempts({ address: ATTACKER })).toBe(MAX_ADDRESS_FAILURES);
  });
});
