import { rolesFor } from '@/lib/auth/policy';
import { listLadder } from '@/db/consequence-levels';
import { apiRoute, readJson } from '@/lib/http/api';
import { ladderSchema } from '@/lib/validation/consequence-level';
import { replaceLadder } from '@/lib/register/commands';

export const GET = apiRoute('any', async (_request, { member }) => Response.json({ levels: await listLadder(member.organisationId) }));

/** The whole ladder at once, lowest first; every item of the organisation is reclassified in the same transaction. */
export const PUT = apiRoute(rolesFor('ladder.edit'), async (request, { member }) => {
  const input = await readJson(request, ladderSchema);
  const { ladder, reclassified } = await replaceLadder(member.organisationId, member.userId, input);
  return Response.json({ levels: ladder, reclassified_items: reclassified });
});
