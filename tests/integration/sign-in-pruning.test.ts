import { describe, expect, it } from 'vitest';
import { POST as postSession } from '@/app/api/v1/session/route';
import { getDb } from '@/db/knex';
import { pruneSignInAttempts } from '@/db/sign-in-attempts';
import { pruneBefore } from '@/lib/auth/rate-limit';
import { jsonRequest, resetDatabase } from './harness';

// Thirty days is how far back a successful sign-in makes an address known (lib/auth/rate-limit.ts, common practice).
async function attemptsAged(days: number[]) {
  const db = getDb();
  await db('sign_in_attempts').insert(
    days.map((d, i) => ({ email: `aged-${i}@test.example`, address: '192.0.2.9', succeeded: i % 2 === 0, created_at: db.raw(`now() - make_interval(days => ?)`, [d]) })),
  );
}

const agesLeft = async () =>
  (await getDb()('sign_in_attempts').select(getDb().raw(`extract(day from now() - created_at)::int AS days`)).orderBy('days')).map((r: { days: number }) => r.days);

describe('pruning old sign-in attempts', () => {
  it('happens at the first sign-in of the process, and keeps everything the limits still look at', async () => {
    await resetDatabase();
    await attemptsAged([0, 14, 30, 32, 90]);
    expect((await postSession(jsonRequest('POST', { email: 'nobody@test.example', password: 'guess' }))).status).toBe(401);
    for (let i = 0; i < 50 && (await agesLeft()).includes(90); i++) await new Promise((r) => setTimeout(r, 100));
    // The sign-in's own attempt (0 days) joins the three young ones.
    expect(await agesLeft()).toEqual([0, 0, 14, 30]);
  });

  it('deletes in bounded batches, oldest first', async () => {
    await resetDatabase();
    await attemptsAged([40, 50, 60, 1]);
    expect(await pruneSignInAttempts(pruneBefore(new Date()), 2)).toBe(2);
    expect(await agesLeft()).toEqual([1, 40]);
    expect(await pruneSignInAttempts(pruneBefore(new Date()), 2)).toBe(1);
    expect(await agesLeft()).toEqual([1]);
  });
});
