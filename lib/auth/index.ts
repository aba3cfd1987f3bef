import 'server-only';
export { AuthError, endEverySession, endOtherSessions, endSession, getSession, requireRole, startSession } from './session';
export type { RoleSet, SessionData } from './session';
export { authenticate, WRONG_CREDENTIALS } from './sign-in';
export { hashPassword, temporaryPassword, verifyPassword } from './password';
