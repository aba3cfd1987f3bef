import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { POST as postDrops } from '@/app/api/v1/drops/route';
import { DROP_COST_LIMIT, dropCost, SAMPLE_FLOOR } from '@/lib/compute/drop-cost';
import { closeDropPool, QUEUE_COST_LIMIT, solveOffThread } from '@/lib/compute/drop-pool';
import solveDrops from '@/lib/compute/drop-worker';
import { startSession } from '@/lib/auth';
import { UnavailableError } from '@/lib/errors';
import type { DropCase } from '@/lib/physics';
import { dropCaseSchema } from '@/lib/schemas/drop-case';
import { createOrg, ctx, resetDatabase, signOutLocally } from './harness';
import { requestContext } from './harness/context';

// Counts every solve on this thread: the route must leave them all to the worker threads. The reference results
// below come from the real function, imported past the mock.
const inProcessSolves = vi.hoisted(() => ({ count: 0 }));
vi.mock('@/lib/physics', async (importOriginal) => {
  const physics = await importOriginal<typeof import('@/lib/physics')>();
  return {
    ...physics,
    simulateDrop: (...args: Parameters<typeof physics.simulateDrop>) => {
      inProcessSolves.count++;
      return physics.simulateDrop(...args);
    },
  };
});
const { simulateDrop } = await vi.importActual<typeof import('@/lib/physics')>('@/lib/physics');

async function post(body: unknown, headers: Record<string, string> = {}) {
  const text = typeof body === 'string' ? body : JSON.stringify(body);
  const request = new Request('http://127.0.0.1/api/v1/drops', { method: 'POST', headers: { 'content-type': 'application/json', ...headers }, body: text });
  const response = await postDrops(request, ctx({}));
  return { status: response.status, retryAfter: response.headers.get('retry-after'), text: await response.text() };
}

const layered = (layers: number, samples: number) => ({
  object: { mass_kg: 2, cd: 1.05, area_m2: 0.01, volume_m3: 0.001 },
  drag_model: 'quadratic',
  layers: Array.from({ length: layers }, (_, i) => ({ medium: { preset: i % 2 ? 'seawater' : 'isa' }, thickness_m: 15, flow_m_s: i % 3 })),
  samples,
});

beforeAll(async () => {
  await resetDatabase();
  const org = await createOrg('Compute Ltd', 'compute');
  signOutLocally();
  await startSession(org.users.viewer.id, org.id);
});

afterAll(async () => {
  requestContext.headers.delete('x-request-id');
  await closeDropPool();
});

describe('POST /api/v1/drops solves on the worker pool', () => {
  // Cases of every kind the route takes; the reference is the physics core run on this thread on the same parsed case.
  const cases: [string, unknown][] = [
    ['a vacuum fall', { object: { mass_kg: 5 }, drag_model: 'none', medium: { preset: 'isa' }, release: { height_m: 1 } }],
    ['a quadratic fall in wind with samples', { object: { mass_kg: 2, cd: 1.05, area_m2: 0.01 }, drag_model: 'quadratic', medium: { preset: 'isa', altitude_m: 300 }, wind_m_s: 12, release: { height_m: 40 }, samples: 50 }],
    ['a shape in fresh water, thrown upwards', { object: { mass_kg: 0.4, shape: 'sphere', dimensions_m: { diameter: 0.05 } }, drag_model: 'quadratic', medium: { preset: 'freshwater', temperature_c: 10 }, release: { height_m: 3, velocity_m_s: [0.5, 2] } }],
    ['air then seawater with 2,000 samples over 20 layers', layered(20, 2000)],
  ];
  for (const [name, body] of cases) {
    it(`answers exactly the in-process result, byte for byte, for ${name}`, async () => {
      const before = inProcessSolves.count;
      const { status, text } = await post(body);
      expect(status).toBe(200);
      expect(text).toBe(JSON.stringify(simulateDrop(dropCaseSchema.parse(body))));
      expect(inProcessSolves.count).toBe(before);
    });
  }

  it('answers an array in order, exactly as the in-process results', async () => {
    const batch = cases.map(([, body]) => body).slice(0, 3);
    const { status, text } = await post(batch);
    expect(status).toBe(200);
    expect(text).toBe(JSON.stringify(batch.map((c) => simulateDrop(dropCaseSchema.parse(c)))));
  });

  it('brings a physics refusal back across the thread as the field and message', async () => {
    // The route validates first, so this reaches the worker only when called directly, as here.
    const bad = { object: { mass_kg: -1 }, drag_model: 'none', medium: { preset: 'isa' }, release: { height_m: 1 } } as unknown as DropCase;
    const expected = solveDrops({ cases: [bad], batch: true });
    expect(expected).toMatchObject({ ok: false, index: 0, kind: 'input', field: 'object.mass_kg' });
    expect(await solveOffThread({ cases: [bad], batch: true }, 100)).toEqual(expected);
  });
});

describe('the bound on the work of one request', () => {
  it('costs a case its layers × the larger of its samples and the floor', () => {
    expect(dropCost({})).toBe(SAMPLE_FLOOR);
    expect(dropCost({ samples: 2000 })).toBe(2000);
    expect(dropCost({ layers: layered(20, 0).layers as DropCase['layers'], samples: 2000 })).toBe(40_000);
  });

  it('refuses 100 cases of 20 layers and 2,000 samples with 422 stating the cost and the bound', async () => {
    const { status, text } = await post(Array.from({ length: 100 }, () => layered(20, 2000)));
    expect(status).toBe(422);
    const [issue] = JSON.parse(text).errors;
    expect(issue.path).toBe('(body)');
    expect(issue.message).toContain('4,000,000');
    expect(issue.message).toContain(DROP_COST_LIMIT.toLocaleString('en'));
  });

  it('takes a request exactly at the bound and refuses one just over it', async () => {
    expect((await post([layered(20, 2000)])).status).toBe(200);
    expect((await post([layered(20, 2000), layered(1, 0)])).status).toBe(422);
  });

  it('refuses a body over 512 KB with 413 before reading it', async () => {
    const { status, text } = await post('[' + ' '.repeat(600 * 1024) + ']', { 'content-length': String(600 * 1024 + 2) });
    expect(status).toBe(413);
    expect(JSON.parse(text).errors[0].message).toContain('512 KB');
  });
});

describe('the bounded queue', () => {
  it('refuses work beyond what is admitted at once, and admits it again once the queue drains', async () => {
    const heavy = Array.from({ length: 10 }, () => dropCaseSchema.parse(layered(20, 2000)));
    const running = solveOffThread({ cases: heavy, batch: true }, QUEUE_COST_LIMIT - 1000);
    await expect(solveOffThread({ cases: heavy.slice(0, 1), batch: false }, 40_000)).rejects.toBeInstanceOf(UnavailableError);

    requestContext.headers.set('x-request-id', 'queue-full');
    const refused = await post(layered(20, 2000));
    expect(refused.status).toBe(503);
    expect(Number(refused.retryAfter)).toBeGreaterThan(0);
    expect(JSON.parse(refused.text)).toEqual({ error: expect.stringContaining('busy'), request_id: 'queue-full' });

    expect((await running).ok).toBe(true);
    expect((await post(layered(20, 2000))).status).toBe(200);
  });
});
