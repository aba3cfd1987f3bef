import type { IncomingMessage } from 'node:http';
import { CLIENT_ADDRESS_HEADER, CSP_HEADER, REQUEST_ID_HEADER } from '@/lib/http/header-names';

/** Claims a client could make that only a trusted proxy may: gone unless TRUST_PROXY_HOPS says proxies are in front. */
const PROXY_HEADERS = ['x-forwarded-for', 'x-forwarded-host', 'x-forwarded-proto', 'x-forwarded-port', 'forwarded', 'x-real-ip'];
/** Set only by this server, whatever a client sent under these names. */
const OWN_HEADERS = [REQUEST_ID_HEADER, CLIENT_ADDRESS_HEADER, CSP_HEADER, `${CSP_HEADER}-report-only`];

export function firstHeader(req: IncomingMessage, name: string): string | undefined {
  const value = req.headers[name];
  return Array.isArray(value) ? value[0] : value;
}

/**
 * Puts our id, the caller's address and the page policy (or none) on the request Next will read, after deleting
 * whatever a client sent under those names and, with no trusted proxy, its X-Forwarded-* claims. Both the parsed
 * headers and the raw list they were built from are rewritten.
 */
export function setRequestHeaders(req: IncomingMessage, own: { id: string; address: string; policy: string | null }, trustProxyHops: number): void {
  const set: Record<string, string> = { [REQUEST_ID_HEADER]: own.id, [CLIENT_ADDRESS_HEADER]: own.address };
  if (own.policy) set[CSP_HEADER] = own.policy;
  const gone = new Set(trustProxyHops > 0 ? OWN_HEADERS : [...OWN_HEADERS, ...PROXY_HEADERS]);
  for (const name of gone) delete req.headers[name];
  Object.assign(req.headers, set);
  const raw: string[] = [];
  for (let i = 0; i + 1 < req.rawHeaders.length; i += 2) {
    if (!gone.has(req.rawHeaders[i].toLowerCase())) raw.push(req.rawHeaders[i], req.rawHeaders[i + 1]);
  }
  for (const [name, value] of Object.entries(set)) raw.push(name, value);
  req.rawHeaders = raw;
}
