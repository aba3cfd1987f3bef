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

/** The first message per field, keyed as the form names its inputs, for useActionState. */
export function toFieldErrors(error: z.ZodError): Record<string, string> {
  const out: Record<string, string> = {};
  for (const { path, message } of toFieldIssues(error)) {
    if (!(path in out)) out[path] = message;
  }
  return out;
}

/** A form's fields as a plain object; repeated names keep the last value. */
export function formToObject(form: FormData): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of form.entries()) {
    if (typeof v === 'string') out[k] = v;
  }
  return out;
}
