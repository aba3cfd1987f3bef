import 'server-only';
import { setTimeout as sleep } from 'node:timers/promises';
import { firstMembership } from '@/db/memberships';
import { cancelSignInAttempt, markSignInSucceeded, pruneSignInAttempts, reserveSignInAttempt } from '@/db/sign-in-attempts';
import type { Member } from '@/db/types';
import { findUserByEmail } from '@/db/users';
import { UnavailableError } from '@/lib/errors';
import { clientAddress } from '@/lib/http/request-meta';
import { requestLog } from '@/lib/log';
import { Gate } from './gate';
import { busyError, HASH_QUEUE_LIMIT, hashPoolFull } from './hash-pool';
import { burnPasswordCheck, verifyPassword } from './password';
import { limitWindows, pruneBefore, refusalFor, type LimitReason } from './rate-limit';

export const WRONG_CREDENTIALS = 'That e-mail and password do not match an account.';

/**
 * A wrong e-mail or password is answered no sooner than this after the request began, so neither the hash's time
 * nor the database's tells an unknown e-mail from a known one (common practice for sign-in forms).
 */
const WRONG_ANSWER_FLOOR_MS = 1000;

/**
 * Limit checks in flight at once, per process: each holds a pooled database connection (and may wait on another's
 * lock), so a flood of sign-ins uses at most two of the pool's connections and never starves other requests.
 */
const checking = new Gate(2);

export type SignInOutcome =
  | { ok: true; member: Member }
  | { ok: false; status: 401 | 429; message: string; retryAfterS?: number };

async function logRefusal(reason: LimitReason | 'wrong credentials' | 'busy', email: string, address: string) {
  // The e-mail tried and the address, for whoever investigates a flood; never the password or the cookie.
  (await requestLog()).warn({ event: 'sign_in_refused', reason, email: email.toLowerCase().slice(0, 254), address }, 'sign-in refused');
}

/** Old attempts are pruned by whichever sign-in comes first after this long, per process, not on a timer. */
const PRUNE_EVERY_MS = 10 * 60_000;
let lastPrune = 0;

function pruneNowAndThen(): void {
  if (Date.now() - lastPrune < PRUNE_EVERY_MS) return;
  lastPrune = Date.now();
  // Housekeeping must never fail or slow a sign-in: it runs beside it, and a failure waits for the next turn.
  pruneSignInAttempts(pruneBefore(new Date())).catch(async (error) => (await requestLog()).warn({ err: error }, 'pruning sign-in attempts failed'));
}

/** Sign-ins between admission and their answer (waiting at the gate, checking, hashing), per process. */
let admitted = 0;

/**
 * Checks an e-mail and password against the limits (lib/auth/rate-limit.ts) and then the stored hash, on the
 * hashing pool. The address is the one the server took from the socket (TRUST_PROXY_HOPS), never the client's claim.
 * Throws UnavailableError (503) when HASH_QUEUE_LIMIT sign-ins are in hand or the pool is full; that attempt then
 * counts for nothing. The refusal comes before any database work, so a flood's extra requests cost next to nothing.
 */
export async function authenticate(email: string, password: string): Promise<SignInOutcome> {
  const started = Date.now();
  const address = await clientAddress();
  if (admitted >= HASH_QUEUE_LIMIT || hashPoolFull()) {
    await logRefusal('busy', email, address);
    throw busyError();
  }
  admitted += 1;
  pruneNowAndThen();
  let outcome: SignInOutcome;
  try {
    outcome = await check(email, password, address);
  } finally {
    admitted -= 1;
  }
  if (!outcome.ok && outcome.status === 401) {
    // Held outside the admission: waiting costs a timer, not a place in the queue.
    await sleep(Math.max(0, started + WRONG_ANSWER_FLOOR_MS - Date.now()));
  }
  return outcome;
}

async function check(email: string, password: string, address: string): Promise<SignInOutcome> {
  const reserved = await checking.run(() =>
    reserveSignInAttempt({ email, address, ...limitWindows(new Date()) }, (history) => refusalFor(history, new Date())),
  );
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
    return { ok: false, status: 401, message: WRONG_CREDENTIALS };
  }
  await markSignInSucceeded(reserved.id);
  return { ok: true, member };
}
