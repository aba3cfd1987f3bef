import { isDatabaseUnreachable } from '@/db/connection-errors';
import type { ActionState } from './state';

// A change is one transaction: if the connection died before the commit nothing of it was kept, and if only the
// answer was lost it was kept whole. Either way the user should look before trying again.
export const DATABASE_UNREACHABLE_MESSAGE =
  'The database cannot be reached just now, so this change may not have been saved (a change is never half-saved). Check, and try again in a minute.';

/**
 * Wraps a server action so that a database outage, from its role check to its commit, answers a message in the
 * form instead of the error page; every other error (redirects and forbidden() included) passes through.
 */
export function outageSafe<A extends unknown[]>(action: (...args: A) => Promise<ActionState>): (...args: A) => Promise<ActionState> {
  return async (...args) => {
    try {
      return await action(...args);
    } catch (error) {
      if (isDatabaseUnreachable(error)) return { message: DATABASE_UNREACHABLE_MESSAGE };
      throw error;
    }
  };
}
