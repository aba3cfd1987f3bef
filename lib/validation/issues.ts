import type { z } from 'zod';

export interface FieldIssue {
  path: string;
  message: string;
}

/** Flat, dotted field paths ("object.mass_kg") for API clients. */
export function toFieldIssues(error: z.ZodError): FieldIssue[] {
  return error.issues.map((issue) => ({
    path: issue.path.length ? issue.path.map(String).join('.') : '(body)',
    message: issue.message,
  }));
}

/**
 * The first message per field, keyed as the form names its inputs, for useActionState. A plain object, because
 * React sends only those to the browser; defined rather than assigned, so a refused name such as "__proto__" is
 * kept as a key instead of reaching the prototype.
 */
export function toFieldErrors(error: z.ZodError): Record<string, string> {
  const out: Record<string, string> = {};
  for (const { path, message } of toFieldIssues(error)) {
    if (!Object.hasOwn(out, path)) Object.defineProperty(out, path, { value: message, enumerable: true, writable: true, configurable: true });
  }
  return out;
}
