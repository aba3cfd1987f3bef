import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb } from '@/db/knex';
import { base, member, signIn } from './helpers';

// Pages where the status matters render their checks before any streaming (no loading boundary above them), so the
// HTTP status is the real one rather than 200 with a refusal inside.
let viewer = '';
let admin = '';
beforeAll(async () => {
  viewer = await signIn((await member('viewer')).email);
  admin = await signIn((await member('admin')).email);
});
afterAll(closeDb);

const get = (path: string, cookie: string) => fetch(`${base}${path}`, { headers: { cookie }, redirect: 'manual' });

describe('status codes of pages', () => {
  it('403 for a viewer on the members page, 200 for an admin', async () => {
    const refused = await get('/members', viewer);
    expect(refused.status).toBe(403);
    expect(await refused.text()).toContain('Your role does not open this page');
    expect((await get('/members', admin)).status).toBe(200);
  });

  it('403 for a viewer on the pages that change the register', async () => {
    expect((await get('/items/new', viewer)).status).toBe(403);
    expect((await get(`/sites/${randomUUID()}/import`, viewer)).status).toBe(403);
  });

  it('404 for a site or item id that does not exist (or belongs to another organisation), and for no page at all', async () => {
    for (const path of [`/sites/${randomUUID()}`, '/sites/not-an-id', `/items/${randomUUID()}`, `/sites/${randomUUID()}/items/new`, '/no-such-page']) {
      const res = await get(path, admin);
      expect(res.status, path).toBe(404);
    }
  });

  it('a page of the app without a session still redirects to sign-in, which returns to the page afterwards', async () => {
    const res = await get('/members', '');
    expect(res.status).toBe(307);
    expect(res.headers.get('location')).toMatch(/\/sign-in\?next=%2Fmembers$/);
  });
});
