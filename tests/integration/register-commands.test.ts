import { beforeEach, describe, expect, it, vi } from 'vitest';
import { findItem, itemHistory } from '@/db/items';
import { getDb } from '@/db/knex';
import { createLevel } from '@/db/levels';
import { createSite } from '@/db/sites';
import { listLadder } from '@/db/consequence-levels';
import { computeItem } from '@/lib/register/compute';
import { createItem, importItems, updateLevel, updateSite } from '@/lib/register/commands';
import { itemSchema, type ItemInput } from '@/lib/validation/item';
import { levelSchema } from '@/lib/validation/level';
import { siteSchema } from '@/lib/validation/site';
import { createOrg, resetDatabase, type OrgFixture } from './harness';

/**
 * Issue 11: the register's commands solve falls before they lock anything, and write in one short transaction.
 * Every fall solved is counted, and each write function marks when it runs, so the test sees where each fall was
 * solved: before the write (the rule) or inside it (only for rows a concurrent writer changed meanwhile).
 */
const count = vi.hoisted(() => ({ phase: 'before' as 'before' | 'write', before: 0, write: 0, between: undefined as undefined | (() => Promise<unknown>) }));

vi.mock('@/lib/register/compute', async (importOriginal) => {
  const actual = await importOriginal<typeof import('@/lib/register/compute')>();
  return { ...actual, solveItem: (...args: Parameters<typeof actual.solveItem>) => (count[count.phase]++, actual.solveItem(...args)) };
});

function marked<F extends (...args: never[]) => Promise<unknown>>(write: F): F {
  return (async (...args: Parameters<F>) => {
    await count.between?.();
    count.phase = 'write';
    try {
      return await write(...args);
    } finally {
      count.phase = 'before';
    }
  }) as F;
}
vi.mock('@/db/items', async (importOriginal) => {
  const actual = await importOriginal<typeof import('@/db/items')>();
  return { ...actual, importItems: marked(actual.importItems) };
});
vi.mock('@/db/sites', async (importOriginal) => {
  const actual = await importOriginal<typeof import('@/db/sites')>();
  return { ...actual, updateSite: marked(actual.updateSite) };
});
vi.mock('@/db/levels', async (importOriginal) => {
  const actual = await importOriginal<typeof import('@/db/levels')>();
  return { ...actual, updateLevel: marked(actual.updateLevel) };
});

// An invented yard; the figures are only inputs.
let org: OrgFixture;
let siteId: string;
let levelId: string;
const siteInput = (wind: number) => siteSchema('si').parse({ name: 'Copperbeck Yard', kind: 'building', surface: 'ground', design_wind: wind });
const bolt = (i: number): ItemInput =>
  itemSchema('si').parse({ tag: `B-${i}`, description: 'Bolt', category: 'fastener', mass: 0.1 + i / 100, shape: 'sphere', dimensions: { diameter: 0.03 }, level_id: levelId, securing: 'unsecured' });

beforeEach(async () => {
  await resetDatabase();
  org = await createOrg('Copperbeck Fabrication', 'cmd');
  siteId = (await createSite(org.id, org.users.admin.id, siteInput(10))).id;
  levelId = (await createLevel(org.id, org.users.admin.id, siteId, levelSchema('si').parse({ name: 'Gantry', floor_height: 18, surface: 'ground' }))).id;
  Object.assign(count, { phase: 'before', before: 0, write: 0, between: undefined });
});

/** Every stored result equals what its stored rows give now: nothing was written from a stale reading. */
async function expectStoredResultsCurrent(): Promise<void> {
  const ladder = await listLadder(org.id);
  const ids: { id: string }[] = await getDb()('items').where({ site_id: siteId }).select('id');
  expect(ids.length).toBeGreaterThan(0);
  for (const { id } of ids) {
    const item = (await findItem(org.id, id))!;
    const expected = computeItem(item, item, ladder);
    expect(item.inputs_hash).toBe(expected.inputs_hash);
    expect(item.effective_energy_j).toBe(expected.effective_energy_j);
    expect(item.consequence_level_id).toBe(expected.consequence_level_id);
  }
}

describe('the register commands solve first and write after', () => {
  it('an import of 40 rows solves all 40 falls before its transaction and none inside it', async () => {
    const rows = Array.from({ length: 40 }, (_, i) => ({ line: i + 2, item: bolt(i) }));
    expect(await importItems(org.id, org.users.admin.id, siteId, rows, { file_name: 'bolts.csv', mode: 'valid-only', skipped_rows: 0 })).toBe(40);
    expect(count).toMatchObject({ before: 40, write: 0 });
    await expectStoredResultsCurrent();
  });

  it('new site conditions: every item solved before the site is locked, and stored under the new wind', async () => {
    for (let i = 0; i < 12; i++) await createItem(org.id, org.users.admin.id, siteId, bolt(i));
    Object.assign(count, { before: 0, write: 0 });
    const { recomputed } = await updateSite(org.id, org.users.admin.id, siteId, siteInput(25));
    expect(recomputed).toBe(12);
    expect(count).toMatchObject({ before: 12, write: 0 });
    await expectStoredResultsCurrent();
  });

  it('a site changed by someone else between the solving and the write: the level change solves its items again, from the rows it locked', async () => {
    for (let i = 0; i < 5; i++) await createItem(org.id, org.users.admin.id, siteId, bolt(i));
    Object.assign(count, { before: 0, write: 0 });
    count.between = async () => {
      count.between = undefined;
      await updateSite(org.id, org.users.engineer.id, siteId, siteInput(30));
    };
    await updateLevel(org.id, org.users.admin.id, levelId, levelSchema('si').parse({ name: 'Gantry', floor_height: 24, surface: 'ground' }));
    // 5 solved for the level, then 5 for the other writer's site change (its own, before its write), then 5 again
    // inside the level's write because the wind it was solved for is no longer the stored one.
    expect(count).toMatchObject({ before: 10, write: 5 });
    await expectStoredResultsCurrent();
  });

  it('the recomputation a level change caused shows in the item’s own history, and an unrelated level’s change does not', async () => {
    const item = await createItem(org.id, org.users.admin.id, siteId, bolt(1));
    const other = await createLevel(org.id, org.users.admin.id, siteId, levelSchema('si').parse({ name: 'Roof', floor_height: 30, surface: 'ground' }));
    await updateLevel(org.id, org.users.admin.id, other.id, levelSchema('si').parse({ name: 'Roof', floor_height: 32, surface: 'ground' }));
    await updateLevel(org.id, org.users.admin.id, levelId, levelSchema('si').parse({ name: 'Gantry', floor_height: 21, surface: 'ground' }));
    const history = await itemHistory(org.id, item);
    expect(history.map((h) => `${h.entity_type}:${h.action}`)).toEqual(['level:level.updated', 'item:item.created']);
    expect(history[0].entity_id).toBe(levelId);
  });
});
