import { z } from 'zod';

/**
 * Where outside input becomes an object. A key that names a prototype link would let one request change
 * `Object.prototype` for the whole process (and so every organisation's queries), so no path segment may be one of
 * these, and every object built here has a null prototype.
 */
const REFUSED_KEYS: ReadonlySet<string> = new Set(['__proto__', 'constructor', 'prototype']);

/** Deeper than any body Plumbline reads (a drop case's layers' media are 4 levels down). */
export const MAX_JSON_DEPTH = 16;

/** A form field or JSON key that cannot become an object key, or a JSON body nested past MAX_JSON_DEPTH. */
export class UnsafeInputError extends Error {
  constructor(
    /** The dotted path of the key at fault, as the client sent it. */
    public readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = 'UnsafeInputError';
  }
}

/** Whether a key would name a prototype link if it became an object's key. */
export function isRefusedKey(key: string): boolean {
  return REFUSED_KEYS.has(key);
}

const refusedKey = (field: string) => new UnsafeInputError(field, `The field name "${field}" is not accepted.`);

function checkName(name: string): void {
  if (name.split('.').some((part) => REFUSED_KEYS.has(part))) throw refusedKey(name);
}

// Duck-typed rather than `instanceof FormData`: the FormData an action receives is built by Next's decoder, whose
// class need not be this realm's global.
function isFormLike(value: unknown): value is FormData {
  if (typeof value !== 'object' || value === null) return false;
  const form = value as FormData;
  return typeof form.entries === 'function' && typeof form.getAll === 'function' && typeof form.append === 'function';
}

/**
 * A form's text fields as a null-prototype record; repeated names keep the last value. A server action is a public
 * endpoint whose arguments the client chooses: anything that is not a FormData reads as an empty form, so the schema
 * names the missing fields instead of the action failing on a number or a list.
 */
export function formToObject(form: unknown): Record<string, string> {
  const out: Record<string, string> = Object.create(null);
  if (!isFormLike(form)) return out;
  for (const [name, value] of form.entries()) {
    checkName(name);
    if (typeof value === 'string') out[name] = value;
  }
  return out;
}

type Tree = Record<string, unknown>;

/**
 * Turns dotted form names ("dimensions.length", "levels.0.name") into nested null-prototype objects and lists, so
 * forms and JSON share one schema.
 */
export function unflatten(flat: Record<string, string>): Tree {
  const out: Tree = Object.create(null);
  for (const key of Object.keys(flat)) {
    checkName(key);
    const parts = key.split('.');
    let node = out;
    for (const part of parts.slice(0, -1)) {
      if (typeof node[part] !== 'object' || node[part] === null) node[part] = Object.create(null);
      node = node[part] as Tree;
    }
    node[parts[parts.length - 1]] = flat[key];
  }
  return listify(out) as Tree;
}

function listify(node: unknown): unknown {
  if (typeof node !== 'object' || node === null) return node;
  const keys = Object.keys(node);
  if (keys.length && keys.every((k) => /^\d+$/.test(k))) {
    return keys.sort((a, b) => Number(a) - Number(b)).map((k) => listify((node as Tree)[k]));
  }
  const out: Tree = Object.create(null);
  for (const k of keys) out[k] = listify((node as Tree)[k]);
  return out;
}

/**
 * A parsed JSON value rebuilt with null-prototype objects, refusing prototype keys at any depth and nesting past
 * MAX_JSON_DEPTH. The depth bound comes first, so the walk's own recursion stays shallow whatever the body.
 */
export function safeJson(value: unknown, path: string[] = []): unknown {
  if (typeof value !== 'object' || value === null) return value;
  const where = path.join('.') || '(body)';
  if (path.length >= MAX_JSON_DEPTH) throw new UnsafeInputError(where, `The body is nested more than ${MAX_JSON_DEPTH} levels deep.`);
  if (Array.isArray(value)) return value.map((v, i) => safeJson(v, [...path, String(i)]));
  const out: Tree = Object.create(null);
  for (const key of Object.keys(value)) {
    if (REFUSED_KEYS.has(key)) throw refusedKey([...path, key].join('.'));
    out[key] = safeJson((value as Tree)[key], [...path, key]);
  }
  return out;
}

/** The input's field error, in the shape a schema's failure takes, so callers report it like any other field. */
export function unsafeInputFailure(error: UnsafeInputError): { success: false; error: z.ZodError } {
  return { success: false, error: new z.ZodError([{ code: 'custom', path: [error.field], message: error.message, input: undefined }]) };
}

/**
 * A posted form read for a server action: its text fields as posted, and the values its schema parses (nested
 * when the form uses dotted names). A refused field name comes back as a failure naming that field, in the shape of
 * a schema's failure, so the action reports it like any other field.
 */
export function readForm(
  form: unknown,
  nested = false,
): { success: true; fields: Record<string, string>; values: Record<string, unknown> } | { success: false; error: z.ZodError } {
  try {
    const fields = formToObject(form);
    return { success: true, fields, values: nested ? unflatten(fields) : fields };
  } catch (error) {
    if (error instanceof UnsafeInputError) return unsafeInputFailure(error);
    throw error;
  }
}
