import { z } from 'zod';
import { AuthError, requireRole, type RoleSet } from '@/lib/auth';
import { isDatabaseUnreachable } from '@/db/connection-errors';
import type { Member } from '@/db/types';
import { ConflictError, NotFoundError, UnavailableError } from '@/lib/errors';
import { SERVER_FAULT } from '@/lib/http/messages';
import { requestId } from '@/lib/http/request-meta';
import { requestLog } from '@/lib/log';
import { ownOrigins } from './origin';
import { safeJson, UnsafeInputError } from '@/lib/validation/input';
import { toFieldIssues, type FieldIssue } from '@/lib/validation/issues';

export function jsonError(status: number, errors: FieldIssue[] | string): Response {
  const body = typeof errors === 'string' ? { error: errors } : { errors };
  return Response.json(body, { status });
}

class BodyError extends Error {
  constructor(public readonly issue: FieldIssue) {
    super(issue.message);
  }
}

/** Reads a JSON object body and validates it; anything else answers 400 with the field at fault. */
export async function readJson<S extends z.ZodType>(request: Request, schema: S): Promise<z.output<S>> {
  return schema.parse(await readJsonObject(request));
}

/**
 * The one JSON body reader: any JSON value, rebuilt with null-prototype objects; a prototype key at any depth
 * ("__proto__", "constructor", "prototype") or nesting deeper than MAX_JSON_DEPTH answers 400 naming the path.
 */
export async function readJsonBody(request: Request): Promise<unknown> {
  let parsed: unknown;
  try {
    parsed = JSON.parse(await request.text());
  } catch {
    throw new BodyError({ path: '(body)', message: 'The body must be JSON.' });
  }
  try {
    return safeJson(parsed);
  } catch (error) {
    if (error instanceof UnsafeInputError) throw new BodyError({ path: error.field, message: error.message });
    throw error;
  }
}

/** A JSON object body, for handlers whose schema depends on what the body says (its unit system, say). */
export async function readJsonObject(request: Request): Promise<Record<string, unknown>> {
  const body = await readJsonBody(request);
  if (typeof body !== 'object' || body === null || Array.isArray(body)) {
    throw new BodyError({ path: '(body)', message: 'The body must be a JSON object.' });
  }
  return body as Record<string, unknown>;
}

/** Fails the request with 400 and the field at fault, the same shape as a validation error. */
export function badRequest(path: string, message: string): never {
  throw new BodyError({ path, message });
}

type Handler<P> = (request: Request, context: { member: Member; params: P }) => Promise<Response>;

/** What a route's writes carry: a JSON body, or a file upload. */
export type BodyKind = 'json' | 'multipart';
const MEDIA_TYPE: Record<BodyKind, string> = { json: 'application/json', multipart: 'multipart/form-data' };
const WRITES = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/**
 * Refuses a write a page on another site could have sent with a member's cookie (403), and a write body that is not
 * the route's kind (415): a cross-site form can post text/plain or form data without a preflight, never JSON.
 * Browsers send Origin and Sec-Fetch-Site on such requests; a request with neither (curl, scripts) holds no one
 * else's cookie and passes. Exported for the sign-in route, which has no role to check.
 */
export function refuseCrossSite(request: Request, body: BodyKind = 'json'): Response | null {
  if (!WRITES.has(request.method)) return null;
  const origin = request.headers.get('origin');
  const site = request.headers.get('sec-fetch-site');
  if ((origin !== null && !ownOrigins(request).has(origin)) || (site !== null && site !== 'same-origin' && site !== 'none')) {
    return jsonError(403, 'Cross-site requests are refused: send this request from Plumbline itself.');
  }
  // A DELETE reads no body, so only one that sends a body must say what it is.
  const length = request.headers.get('content-length');
  const sendsBody = request.method !== 'DELETE' || (length !== null && length !== '0') || request.headers.has('transfer-encoding');
  const type = (request.headers.get('content-type') ?? '').split(';')[0].trim().toLowerCase().slice(0, 100);
  if (sendsBody && type !== MEDIA_TYPE[body]) {
    return jsonError(415, `Send the body as ${MEDIA_TYPE[body]}${type ? `, not ${type}` : ''}.`);
  }
  return null;
}

/**
 * Every route handler goes through here: a write from another site or with the wrong content type is refused
 * before anything else, then the role check, then the handler; known errors map to their statuses (401/403 auth,
 * 400 validation with field paths, 404, 409/422 conflicts).
 */
export function apiRoute<P = Record<string, never>>(roles: RoleSet, handler: Handler<P>, options: { body?: BodyKind } = {}) {
  return async (request: Request, context: { params: Promise<P> }): Promise<Response> => {
    const refused = refuseCrossSite(request, options.body);
    if (refused) return refused;
    try {
      const member = await requireRole(roles, 'throw');
      return await handler(request, { member, params: await context.params });
    } catch (error) {
      return errorResponse(error);
    }
  };
}

export async function errorResponse(error: unknown): Promise<Response> {
  if (error instanceof AuthError) return jsonError(error.status, error.message);
  if (error instanceof BodyError) return jsonError(400, [error.issue]);
  if (error instanceof z.ZodError) return jsonError(400, toFieldIssues(error));
  if (error instanceof NotFoundError) return jsonError(404, error.message);
  if (error instanceof ConflictError) return jsonError(error.status, [{ path: error.field, message: error.message }]);
  if (error instanceof UnavailableError) return unavailable(error, error.message, error.retryAfterS);
  if (isDatabaseUnreachable(error)) return unavailable(error, DATABASE_UNREACHABLE, 5);
  (await requestLog()).error({ err: error }, 'route handler failed');
  return Response.json({ error: SERVER_FAULT, request_id: await requestId().catch(() => 'none') }, { status: 500 });
}

const DATABASE_UNREACHABLE = 'The database cannot be reached just now, so the request was not completed. Try again in a minute.';

/** 503 in the shape of every server-side failure, with the request id for the logs and a time to retry after. */
async function unavailable(cause: unknown, message: string, retryAfterS: number): Promise<Response> {
  const id = await requestId().catch(() => 'none');
  // The code and message only: a driver's error can carry the statement's parameters, and so a user's input.
  const { code, message: reason } = cause as { code?: string; message?: string };
  (await requestLog()).error({ code, reason: String(reason).split(' - ').pop() }, 'answered 503');
  return Response.json({ error: message, request_id: id }, { status: 503, headers: { 'retry-after': String(retryAfterS) } });
}
