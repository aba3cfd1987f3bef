import type { Member } from '@/db/types';
import type { UnitSystem } from '@/lib/domain';
import { findSite } from '@/db/sites';
import { NotFoundError } from '@/lib/errors';
import { badRequest } from '@/lib/http/api';
import { unitsField } from '@/lib/validation/quantity';

/** The unit system a JSON body declares, and the body without that key. */
export function bodyUnits(body: Record<string, unknown>): { units: UnitSystem; rest: Record<string, unknown> } {
  const { units, ...rest } = body;
  const parsed = unitsField.safeParse(units);
  if (!parsed.success) badRequest('units', 'Units must be "si" or "us".');
  return { units: parsed.data, rest };
}

/** A site of the caller's organisation; another organisation's id is simply not found. */
export async function siteOf(member: Member, id: string) {
  const site = await findSite(member.organisationId, id);
  if (!site) throw new NotFoundError('No such site');
  return site;
}
