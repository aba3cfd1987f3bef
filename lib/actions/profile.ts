'use server';

import { redirect } from 'next/navigation';
import { findUserById, updatePasswordHash, updateProfile } from '@/db/users';
import { endEverySession, endOtherSessions, hashPassword, requireRole, verifyPassword } from '@/lib/auth';
import { passwordChangeSchema, profileSchema } from '@/lib/validation/user';
import { defineAction } from './define';
import type { ActionState } from './state';

export const updateProfileAction = defineAction({
  allow: 'any',
  schema: profileSchema,
  run: async (profile, { member: me }) => {
    await updateProfile(me.userId, me.organisationId, profile);
    return { ok: true, message: 'Profile saved.', revalidate: ['/', 'layout'] };
  },
});

export const changePasswordAction = defineAction({
  allow: 'any',
  schema: passwordChangeSchema,
  run: async ({ currentPassword, newPassword }, { member: me }) => {
    // A full hashing pool throws UnavailableError, which the form shows with when to try again.
    const user = await findUserById(me.userId);
    if (!user || !(await verifyPassword(currentPassword, user.password_hash))) {
      return { errors: { currentPassword: 'The current password is not right.' } };
    }
    await updatePasswordHash(me.userId, me.organisationId, await hashPassword(newPassword));
    // Whoever else held a session (a copied cookie, a forgotten device) signs in again, with the new password.
    await endOtherSessions(me.userId);
    return { ok: true, message: 'Password changed. Other devices are signed out.', revalidate: ['/', 'layout'] };
  },
});

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
