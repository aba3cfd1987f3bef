import { describe, expect, it } from 'vitest';
import { toFieldErrors, toFieldIssues } from '@/lib/validation/issues';
import { inviteMemberSchema } from '@/lib/validation/member';
import { passwordChangeSchema, signUpSchema } from '@/lib/validation/user';

describe('user and member schemas', () => {
  it('name every bad field with its limit', () => {
    const r = signUpSchema.safeParse({ organisationName: 'A', displayName: '', email: 'a@', password: 'x'.repeat(73) });
    expect(r.success).toBe(false);
    if (r.success) return;
    expect(toFieldErrors(r.error)).toEqual({
      organisationName: 'Organisation name must be at least 2 characters.',
      displayName: 'Name is required.',
      email: 'E-mail must be a valid address, like name@example.com.',
      password: 'Password must be at most 72 characters.',
    });
  });

  it('trims names and e-mail, keeping the e-mail’s case until it is stored', () => {
    const r = signUpSchema.parse({ organisationName: '  Ness Ltd ', displayName: ' Ann ', email: ' Ann@X.example ', password: 'long-enough-pw' });
    expect(r).toMatchObject({ organisationName: 'Ness Ltd', displayName: 'Ann', email: 'Ann@X.example' });
  });

  it('puts a mismatched confirmation on the confirmation field', () => {
    const r = passwordChangeSchema.safeParse({ currentPassword: 'a', newPassword: 'long-enough-1', confirmPassword: 'long-enough-2' });
    expect(r.success).toBe(false);
    if (!r.success) expect(toFieldIssues(r.error)).toEqual([{ path: 'confirmPassword', message: 'The two new passwords differ.' }]);
  });

  it('accepts only the four roles', () => {
    expect(inviteMemberSchema.safeParse({ displayName: 'A', email: 'a@b.example', role: 'owner' }).success).toBe(false);
    for (const role of ['admin', 'engineer', 'reviewer', 'viewer']) {
      expect(inviteMemberSchema.safeParse({ displayName: 'A', email: 'a@b.example', role }).success).toBe(true);
    }
  });
});
