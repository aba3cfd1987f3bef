import { z } from 'zod';
import { AuthError, requireRole, type RoleSet } from '@/lib/auth';
import { isDatabaseUnreachable } from '@/db/connection-errors';
import type { Member } from '@/db/types';
import { ConflictError, NotFoundError, UnavailableError } from '@/lib/errors';
import { requestId } from '@/lib/http/request-meta';
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

/** A JSON object body, for handlers whose schema depends on what the body says (its unit system, say). */
export async function readJsonObject(request: Request): Promise<Record<string, unknown>> {
  let body: unknown;
  try {
    body = await request.json();
  } catch {
    throw new BodyError({ path: '(body)', message: 'The body must be JSON.' });
  }
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

/**
 * Every route handler goes through here: the role check comes first, then the handler; known errors map to
 * their statuses (401/403 auth, 400 validation with field paths, 404, 409/422 conflicts).
 */
export function apiRoute<P = Record<string, never>>(roles: RoleSet, handler: Handler<P>) {
  return async (request: Request, context: { params: Promise<P> }): Promise<Response> => {
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
  throw error;
}

const DATABASE_UNREACHABLE = 'The database cannot be reached just now, so the request was not completed. Try again in a minute.';

/** 503 in the shape of every server-side failure, with the request id for the logs and a time to retry after. */
async function unavailable(cause: unknown, message: string, retryAfterS: number): Promise<Response> {
  const id = await requestId();
  // The code and message only: a driver's error can carry the statement's parameters, and so a user's input.
  const { code, message: reason } = cause as { code?: string; message?: string };
  console.error(JSON.stringify({ level: 'error', msg: 'answered 503', request_id: id, code, reason: String(reason).split(' - ').pop() }));
  return Response.json({ error: message, request_id: id }, { status: 503, headers: { 'retry-after': String(retryAfterS) } });
}
