import type { OutgoingHttpHeader, OutgoingHttpHeaders, ServerResponse } from 'node:http';

export interface ResponseRules {
  /** Private data: nothing on the way may store the answer. */
  noStore: boolean;
  /** A 5xx that is not JSON is replaced by this JSON body (API routes, server actions); null keeps Next's. */
  serverErrorBody: string | null;
}

type Callback = (error?: Error | null) => void;

function isJson(contentType: number | string | string[] | undefined): boolean {
  return String(contentType ?? '').toLowerCase().startsWith('application/json');
}

/** What Node's writeHead accepts as headers: an object, or a flat list of names and values. */
function mergeHeaders(res: ServerResponse, headers: OutgoingHttpHeaders | OutgoingHttpHeader[] | undefined): void {
  if (!headers) return;
  if (!Array.isArray(headers)) {
    for (const [name, value] of Object.entries(headers)) if (value !== undefined) res.setHeader(name, value);
    return;
  }
  for (let i = 0; i + 1 < headers.length; i += 2) res.appendHeader(String(headers[i]), headers[i + 1] as string);
}

/**
 * Applies the rules at the moment the status and headers are final: the first of writeHead, write or end, however
 * Next sends its answer. A replaced 5xx keeps its status; Next's body for it is dropped unread.
 */
export function guardResponse(res: ServerResponse, rules: ResponseRules): void {
  const original = { writeHead: res.writeHead, write: res.write, end: res.end };
  let replacement: string | null | undefined;

  const decide = () => {
    if (replacement !== undefined || res.headersSent) return;
    if (rules.noStore) res.setHeader('Cache-Control', 'no-store');
    replacement = null;
    if (rules.serverErrorBody !== null && res.statusCode >= 500 && !isJson(res.getHeader('content-type'))) {
      replacement = rules.serverErrorBody;
      for (const name of ['content-length', 'content-encoding', 'etag']) res.removeHeader(name);
      res.setHeader('Content-Type', 'application/json; charset=utf-8');
    }
  };

  res.writeHead = function writeHead(this: ServerResponse, status: number, ...rest: unknown[]) {
    const message = typeof rest[0] === 'string' ? rest[0] : undefined;
    this.statusCode = status;
    mergeHeaders(this, (message === undefined ? rest[0] : rest[1]) as OutgoingHttpHeaders | undefined);
    decide();
    const writeHeadOf = original.writeHead as (this: ServerResponse, status: number, message?: string) => ServerResponse;
    return message === undefined ? writeHeadOf.call(this, this.statusCode) : writeHeadOf.call(this, this.statusCode, message);
  } as ServerResponse['writeHead'];

  res.write = function write(this: ServerResponse, ...args: unknown[]) {
    decide();
    if (!replacement) return (original.write as (...a: unknown[]) => boolean).apply(this, args);
    const callback = args.find((a) => typeof a === 'function') as Callback | undefined;
    if (callback) process.nextTick(callback);
    return true;
  } as ServerResponse['write'];

  res.end = function end(this: ServerResponse, ...args: unknown[]) {
    decide();
    if (!replacement) return (original.end as (...a: unknown[]) => ServerResponse).apply(this, args);
    const callback = args.find((a) => typeof a === 'function') as (() => void) | undefined;
    return (original.end as (this: ServerResponse, body: string, done?: () => void) => ServerResponse).call(this, replacement, callback);
  } as ServerResponse['end'];
}
