'use server';

import { revalidatePath } from 'next/cache';
import { addMember, changeRole, removeMember } from '@/db/memberships';
import { renameOrganisation } from '@/db/organisations';
import { hashPassword, requireRole, temporaryPassword } from '@/lib/auth';
import { ConflictError, NotFoundError, UnavailableError } from '@/lib/errors';
import { parseForm } from '@/lib/validation/input';
import { toFieldErrors } from '@/lib/validation/issues';
import { changeRoleSchema, inviteMemberSchema, removeMemberSchema } from '@/lib/validation/member';
import { organisationSettingsSchema } from '@/lib/validation/organisation';
import type { ActionState } from './state';

function known(error: unknown): ActionState {
  if (error instanceof ConflictError) return { errors: { [error.field]: error.message }, message: error.message };
  if (error instanceof NotFoundError) return { message: 'That member is no longer in the organisation.' };
  // The password hashing pool is full (lib/auth/hash-pool.ts): the message says when to try again.
  if (error instanceof UnavailableError) return { message: error.message };
  throw error;
}

export async function inviteMemberAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const admin = await requireRole(['admin']);
  const parsed = parseForm(inviteMemberSchema, form);
  if (!parsed.success) return { errors: toFieldErrors(parsed.error), message: 'Check the highlighted fields.' };
  const password = temporaryPassword();
  try {
    const { createdAccount } = await addMember({
      organisationId: admin.organisationId,
      actorUserId: admin.userId,
      email: parsed.data.email,
      displayName: parsed.data.displayName,
      role: parsed.data.role,
      temporaryPasswordHash: await hashPassword(password),
    });
    revalidatePath('/members');
    return createdAccount
      ? {
          ok: true,
          message: `${parsed.data.displayName} can now sign in as ${parsed.data.email} with this one-time password, then must choose their own.`,
          secret: password,
        }
      : { ok: true, message: `${parsed.data.email} already had an account and joins with their own password.` };
  } catch (error) {
    return known(error);
  }
}

export async function changeRoleAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const admin = await requireRole(['admin']);
  const parsed = parseForm(changeRoleSchema, form);
  if (!parsed.success) return { errors: toFieldErrors(parsed.error), message: 'Check the highlighted fields.' };
  try {
    await changeRole({ organisationId: admin.organisationId, actorUserId: admin.userId, ...parsed.data });
    revalidatePath('/members');
    return { ok: true, message: 'Role changed.' };
  } catch (error) {
    return known(error);
  }
}

export async function removeMemberAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const admin = await requireRole(['admin']);
  const parsed = parseForm(removeMemberSchema, form);
  if (!parsed.success) return { errors: toFieldErrors(parsed.error), message: 'Check the highlighted fields.' };
  try {
    await removeMember({ organisationId: admin.organisationId, actorUserId: admin.userId, ...parsed.data });
    revalidatePath('/members');
    return { ok: true, message: 'Member removed.' };
  } catch (error) {
    return known(error);
  }
}

export async function organisationSettingsAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const admin = await requireRole(['admin']);
  const parsed = parseForm(organisationSettingsSchema, form);
  if (!parsed.success) return { errors: toFieldErrors(parsed.error), message: 'Check the highlighted fields.' };
  await renameOrganisation(admin.organisationId, parsed.data.name, admin.userId);
  revalidatePath('/', 'layout');
  return { ok: true, message: 'Organisation renamed.' };
}
