import { beforeEach, describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { ConflictError, NotFoundError } from '@/lib/errors';

// The wrapper's order is what this file checks, so its collaborators record the calls they get.
const calls = vi.hoisted(() => ({ log: [] as string[], denied: false }));
vi.mock('@/lib/auth', () => ({
  requireRole: async (roles: unknown) => {
    calls.log.push(`requireRole ${JSON.stringify(roles)}`);
    if (calls.denied) throw new Error('forbidden');
    return { userId: 'u1', organisationId: 'o1', role: 'engineer' };
  },
}));
vi.mock('next/cache', () => ({ revalidatePath: (...args: unknown[]) => calls.log.push(`revalidate ${args.join(' ')}`) }));
vi.mock('next/navigation', () => ({
  redirect: (to: string) => {
    calls.log.push(`redirect ${to}`);
    throw new Error('NEXT_REDIRECT');
  },
}));

const { CHECK_FIELDS, defineAction } = await import('@/lib/actions/define');

function form(entries: Record<string, string>): FormData {
  const f = new FormData();
  for (const [k, v] of Object.entries(entries)) f.append(k, v);
  return f;
}

const schema = z.object({ name: z.string().min(1, 'Name is required.') });

beforeEach(() => {
  calls.log = [];
  calls.denied = false;
});

describe('defineAction', () => {
  it('checks the role from the policy before it reads the form, and runs nothing when refused', async () => {
    calls.denied = true;
    const run = vi.fn();
    const action = defineAction({ allow: 'register.edit', schema, run });
    await expect(action({}, form({ name: '' }))).rejects.toThrow('forbidden');
    // lib/auth/policy.ts: register.edit is for admins and engineers.
    expect(calls.log).toEqual(['requireRole ["admin","engineer"]']);
    expect(run).not.toHaveBeenCalled();
  });

  it('answers field errors with the one message and does not run', async () => {
    const run = vi.fn();
    const state = await defineAction({ allow: 'any', schema, run })({}, form({ name: '' }));
    expect(state).toEqual({ errors: { name: 'Name is required.' }, message: CHECK_FIELDS });
    expect(CHECK_FIELDS).toBe('Check the highlighted fields.');
    expect(run).not.toHaveBeenCalled();
  });

  it('refuses a prototype field name as that field, before the schema', async () => {
    const state = await defineAction({ allow: 'any', schema, run: vi.fn() })({}, form({ name: 'a', '__proto__.x': 'y' }));
    expect(state).toEqual({ errors: { '__proto__.x': 'The field name "__proto__.x" is not accepted.' }, message: CHECK_FIELDS });
  });

  it('nests dotted names, runs with the parsed input, then revalidates and redirects in that order', async () => {
    const nested = z.object({ dims: z.object({ length: z.string() }) });
    const action = defineAction({
      allow: 'ladder.edit',
      schema: nested,
      nested: true,
      run: async (input, { fields, units }) => {
        calls.log.push(`run ${input.dims.length} ${fields.id} ${units}`);
        return { revalidate: ['/', 'layout'], redirect: '/done' };
      },
    });
    await expect(action({}, form({ 'dims.length': '3', id: 'x', units: 'us' }))).rejects.toThrow('NEXT_REDIRECT');
    expect(calls.log).toEqual(['requireRole ["admin"]', 'run 3 x us', 'revalidate / layout', 'redirect /done']);
  });

  it('turns known errors into the form state and lets others through', async () => {
    const failing = (error: Error) => defineAction({ allow: 'any', notFound: 'It is gone.', run: async () => Promise.reject(error) });
    expect(await failing(new ConflictError('tag', 'Tag taken.'))({}, form({}))).toEqual({ errors: { tag: 'Tag taken.' }, message: 'Tag taken.' });
    expect(await failing(new NotFoundError('x'))({}, form({}))).toEqual({ message: 'It is gone.' });
    await expect(failing(new Error('boom'))({}, form({}))).rejects.toThrow('boom');
    await expect(defineAction({ allow: 'any', run: async () => Promise.reject(new NotFoundError('x')) })({}, form({}))).rejects.toThrow(NotFoundError);
  });

  it('asks no role of the two signed-out forms', async () => {
    const state = await defineAction({ allow: 'public', schema, run: async (_input, { member }) => ({ message: String(member) }) })({}, form({ name: 'a' }));
    expect(state).toEqual({ message: 'null' });
    expect(calls.log).toEqual([]);
  });
});
