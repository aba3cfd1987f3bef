import type { Member } from '@/db/types';

/** The session as the API shows it. */
export function memberJson(member: Member) {
  return {
    user: {
      id: member.userId,
      email: member.email,
      display_name: member.displayName,
      unit_system: member.unitSystem,
      must_change_password: member.mustChangePassword,
    },
    organisation: { id: member.organisationId, name: member.organisationName },
    role: member.role,
  };
}
