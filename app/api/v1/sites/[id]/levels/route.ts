import { rolesFor } from '@/lib/auth/policy';
import { createLevel, listLevels } from '@/db/levels';
import { apiRoute, readJsonObject } from '@/lib/http/api';
import { bodyUnits, siteOf } from '@/lib/register/api';
import { levelValues } from '@/lib/register/form-values';
import { levelSchema } from '@/lib/validation/level';

type Params = { id: string };

export const GET = apiRoute<Params>('any', async (_request, { member, params }) => {
  const site = await siteOf(member, params.id);
  return Response.json({ levels: await listLevels(member.organisationId, site.id) });
});

/** What is below and the water depth default to the site's when the body leaves them out. */
export const POST = apiRoute<Params>(rolesFor('register.edit'), async (request, { member, params }) => {
  const site = await siteOf(member, params.id);
  const { units, rest } = bodyUnits(await readJsonObject(request));
  const defaults = levelValues(null, site, units, true);
  const input = levelSchema(units).parse({ surface: defaults.surface, water_depth: defaults.water_depth, ...rest });
  const level = await createLevel(member.organisationId, member.userId, site.id, input);
  return Response.json({ level }, { status: 201 });
});
