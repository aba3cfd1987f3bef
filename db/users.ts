import { ConflictError } from '@/lib/errors';
import { appendAudit } from './audit';
import { getDb } from './knex';
import type { UnitSystem } from '@/lib/domain';
import type { Conn, PublicUser, UserRow } from './types';

const PUBLIC_COLUMNS = ['id', 'email', 'display_name', 'unit_system', 'must_change_password', 'created_at', 'updated_at'];

export async function findUserByEmail(email: string, conn: Conn = getDb()): Promise<UserRow | undefined> {
  return conn<UserRow>('users').whereRaw('lower(email) = lower(?)', [email]).first();
}

export async function findUserById(id: string, conn: Conn = getDb()): Promise<UserRow | undefined> {
  return conn<UserRow>('users').where({ id }).first();
}

export async function insertUser(
  conn: Conn,
  input: { email: string; passwordHash: string; displayName: string; mustChangePassword?: boolean },
): Promise<PublicUser> {
  try {
    const [row] = await conn('users')
      .insert({
        email: input.email.toLowerCase(),
        password_hash: input.passwordHash,
        display_name: input.displayName,
        must_change_password: input.mustChangePassword ?? false,
      })
      .returning(PUBLIC_COLUMNS);
    return row as PublicUser;
  } catch (error) {
    // Two sign-ups racing for one address: the unique index decides, and the loser hears why.
    if ((error as { code?: string }).code === '23505') {
      throw new ConflictError('email', 'An account with this e-mail exists already.');
    }
    throw error;
  }
}

export interface ProfileChange {
  displayName: string;
  unitSystem: UnitSystem;
}

export async function updateProfile(
  userId: string,
  organisationId: string,
  change: ProfileChange,
  conn: Conn = getDb(),
): Promise<PublicUser> {
  return conn.transaction(async (trx) => {
    const before = await trx('users').where({ id: userId }).first(PUBLIC_COLUMNS).forNoKeyUpdate();
    const [after] = await trx('users')
      .where({ id: userId })
      .update({ display_name: change.displayName, unit_system: change.unitSystem, updated_at: trx.fn.now() })
      .returning(PUBLIC_COLUMNS);
    await appendAudit(trx, {
      organisationId,
      actorUserId: userId,
      action: 'user.profile_updated',
      entityType: 'user',
      entityId: userId,
      before: { display_name: before.display_name, unit_system: before.unit_system },
      after: { display_name: after.display_name, unit_system: after.unit_system },
    });
    return after as PublicUser;
  });
}

export async function updatePasswordHash(
  userId: string,
  organisationId: string,
  passwordHash: string,
  conn: Conn = getDb(),
): Promise<void> {
  await conn.transaction(async (trx) => {
    await trx('users')
      .where({ id: userId })
      .update({ password_hash: passwordHash, must_change_password: false, updated_at: trx.fn.now() });
    // The hash itself never enters the audit log.
    await appendAudit(trx, {
      organisationId,
      actorUserId: userId,
      action: 'user.password_changed',
      entityType: 'user',
      entityId: userId,
    });
  });
}
