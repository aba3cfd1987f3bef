import { describe, expect, it } from 'vitest';
import { BODY_LIMITS } from '@/lib/http/limits';
import { actionId, rawRequest } from './helpers';

// Limits by route (README "Limits and status codes"): the import 5 MB plus 64 KB of multipart wrapping, sign-in
// 8 KB, everything else 1 MB. Each is checked both ways a client can send a body, and just under each limit the
// request must reach the app (which then answers for itself: 401, 400), so the limit is not refusing everything.
// Linux lets loopback sockets buffer tens of megabytes (tcp_rmem's maximum is 32 MB on these machines), so a client
// can hand over that much before the server has even looked at it: "sent less than the whole" only shows the server
// stopped reading when the whole is well beyond what both sockets' buffers can hold.
const BEYOND_SOCKET_BUFFERS = 160 * 1024 * 1024;
const IMPORT = '/api/v1/sites/6f1c1d7e-0000-4000-8000-000000000000/items/import';
const cases: { name: string; path: string; headers: Record<string, string>; limit: number }[] = [
  { name: 'the CSV import', path: IMPORT, headers: { 'content-type': 'multipart/form-data; boundary=x' }, limit: BODY_LIMITS.importFile + BODY_LIMITS.importSlack },
  { name: 'the sign-in route', path: '/api/v1/session', headers: { 'content-type': 'application/json' }, limit: BODY_LIMITS.signIn },
  { name: 'an ordinary route', path: '/api/v1/sites', headers: { 'content-type': 'application/json' }, limit: BODY_LIMITS.standard },
  { name: 'the sign-in action', path: '/sign-in', headers: { 'content-type': 'text/plain', 'next-action': actionId('signInAction') }, limit: BODY_LIMITS.signIn },
  { name: 'another server action', path: '/sites', headers: { 'content-type': 'text/plain', 'next-action': actionId('saveSiteAction') }, limit: BODY_LIMITS.standard },
];

describe.each(cases)('the body limit of $name', ({ path, headers, limit }) => {
  it('refuses a Content-Length over the limit with 413 JSON at once, reading none of the body', async () => {
    const declared = await rawRequest({ path, headers: { ...headers, 'content-length': String(limit + 1) }, total: 0 });
    expect(declared.status).toBe(413);
    // And while a client keeps sending: it reads the 413 and the connection closes long before the end.
    const total = limit + BEYOND_SOCKET_BUFFERS;
    const answer = await rawRequest({ path, headers: { ...headers, 'content-length': String(total) }, total });
    expect(answer.status).toBe(413);
    expect(answer.sent).toBeLessThan(total);
    expect(answer.headers['content-type']).toMatch(/^application\/json/);
    expect(answer.headers.connection).toBe('close');
    expect(JSON.parse(answer.body)).toMatchObject({ error: expect.stringMatching(/larger than the/), request_id: answer.headers['x-request-id'] });
  });

  it('cuts a chunked body at the limit, answering 413 long before the rest is sent', async () => {
    const total = limit + BEYOND_SOCKET_BUFFERS;
    const answer = await rawRequest({ path, headers, total });
    expect(answer.status).toBe(413);
    expect(JSON.parse(answer.body).request_id).toBe(answer.headers['x-request-id']);
    // The server stopped reading at the limit: what got out is the limit plus what the two sockets' buffers hold.
    expect(answer.sent).toBeLessThan(total);
  });

  it('lets a body just within the limit through to the app, declared or chunked', async () => {
    for (const declared of [true, false]) {
      const answer = await rawRequest({ path, headers: declared ? { ...headers, 'content-length': String(limit) } : headers, total: limit });
      expect(answer.status, declared ? 'declared' : 'chunked').not.toBe(413);
      expect(answer.status).toBeLessThan(500);
    }
  });
});
