import { headers } from 'next/headers';
import { firstMembership } from '@/db/memberships';
import { recordSignInAttempt } from '@/db/sign-in-attempts';
import type { Member } from '@/db/types';
import { findUserByEmail } from '@/db/users';
import { burnPasswordCheck, verifyPassword } from './password';
import { minutesLocked } from './rate-limit';

export const WRONG_CREDENTIALS = 'That e-mail and password do not match an account.';

export type SignInOutcome =
  | { ok: true; member: Member }
  | { ok: false; status: 401 | 429; message: string; retryAfterMinutes?: number };

/** The caller's address as the server saw it; behind a proxy, the proxy's forwarded header. */
export async function clientAddress(): Promise<string> {
  const h = await headers();
  const forwarded = h.get('x-forwarded-for')?.split(',')[0]?.trim();
  return (forwarded || h.get('x-real-ip') || 'local').slice(0, 64);
}

export async function authenticate(email: string, password: string): Promise<SignInOutcome> {
  const address = await clientAddress();
  const wait = await minutesLocked(email, address);
  if (wait > 0) {
    return {
      ok: false,
      status: 429,
      retryAfterMinutes: wait,
      message: `Too many failed sign-ins. Try again in ${wait} minute${wait === 1 ? '' : 's'}.`,
    };
  }
  const user = await findUserByEmail(email);
  const valid = user ? await verifyPassword(password, user.password_hash) : await burnPasswordCheck(password);
  const member = user && valid ? await firstMembership(user.id) : undefined;
  await recordSignInAttempt(email, address, Boolean(member));
  if (!member) return { ok: false, status: 401, message: WRONG_CREDENTIALS };
  return { ok: true, member };
}
