import { getDb } from './knex';
import type { AuditRow, Conn } from './types';

export interface AuditEntry {
  organisationId: string | null;
  actorUserId: string | null;
  action: string;
  entityType: string;
  entityId: string | null;
  before?: unknown;
  after?: unknown;
}

export async function appendAudit(conn: Conn, entry: AuditEntry): Promise<void> {
  await conn('audit_log').insert({
    organisation_id: entry.organisationId,
    actor_user_id: entry.actorUserId,
    action: entry.action,
    entity_type: entry.entityType,
    entity_id: entry.entityId,
    before: entry.before === undefined ? null : JSON.stringify(entry.before),
    after: entry.after === undefined ? null : JSON.stringify(entry.after),
  });
}

export async function listAudit(organisationId: string, limit = 100, conn: Conn = getDb()): Promise<AuditRow[]> {
  return conn<AuditRow>('audit_log')
    .where({ organisation_id: organisationId })
    .orderBy('id', 'desc')
    .limit(limit);
}
