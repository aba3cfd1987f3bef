/**
 * Whether an error means the database could not be reached (refused, reset, timed out, shutting down, pool
 * exhausted) rather than that a query was wrong. Such a request can be retried later; pg and knex report it in
 * several shapes, sometimes wrapped (a knex query error prefixes the SQL; a connect error may be an AggregateError
 * of one error per address, or carry its reason as `cause`).
 */
const NETWORK_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ECONNABORTED', 'ETIMEDOUT', 'EHOSTUNREACH', 'ENETUNREACH', 'ENOTFOUND', 'EAI_AGAIN', 'EPIPE']);
// SQLSTATE class 08 is "connection exception"; 57P01–57P03 the server shutting down or starting up; 53300 too many connections.
const SQLSTATE = /^(08[0-9A-Z]{3}|57P0[1-3]|53300)$/;
const MESSAGES = [
  /Connection terminated/i,
  /Timeout acquiring a connection/i,
  /timeout expired/i,
  /timeout exceeded when trying to connect/i,
  /is not queryable/i,
  /Query read timeout/i,
];

export function isDatabaseUnreachable(error: unknown, depth = 0): boolean {
  if (!error || typeof error !== 'object' || depth > 4) return false;
  const e = error as { code?: unknown; name?: unknown; message?: unknown; cause?: unknown; errors?: unknown };
  if (typeof e.code === 'string' && (NETWORK_CODES.has(e.code) || SQLSTATE.test(e.code))) return true;
  if (e.name === 'KnexTimeoutError') return true;
  if (typeof e.message === 'string' && MESSAGES.some((m) => m.test(e.message as string))) return true;
  if (Array.isArray(e.errors) && e.errors.some((inner) => isDatabaseUnreachable(inner, depth + 1))) return true;
  return isDatabaseUnreachable(e.cause, depth + 1);
}
