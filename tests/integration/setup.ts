import { afterAll, vi } from 'vitest';
import { closeDb } from '@/db/knex';
import { requestContext } from './harness/context';

// Server actions and route handlers read cookies and headers through next/headers; the harness stands in for
// the request Next would build, so the real auth, validation and database code runs unchanged.
vi.mock('next/headers', () => ({
  cookies: async () => requestContext.cookies,
  headers: async () => requestContext.headers,
}));
vi.mock('next/cache', () => ({ revalidatePath: () => undefined, revalidateTag: () => undefined }));

process.env.__NEXT_EXPERIMENTAL_AUTH_INTERRUPTS = 'true';

afterAll(async () => {
  await closeDb();
});
