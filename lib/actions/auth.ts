'use server';

import { redirect } from 'next/navigation';
import { createOrganisationWithAdmin } from '@/db/organisations';
import { findUserByEmail } from '@/db/users';
import { ConflictError } from '@/lib/errors';
import { authenticate, endSession, hashPassword, startSession } from '@/lib/auth';
import { safeReturnPath } from '@/lib/http/return-path';
import { signInSchema, signUpSchema } from '@/lib/validation/user';
import { defineAction } from './define';

// Sign-in and sign-up are the two actions open to signed-out visitors; every other action starts with requireRole.
export const signInAction = defineAction({
  allow: 'public',
  schema: signInSchema,
  run: async ({ email, password }, { fields }) => {
    // A full hashing pool throws UnavailableError: the form says so and when to try again, as the route's 503 does.
    const outcome = await authenticate(email, password);
    if (!outcome.ok) return { message: outcome.message };
    await startSession(outcome.member.userId, outcome.member.organisationId);
    // A first sign-in changes the password before anything else; otherwise back to the page asked for, if it is ours.
    return { redirect: outcome.member.mustChangePassword ? '/profile?welcome=1' : safeReturnPath(fields.next) };
  },
});

export const signUpAction = defineAction({
  allow: 'public',
  schema: signUpSchema,
  run: async (input) => {
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
      // A taken e-mail found only at insert time: under its field, without the form-wide message.
      if (error instanceof ConflictError) return { errors: { [error.field]: error.message } };
      throw error;
    }
    await startSession(created.user.id, created.organisation.id);
    return { redirect: '/' };
  },
});

export async function signOutAction(): Promise<void> {
  await endSession();
  redirect('/sign-in');
}
