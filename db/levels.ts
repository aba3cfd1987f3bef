import { ConflictError, NotFoundError } from '@/lib/errors';
import { isUuid } from '@/lib/domain';
import { appendAudit } from './audit';
import { recomputeItems } from './items';
import type { ResultSource } from './results';
import { getDb } from './knex';
import { lockLevel, lockOrganisation, lockSite, siteIdOf, type LockMode } from './locks';
import type { Conn, LevelFields, LevelRow } from './types';

export interface LevelListing extends LevelRow {
  line_count: number;
}

function duplicateName(error: unknown, name: string): never {
  if ((error as { code?: string }).code === '23505') throw new ConflictError('name', `This site already has a level named "${name}".`);
  throw error;
}

export function levelColumns(input: LevelFields) {
  return { name: input.name, floor_height_m: input.floor_height, surface: input.surface, water_depth_m: input.water_depth, notes: input.notes };
}

const pick = ({ name, floor_height_m, surface, water_depth_m, notes }: Partial<LevelRow>) => ({ name, floor_height_m, surface, water_depth_m, notes });

/** Locks the organisation, the level's site and then the level, in the order every register write takes them. */
async function lockLevelWithSite(trx: Conn, organisationId: string, levelId: string, mode: LockMode): Promise<LevelRow> {
  await lockOrganisation(trx, organisationId, 'share');
  const siteId = await siteIdOf(trx, 'site_levels', organisationId, levelId);
  const site = siteId ? await lockSite(trx, organisationId, siteId, 'share') : undefined;
  const level = site ? await lockLevel(trx, organisationId, site.id, levelId, mode) : undefined;
  if (!level) throw new NotFoundError('No such level');
  return level;
}

/** Highest first, the way a survey walks a structure from the top down. */
export async function listLevels(organisationId: string, siteId: string, conn: Conn = getDb()): Promise<LevelListing[]> {
  const rows: (LevelRow & { line_count: string })[] = await conn('site_levels as l')
    .leftJoin('items as i', 'i.level_id', 'l.id')
    .where({ 'l.site_id': siteId, 'l.organisation_id': organisationId })
    .groupBy('l.id')
    .orderBy([{ column: 'l.floor_height_m', order: 'desc' }, { column: 'l.name' }])
    .select('l.*')
    .count('i.id as line_count');
  return rows.map((r) => ({ ...r, line_count: Number(r.line_count) }));
}

export async function findLevel(organisationId: string, siteId: string, levelId: string, conn: Conn = getDb()): Promise<LevelRow | undefined> {
  if (!isUuid(levelId)) return undefined;
  return conn<LevelRow>('site_levels').where({ id: levelId, site_id: siteId, organisation_id: organisationId }).first();
}

export async function createLevel(organisationId: string, actorUserId: string, siteId: string, input: LevelFields, conn: Conn = getDb()): Promise<LevelRow> {
  return conn.transaction(async (trx) => {
    await lockOrganisation(trx, organisationId, 'share');
    const site = await lockSite(trx, organisationId, siteId, 'share');
    if (!site) throw new NotFoundError('No such site');
    const [level] = await trx<LevelRow>('site_levels')
      .insert({ ...levelColumns(input), site_id: siteId, organisation_id: organisationId })
      .returning('*')
      .catch((e) => duplicateName(e, input.name));
    await appendAudit(trx, { organisationId, actorUserId, action: 'level.created', entityType: 'level', entityId: level.id, after: { site_id: siteId, ...pick(level) } });
    return level;
  });
}

/** A changed floor height or surface below changes every fall from the level: they are recomputed before commit. */
export async function updateLevel(
  organisationId: string,
  actorUserId: string,
  levelId: string,
  input: LevelFields,
  resultFor: ResultSource,
  conn: Conn = getDb(),
): Promise<{ level: LevelRow; recomputed: number }> {
  return conn.transaction(async (trx) => {
    const before = await lockLevelWithSite(trx, organisationId, levelId, 'change');
    const [level] = await trx<LevelRow>('site_levels')
      .where({ id: levelId })
      .update({ ...levelColumns(input), updated_at: trx.fn.now() })
      .returning('*')
      .catch((e) => duplicateName(e, input.name));
    const changed = before.floor_height_m !== level.floor_height_m || before.surface !== level.surface || before.water_depth_m !== level.water_depth_m;
    const recomputed = changed ? await recomputeItems(trx, organisationId, { levelId }, resultFor) : 0;
    await appendAudit(trx, {
      organisationId,
      actorUserId,
      action: 'level.updated',
      entityType: 'level',
      entityId: levelId,
      before: pick(before),
      after: { ...pick(level), recomputed_items: recomputed },
    });
    return { level, recomputed };
  });
}

/** Only an empty level may go: deleting one with items would silently drop them from the register. */
export async function deleteLevel(organisationId: string, actorUserId: string, levelId: string, conn: Conn = getDb()): Promise<void> {
  await conn.transaction(async (trx) => {
    const before = await lockLevelWithSite(trx, organisationId, levelId, 'delete');
    const used = await trx('items').where({ level_id: levelId }).count<{ count: string }[]>('* as count');
    if (Number(used[0].count) > 0) {
      throw new ConflictError('level', `Level "${before.name}" still has ${used[0].count} item(s): move or delete them first.`);
    }
    await trx('site_levels').where({ id: levelId }).delete();
    await appendAudit(trx, { organisationId, actorUserId, action: 'level.deleted', entityType: 'level', entityId: levelId, before: { site_id: before.site_id, ...pick(before) } });
  });
}
