import { rolesFor } from '@/lib/auth/policy';
import { findItem, listRegister } from '@/db/items';
import { apiRoute, readJsonObject } from '@/lib/http/api';
import { bodyUnits, siteOf } from '@/lib/register/api';
import { itemSchema } from '@/lib/validation/item';
import { createItem } from '@/lib/register/commands';

type Params = { id: string };

export const GET = apiRoute<Params>('any', async (_request, { member, params }) => {
  const site = await siteOf(member, params.id);
  return Response.json({ items: await listRegister(member.organisationId, site.id) });
});

/** The item is computed at the site's design wind before it is stored; the answer carries its stored result. */
export const POST = apiRoute<Params>(rolesFor('register.edit'), async (request, { member, params }) => {
  const site = await siteOf(member, params.id);
  const { units, rest } = bodyUnits(await readJsonObject(request));
  const created = await createItem(member.organisationId, member.userId, site.id, itemSchema(units).parse(rest));
  return Response.json({ item: await findItem(member.organisationId, created.id) }, { status: 201 });
});
