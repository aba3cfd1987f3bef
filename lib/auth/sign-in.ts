import 'server-only';
import { setTimeout as sleep } from 'node:timers/promises';
import { firstMembership } from '@/db/memberships';
import { cancelSignInAttempt, markSignInSucceeded, reserveSignInAttempt } from '@/db/sign-in-attempts';
import type { Member } from '@/db/types';
import { findUserByEmail } from '@/db/users';
import { UnavailableError } from '@/lib/errors';
import { clientAddress } from '@/lib/http/request-meta';
import { requestLog } from '@/lib/log';
import { burnPasswordCheck, verifyPassword } from './password';
import { limitWindows, refusalFor, type LimitReason } from './rate-limit';

export const WRONG_CREDENTIALS = 'That e-mail and password do not match an account.';

/**
 * A wrong e-mail or password is answered no sooner than this after the request began, so neither the hash's time
 * nor the database's tells an unknown e-mail from a known one (common practice for sign-in forms).
 */
const WRONG_ANSWER_FLOOR_MS = 1000;

export type SignInOutcome =
  | { ok: true; member: Member }
  | { ok: false; status: 401 | 429; message: string; retryAfterS?: number };

async function logRefusal(reason: LimitReason | 'wrong credentials' | 'busy', email: string, address: string) {
  // The e-mail tried and the address, for whoever investigates a flood; never the password or the cookie.
  (await requestLog()).warn({ event: 'sign_in_refused', reason, email: email.toLowerCase().slice(0, 254), address }, 'sign-in refused');
}

/**
 * Checks an e-mail and password against the limits (lib/auth/rate-limit.ts) and then the stored hash, on the
 * hashing pool. The address is the one the server took from the socket (TRUST_PROXY_HOPS), never the client's claim.
 * Throws UnavailableError (503) when the hashing pool is full; that attempt then counts for nothing.
 */
export async function authenticate(email: string, password: string): Promise<SignInOutcome> {
  const started = Date.now();
  const address = await clientAddress();
  const reserved = await reserveSignInAttempt({ email, address, ...limitWindows(new Date()) }, (history) => refusalFor(history, new Date()));
  if (!reserved.ok) {
    await logRefusal(reserved.refusal.reason, email, address);
    return { ok: false, status: 429, message: reserved.refusal.message, retryAfterS: reserved.refusal.retryAfterS };
  }
  let member: Member | undefined;
  try {
    const user = await findUserByEmail(email);
    const valid = user ? await verifyPassword(password, user.password_hash) : await burnPasswordCheck(password);
    member = user && valid ? await firstMembership(user.id) : undefined;
  } catch (error) {
    await cancelSignInAttempt(reserved.id).catch(() => undefined);
    if (error instanceof UnavailableError) await logRefusal('busy', email, address);
    throw error;
  }
  if (!member) {
    await logRefusal('wrong credentials', email, address);
    await sleep(Math.max(0, started + WRONG_ANSWER_FLOOR_MS - Date.now()));
    return { ok: false, status: 401, message: WRONG_CREDENTIALS };
  }
  await markSignInSucceeded(reserved.id);
  return { ok: true, member };
}
