import { describe, expect, it } from 'vitest';
import { can, POLICY, rolesFor } from '@/lib/auth/policy';
import { ROLES } from '@/lib/domain';

// The duties each role is told it has on the overview page (components/layout/overview-panels.tsx ROLE_DUTY):
// admins manage members and do everything; engineers change the register; reviewers and viewers read.
const EXPECTED = {
  'register.edit': ['admin', 'engineer'],
  'ladder.edit': ['admin'],
  'members.manage': ['admin'],
};

describe('the permission table', () => {
  it('allows each action to exactly the roles whose duty it is', () => {
    expect(POLICY).toEqual(EXPECTED);
    for (const [action, allowed] of Object.entries(EXPECTED)) {
      expect(rolesFor(action as keyof typeof POLICY)).toEqual(allowed);
      for (const role of ROLES) expect(can({ role }, action as keyof typeof POLICY)).toBe(allowed.includes(role));
    }
  });

  it('refuses a role it does not know', () => {
    expect(can({ role: 'owner' as never }, 'register.edit')).toBe(false);
  });
});
