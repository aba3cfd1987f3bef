'use server';

import { revalidatePath } from 'next/cache';
import { redirect } from 'next/navigation';
import { findUserById, updatePasswordHash, updateProfile } from '@/db/users';
import { endEverySession, endOtherSessions, hashPassword, requireRole, verifyPassword } from '@/lib/auth';
import { UnavailableError } from '@/lib/errors';
import { parseForm } from '@/lib/validation/input';
import { toFieldErrors } from '@/lib/validation/issues';
import { passwordChangeSchema, profileSchema } from '@/lib/validation/user';
import type { ActionState } from './state';

export async function updateProfileAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const me = await requireRole('any');
  const parsed = parseForm(profileSchema, form);
  if (!parsed.success) return { errors: toFieldErrors(parsed.error), message: 'Check the highlighted fields.' };
  await updateProfile(me.userId, me.organisationId, parsed.data);
  revalidatePath('/', 'layout');
  return { ok: true, message: 'Profile saved.' };
}

export async function changePasswordAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const me = await requireRole('any');
  const parsed = parseForm(passwordChangeSchema, form);
  if (!parsed.success) return { errors: toFieldErrors(parsed.error), message: 'Check the highlighted fields.' };
  const user = await findUserById(me.userId);
  try {
    if (!user || !(await verifyPassword(parsed.data.currentPassword, user.password_hash))) {
      return { errors: { currentPassword: 'The current password is not right.' } };
    }
    await updatePasswordHash(me.userId, me.organisationId, await hashPassword(parsed.data.newPassword));
  } catch (error) {
    if (error instanceof UnavailableError) return { message: error.message };
    throw error;
  }
  // Whoever else held a session (a copied cookie, a forgotten device) signs in again, with the new password.
  await endOtherSessions(me.userId);
  revalidatePath('/', 'layout');
  return { ok: true, message: 'Password changed. Other devices are signed out.' };
}

/** Ends every session of this user, this one too, and returns to the sign-in page. */
export async function signOutEverywhereAction(): Promise<void> {
  const me = await requireRole('any');
  await endEverySession(me.userId);
  redirect('/sign-in');
}

/** The calculator's unit switch remembers the choice in the profile. */
export async function setUnitSystemAction(unitSystem: string): Promise<ActionState> {
  const me = await requireRole('any');
  const parsed = profileSchema.shape.unitSystem.safeParse(unitSystem);
  if (!parsed.success) return { errors: { unitSystem: parsed.error.issues[0].message } };
  await updateProfile(me.userId, me.organisationId, { displayName: me.displayName, unitSystem: parsed.data });
  return { ok: true };
}
