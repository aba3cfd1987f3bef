/**
 * Request body limits, enforced by the server in front of Next (server/) while a body streams in. Every route
 * gets STANDARD unless it is named here. Next's own server-action limit (next.config.ts) sits above all of them,
 * so a refusal is always our 413 rather than Next's 500.
 */
const KIB = 1024;
const MIB = 1024 * KIB;

export const BODY_LIMITS = {
  /** Every route, page and server action not named below. */
  standard: 1 * MIB,
  /** Sign-in and sign-up, route and actions: an e-mail, a password and two names. */
  signIn: 8 * KIB,
  /** The CSV import's file alone (the register's import checks the file against this too). */
  importFile: 5 * MIB,
  /** What the multipart wrapping and the mode field add around the import's file. */
  importSlack: 64 * KIB,
} as const;

/** Next's own server-action limit: above every limit of ours, so ours always answers first. */
export const NEXT_ACTION_BODY_LIMIT = '2mb';

/** "1 MB", "8 KB": how a refusal states the limit. */
export function formatBytes(bytes: number): string {
  if (bytes >= MIB) return `${Number((bytes / MIB).toFixed(2))} MB`;
  return `${Number((bytes / KIB).toFixed(1))} KB`;
}
