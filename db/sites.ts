import { isUuid } from '@/lib/domain';
import { NotFoundError, ConflictError } from '@/lib/errors';
import { appendAudit } from './audit';
import { recomputeItems } from './items';
import type { ResultSource } from './results';
import { getDb } from './knex';
import { lockItems, lockOrganisation, lockSite, lockSiteLevels } from './locks';
import type { Conn, SiteFields, SiteRow } from './types';

export interface SiteListing extends SiteRow {
  level_count: number;
  line_count: number;
  item_count: number;
  max_energy_j: number | null;
  /** Register lines per consequence level id; lines without a result are under "none". */
  by_consequence: Record<string, number>;
}

function duplicateName(error: unknown, name: string): never {
  if ((error as { code?: string }).code === '23505') throw new ConflictError('name', `A site named "${name}" already exists.`);
  throw error;
}

const SITE_FIELDS = ['name', 'kind', 'location', 'surface', 'water_depth_m', 'altitude_m', 'design_wind_m_s', 'current_m_s', 'notes'] as const;
/** The site fields that change a fall; the rest are descriptions or defaults for new levels. */
const PHYSICS_FIELDS = ['altitude_m', 'design_wind_m_s', 'current_m_s'] as const;

export function siteColumns(input: SiteFields) {
  return {
    name: input.name,
    kind: input.kind,
    location: input.location,
    surface: input.surface,
    water_depth_m: input.water_depth,
    altitude_m: input.altitude,
    design_wind_m_s: input.design_wind,
    current_m_s: input.current,
    notes: input.notes,
  };
}

function pick(row: Partial<SiteRow>) {
  return Object.fromEntries(SITE_FIELDS.map((k) => [k, row[k]]));
}

export async function listSites(organisationId: string, conn: Conn = getDb()): Promise<SiteListing[]> {
  const [sites, levels, items] = await Promise.all([
    conn<SiteRow>('sites').where({ organisation_id: organisationId }).orderByRaw('lower(name)'),
    conn('site_levels').where({ organisation_id: organisationId }).groupBy('site_id').select('site_id').count<{ site_id: string; count: string }[]>('* as count'),
    conn('items')
      .where({ organisation_id: organisationId })
      .groupBy('site_id', 'consequence_level_id')
      .select('site_id', 'consequence_level_id')
      .count('* as lines')
      .sum('quantity as quantity')
      .max('effective_energy_j as max_energy'),
  ]);
  const levelCount = new Map(levels.map((l) => [l.site_id, Number(l.count)]));
  return sites.map((s) => {
    const mine = (items as { site_id: string; consequence_level_id: string | null; lines: string; quantity: string; max_energy: number | null }[]).filter(
      (r) => r.site_id === s.id,
    );
    const energies = mine.map((r) => r.max_energy).filter((e): e is number => e !== null);
    return {
      ...s,
      level_count: levelCount.get(s.id) ?? 0,
      line_count: mine.reduce((n, r) => n + Number(r.lines), 0),
      item_count: mine.reduce((n, r) => n + Number(r.quantity), 0),
      max_energy_j: energies.length ? Math.max(...energies) : null,
      by_consequence: Object.fromEntries(mine.map((r) => [r.consequence_level_id ?? 'none', Number(r.lines)])),
    };
  });
}

export async function findSite(organisationId: string, siteId: string, conn: Conn = getDb()): Promise<SiteRow | undefined> {
  if (!isUuid(siteId)) return undefined;
  return conn<SiteRow>('sites').where({ id: siteId, organisation_id: organisationId }).first();
}

export async function createSite(organisationId: string, actorUserId: string, input: SiteFields, conn: Conn = getDb()): Promise<SiteRow> {
  return conn.transaction(async (trx) => {
    await lockOrganisation(trx, organisationId, 'share');
    const [site] = await trx<SiteRow>('sites')
      .insert({ ...siteColumns(input), organisation_id: organisationId })
      .returning('*')
      .catch((e) => duplicateName(e, input.name));
    await appendAudit(trx, { organisationId, actorUserId, action: 'site.created', entityType: 'site', entityId: site.id, after: pick(site) });
    return site;
  });
}

/** Changing the site's altitude, design wind or current recomputes every item of the site in the same transaction. */
export async function updateSite(
  organisationId: string,
  actorUserId: string,
  siteId: string,
  input: SiteFields,
  resultFor: ResultSource,
  conn: Conn = getDb(),
): Promise<{ site: SiteRow; recomputed: number }> {
  return conn.transaction(async (trx) => {
    await lockOrganisation(trx, organisationId, 'share');
    const before = await lockSite(trx, organisationId, siteId, 'change');
    if (!before) throw new NotFoundError('No such site');
    const [site] = await trx<SiteRow>('sites')
      .where({ id: siteId })
      .update({ ...siteColumns(input), updated_at: trx.fn.now() })
      .returning('*')
      .catch((e) => duplicateName(e, input.name));
    const physicsChanged = PHYSICS_FIELDS.some((k) => before[k] !== site[k]);
    const recomputed = physicsChanged ? await recomputeItems(trx, organisationId, { siteId }, resultFor) : 0;
    await appendAudit(trx, {
      organisationId,
      actorUserId,
      action: 'site.updated',
      entityType: 'site',
      entityId: siteId,
      before: pick(before),
      after: { ...pick(site), recomputed_items: recomputed },
    });
    return { site, recomputed };
  });
}

export async function deleteSite(organisationId: string, actorUserId: string, siteId: string, conn: Conn = getDb()): Promise<void> {
  await conn.transaction(async (trx) => {
    await lockOrganisation(trx, organisationId, 'share');
    const before = await lockSite(trx, organisationId, siteId, 'delete');
    if (!before) throw new NotFoundError('No such site');
    await lockSiteLevels(trx, organisationId, siteId, 'delete');
    const lines = (await lockItems(trx, organisationId, { siteId })).length;
    await trx('items').where({ site_id: siteId }).delete();
    await trx('site_levels').where({ site_id: siteId }).delete();
    await trx('sites').where({ id: siteId }).delete();
    await appendAudit(trx, {
      organisationId,
      actorUserId,
      action: 'site.deleted',
      entityType: 'site',
      entityId: siteId,
      before: { ...pick(before), items: lines },
    });
  });
}
