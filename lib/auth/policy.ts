import type { Role } from '@/lib/domain';

/**
 * Who may do what: the one table of permissions. Pages, server actions, route handlers and the header's links all
 * ask here, by action name, instead of comparing roles themselves. requireRole(rolesFor(action)) stays the gate at
 * the top of every action, route and private page; can() only decides what a page offers. Reading is open to every
 * member (requireRole('any')), so it has no entry. Pure: it imports no session code, so any component can ask.
 */
export const POLICY = {
  /** Create, change and delete sites, levels and items, and import items from CSV. */
  'register.edit': ['admin', 'engineer'],
  /** Replace the organisation's consequence ladder, which reclassifies every item. */
  'ladder.edit': ['admin'],
  /** Invite and remove members, change roles, rename the organisation. */
  'members.manage': ['admin'],
} as const satisfies Record<string, readonly Role[]>;

export type Action = keyof typeof POLICY;

/** The roles allowed an action, for requireRole() and apiRoute(). */
export function rolesFor(action: Action): readonly Role[] {
  return POLICY[action];
}

export function can(member: { role: Role }, action: Action): boolean {
  return (POLICY[action] as readonly Role[]).includes(member.role);
}
