import { randomUUID } from 'node:crypto';

/** What a trusted proxy may hand us as a request id: short, and safe to put in a header, a log line or a page. */
const SAFE_ID = /^[A-Za-z0-9][A-Za-z0-9._:-]{0,63}$/;

/**
 * This request's id: a fresh UUID, or behind trusted proxies (hops > 0) the id the nearest proxy sent, if it is a
 * short safe token. A client talking to us directly never chooses its own id.
 */
export function requestIdFor(sent: string | string[] | undefined, hops: number): string {
  if (hops > 0 && typeof sent === 'string' && SAFE_ID.test(sent)) return sent;
  return randomUUID();
}
