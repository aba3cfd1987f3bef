import { getDb } from './knex';
import type { Conn } from './types';

export async function recordSignInAttempt(
  email: string,
  address: string,
  succeeded: boolean,
  conn: Conn = getDb(),
): Promise<void> {
  await conn.transaction(async (trx) => {
    await trx('sign_in_attempts').insert({ email: email.toLowerCase(), address, succeeded });
  });
}

/** Failed attempts for this e-mail and address since `since`, and the oldest of them. */
export async function recentFailures(
  email: string,
  address: string,
  since: Date,
  conn: Conn = getDb(),
): Promise<{ count: number; oldest: Date | null }> {
  const row = await conn('sign_in_attempts')
    .where({ email: email.toLowerCase(), address, succeeded: false })
    .andWhere('created_at', '>=', since)
    .first(conn.raw('count(*)::int AS count'), conn.raw('min(created_at) AS oldest'));
  return { count: row?.count ?? 0, oldest: row?.oldest ?? null };
}
