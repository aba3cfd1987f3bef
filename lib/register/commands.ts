import { replaceLadder as writeLadder } from '@/db/consequence-levels';
import {
  createItem as insertItem,
  findItem,
  importItems as insertItems,
  itemSettings,
  updateItem as writeItem,
} from '@/db/items';
import { findLevel, levelColumns, listLevels, updateLevel as writeLevel } from '@/db/levels';
import type { FallSetting, ItemPhysics, ResultSource } from '@/db/results';
import { findSite, siteColumns, updateSite as writeSite } from '@/db/sites';
import type { ItemRow, LevelRow, SiteRow } from '@/db/types';
import type { LadderInput } from '@/lib/validation/consequence-level';
import type { ItemInput } from '@/lib/validation/item';
import type { LevelInput } from '@/lib/validation/level';
import type { SiteInput } from '@/lib/validation/site';
import { classified, inputsHash, itemDropCase, solveItem, type SolvedFall } from './compute';

/**
 * The register's writes that change stored falls. Each solves the falls first, from rows read without locks, and
 * then writes in one short transaction in the lock order (organisation, site, level, items; db/locks.ts). Inside
 * it the write functions read the locked rows again and take each result from `presolved`: a lookup by the hash of
 * the fall's exact inputs, so a fall whose rows a concurrent writer changed meanwhile is solved there, from the rows
 * that are stored with it. That is rare and one item at a time; the thousands of falls of an import or a site
 * change are never solved under a lock.
 */
export function presolved(pairs: Iterable<readonly [ItemPhysics, FallSetting]>): ResultSource {
  const solved = new Map<string, SolvedFall>();
  for (const [item, setting] of pairs) {
    const fall = solveItem(item, setting);
    solved.set(fall.inputs_hash!, fall);
  }
  return (item, setting, ladder) => classified(solved.get(inputsHash(itemDropCase(item, setting))) ?? solveItem(item, setting), ladder);
}

const conditions = (site: Pick<SiteRow, 'altitude_m' | 'design_wind_m_s' | 'current_m_s'>) => ({
  altitude_m: site.altitude_m,
  design_wind_m_s: site.design_wind_m_s,
  current_m_s: site.current_m_s,
});

/** The setting of an item written to this level of this site, as the rows stand now; undefined if either is gone. */
async function settingOf(organisationId: string, siteId: string, levelId: string): Promise<FallSetting | undefined> {
  const [site, level] = await Promise.all([findSite(organisationId, siteId), findLevel(organisationId, siteId, levelId)]);
  return site && level ? { ...level, ...conditions(site) } : undefined;
}

const solvedFor = (input: ItemInput, setting: FallSetting | undefined) => presolved(setting ? [[input, setting]] : []);

export async function createItem(organisationId: string, actorUserId: string, siteId: string, input: ItemInput): Promise<ItemRow> {
  const setting = await settingOf(organisationId, siteId, input.level_id);
  return insertItem(organisationId, actorUserId, siteId, input, solvedFor(input, setting));
}

export async function updateItem(organisationId: string, actorUserId: string, itemId: string, input: ItemInput): Promise<ItemRow> {
  const item = await findItem(organisationId, itemId);
  const setting = item ? await settingOf(organisationId, item.site_id, input.level_id) : undefined;
  return writeItem(organisationId, actorUserId, itemId, input, solvedFor(input, setting));
}

/** A checked CSV's rows, all of them or none; a level deleted meanwhile fails the whole import (db/items.ts). */
export async function importItems(
  organisationId: string,
  actorUserId: string,
  siteId: string,
  inputs: { line: number; item: ItemInput }[],
  meta: { file_name: string; mode: string; skipped_rows: number },
): Promise<number> {
  const [site, levels] = await Promise.all([findSite(organisationId, siteId), listLevels(organisationId, siteId)]);
  const byId = new Map(levels.map((l) => [l.id, l]));
  const pairs: [ItemPhysics, FallSetting][] = [];
  for (const { item } of inputs) {
    const level = byId.get(item.level_id);
    if (site && level) pairs.push([item, { ...level, ...conditions(site) }]);
  }
  return insertItems(organisationId, actorUserId, siteId, inputs, meta, presolved(pairs));
}

/** New site conditions: every item of the site is solved under them before the site is locked. */
export async function updateSite(organisationId: string, actorUserId: string, siteId: string, input: SiteInput): Promise<{ site: SiteRow; recomputed: number }> {
  const next = conditions(siteColumns(input));
  const rows = await itemSettings(organisationId, { siteId });
  return writeSite(organisationId, actorUserId, siteId, input, presolved(rows.map((r) => [r, { ...r, ...next }] as const)));
}

/** A changed level: its items are solved from the new floor height and surface before anything is locked. */
export async function updateLevel(organisationId: string, actorUserId: string, levelId: string, input: LevelInput): Promise<{ level: LevelRow; recomputed: number }> {
  const { floor_height_m, surface, water_depth_m } = levelColumns(input);
  const rows = await itemSettings(organisationId, { levelId });
  return writeLevel(organisationId, actorUserId, levelId, input, presolved(rows.map((r) => [r, { ...r, floor_height_m, surface, water_depth_m }] as const)));
}

/** A new ladder changes no fall: every item is classified again by the one rule, classify() in lib/domain. */
export async function replaceLadder(organisationId: string, actorUserId: string, input: LadderInput) {
  return writeLadder(organisationId, actorUserId, input);
}
