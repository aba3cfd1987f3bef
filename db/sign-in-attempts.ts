import { getDb } from './knex';
import type { Conn } from './types';

/** What the sign-in limits look at, counted inside the lock that serialises attempts on this address and e-mail. */
export interface AttemptHistory {
  /** Failures for this e-mail from this address in the window. */
  pair: { count: number; oldest: Date | null };
  /** Failures for this e-mail from any address in the window, since its last success. */
  account: { count: number; last: Date | null };
  /** Failures from this address for any e-mail in the window. */
  address: { count: number; oldest: Date | null };
  /** This address has signed in to this e-mail's account within `knownSince`. */
  knownAddress: boolean;
}

// Advisory lock namespaces (the first key of pg_advisory_xact_lock's two-key form), one per kind of key.
const ADDRESS_LOCK = 91;
const EMAIL_LOCK = 92;

export type Reservation<R> = { ok: true; id: string } | { ok: false; refusal: R };

/**
 * Check-and-record in one step: under transaction-scoped advisory locks on the address, then the e-mail (always
 * that order, so two attempts never wait on each other crosswise), reads the history, asks `decide`, and when it
 * allows the attempt records it as a failure before the password is checked. Parallel guesses therefore each see the
 * ones before them; a success turns its row into a success afterwards (markSignInSucceeded).
 */
export async function reserveSignInAttempt<R>(
  input: { email: string; address: string; windowStart: Date; knownSince: Date },
  decide: (history: AttemptHistory) => R | null,
  conn: Conn = getDb(),
): Promise<Reservation<R>> {
  const email = input.email.toLowerCase();
  const { address, windowStart } = input;
  return conn.transaction(async (trx) => {
    await trx.raw('SELECT pg_advisory_xact_lock(?, hashtext(?))', [ADDRESS_LOCK, address]);
    await trx.raw('SELECT pg_advisory_xact_lock(?, hashtext(?))', [EMAIL_LOCK, email]);
    const failures = () => trx('sign_in_attempts').where({ succeeded: false }).andWhere('created_at', '>=', windowStart);
    const pair = await failures().where({ email, address }).first(trx.raw('count(*)::int AS count'), trx.raw('min(created_at) AS oldest'));
    const account = await failures()
      .where({ email })
      .andWhere('created_at', '>', trx.raw(`coalesce((SELECT max(created_at) FROM sign_in_attempts WHERE email = ? AND succeeded), '-infinity')`, [email]))
      .first(trx.raw('count(*)::int AS count'), trx.raw('max(created_at) AS last'));
    const byAddress = await failures().where({ address }).first(trx.raw('count(*)::int AS count'), trx.raw('min(created_at) AS oldest'));
    const known = await trx('sign_in_attempts').where({ email, address, succeeded: true }).andWhere('created_at', '>=', input.knownSince).first('id');
    const refusal = decide({
      pair: { count: pair?.count ?? 0, oldest: pair?.oldest ?? null },
      account: { count: account?.count ?? 0, last: account?.last ?? null },
      address: { count: byAddress?.count ?? 0, oldest: byAddress?.oldest ?? null },
      knownAddress: Boolean(known),
    });
    if (refusal !== null) return { ok: false, refusal };
    const [row] = await trx('sign_in_attempts').insert({ email, address, succeeded: false }).returning('id');
    return { ok: true, id: String(row.id) };
  });
}

export async function markSignInSucceeded(id: string, conn: Conn = getDb()): Promise<void> {
  await conn('sign_in_attempts').where({ id }).update({ succeeded: true });
}

/** An attempt whose password was never checked (the hashing pool was full) counts for nothing. */
export async function cancelSignInAttempt(id: string, conn: Conn = getDb()): Promise<void> {
  await conn('sign_in_attempts').where({ id }).delete();
}

/** Deletes attempts older than `before`, a bounded batch at a time; the number deleted. */
export async function pruneSignInAttempts(before: Date, batch = 10_000, conn: Conn = getDb()): Promise<number> {
  const result = await conn.raw(
    'DELETE FROM sign_in_attempts WHERE id IN (SELECT id FROM sign_in_attempts WHERE created_at < ? ORDER BY created_at LIMIT ?)',
    [before, batch],
  );
  return result.rowCount ?? 0;
}
