import { rolesFor } from '@/lib/auth/policy';
import { listLevels } from '@/db/levels';
import { deleteSite } from '@/db/sites';
import { apiRoute, readJsonObject } from '@/lib/http/api';
import { bodyUnits, siteOf } from '@/lib/register/api';
import { patchedSite } from '@/lib/register/patch';
import { updateSite } from '@/lib/register/commands';

type Params = { id: string };

export const GET = apiRoute<Params>('any', async (_request, { member, params }) => {
  const site = await siteOf(member, params.id);
  return Response.json({ site, levels: await listLevels(member.organisationId, site.id) });
});

/** Any subset of the fields; the merged site is checked as a whole, and a changed wind recomputes its items. */
export const PATCH = apiRoute<Params>(rolesFor('register.edit'), async (request, { member, params }) => {
  const site = await siteOf(member, params.id);
  const { units, rest } = bodyUnits(await readJsonObject(request));
  const updated = await updateSite(member.organisationId, member.userId, site.id, patchedSite(site, units, rest));
  return Response.json({ site: updated.site, recomputed_items: updated.recomputed });
});

export const DELETE = apiRoute<Params>(rolesFor('register.edit'), async (_request, { member, params }) => {
  const site = await siteOf(member, params.id);
  await deleteSite(member.organisationId, member.userId, site.id);
  return new Response(null, { status: 204 });
});
