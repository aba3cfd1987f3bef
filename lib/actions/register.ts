'use server';

import { deleteItem } from '@/db/items';
import { createLevel, deleteLevel } from '@/db/levels';
import { createSite, deleteSite } from '@/db/sites';
import { isUuid } from '@/lib/domain';
import { createItem, replaceLadder, updateItem, updateLevel, updateSite } from '@/lib/register/commands';
import { ladderSchema } from '@/lib/validation/consequence-level';
import { itemSchema } from '@/lib/validation/item';
import { levelSchema } from '@/lib/validation/level';
import { siteSchema } from '@/lib/validation/site';
import { defineAction, type ActionContext } from './define';

/** What the form says when the row it names was deleted meanwhile (or the id was never one). */
const gone = (what: 'site' | 'level' | 'item') => `That ${what} no longer exists: it may have been deleted by someone else.`;
const goneFor = (what: 'site' | 'level' | 'item', parent: 'site') => ({ fields }: ActionContext) => gone(fields.id ? what : parent);

export const saveSiteAction = defineAction({
  allow: 'register.edit',
  schema: siteSchema,
  nested: true,
  notFound: gone('site'),
  run: async (site, { member, fields: { id = '' } }) => {
    if (id) {
      if (!isUuid(id)) return { message: gone('site') };
      const { recomputed } = await updateSite(member.organisationId, member.userId, id, site);
      return {
        ok: true,
        message: recomputed ? `Site saved; ${recomputed} item result(s) recomputed at the new conditions.` : 'Site saved.',
        revalidate: `/sites/${id}`,
      };
    }
    const created = await createSite(member.organisationId, member.userId, site);
    return { revalidate: '/sites', redirect: `/sites/${created.id}` };
  },
});

export const deleteSiteAction = defineAction({
  allow: 'register.edit',
  notFound: gone('site'),
  run: async (_, { member, fields: { id = '' } }) => {
    if (!isUuid(id)) return { message: gone('site') };
    await deleteSite(member.organisationId, member.userId, id);
    return { revalidate: '/sites', redirect: '/sites' };
  },
});

export const saveLevelAction = defineAction({
  allow: 'register.edit',
  schema: levelSchema,
  nested: true,
  notFound: goneFor('level', 'site'),
  run: async (level, { member, fields: { id = '', site_id: siteId = '' } }) => {
    if (id) {
      if (!isUuid(id)) return { message: gone('level') };
      const { recomputed } = await updateLevel(member.organisationId, member.userId, id, level);
      return { ok: true, message: recomputed ? `Level saved; ${recomputed} item result(s) recomputed.` : 'Level saved.', revalidate: `/sites/${siteId}` };
    }
    if (!isUuid(siteId)) return { message: gone('site') };
    await createLevel(member.organisationId, member.userId, siteId, level);
    return { ok: true, message: `Level “${level.name}” added.`, revalidate: `/sites/${siteId}` };
  },
});

export const deleteLevelAction = defineAction({
  allow: 'register.edit',
  notFound: gone('level'),
  run: async (_, { member, fields: { id = '', site_id: siteId = '' } }) => {
    if (!isUuid(id)) return { message: gone('level') };
    await deleteLevel(member.organisationId, member.userId, id);
    return { ok: true, message: 'Level deleted.', revalidate: `/sites/${siteId}` };
  },
});

export const saveItemAction = defineAction({
  allow: 'register.edit',
  schema: itemSchema,
  nested: true,
  notFound: goneFor('item', 'site'),
  run: async (item, { member, fields: { id = '', site_id: siteId = '' } }) => {
    if (id) {
      if (!isUuid(id)) return { message: gone('item') };
      await updateItem(member.organisationId, member.userId, id, item);
      return { ok: true, message: 'Item saved and its fall recomputed.', revalidate: `/items/${id}` };
    }
    if (!isUuid(siteId)) return { message: gone('site') };
    const created = await createItem(member.organisationId, member.userId, siteId, item);
    return { revalidate: `/sites/${siteId}`, redirect: `/items/${created.id}?added=1` };
  },
});

export const deleteItemAction = defineAction({
  allow: 'register.edit',
  notFound: gone('item'),
  run: async (_, { member, fields: { id = '', site_id: siteId = '' } }) => {
    if (!isUuid(id)) return { message: gone('item') };
    await deleteItem(member.organisationId, member.userId, id);
    return { revalidate: `/sites/${siteId}`, redirect: isUuid(siteId) ? `/sites/${siteId}` : '/sites' };
  },
});

export const saveLadderAction = defineAction({
  allow: 'ladder.edit',
  schema: ladderSchema,
  nested: true,
  prepare: (values) => ({ levels: values.levels ?? [] }),
  run: async (ladder, { member }) => {
    const { reclassified } = await replaceLadder(member.organisationId, member.userId, ladder);
    return { ok: true, message: `Ladder saved; ${reclassified} register line(s) reclassified.`, revalidate: ['/', 'layout'] };
  },
});
