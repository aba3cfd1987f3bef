import { classify, DEFAULT_LADDER, type ConsequenceLevel } from '@/lib/domain';
import { appendAudit } from './audit';
import { getDb } from './knex';
import { lockItems, lockOrganisation } from './locks';
import type { LadderBound } from './results';
import type { Conn, LadderFields } from './types';

const COLUMNS = ['id', 'rank', 'name', 'lower_bound_j', 'colour', 'guidance', 'source'] as const;

export async function listLadder(organisationId: string, conn: Conn = getDb()): Promise<ConsequenceLevel[]> {
  return conn('consequence_levels').where({ organisation_id: organisationId }).orderBy('rank').select(COLUMNS);
}

/** Every new organisation starts with the default ladder, in the transaction that creates it. */
export async function insertDefaultLadder(trx: Conn, organisationId: string): Promise<void> {
  await trx('consequence_levels').insert(DEFAULT_LADDER.map((l) => ({ ...l, organisation_id: organisationId })));
}

/**
 * Points every item of the organisation at the level its stored energy falls in, by classify() in lib/domain: the
 * one place the rule is written, so SQL never holds a second copy. One statement per 5,000 items.
 */
async function reclassifyItems(trx: Conn, organisationId: string, ladder: readonly LadderBound[]): Promise<number> {
  const rows: { id: string; effective_energy_j: number | null }[] = await trx('items')
    .where({ organisation_id: organisationId })
    .select('id', 'effective_energy_j');
  const CHUNK = 5000;
  for (let start = 0; start < rows.length; start += CHUNK) {
    const slice = rows.slice(start, start + CHUNK);
    await trx.raw(
      `UPDATE items AS i SET consequence_level_id = v.level FROM unnest(?::uuid[], ?::uuid[]) AS v(id, level) WHERE i.id = v.id`,
      // pg sends each JS array as a PostgreSQL array; null entries stay NULL.
      [slice.map((r) => r.id), slice.map((r) => classify(r.effective_energy_j, ladder))] as unknown as string[][],
    );
  }
  return rows.length;
}

/**
 * Replaces the whole ladder and reclassifies every item in the same transaction, so no item ever points at a
 * level that no longer means what it did.
 */
export async function replaceLadder(
  organisationId: string,
  actorUserId: string,
  input: LadderFields,
  conn: Conn = getDb(),
): Promise<{ ladder: ConsequenceLevel[]; reclassified: number }> {
  return conn.transaction(async (trx) => {
    // Exclusive on the organisation: every register write holds it shared, so none is half-way through an item.
    await lockOrganisation(trx, organisationId, 'exclusive');
    await lockItems(trx, organisationId, { organisation: true });
    const before = await listLadder(organisationId, trx);
    await trx('items').where({ organisation_id: organisationId }).update({ consequence_level_id: null });
    await trx('consequence_levels').where({ organisation_id: organisationId }).delete();
    await trx('consequence_levels').insert(
      input.levels.map((l, i) => ({ ...l, rank: i + 1, organisation_id: organisationId })),
    );
    const ladder = await listLadder(organisationId, trx);
    const reclassified = await reclassifyItems(trx, organisationId, ladder);
    const strip = (levels: ConsequenceLevel[]) => levels.map(({ name, lower_bound_j, colour }) => ({ name, lower_bound_j, colour }));
    await appendAudit(trx, {
      organisationId,
      actorUserId,
      action: 'ladder.changed',
      entityType: 'consequence_ladder',
      entityId: organisationId,
      before: strip(before),
      after: { levels: strip(ladder), reclassified_items: reclassified },
    });
    return { ladder, reclassified };
  });
}
