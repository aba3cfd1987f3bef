/** A member's role in an organisation. What each may do is decided in lib/auth/policy.ts, not here. */
export const ROLES = ['admin', 'engineer', 'reviewer', 'viewer'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Admin',
  engineer: 'Engineer',
  reviewer: 'Reviewer',
  viewer: 'Viewer',
};
