/**
 * Headers the Plumbline server (server/) sets on every request before Next sees it. It deletes any value a client
 * sent under these names first, so code inside the app can trust them. (A module of its own: the server loads it
 * before Next is ready, when next/headers cannot be loaded yet.)
 */
export const REQUEST_ID_HEADER = 'x-request-id';
export const CLIENT_ADDRESS_HEADER = 'x-plumbline-client-address';
/** Next reads the script nonce from the policy the server puts on the request under this name. */
export const CSP_HEADER = 'content-security-policy';
