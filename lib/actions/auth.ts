'use server';

import { redirect } from 'next/navigation';
import { createOrganisationWithAdmin } from '@/db/organisations';
import { findUserByEmail } from '@/db/users';
import { ConflictError, UnavailableError } from '@/lib/errors';
import { authenticate, endSession, hashPassword, startSession } from '@/lib/auth';
import { parseForm } from '@/lib/validation/input';
import { toFieldErrors } from '@/lib/validation/issues';
import { signInSchema, signUpSchema } from '@/lib/validation/user';
import type { ActionState } from './state';

// Sign-in and sign-up are the two actions open to signed-out visitors; every other action starts with requireRole.
export async function signInAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const parsed = parseForm(signInSchema, form);
  if (!parsed.success) return { errors: toFieldErrors(parsed.error), message: 'Check the highlighted fields.' };
  let outcome;
  try {
    outcome = await authenticate(parsed.data.email, parsed.data.password);
  } catch (error) {
    // The hashing pool is full: the form says so and when to try again, as the route's 503 does.
    if (error instanceof UnavailableError) return { message: error.message };
    throw error;
  }
  if (!outcome.ok) return { message: outcome.message };
  await startSession(outcome.member.userId, outcome.member.organisationId);
  redirect(outcome.member.mustChangePassword ? '/profile?welcome=1' : '/');
}

export async function signUpAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const parsed = parseForm(signUpSchema, form);
  if (!parsed.success) return { errors: toFieldErrors(parsed.error), message: 'Check the highlighted fields.' };
  const input = parsed.data;
  if (await findUserByEmail(input.email)) {
    return { errors: { email: 'An account with this e-mail exists already: sign in instead.' } };
  }
  let created;
  try {
    created = await createOrganisationWithAdmin({
      organisationName: input.organisationName,
      displayName: input.displayName,
      email: input.email,
      passwordHash: await hashPassword(input.password),
    });
  } catch (error) {
    if (error instanceof ConflictError) return { errors: { [error.field]: error.message } };
    if (error instanceof UnavailableError) return { message: error.message };
    throw error;
  }
  const { organisation, user } = created;
  await startSession(user.id, organisation.id);
  redirect('/');
}

export async function signOutAction(): Promise<void> {
  await endSession();
  redirect('/sign-in');
}
