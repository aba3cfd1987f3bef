import { rolesFor } from '@/lib/auth/policy';
import { createSite, listSites } from '@/db/sites';
import { apiRoute, readJsonObject } from '@/lib/http/api';
import { bodyUnits } from '@/lib/register/api';
import { siteSchema } from '@/lib/validation/site';

export const GET = apiRoute('any', async (_request, { member }) => Response.json({ sites: await listSites(member.organisationId) }));

export const POST = apiRoute(rolesFor('register.edit'), async (request, { member }) => {
  const { units, rest } = bodyUnits(await readJsonObject(request));
  const site = await createSite(member.organisationId, member.userId, siteSchema(units).parse(rest));
  return Response.json({ site }, { status: 201 });
});
