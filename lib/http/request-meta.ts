import { headers } from 'next/headers';
import { CLIENT_ADDRESS_HEADER, CSP_HEADER, REQUEST_ID_HEADER } from './header-names';

export { CLIENT_ADDRESS_HEADER, CSP_HEADER, REQUEST_ID_HEADER };

/** The id the server gave this request: in every log line and every 500 answer. */
export async function requestId(): Promise<string> {
  return (await headers()).get(REQUEST_ID_HEADER) ?? 'none';
}

/**
 * The caller's address: the socket's, or with TRUST_PROXY_HOPS set, the one the nearest trusted proxy saw.
 * Never the client's own X-Forwarded-For claim.
 */
export async function clientAddress(): Promise<string> {
  return ((await headers()).get(CLIENT_ADDRESS_HEADER) ?? 'unknown').slice(0, 64);
}

/** This request's Content-Security-Policy nonce, for the few elements Next does not nonce itself. */
export async function cspNonce(): Promise<string | undefined> {
  return /'nonce-([A-Za-z0-9+/=]+)'/.exec((await headers()).get(CSP_HEADER) ?? '')?.[1];
}
