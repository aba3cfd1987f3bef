import { z } from 'zod';
import { ROLES } from '@/lib/domain';
import { uuidField } from './ids';
import { userFields } from './user';

const role = z.enum(ROLES, { error: 'Role must be admin, engineer, reviewer or viewer.' });
const userId = uuidField('Member id must be a UUID.');

export const inviteMemberSchema = z.object({
  displayName: userFields.displayName,
  email: userFields.email,
  role,
});
export type InviteMemberInput = z.infer<typeof inviteMemberSchema>;

export const changeRoleSchema = z.object({ userId, role });

export const removeMemberSchema = z.object({ userId });
