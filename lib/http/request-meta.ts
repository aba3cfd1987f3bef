import { headers } from 'next/headers';

/**
 * Headers the Plumbline server (server/) sets on every request before Next sees it. It deletes any value a client
 * sent under these names first, so code inside the app can trust them.
 */
export const REQUEST_ID_HEADER = 'x-request-id';
export const CLIENT_ADDRESS_HEADER = 'x-plumbline-client-address';

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
