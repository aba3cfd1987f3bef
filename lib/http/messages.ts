/** What every remaining 500 says, beside its request id: from a route handler, a server action or the server itself. */
export const SERVER_FAULT = 'The server could not complete this request. Nothing you saved before it has been lost.';
