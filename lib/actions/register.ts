'use server';

import { revalidatePath } from 'next/cache';
import { redirect } from 'next/navigation';
import { deleteItem } from '@/db/items';
import { createLevel, deleteLevel } from '@/db/levels';
import { createSite, deleteSite } from '@/db/sites';
import { requireRole } from '@/lib/auth';
import { EDITORS } from '@/lib/register/api';
import { createItem, replaceLadder, updateItem, updateLevel, updateSite } from '@/lib/register/commands';
import { ConflictError, NotFoundError } from '@/lib/errors';
import { ladderSchema } from '@/lib/validation/consequence-level';
import { isUuid } from '@/lib/validation/ids';
import { formToObject, unflatten, unsafeInputFailure, UnsafeInputError } from '@/lib/validation/input';
import { toFieldErrors } from '@/lib/validation/issues';
import { itemSchema } from '@/lib/validation/item';
import { levelSchema } from '@/lib/validation/level';
import { unitsField } from '@/lib/validation/quantity';
import { siteSchema } from '@/lib/validation/site';
import { outageSafe } from './outage';
import type { ActionState } from './state';

const CHECK = 'Check the highlighted fields.';

function known(error: unknown, what: string): ActionState {
  if (error instanceof ConflictError) return { errors: { [error.field]: error.message }, message: error.message };
  if (error instanceof NotFoundError) return { message: `That ${what} no longer exists: it may have been deleted by someone else.` };
  throw error;
}

interface FormInput {
  values: Record<string, unknown>;
  units: 'si' | 'us';
  id: string;
  siteId: string;
  /** Set when a field's name is refused: the action answers with it and does nothing. */
  refused?: ActionState;
}

/** The form's fields, nested, and the unit system its numbers were typed in. */
function read(form: FormData): FormInput {
  try {
    const flat = formToObject(form);
    const units = unitsField.safeParse(flat.units);
    return { values: unflatten(flat), units: units.success ? units.data : 'si', id: flat.id ?? '', siteId: flat.site_id ?? '' };
  } catch (error) {
    if (!(error instanceof UnsafeInputError)) throw error;
    return { values: {}, units: 'si', id: '', siteId: '', refused: { errors: toFieldErrors(unsafeInputFailure(error).error), message: error.message } };
  }
}

export const saveSiteAction = outageSafe(async (_prev: ActionState, form: FormData): Promise<ActionState> => {
  const member = await requireRole(EDITORS);
  const { values, units, id, refused } = read(form);
  if (refused) return refused;
  const parsed = siteSchema(units).safeParse(values);
  if (!parsed.success) return { errors: toFieldErrors(parsed.error), message: CHECK };
  let siteId = id;
  try {
    if (id) {
      if (!isUuid(id)) return { message: 'That site no longer exists: it may have been deleted by someone else.' };
      const { recomputed } = await updateSite(member.organisationId, member.userId, id, parsed.data);
      revalidatePath(`/sites/${id}`);
      return { ok: true, message: recomputed ? `Site saved; ${recomputed} item result(s) recomputed at the new conditions.` : 'Site saved.' };
    }
    siteId = (await createSite(member.organisationId, member.userId, parsed.data)).id;
  } catch (error) {
    return known(error, 'site');
  }
  revalidatePath('/sites');
  redirect(`/sites/${siteId}`);
});

export const deleteSiteAction = outageSafe(async (_prev: ActionState, form: FormData): Promise<ActionState> => {
  const member = await requireRole(EDITORS);
  const { id, refused } = read(form);
  if (refused) return refused;
  if (!isUuid(id)) return { message: 'That site no longer exists: it may have been deleted by someone else.' };
  try {
    await deleteSite(member.organisationId, member.userId, id);
  } catch (error) {
    return known(error, 'site');
  }
  revalidatePath('/sites');
  redirect('/sites');
});

export const saveLevelAction = outageSafe(async (_prev: ActionState, form: FormData): Promise<ActionState> => {
  const member = await requireRole(EDITORS);
  const { values, units, id, siteId, refused } = read(form);
  if (refused) return refused;
  const parsed = levelSchema(units).safeParse(values);
  if (!parsed.success) return { errors: toFieldErrors(parsed.error), message: CHECK };
  try {
    if (id) {
      if (!isUuid(id)) return { message: 'That level no longer exists: it may have been deleted by someone else.' };
      const { recomputed } = await updateLevel(member.organisationId, member.userId, id, parsed.data);
      revalidatePath(`/sites/${siteId}`);
      return { ok: true, message: recomputed ? `Level saved; ${recomputed} item result(s) recomputed.` : 'Level saved.' };
    }
    if (!isUuid(siteId)) return { message: 'That site no longer exists: it may have been deleted by someone else.' };
    await createLevel(member.organisationId, member.userId, siteId, parsed.data);
    revalidatePath(`/sites/${siteId}`);
    return { ok: true, message: `Level “${parsed.data.name}” added.` };
  } catch (error) {
    return known(error, id ? 'level' : 'site');
  }
});

export const deleteLevelAction = outageSafe(async (_prev: ActionState, form: FormData): Promise<ActionState> => {
  const member = await requireRole(EDITORS);
  const { id, siteId, refused } = read(form);
  if (refused) return refused;
  if (!isUuid(id)) return { message: 'That level no longer exists: it may have been deleted by someone else.' };
  try {
    await deleteLevel(member.organisationId, member.userId, id);
    revalidatePath(`/sites/${siteId}`);
    return { ok: true, message: 'Level deleted.' };
  } catch (error) {
    return known(error, 'level');
  }
});

export const saveItemAction = outageSafe(async (_prev: ActionState, form: FormData): Promise<ActionState> => {
  const member = await requireRole(EDITORS);
  const { values, units, id, siteId, refused } = read(form);
  if (refused) return refused;
  const parsed = itemSchema(units).safeParse(values);
  if (!parsed.success) return { errors: toFieldErrors(parsed.error), message: CHECK };
  let itemId = id;
  try {
    if (id) {
      if (!isUuid(id)) return { message: 'That item no longer exists: it may have been deleted by someone else.' };
      await updateItem(member.organisationId, member.userId, id, parsed.data);
      revalidatePath(`/items/${id}`);
      return { ok: true, message: 'Item saved and its fall recomputed.' };
    }
    if (!isUuid(siteId)) return { message: 'That site no longer exists: it may have been deleted by someone else.' };
    itemId = (await createItem(member.organisationId, member.userId, siteId, parsed.data)).id;
  } catch (error) {
    return known(error, id ? 'item' : 'site');
  }
  revalidatePath(`/sites/${siteId}`);
  redirect(`/items/${itemId}?added=1`);
});

export const deleteItemAction = outageSafe(async (_prev: ActionState, form: FormData): Promise<ActionState> => {
  const member = await requireRole(EDITORS);
  const { id, siteId, refused } = read(form);
  if (refused) return refused;
  if (!isUuid(id)) return { message: 'That item no longer exists: it may have been deleted by someone else.' };
  try {
    await deleteItem(member.organisationId, member.userId, id);
  } catch (error) {
    return known(error, 'item');
  }
  revalidatePath(`/sites/${siteId}`);
  redirect(isUuid(siteId) ? `/sites/${siteId}` : '/sites');
});

export const saveLadderAction = outageSafe(async (_prev: ActionState, form: FormData): Promise<ActionState> => {
  const member = await requireRole(['admin']);
  const { values, refused } = read(form);
  if (refused) return refused;
  const parsed = ladderSchema.safeParse({ levels: values.levels ?? [] });
  if (!parsed.success) return { errors: toFieldErrors(parsed.error), message: CHECK };
  const { reclassified } = await replaceLadder(member.organisationId, member.userId, parsed.data);
  revalidatePath('/', 'layout');
  return { ok: true, message: `Ladder saved; ${reclassified} register line(s) reclassified.` };
});
