import { rolesFor } from '@/lib/auth/policy';
import { deleteItem, findItem } from '@/db/items';
import { NotFoundError } from '@/lib/errors';
import { apiRoute, readJsonObject } from '@/lib/http/api';
import { bodyUnits } from '@/lib/register/api';
import { patchedItem } from '@/lib/register/patch';
import type { Member } from '@/db/types';
import { updateItem } from '@/lib/register/commands';

type Params = { id: string };

async function itemOf(member: Member, id: string) {
  const item = await findItem(member.organisationId, id);
  if (!item) throw new NotFoundError('No such item');
  return item;
}

export const GET = apiRoute<Params>('any', async (_request, { member, params }) => Response.json({ item: await itemOf(member, params.id) }));

/** Any subset of the fields (dimensions merge key by key); the merged item is checked whole and recomputed. */
export const PATCH = apiRoute<Params>(rolesFor('register.edit'), async (request, { member, params }) => {
  const item = await itemOf(member, params.id);
  const { units, rest } = bodyUnits(await readJsonObject(request));
  await updateItem(member.organisationId, member.userId, item.id, patchedItem(item, units, rest));
  return Response.json({ item: await findItem(member.organisationId, item.id) });
});

export const DELETE = apiRoute<Params>(rolesFor('register.edit'), async (_request, { member, params }) => {
  const item = await itemOf(member, params.id);
  await deleteItem(member.organisationId, member.userId, item.id);
  return new Response(null, { status: 204 });
});
