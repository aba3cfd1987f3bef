import { beforeEach, describe, expect, it } from 'vitest';
import { getDb } from '@/db/knex';
import { signInAction } from '@/lib/actions/auth';
import { changeRoleAction, inviteMemberAction, removeMemberAction } from '@/lib/actions/members';
import { changePasswordAction } from '@/lib/actions/profile';
import { startSession } from '@/lib/auth';
import { createOrg, resetDatabase, runAction, signOutLocally, type OrgFixture } from './harness';

let org: OrgFixture;

beforeEach(async () => {
  await resetDatabase();
  org = await createOrg('Ness', 'ness');
  signOutLocally();
  await startSession(org.users.admin.id, org.id);
});

async function auditActions(): Promise<string[]> {
  const rows = await getDb()('audit_log').where({ organisation_id: org.id }).orderBy('id');
  return rows.map((r) => r.action);
}

describe('members', () => {
  it('invites a member with a one-time password that must be replaced', async () => {
    const invited = await runAction(inviteMemberAction, { displayName: 'Pat Quinn', email: 'pat@test.example', role: 'viewer' });
    expect(invited.kind).toBe('state');
    const secret = invited.kind === 'state' ? invited.state.secret : undefined;
    expect(secret).toMatch(/^[A-Za-z2-9]{14}$/);

    signOutLocally();
    expect(await runAction(signInAction, { email: 'pat@test.example', password: secret! })).toEqual({
      kind: 'redirect',
      to: '/profile?welcome=1',
    });
    const changed = await runAction(changePasswordAction, {
      currentPassword: secret!,
      newPassword: 'pats-own-password',
      confirmPassword: 'pats-own-password',
    });
    expect(changed).toEqual({ kind: 'state', state: { ok: true, message: 'Password changed. Other devices are signed out.' } });
    signOutLocally();
    expect(await runAction(signInAction, { email: 'pat@test.example', password: secret! })).toMatchObject({ kind: 'state' });
    expect(await runAction(signInAction, { email: 'pat@test.example', password: 'pats-own-password' })).toEqual({
      kind: 'redirect',
      to: '/',
    });
  });

  it('refuses to invite someone who is already a member', async () => {
    const again = await runAction(inviteMemberAction, { displayName: 'Dup', email: org.users.viewer.email, role: 'viewer' });
    expect(again).toMatchObject({ kind: 'state', state: { errors: { email: 'This person is already a member of the organisation.' } } });
  });

  it('changes roles and removes members, auditing each change', async () => {
    expect(await runAction(changeRoleAction, { userId: org.users.viewer.id, role: 'engineer' })).toMatchObject({ state: { ok: true } });
    expect(await runAction(removeMemberAction, { userId: org.users.reviewer.id })).toMatchObject({ state: { ok: true } });
    const rows = await getDb()('memberships').where({ organisation_id: org.id }).select('user_id', 'role');
    expect(rows).toHaveLength(3);
    expect(rows.find((r) => r.user_id === org.users.viewer.id)?.role).toBe('engineer');
    expect(await auditActions()).toEqual(['member.role_changed', 'member.removed']);
    const change = await getDb()('audit_log').where({ action: 'member.role_changed' }).first();
    expect(change.before).toEqual({ role: 'viewer' });
    expect(change.after).toEqual({ role: 'engineer' });
    expect(change.actor_user_id).toBe(org.users.admin.id);
  });

  it('never demotes or removes the last admin', async () => {
    const demote = await runAction(changeRoleAction, { userId: org.users.admin.id, role: 'viewer' });
    expect(demote).toMatchObject({ state: { errors: { role: expect.stringMatching(/last admin/) } } });
    const remove = await runAction(removeMemberAction, { userId: org.users.admin.id });
    expect(remove).toMatchObject({ state: { errors: { userId: expect.stringMatching(/last admin/) } } });
    expect(await auditActions()).toEqual([]);

    await runAction(changeRoleAction, { userId: org.users.engineer.id, role: 'admin' });
    expect(await runAction(changeRoleAction, { userId: org.users.admin.id, role: 'viewer' })).toMatchObject({ state: { ok: true } });
  });
});
