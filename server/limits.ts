import { BODY_LIMITS } from '@/lib/http/limits';
import type { ActionIndex } from './actions';

const IMPORT_PATH = /^\/api\/v1\/sites\/[^/]+\/items\/import\/?$/;
const SIGN_IN_PATHS = new Set(['/api/v1/session', '/sign-in', '/sign-up']);

/** The most body bytes a request may send, by its (decoded) path and, for a server action, the action it names. */
export function bodyLimit(path: string, actionId: string | undefined, actions: ActionIndex): number {
  if (IMPORT_PATH.test(path)) return BODY_LIMITS.importFile + BODY_LIMITS.importSlack;
  if (SIGN_IN_PATHS.has(path.replace(/\/$/, '')) || (actionId && actions.signIn.has(actionId))) return BODY_LIMITS.signIn;
  return BODY_LIMITS.standard;
}
