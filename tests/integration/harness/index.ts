import type { Role } from '@/lib/domain';
import { insertDefaultLadder } from '@/db/consequence-levels';
import { getDb } from '@/db/knex';
import type { ActionState } from '@/lib/actions/state';
import { hashPassword } from '@/lib/auth/password';
import { POST as postSession } from '@/app/api/v1/session/route';
import { CLIENT_ADDRESS_HEADER } from '@/lib/http/header-names';
import { requestContext } from './context';

export const PASSWORD = 'correct-horse-battery';

export async function resetDatabase(): Promise<void> {
  await getDb().raw('TRUNCATE organisations, users, memberships, sessions, audit_log, sign_in_attempts, consequence_levels, sites, site_levels, items RESTART IDENTITY CASCADE');
}

let sharedHash: string | undefined;
async function passwordHash(): Promise<string> {
  sharedHash ??= await hashPassword(PASSWORD);
  return sharedHash;
}

export interface OrgFixture {
  id: string;
  users: Record<Role, { id: string; email: string }>;
}

/** An organisation with one member per role, all with PASSWORD. */
export async function createOrg(name: string, prefix: string): Promise<OrgFixture> {
  const db = getDb();
  const hash = await passwordHash();
  const [org] = await db('organisations').insert({ name }).returning('id');
  await insertDefaultLadder(db, org.id);
  const users = {} as OrgFixture['users'];
  for (const role of ['admin', 'engineer', 'reviewer', 'viewer'] as const) {
    const email = `${prefix}-${role}@test.example`;
    const [u] = await db('users').insert({ email, password_hash: hash, display_name: `${prefix} ${role}` }).returning('id');
    await db('memberships').insert({ organisation_id: org.id, user_id: u.id, role });
    users[role] = { id: u.id, email };
  }
  return { id: org.id, users };
}

export function signOutLocally(): void {
  requestContext.cookies.clear();
}

/** The caller's address as the server passes it to the app (CLIENT_ADDRESS_HEADER), as if from the socket. */
export function setClientAddress(address: string): void {
  requestContext.headers.set(CLIENT_ADDRESS_HEADER, address);
}

export function jsonRequest(method: string, body?: unknown, url = 'http://127.0.0.1/api'): Request {
  return new Request(url, {
    method,
    headers: { 'content-type': 'application/json' },
    body: body === undefined ? undefined : typeof body === 'string' ? body : JSON.stringify(body),
  });
}

export async function signInAs(email: string, password = PASSWORD): Promise<Response> {
  signOutLocally();
  const response = await postSession(jsonRequest('POST', { email, password }));
  if (response.status !== 200) throw new Error(`sign-in of ${email} answered ${response.status}`);
  return response;
}

export function form(fields: Record<string, string>): FormData {
  const data = new FormData();
  for (const [k, v] of Object.entries(fields)) data.set(k, v);
  return data;
}

export type ActionOutcome =
  | { kind: 'state'; state: ActionState }
  | { kind: 'redirect'; to: string }
  | { kind: 'status'; status: number };

/** Runs a server action and reports what Next would do: render its state, redirect, or answer 401/403/404. */
export async function runAction(
  action: (prev: ActionState, data: FormData) => Promise<ActionState | void>,
  fields: Record<string, string> = {},
): Promise<ActionOutcome> {
  try {
    const state = await action({}, form(fields));
    return { kind: 'state', state: state ?? {} };
  } catch (error) {
    const digest = (error as { digest?: string }).digest ?? '';
    if (digest.startsWith('NEXT_REDIRECT')) return { kind: 'redirect', to: digest.split(';')[2] };
    if (digest.startsWith('NEXT_HTTP_ERROR_FALLBACK')) return { kind: 'status', status: Number(digest.split(';')[1]) };
    throw error;
  }
}

export const ctx = <P>(params: P) => ({ params: Promise.resolve(params) });
