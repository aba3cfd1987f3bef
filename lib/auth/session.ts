import { getIronSession, type IronSession } from 'iron-session';
import { cookies } from 'next/headers';
import { forbidden, redirect } from 'next/navigation';
import { cache } from 'react';
import { findMember } from '@/db/memberships';
import type { Member, Role } from '@/db/types';
import { sessionOptions } from './config';

export interface SessionData {
  userId?: string;
  organisationId?: string;
}

export class AuthError extends Error {
  constructor(public readonly status: 401 | 403) {
    super(status === 401 ? 'Sign in first.' : 'Your role does not allow this.');
    this.name = 'AuthError';
  }
}

export async function cookieSession(): Promise<IronSession<SessionData>> {
  return getIronSession<SessionData>(await cookies(), sessionOptions());
}

/**
 * The signed-in member, read fresh from the database once per request, so a changed role or a removal
 * takes effect at once rather than when the cookie expires.
 */
export const getSession = cache(async (): Promise<Member | null> => {
  const session = await cookieSession();
  if (!session.userId || !session.organisationId) return null;
  return (await findMember(session.userId, session.organisationId)) ?? null;
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
  session.userId = userId;
  session.organisationId = organisationId;
  await session.save();
}

export async function endSession(): Promise<void> {
  const session = await cookieSession();
  session.destroy();
}
