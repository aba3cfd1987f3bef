import { getDb } from './knex';
import type { Conn, SessionRow } from './types';

/** last_seen_at is written at most this often per session, not on every request. */
const TOUCH_EVERY_S = 60;

export async function insertSession(
  input: { idHash: string; userId: string; organisationId: string; ttlS: number },
  conn: Conn = getDb(),
): Promise<void> {
  await conn.transaction(async (trx) => {
    await trx('sessions').insert({
      id_hash: input.idHash,
      user_id: input.userId,
      organisation_id: input.organisationId,
      expires_at: trx.raw(`now() + make_interval(secs => ?)`, [input.ttlS]),
    });
    // Housekeeping bounded by one user's rows: sessions ended more than a day ago are no use to anyone.
    await trx('sessions')
      .where({ user_id: input.userId })
      .andWhere((q) => q.where('expires_at', '<', trx.raw(`now() - interval '1 day'`)).orWhere('revoked_at', '<', trx.raw(`now() - interval '1 day'`)))
      .delete();
  });
}

/** The session if it is neither revoked nor expired; notes that it was seen. */
export async function findLiveSession(idHash: string, conn: Conn = getDb()): Promise<SessionRow | undefined> {
  const row = await conn<SessionRow>('sessions')
    .where({ id_hash: idHash })
    .whereNull('revoked_at')
    .andWhere('expires_at', '>', conn.fn.now())
    .first();
  if (row && Date.now() - new Date(row.last_seen_at).getTime() > TOUCH_EVERY_S * 1000) {
    await conn('sessions').where({ id_hash: idHash }).update({ last_seen_at: conn.fn.now() });
  }
  return row;
}

export async function revokeSession(idHash: string, conn: Conn = getDb()): Promise<void> {
  await conn('sessions').where({ id_hash: idHash }).whereNull('revoked_at').update({ revoked_at: conn.fn.now() });
}

/** Ends every live session of the user, except `keepIdHash` when given (the one that changed the password). */
export async function revokeUserSessions(userId: string, keepIdHash?: string, conn: Conn = getDb()): Promise<number> {
  const q = conn('sessions').where({ user_id: userId }).whereNull('revoked_at');
  if (keepIdHash) q.whereNot({ id_hash: keepIdHash });
  return q.update({ revoked_at: conn.fn.now() });
}
