'use server';

import { addMember, changeRole, removeMember } from '@/db/memberships';
import { renameOrganisation } from '@/db/organisations';
import { hashPassword, temporaryPassword } from '@/lib/auth';
import { changeRoleSchema, inviteMemberSchema, removeMemberSchema } from '@/lib/validation/member';
import { organisationSettingsSchema } from '@/lib/validation/organisation';
import { defineAction } from './define';

const GONE = 'That member is no longer in the organisation.';

export const inviteMemberAction = defineAction({
  allow: 'members.manage',
  schema: inviteMemberSchema,
  notFound: GONE,
  run: async (invite, { member: admin }) => {
    const password = temporaryPassword();
    const { createdAccount } = await addMember({
      organisationId: admin.organisationId,
      actorUserId: admin.userId,
      email: invite.email,
      displayName: invite.displayName,
      role: invite.role,
      temporaryPasswordHash: await hashPassword(password),
    });
    return createdAccount
      ? {
          ok: true,
          message: `${invite.displayName} can now sign in as ${invite.email} with this one-time password, then must choose their own.`,
          secret: password,
          revalidate: '/members',
        }
      : { ok: true, message: `${invite.email} already had an account and joins with their own password.`, revalidate: '/members' };
  },
});

export const changeRoleAction = defineAction({
  allow: 'members.manage',
  schema: changeRoleSchema,
  notFound: GONE,
  run: async (change, { member: admin }) => {
    await changeRole({ organisationId: admin.organisationId, actorUserId: admin.userId, ...change });
    return { ok: true, message: 'Role changed.', revalidate: '/members' };
  },
});

export const removeMemberAction = defineAction({
  allow: 'members.manage',
  schema: removeMemberSchema,
  notFound: GONE,
  run: async (removal, { member: admin }) => {
    await removeMember({ organisationId: admin.organisationId, actorUserId: admin.userId, ...removal });
    return { ok: true, message: 'Member removed.', revalidate: '/members' };
  },
});

export const organisationSettingsAction = defineAction({
  allow: 'members.manage',
  schema: organisationSettingsSchema,
  run: async ({ name }, { member: admin }) => {
    await renameOrganisation(admin.organisationId, name, admin.userId);
    return { ok: true, message: 'Organisation renamed.', revalidate: ['/', 'layout'] };
  },
});
