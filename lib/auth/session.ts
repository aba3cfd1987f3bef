import 'server-only';
import { createHash, randomBytes } from 'node:crypto';
import { getIronSession, type IronSession } from 'iron-session';
import { cookies } from 'next/headers';
import { forbidden, redirect } from 'next/navigation';
import { cache } from 'react';
import type { Role } from '@/lib/domain';
import { findMember } from '@/db/memberships';
import { findLiveSession, insertSession, revokeSession, revokeUserSessions } from '@/db/sessions';
import type { Member } from '@/db/types';
import { SESSION_COOKIE, SESSION_TTL_SECONDS, sessionOptions } from './config';

/** What the sealed cookie holds: the session's random token, looked up in the sessions table on every request. */
export interface SessionData {
  sid?: string;
}

export class AuthError extends Error {
  constructor(public readonly status: 401 | 403) {
    super(status === 401 ? 'Sign in first.' : 'Your role does not allow this.');
    this.name = 'AuthError';
  }
}

const TOKEN = /^[A-Za-z0-9_-]{43}$/;
const hashOf = (token: string) => createHash('sha256').update(token).digest('hex');

/**
 * The sealed cookie, or an empty one when the cookie is forged or malformed: iron-session rethrows some unsealing
 * errors, and a cookie anyone can write must never turn into a 500. Where cookies may be written (actions and route
 * handlers), the bad cookie is dropped so the next save replaces it.
 */
async function cookieSession(): Promise<IronSession<SessionData>> {
  const jar = await cookies();
  try {
    return await getIronSession<SessionData>(jar, sessionOptions());
  } catch {
    try {
      jar.delete(SESSION_COOKIE);
    } catch {
      // A page render cannot write cookies: it reads the session through a store that holds nothing.
    }
    return getIronSession<SessionData>(jar.has(SESSION_COOKIE) ? NO_COOKIES : jar, sessionOptions());
  }
}

type CookieStore = Awaited<ReturnType<typeof cookies>>;
const NO_COOKIES = { get: () => undefined, set: () => NO_COOKIES } as unknown as CookieStore;

/** The hash of this request's session token, when the cookie carries a well-formed one. */
async function currentSessionHash(): Promise<string | null> {
  const sid = (await cookieSession()).sid;
  return typeof sid === 'string' && TOKEN.test(sid) ? hashOf(sid) : null;
}

/**
 * The signed-in member, read fresh from the database once per request: the session must be live (not revoked, not
 * expired), and the membership must still exist, so a sign-out elsewhere, a changed role or a removal takes effect at
 * once rather than when the cookie expires.
 */
export const getSession = cache(async (): Promise<Member | null> => {
  const idHash = await currentSessionHash();
  if (!idHash) return null;
  const session = await findLiveSession(idHash);
  if (!session) return null;
  return (await findMember(session.user_id, session.organisation_id)) ?? null;
});

export type RoleSet = readonly Role[] | 'any';

/**
 * The one authorisation gate. Pages and server actions get Next's interrupts (a redirect to sign-in,
 * or the 403 page); route handlers ask for `throw` and answer JSON 401/403 themselves.
 */
export async function requireRole(roles: RoleSet, onDenied: 'interrupt' | 'throw' = 'interrupt'): Promise<Member> {
  const member = await getSession();
  const status = !member ? 401 : roles !== 'any' && !roles.includes(member.role) ? 403 : 0;
  if (!status) return member as Member;
  if (onDenied === 'throw') throw new AuthError(status as 401 | 403);
  if (status === 401) redirect('/sign-in');
  forbidden();
}

export async function startSession(userId: string, organisationId: string): Promise<void> {
  const session = await cookieSession();
  const token = randomBytes(32).toString('base64url');
  await insertSession({ idHash: hashOf(token), userId, organisationId, ttlS: SESSION_TTL_SECONDS });
  session.sid = token;
  await session.save();
}

/** Sign-out: the session row is revoked, so a copy of the cookie stops working too. */
export async function endSession(): Promise<void> {
  const idHash = await currentSessionHash();
  if (idHash) await revokeSession(idHash);
  (await cookieSession()).destroy();
}

/** After a password change: every other device signs in again with the new password; this one stays. */
export async function endOtherSessions(userId: string): Promise<void> {
  await revokeUserSessions(userId, (await currentSessionHash()) ?? undefined);
}

/** "Sign out on every device": every session of the user ends, this one included. */
export async function endEverySession(userId: string): Promise<void> {
  await revokeUserSessions(userId);
  (await cookieSession()).destroy();
}
