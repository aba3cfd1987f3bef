import { appendAudit } from './audit';
import { insertDefaultLadder } from './consequence-levels';
import { getDb } from './knex';
import type { Conn, OrganisationRow, PublicUser } from './types';
import { insertUser } from './users';

export async function findOrganisation(id: string, conn: Conn = getDb()): Promise<OrganisationRow | undefined> {
  return conn<OrganisationRow>('organisations').where({ id }).first();
}

export async function findOrganisationByName(name: string, conn: Conn = getDb()): Promise<OrganisationRow | undefined> {
  return conn<OrganisationRow>('organisations').where({ name }).first();
}

/** Sign-up: the organisation, its first user and that user's admin membership land together or not at all. */
export async function createOrganisationWithAdmin(
  input: { organisationName: string; email: string; passwordHash: string; displayName: string },
  conn: Conn = getDb(),
): Promise<{ organisation: OrganisationRow; user: PublicUser }> {
  return conn.transaction(async (trx) => {
    const [organisation] = await trx<OrganisationRow>('organisations')
      .insert({ name: input.organisationName })
      .returning('*');
    const user = await insertUser(trx, {
      email: input.email,
      passwordHash: input.passwordHash,
      displayName: input.displayName,
    });
    await trx('memberships').insert({ organisation_id: organisation.id, user_id: user.id, role: 'admin' });
    await insertDefaultLadder(trx, organisation.id);
    await appendAudit(trx, {
      organisationId: organisation.id,
      actorUserId: user.id,
      action: 'organisation.created',
      entityType: 'organisation',
      entityId: organisation.id,
      after: { name: organisation.name, admin_email: user.email },
    });
    return { organisation, user };
  });
}

export async function renameOrganisation(
  id: string,
  name: string,
  actorUserId: string,
  conn: Conn = getDb(),
): Promise<OrganisationRow> {
  return conn.transaction(async (trx) => {
    const before = await trx<OrganisationRow>('organisations').where({ id }).first().forNoKeyUpdate();
    const [after] = await trx<OrganisationRow>('organisations')
      .where({ id })
      .update({ name, updated_at: trx.fn.now() })
      .returning('*');
    await appendAudit(trx, {
      organisationId: id,
      actorUserId,
      action: 'organisation.renamed',
      entityType: 'organisation',
      entityId: id,
      before: { name: before?.name },
      after: { name: after.name },
    });
    return after;
  });
}
