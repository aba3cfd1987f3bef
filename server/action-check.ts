import type { IncomingHttpHeaders } from 'node:http';
import busboy from 'next/dist/compiled/busboy/index.js';

/**
 * Server actions are public endpoints, and Next answers 500 to many malformed ones (a body that is not an argument
 * list, broken multipart, a foreign Origin). The server checks an action request's body with the same parsers Next
 * uses before Next sees it, and refuses what Next would fail on with a 4xx. What passes is what our pages send.
 */
export interface ActionProblem {
  status: 400 | 403;
  message: string;
}

const NOT_FROM_OUR_PAGES = 'This server action request is not one the app sends.';
const bad = (detail: string): ActionProblem => ({ status: 400, message: `${NOT_FROM_OUR_PAGES} ${detail}` });

/** Next's own limit on an action's arguments (more fails inside Next). */
const MAX_ARGUMENTS = 1000;
const MAX_DEPTH = 32;
/** Next's decoder refuses nested arrays past a million slots; stay well under it. */
const MAX_SLOTS = 500_000;

/**
 * The reference strings of React's reply format that our pages produce: escaped strings, form data, undefined,
 * the non-JSON numbers, dates and big integers. Others (promises, maps, streams, blobs, server references) point at
 * parts of the body Next would resolve and can fail on, so they are refused.
 */
const SAFE_REFERENCE = /^\$(?:\$|K[0-9a-f]{1,8}$|undefined$|Infinity$|-Infinity$|-0$|NaN$|D|n-?\d{1,300}$)/;

/** Checks one decoded value of an argument list: every `$` string is a safe reference; depth and size bounded. */
export function checkReplyValue(root: unknown): string | null {
  if (!Array.isArray(root)) return 'The arguments must be a JSON array.';
  if (root.length > MAX_ARGUMENTS) return `At most ${MAX_ARGUMENTS} arguments.`;
  let slots = 0;
  const stack: { value: unknown; depth: number }[] = [{ value: root, depth: 1 }];
  while (stack.length) {
    const { value, depth } = stack.pop()!;
    if (typeof value === 'string') {
      slots += value.length;
      if (value.startsWith('$') && !SAFE_REFERENCE.test(value)) return 'It holds a reference the app never sends.';
    } else if (value !== null && typeof value === 'object') {
      if (depth > MAX_DEPTH) return 'It is nested too deeply.';
      const children = Array.isArray(value) ? value : Object.values(value);
      slots += children.length;
      for (const child of children) stack.push({ value: child, depth: depth + 1 });
    }
    if (slots > MAX_SLOTS) return 'It is too large.';
  }
  return null;
}

function parseArguments(text: string): string | null {
  let root: unknown;
  try {
    root = JSON.parse(text);
  } catch {
    return 'The arguments are not valid JSON.';
  }
  return checkReplyValue(root);
}

/** The fields of a multipart body, read with the busboy build Next reads action bodies with. */
function multipartFields(headers: IncomingHttpHeaders, body: Buffer): Promise<Map<string, string> | string> {
  return new Promise((resolve) => {
    let parser: ReturnType<typeof busboy>;
    try {
      parser = busboy({ headers, defParamCharset: 'utf8', limits: { fieldSize: body.length + 1 } });
    } catch (error) {
      resolve(`The multipart body cannot be read (${(error as Error).message}).`);
      return;
    }
    const fields = new Map<string, string>();
    let problem: string | null = null;
    parser.on('field', (name, value) => fields.set(name, value));
    parser.on('file', (_name, stream) => {
      problem ??= 'Files are uploaded through the API, not through server actions.';
      stream.resume();
    });
    parser.on('error', (error: Error) => resolve(`The multipart body cannot be read (${error.message}).`));
    parser.on('close', () => resolve(problem ?? fields));
    parser.end(body);
  });
}

/** A POST that names its action in the `next-action` header: the argument list is the body or its field "0". */
export async function checkFetchAction(headers: IncomingHttpHeaders, body: Buffer): Promise<ActionProblem | null> {
  if (!String(headers['content-type'] ?? '').startsWith('multipart/form-data')) {
    const problem = parseArguments(body.toString('utf8'));
    return problem ? bad(problem) : null;
  }
  const fields = await multipartFields(headers, body);
  if (typeof fields === 'string') return bad(fields);
  const root = fields.get('0');
  if (root === undefined) return bad('The argument list (field "0") is missing.');
  const problem = parseArguments(root);
  return problem ? bad(problem) : null;
}

/**
 * A multipart POST to a page without the header: a form submitted before the page's scripts ran. Next reads it with
 * the platform's FormData parser, then decodes `$ACTION_REF_n` metadata and its bound arguments.
 */
export async function checkFormPost(headers: IncomingHttpHeaders, body: Buffer): Promise<ActionProblem | null> {
  let form: FormData;
  try {
    form = await new Response(new Blob([new Uint8Array(body)]), { headers: { 'content-type': String(headers['content-type']) } }).formData();
  } catch {
    return bad('The multipart body cannot be read.');
  }
  for (const key of form.keys()) {
    if (!key.startsWith('$ACTION_REF_')) continue;
    const prefix = `$ACTION_${key.slice('$ACTION_REF_'.length)}:`;
    const meta = parseJson(form.get(`${prefix}0`));
    if (!isActionMeta(meta)) return bad('The form names its action in a way the app never does.');
    if (meta.bound !== null) {
      const problem = parseArguments(String(form.get(`${prefix}${parseInt(meta.bound.slice(2), 16)}`) ?? ''));
      if (problem) return bad(problem);
    }
  }
  return null;
}

function parseJson(value: FormDataEntryValue | null): unknown {
  if (typeof value !== 'string') return undefined;
  try {
    return JSON.parse(value);
  } catch {
    return undefined;
  }
}

function isActionMeta(value: unknown): value is { id: string; bound: string | null } {
  if (!value || typeof value !== 'object') return false;
  const { id, bound } = value as { id?: unknown; bound?: unknown };
  return typeof id === 'string' && (bound === null || (typeof bound === 'string' && /^\$@[0-9a-f]{1,8}$/.test(bound)));
}

/**
 * Next refuses an action whose Origin is not this host (with a 500); we refuse it first with a 403. A request without
 * an Origin is not a browser's cross-site request and passes, as it does in Next.
 */
export function foreignOrigin(headers: IncomingHttpHeaders): ActionProblem | null {
  const origin = headers.origin;
  if (origin === undefined) return null;
  const forwarded = headers['x-forwarded-host'];
  const host = (Array.isArray(forwarded) ? forwarded[0] : forwarded?.split(',')[0])?.trim() || headers.host;
  let originHost: string | null = null;
  try {
    originHost = new URL(origin).host;
  } catch {
    originHost = null;
  }
  if (originHost && originHost === host) return null;
  return { status: 403, message: 'Server actions only run for pages of this site.' };
}
