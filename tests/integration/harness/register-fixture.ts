import { getDb } from '@/db/knex';
import { createLevel } from '@/db/levels';
import { createSite } from '@/db/sites';
import { itemSchema } from '@/lib/validation/item';
import { levelSchema } from '@/lib/validation/level';
import { siteSchema } from '@/lib/validation/site';
import type { OrgFixture } from './index';
import { createItem } from '@/lib/register/commands';

export interface RegisterFixture {
  siteId: string;
  levelId: string;
  itemId: string;
}

/** One site with one level holding one item, created by the organisation's admin (invented demo data). */
export async function createRegister(org: OrgFixture, siteName: string): Promise<RegisterFixture> {
  const admin = org.users.admin.id;
  const site = await createSite(org.id, admin, siteSchema('si').parse({ name: siteName, kind: 'building', surface: 'ground', design_wind: 12 }));
  const level = await createLevel(org.id, admin, site.id, levelSchema('si').parse({ name: 'Roof', floor_height: 22, surface: 'ground' }));
  const item = await createItem(
    org.id,
    admin,
    site.id,
    itemSchema('si').parse({
      tag: 'S-1',
      description: 'Spanner',
      category: 'hand_tool',
      mass: 0.45,
      shape: 'long_bar',
      dimensions: { length: 0.3, width: 0.03 },
      level_id: level.id,
      securing: 'tethered',
    }),
  );
  return { siteId: site.id, levelId: level.id, itemId: item.id };
}

const TABLES = ['organisations', 'users', 'memberships', 'audit_log', 'sign_in_attempts', 'consequence_levels', 'sites', 'site_levels', 'items'];

/** Every row of every table the app writes, as one text per table: equal before and after means nothing was written. */
export async function databaseState(): Promise<Record<string, string>> {
  const db = getDb();
  const out: Record<string, string> = {};
  for (const table of TABLES) {
    const { rows } = await db.raw(`SELECT count(*) AS n, md5(coalesce(string_agg(t::text, '|' ORDER BY t::text), '')) AS digest FROM ${table} t`);
    out[table] = `${rows[0].n}:${rows[0].digest}`;
  }
  return out;
}

/** The site form's fields, valid as they stand. */
export const siteFields = { name: 'Quayside Store', kind: 'building', surface: 'ground', design_wind: '15', units: 'si' };
