import { isUuid, type RegisterRow } from '@/lib/domain';
import { ConflictError, NotFoundError } from '@/lib/errors';
import { appendAudit } from './audit';
import { listLadder } from './consequence-levels';
import { getDb } from './knex';
import { lockItems, lockLevel, lockOrganisation, lockSite, lockSiteLevels, siteIdOf } from './locks';
import { fallHeight, type FallSetting, type ItemPhysics, type ResultColumns, type ResultSource } from './results';
import type { AuditRow, Conn, ItemFields, ItemRow, LevelRow, RegisterExportRow, SiteRow } from './types';

/** The stored result's columns, written together whenever an item's fall is computed. */
export const RESULT_COLUMNS: readonly (keyof ResultColumns)[] = [
  'fall_time_s',
  'impact_speed_m_s',
  'impact_energy_j',
  'effective_energy_j',
  'drift_m',
  'sinks',
  'consequence_level_id',
  'model_version',
  'inputs_hash',
  'compute_error',
];
const RESULT_TYPES = ['float8', 'float8', 'float8', 'float8', 'float8', 'bool', 'uuid', 'text', 'text', 'text'];

/** The input fields an audit entry records: what a person changed, not what the computer derived. */
function inputFields(item: Partial<ItemRow> | ItemFields) {
  const { tag, description, category, quantity, mass_kg, shape, dimensions_m, cd, area_m2, volume_m3, level_id, height_m, securing, last_inspected, notes } =
    item as ItemRow;
  return { tag, description, category, quantity, mass_kg, shape, dimensions_m, cd, area_m2, volume_m3, level_id, height_m, securing, last_inspected, notes };
}

function duplicateTag(error: unknown, tag?: string): never {
  if ((error as { code?: string }).code === '23505' && String((error as { constraint?: string }).constraint).startsWith('items_site_tag')) {
    throw new ConflictError('tag', tag ? `Tag "${tag}" is already in this site's register.` : 'A tag is already in this site’s register.');
  }
  throw error;
}

export type SettingRow = ItemPhysics & FallSetting & { id: string };

function settingQuery(trx: Conn, organisationId: string) {
  return trx('items as i')
    .join('site_levels as l', 'l.id', 'i.level_id')
    .join('sites as s', 's.id', 'i.site_id')
    .where('i.organisation_id', organisationId)
    .select(
      'i.id',
      'i.mass_kg',
      'i.shape',
      'i.dimensions_m',
      'i.cd',
      'i.area_m2',
      'i.volume_m3',
      'i.height_m',
      'l.floor_height_m',
      'l.surface',
      'l.water_depth_m',
      's.altitude_m',
      's.design_wind_m_s',
      's.current_m_s',
    );
}

/**
 * The items of a site or a level with what their falls depend on, read without locks: what a caller solves before
 * it writes. Pass `setting` to read them as they will be under changed site or level conditions.
 */
export async function itemSettings(
  organisationId: string,
  scope: { siteId: string } | { levelId: string },
  conn: Conn = getDb(),
): Promise<SettingRow[]> {
  const query = settingQuery(conn, organisationId);
  return 'siteId' in scope ? query.where('i.site_id', scope.siteId) : query.where('i.level_id', scope.levelId);
}

/** Writes many items' results in one statement per chunk: a site with thousands of items recomputes in one go. */
export async function writeResults(trx: Conn, ids: string[], results: ResultColumns[]): Promise<void> {
  const CHUNK = 2000;
  for (let start = 0; start < ids.length; start += CHUNK) {
    const slice = results.slice(start, start + CHUNK);
    const columns = RESULT_COLUMNS.map((c) => slice.map((r) => r[c]));
    const unnest = RESULT_TYPES.map((t) => `?::${t}[]`).join(', ');
    await trx.raw(
      `UPDATE items AS i SET ${RESULT_COLUMNS.map((c) => `${c} = v.${c}`).join(', ')}, computed_at = now()
         FROM unnest(?::uuid[], ${unnest}) AS v(id, ${RESULT_COLUMNS.join(', ')})
        WHERE i.id = v.id`,
      // pg sends each JS array as a PostgreSQL array; null entries stay NULL.
      [ids.slice(start, start + CHUNK), ...columns] as unknown as string[][],
    );
  }
}

/**
 * Rewrites the stored results of the site's or the level's items inside the caller's transaction: whoever changes
 * an input of a fall also rewrites its result before committing, so no stored energy is ever stale. The caller holds
 * the site (and the level) locked for a change; the items are locked here, in id order, before they are read.
 */
export async function recomputeItems(trx: Conn, organisationId: string, scope: { siteId: string } | { levelId: string }, resultFor: ResultSource): Promise<number> {
  const ids = await lockItems(trx, organisationId, scope);
  if (!ids.length) return 0;
  const rows: SettingRow[] = await settingQuery(trx, organisationId).whereRaw('i.id = ANY(?::uuid[])', [ids]);
  const ladder = await listLadder(organisationId, trx);
  await writeResults(
    trx,
    rows.map((r) => r.id),
    rows.map((r) => resultFor(r, r, ladder)),
  );
  return rows.length;
}

/** The level an item is written to, locked after its site, with the site's conditions: what the fall is computed from. */
async function lockedSetting(trx: Conn, organisationId: string, site: SiteRow, levelId: string): Promise<LevelRow & FallSetting> {
  const level = await lockLevel(trx, organisationId, site.id, levelId, 'share');
  if (!level) throw new ConflictError('level_id', 'Level must be one of this site’s levels.', 422);
  return { ...level, altitude_m: site.altitude_m, design_wind_m_s: site.design_wind_m_s, current_m_s: site.current_m_s };
}

/** Locks the organisation and the site of an existing item, in that order; the item itself comes after its level. */
async function lockItemSite(trx: Conn, organisationId: string, itemId: string): Promise<SiteRow> {
  await lockOrganisation(trx, organisationId, 'share');
  const siteId = await siteIdOf(trx, 'items', organisationId, itemId);
  const site = siteId ? await lockSite(trx, organisationId, siteId, 'share') : undefined;
  if (!site) throw new NotFoundError('No such item');
  return site;
}

function toRow(input: ItemFields) {
  return { ...inputFields(input), dimensions_m: JSON.stringify(input.dimensions_m) };
}

export async function createItem(organisationId: string, actorUserId: string, siteId: string, input: ItemFields, resultFor: ResultSource, conn: Conn = getDb()): Promise<ItemRow> {
  return conn.transaction(async (trx) => {
    await lockOrganisation(trx, organisationId, 'share');
    const site = await lockSite(trx, organisationId, siteId, 'share');
    if (!site) throw new NotFoundError('No such site');
    const setting = await lockedSetting(trx, organisationId, site, input.level_id);
    const result = resultFor(input, setting, await listLadder(organisationId, trx));
    const [row] = await trx('items')
      .insert({ ...toRow(input), ...result, computed_at: trx.fn.now(), organisation_id: organisationId, site_id: siteId })
      .returning('*')
      .catch((e) => duplicateTag(e, input.tag));
    await appendAudit(trx, { organisationId, actorUserId, action: 'item.created', entityType: 'item', entityId: row.id, after: inputFields(input) });
    return row;
  });
}

export async function updateItem(organisationId: string, actorUserId: string, itemId: string, input: ItemFields, resultFor: ResultSource, conn: Conn = getDb()): Promise<ItemRow> {
  return conn.transaction(async (trx) => {
    const site = await lockItemSite(trx, organisationId, itemId);
    const setting = await lockedSetting(trx, organisationId, site, input.level_id);
    const before: ItemRow | undefined = await trx('items').where({ id: itemId, organisation_id: organisationId }).forUpdate().first();
    if (!before) throw new NotFoundError('No such item');
    const result = resultFor(input, setting, await listLadder(organisationId, trx));
    const [row] = await trx('items')
      .where({ id: itemId })
      .update({ ...toRow(input), ...result, computed_at: trx.fn.now(), updated_at: trx.fn.now() })
      .returning('*')
      .catch((e) => duplicateTag(e, input.tag));
    await appendAudit(trx, {
      organisationId,
      actorUserId,
      action: 'item.updated',
      entityType: 'item',
      entityId: itemId,
      before: inputFields(before),
      after: inputFields(input),
    });
    return row;
  });
}

export async function deleteItem(organisationId: string, actorUserId: string, itemId: string, conn: Conn = getDb()): Promise<void> {
  await conn.transaction(async (trx) => {
    await lockItemSite(trx, organisationId, itemId);
    const before: ItemRow | undefined = await trx('items').where({ id: itemId, organisation_id: organisationId }).forUpdate().first();
    if (!before) throw new NotFoundError('No such item');
    await trx('items').where({ id: itemId }).delete();
    await appendAudit(trx, { organisationId, actorUserId, action: 'item.deleted', entityType: 'item', entityId: itemId, before: inputFields(before) });
  });
}

/**
 * Adds many items in one transaction: all of them, computed, or none. Used by the CSV import, whose rows were
 * validated against the site's levels beforehand; a level deleted meanwhile fails the whole import.
 */
export async function importItems(
  organisationId: string,
  actorUserId: string,
  siteId: string,
  inputs: { line: number; item: ItemFields }[],
  meta: { file_name: string; mode: string; skipped_rows: number },
  resultFor: ResultSource,
  conn: Conn = getDb(),
): Promise<number> {
  return conn.transaction(async (trx) => {
    await lockOrganisation(trx, organisationId, 'share');
    const site = await lockSite(trx, organisationId, siteId, 'share');
    if (!site) throw new NotFoundError('No such site');
    const levels = await lockSiteLevels(trx, organisationId, siteId, 'share');
    const byId = new Map(levels.map((l) => [l.id, l]));
    const ladder = await listLadder(organisationId, trx);
    const rows = inputs.map(({ line, item: input }) => {
      const level = byId.get(input.level_id);
      if (!level) throw new ConflictError(`line ${line}.level`, 'A level named in the file no longer exists: nothing was imported.', 422);
      const result = resultFor(input, { ...level, altitude_m: site.altitude_m, design_wind_m_s: site.design_wind_m_s, current_m_s: site.current_m_s }, ladder);
      return { ...toRow(input), ...result, computed_at: trx.fn.now(), organisation_id: organisationId, site_id: siteId };
    });
    // Two imports that share tags insert them in the same order, so they queue on the unique index instead of
    // waiting for each other in a cycle.
    const tagKey = (row: { tag: string }) => row.tag.toLowerCase();
    rows.sort((a, b) => (tagKey(a) < tagKey(b) ? -1 : tagKey(a) > tagKey(b) ? 1 : 0));
    const CHUNK = 1000;
    for (let start = 0; start < rows.length; start += CHUNK) {
      await trx('items').insert(rows.slice(start, start + CHUNK)).catch((e) => duplicateTag(e));
    }
    await appendAudit(trx, {
      organisationId,
      actorUserId,
      action: 'items.imported',
      entityType: 'site',
      entityId: siteId,
      after: { imported: rows.length, ...meta },
    });
    return rows.length;
  });
}

export interface ItemDetail extends ItemRow {
  level_name: string;
  floor_height_m: number;
  surface: LevelRow['surface'];
  water_depth_m: number | null;
  site_name: string;
  altitude_m: number;
  design_wind_m_s: number;
  current_m_s: number;
}

export async function findItem(organisationId: string, itemId: string, conn: Conn = getDb()): Promise<ItemDetail | undefined> {
  if (!isUuid(itemId)) return undefined;
  return conn('items as i')
    .join('site_levels as l', 'l.id', 'i.level_id')
    .join('sites as s', 's.id', 'i.site_id')
    .where({ 'i.id': itemId, 'i.organisation_id': organisationId })
    .first(
      'i.*',
      'l.name as level_name',
      'l.floor_height_m',
      'l.surface',
      'l.water_depth_m',
      's.name as site_name',
      's.altitude_m',
      's.design_wind_m_s',
      's.current_m_s',
    );
}

const iso = (d: Date | null) => (d ? d.toISOString() : null);

/** The columns a register line shows; an export also wants the inputs it does not show. */
const LINE_COLUMNS = [
  'id', 'tag', 'description', 'category', 'quantity', 'mass_kg', 'shape', 'level_id', 'height_m', 'securing', 'last_inspected', 'updated_at',
  ...RESULT_COLUMNS,
  'computed_at',
].map((c) => `i.${c}`);

function registerQuery(conn: Conn, organisationId: string, siteId: string, columns: string[] = LINE_COLUMNS) {
  return conn('items as i')
    .join('site_levels as l', 'l.id', 'i.level_id')
    .where({ 'i.site_id': siteId, 'i.organisation_id': organisationId })
    .orderBy([{ column: 'l.floor_height_m', order: 'desc' }, { column: 'i.tag' }])
    .select(...columns, 'l.name as level_name', 'l.floor_height_m');
}

function toRegisterRow(r: ItemRow & { level_name: string; floor_height_m: number }): RegisterRow {
  return {
    id: r.id,
    tag: r.tag,
    description: r.description,
    category: r.category,
    quantity: r.quantity,
    mass_kg: r.mass_kg,
    shape: r.shape,
    level_id: r.level_id,
    level_name: r.level_name,
    height_m: fallHeight(r, r),
    height_overridden: r.height_m !== null,
    securing: r.securing,
    last_inspected: r.last_inspected,
    updated_at: r.updated_at.toISOString(),
    fall_time_s: r.fall_time_s,
    impact_speed_m_s: r.impact_speed_m_s,
    impact_energy_j: r.impact_energy_j,
    effective_energy_j: r.effective_energy_j,
    drift_m: r.drift_m,
    sinks: r.sinks,
    consequence_level_id: r.consequence_level_id,
    model_version: r.model_version,
    inputs_hash: r.inputs_hash,
    computed_at: iso(r.computed_at),
    compute_error: r.compute_error,
  };
}

export async function listRegister(organisationId: string, siteId: string, conn: Conn = getDb()): Promise<RegisterRow[]> {
  const rows = await registerQuery(conn, organisationId, siteId);
  return rows.map(toRegisterRow);
}

export async function listRegisterForExport(organisationId: string, siteId: string, conn: Conn = getDb()): Promise<RegisterExportRow[]> {
  const rows = await registerQuery(conn, organisationId, siteId, ['i.*']);
  return rows.map((r: ItemRow & { level_name: string; floor_height_m: number }) => ({
    ...toRegisterRow(r),
    dimensions_m: r.dimensions_m,
    cd: r.cd,
    area_m2: r.area_m2,
    volume_m3: r.volume_m3,
    notes: r.notes,
    height_override_m: r.height_m,
  }));
}

export async function siteTags(organisationId: string, siteId: string, conn: Conn = getDb()): Promise<string[]> {
  const rows = await conn('items').where({ organisation_id: organisationId, site_id: siteId }).select('tag');
  return rows.map((r: { tag: string }) => r.tag);
}

/**
 * The item's audited changes, newest first, with the changes of its level and site since it was added that
 * recomputed results (the level it is on now; an entry names how many items it recomputed).
 */
export async function itemHistory(
  organisationId: string,
  item: Pick<ItemRow, 'id' | 'level_id' | 'site_id' | 'created_at'>,
  conn: Conn = getDb(),
): Promise<(AuditRow & { actor_name: string | null })[]> {
  return conn('audit_log as a')
    .leftJoin('users as u', 'u.id', 'a.actor_user_id')
    .where('a.organisation_id', organisationId)
    .andWhere((q) =>
      q
        .where({ 'a.entity_type': 'item', 'a.entity_id': item.id })
        .orWhere((r) =>
          r
            .where('a.created_at', '>=', item.created_at)
            .whereRaw(`coalesce((a.after->>'recomputed_items')::int, 0) > 0`)
            .andWhere((e) => e.where({ 'a.entity_type': 'level', 'a.entity_id': item.level_id }).orWhere({ 'a.entity_type': 'site', 'a.entity_id': item.site_id })),
        ),
    )
    .orderBy('a.id', 'desc')
    .limit(50)
    .select('a.*', 'u.display_name as actor_name');
}
