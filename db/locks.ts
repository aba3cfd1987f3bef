import type { Knex } from 'knex';
import type { Conn, LevelRow, SiteRow } from './types';

/**
 * The one lock order of every register write (DEVELOPERS.md, "Lock order"). Writers may wait for each other but
 * never in a cycle, which PostgreSQL would break by failing one of them with SQLSTATE 40P01:
 *
 *   1. the organisation: `share` by every register write, `exclusive` by a ladder replacement (it rewrites every
 *      item of the organisation, and the new item rows of other writers would point at the levels it deletes);
 *   2. the site: `share` by writers of its levels and items, `change` by a change of its conditions, `delete`;
 *   3. its levels, in id order: `share` by writers of their items, `change` by a change of the level, `delete`;
 *   4. items, in id order, for update.
 *
 * Rows are locked before they are read for a computation, so a stored result is always computed from the rows
 * that are stored with it.
 */
export type LockMode = 'share' | 'change' | 'delete';

function withLock<Q extends Knex.QueryBuilder>(query: Q, mode: LockMode): Q {
  // NO KEY UPDATE, not UPDATE, for a change: foreign-key checks of new rows (KEY SHARE) need not wait for it.
  if (mode === 'share') return query.forShare() as Q;
  if (mode === 'change') return query.forNoKeyUpdate() as Q;
  return query.forUpdate() as Q;
}

/**
 * KEY SHARE is what the foreign-key check of every audit entry takes anyway; taking it first keeps the
 * organisation at the top of the order. `exclusive` waits for every register write of the organisation.
 */
export async function lockOrganisation(trx: Conn, organisationId: string, mode: 'share' | 'exclusive'): Promise<void> {
  const strength = mode === 'share' ? 'FOR KEY SHARE' : 'FOR UPDATE';
  await trx.raw(`SELECT id FROM organisations WHERE id = ? ${strength}`, [organisationId]);
}

export async function lockSite(trx: Conn, organisationId: string, siteId: string, mode: LockMode): Promise<SiteRow | undefined> {
  return withLock(trx<SiteRow>('sites').where({ id: siteId, organisation_id: organisationId }), mode).first();
}

/** The site of a level or an item, read without a lock so that the site can be locked before it. */
export async function siteIdOf(trx: Conn, table: 'site_levels' | 'items', organisationId: string, id: string): Promise<string | undefined> {
  const row: { site_id: string } | undefined = await trx(table).where({ id, organisation_id: organisationId }).first('site_id');
  return row?.site_id;
}

/** A level of the site, locked after the site; undefined when it is not one of the site's levels. */
export async function lockLevel(trx: Conn, organisationId: string, siteId: string, levelId: string, mode: LockMode): Promise<LevelRow | undefined> {
  return withLock(trx<LevelRow>('site_levels').where({ id: levelId, site_id: siteId, organisation_id: organisationId }), mode).first();
}

export async function lockSiteLevels(trx: Conn, organisationId: string, siteId: string, mode: LockMode): Promise<LevelRow[]> {
  return withLock(trx<LevelRow>('site_levels').where({ site_id: siteId, organisation_id: organisationId }).orderBy('id'), mode);
}

export type ItemScope = { siteId: string } | { levelId: string } | { itemId: string } | { organisation: true };

/**
 * Locks the items in id order and returns their ids. In READ COMMITTED a row changed meanwhile is re-checked
 * against the scope once its lock is granted, so an item just moved off a level is not returned for that level.
 */
export async function lockItems(trx: Conn, organisationId: string, scope: ItemScope): Promise<string[]> {
  const query = trx('items').where({ organisation_id: organisationId }).orderBy('id').forUpdate().select('id');
  if ('siteId' in scope) query.where({ site_id: scope.siteId });
  else if ('levelId' in scope) query.where({ level_id: scope.levelId });
  else if ('itemId' in scope) query.where({ id: scope.itemId });
  const rows: { id: string }[] = await query;
  return rows.map((r) => r.id);
}
