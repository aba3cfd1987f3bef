import { ConflictError, NotFoundError } from '@/lib/errors';
import { appendAudit } from './audit';
import { getDb } from './knex';
import type { Role } from '@/lib/domain';
import type { Conn, Member, PublicUser } from './types';
import { findUserByEmail, insertUser } from './users';

export interface MemberListing {
  userId: string;
  email: string;
  displayName: string;
  role: Role;
  mustChangePassword: boolean;
  joinedAt: Date;
}

function memberQuery(conn: Conn) {
  return conn('memberships as m')
    .join('users as u', 'u.id', 'm.user_id')
    .join('organisations as o', 'o.id', 'm.organisation_id')
    .select(
      'u.id as userId',
      'u.email as email',
      'u.display_name as displayName',
      'u.unit_system as unitSystem',
      'u.must_change_password as mustChangePassword',
      'o.id as organisationId',
      'o.name as organisationName',
      'm.role as role',
    );
}

export async function findMember(userId: string, organisationId: string, conn: Conn = getDb()): Promise<Member | undefined> {
  return memberQuery(conn).where({ 'm.user_id': userId, 'm.organisation_id': organisationId }).first();
}

/** The organisation a user lands in after sign-in: the one they joined first. */
export async function firstMembership(userId: string, conn: Conn = getDb()): Promise<Member | undefined> {
  return memberQuery(conn).where({ 'm.user_id': userId }).orderBy('m.created_at', 'asc').first();
}

export async function listMembers(organisationId: string, conn: Conn = getDb()): Promise<MemberListing[]> {
  return conn('memberships as m')
    .join('users as u', 'u.id', 'm.user_id')
    .where({ 'm.organisation_id': organisationId })
    .orderBy([{ column: 'u.display_name' }, { column: 'u.email' }])
    .select(
      'u.id as userId',
      'u.email as email',
      'u.display_name as displayName',
      'm.role as role',
      'u.must_change_password as mustChangePassword',
      'm.created_at as joinedAt',
    );
}

async function lockAdmins(trx: Conn, organisationId: string): Promise<string[]> {
  const rows = await trx('memberships')
    .where({ organisation_id: organisationId, role: 'admin' })
    .forUpdate()
    .select('user_id');
  return rows.map((r: { user_id: string }) => r.user_id);
}

export interface InviteInput {
  organisationId: string;
  actorUserId: string;
  email: string;
  displayName: string;
  role: Role;
  /** Hash of the one-time password; used only when the e-mail has no account yet. */
  temporaryPasswordHash: string;
}

/** Adds a member; an e-mail that already has an account elsewhere joins with its own password. */
export async function addMember(
  input: InviteInput,
  conn: Conn = getDb(),
): Promise<{ user: PublicUser | { id: string; email: string }; createdAccount: boolean }> {
  return conn.transaction(async (trx) => {
    const existing = await findUserByEmail(input.email, trx);
    let user: PublicUser | { id: string; email: string };
    let createdAccount = false;
    if (existing) {
      const already = await trx('memberships')
        .where({ organisation_id: input.organisationId, user_id: existing.id })
        .first();
      if (already) throw new ConflictError('email', 'This person is already a member of the organisation.');
      user = { id: existing.id, email: existing.email };
    } else {
      user = await insertUser(trx, {
        email: input.email,
        passwordHash: input.temporaryPasswordHash,
        displayName: input.displayName,
        mustChangePassword: true,
      });
      createdAccount = true;
    }
    await trx('memberships').insert({ organisation_id: input.organisationId, user_id: user.id, role: input.role });
    await appendAudit(trx, {
      organisationId: input.organisationId,
      actorUserId: input.actorUserId,
      action: 'member.invited',
      entityType: 'membership',
      entityId: user.id,
      after: { email: user.email, display_name: input.displayName, role: input.role, new_account: createdAccount },
    });
    return { user, createdAccount };
  });
}

/** The organisation's admins and then the member, locked in that order: the last admin must always stay one. */
async function lockMembership(trx: Conn, organisationId: string, userId: string): Promise<{ admins: string[]; current: { id: string; role: Role } }> {
  const admins = await lockAdmins(trx, organisationId);
  const current = await trx('memberships').where({ organisation_id: organisationId, user_id: userId }).first().forUpdate();
  if (!current) throw new NotFoundError('No such member');
  return { admins, current };
}

export async function changeRole(
  input: { organisationId: string; actorUserId: string; userId: string; role: Role },
  conn: Conn = getDb(),
): Promise<void> {
  await conn.transaction(async (trx) => {
    const { admins, current } = await lockMembership(trx, input.organisationId, input.userId);
    if (current.role === input.role) return;
    if (current.role === 'admin' && admins.length <= 1) {
      throw new ConflictError('role', 'The last admin cannot be demoted: make another member admin first.');
    }
    await trx('memberships')
      .where({ id: current.id })
      .update({ role: input.role, updated_at: trx.fn.now() });
    await appendAudit(trx, {
      organisationId: input.organisationId,
      actorUserId: input.actorUserId,
      action: 'member.role_changed',
      entityType: 'membership',
      entityId: input.userId,
      before: { role: current.role },
      after: { role: input.role },
    });
  });
}

export async function removeMember(
  input: { organisationId: string; actorUserId: string; userId: string },
  conn: Conn = getDb(),
): Promise<void> {
  await conn.transaction(async (trx) => {
    const { admins, current } = await lockMembership(trx, input.organisationId, input.userId);
    if (current.role === 'admin' && admins.length <= 1) {
      throw new ConflictError('userId', 'The last admin cannot be removed: make another member admin first.');
    }
    await trx('memberships').where({ id: current.id }).delete();
    await appendAudit(trx, {
      organisationId: input.organisationId,
      actorUserId: input.actorUserId,
      action: 'member.removed',
      entityType: 'membership',
      entityId: input.userId,
      before: { role: current.role },
    });
  });
}
