import { beforeAll, describe, expect, it } from 'vitest';
import { POST as postDrops } from '@/app/api/v1/drops/route';
import { startSession } from '@/lib/auth';
import { closedFormSpeeds, VERIFICATION_THRESHOLD } from '@/lib/physics';
import { createOrg, ctx, jsonRequest, resetDatabase, signOutLocally } from './harness';

async function post(body: unknown) {
  const response = await postDrops(jsonRequest('POST', body, 'http://127.0.0.1/api/v1/drops'), ctx({}));
  return { status: response.status, json: await response.json() };
}

const paths = (json: { errors: { path: string }[] }) => json.errors.map((e) => e.path);

beforeAll(async () => {
  await resetDatabase();
  const org = await createOrg('Drops', 'drops');
  signOutLocally();
  await startSession(org.users.viewer.id, org.id);
});

describe('POST /api/v1/drops', () => {
  // m 85 kg, A 0.70 m², C 1.0, ρ 1.21 kg/m³, g 9.80 m/s² — OpenStax College Physics, Example 5.2 (answer: 44 m/s).
  const skydiver = {
    object: { mass_kg: 85, cd: 1.0, area_m2: 0.7, volume_m3: 0 },
    drag_model: 'quadratic',
    medium: { density_kg_m3: 1.21 },
    release: { height_m: 3000 },
    gravity_m_s2: 9.8,
  };

  it('reproduces OpenStax College Physics, Example 5.2: a skydiver’s terminal speed of 44 m/s', async () => {
    const { status, json } = await post(skydiver);
    expect(status).toBe(200);
    expect(json.terminal_speed_m_s).toBeGreaterThan(43.5);
    expect(json.terminal_speed_m_s).toBeLessThan(44.5);
    expect(json.verification.passed).toBe(true);
  });

  it('carries the object and the closed-form speed curve of lib/physics/closed-forms.ts for the same skydiver', async () => {
    // The same example: v = v_t·tanh(g·t/v_t) with the published v_t of 44 m/s.
    const { status, json } = await post({ ...skydiver, samples: 50 });
    expect(status).toBe(200);
    expect(json.object).toMatchObject({ mass_kg: 85, cd: 1, area_m2: 0.7, volume_m3: 0, shape: null });
    const { t, closed_form_speed: curve } = json.samples as { t: number[]; closed_form_speed: number[] };
    const ref = closedFormSpeeds({ height_m: 3000, vx0: 0, vy0: 0, gravity: 9.8, linear_per_s: 0, quadratic_per_m: (1.21 * 0.7) / (2 * 85), flow_m_s: 0 }, t)!;
    for (const i of [1, 5, 25, 49]) {
      expect(curve[i] / ref[i]).toBeCloseTo(1, 12);
      // Two figures published: within about 1 %.
      expect(Math.abs(curve[i] - 44 * Math.tanh((9.8 * t[i]) / 44))).toBeLessThan(0.5);
    }
  });

  // EN 397 shock absorption test: a 5.0 kg striker falling 1 m, 49.0 J at g = 9.81 (here the standard 9.80665).
  // The first case checks the route's plumbing of a vacuum fall against m·g·h; the second, the same striker
  // through sea-level ISA air with Newton's drag law, against the textbook energy relation of that law,
  // v² = v_t²·(1 − exp(−2gh/v_t²)), and shows drag changes the test energy by well under 0.1 %.
  it('gives the EN 397 helmet shock-test energy for 5 kg from 1 m in a vacuum', async () => {
    const { json } = await post({ object: { mass_kg: 5 }, drag_model: 'none', medium: { preset: 'isa' }, release: { height_m: 1 } });
    expect(json.impact_energy_j).toBeCloseTo(5 * 9.80665 * 1, 9);
    expect(json.closed_form_rel_deviation).toBeLessThan(VERIFICATION_THRESHOLD);
  });

  it('gives the EN 397 striker energy through sea-level air within the quadratic-drag energy relation', async () => {
    // A steel ball of 5 kg: 7850 kg/m³ (EN 1991-1-1 Annex A, recalled from memory), C_d 0.47 (sphere, Hoerner,
    // Fluid-Dynamic Drag, recalled from memory); ISA sea-level density 1.225 kg/m³ (US Standard Atmosphere 1976).
    const d = Math.cbrt((6 * (5 / 7850)) / Math.PI);
    const area = (Math.PI * d * d) / 4;
    const vt2 = (2 * 5 * 9.80665) / (1.225 * 0.47 * area);
    const energy = 0.5 * 5 * vt2 * -Math.expm1((-2 * 9.80665 * 1) / vt2);
    const { json } = await post({ object: { mass_kg: 5, cd: 0.47, area_m2: area }, drag_model: 'quadratic', medium: { preset: 'isa' }, release: { height_m: 1 } });
    expect(Math.abs(json.impact_energy_j / energy - 1)).toBeLessThan(1e-6);
    expect(json.impact_energy_j).toBeLessThan(5 * 9.80665);
    expect(json.impact_energy_j).toBeGreaterThan(5 * 9.80665 * 0.999);
  });

  it('answers an array of 100 cases with 100 results in order', async () => {
    const cases = Array.from({ length: 100 }, (_, i) => ({
      object: { mass_kg: 2, cd: 1.05, area_m2: 0.01 },
      drag_model: 'quadratic',
      medium: { preset: 'isa' },
      release: { height_m: 1 + i },
    }));
    const { status, json } = await post(cases);
    expect(status).toBe(200);
    expect(json).toHaveLength(100);
    for (let i = 1; i < 100; i++) expect(json[i].fall_time_s).toBeGreaterThan(json[i - 1].fall_time_s);
  });

  const good = { object: { mass_kg: 2, cd: 1, area_m2: 0.01 }, drag_model: 'quadratic', medium: { preset: 'isa' }, release: { height_m: 10 } };
  const bad: [string, unknown, string][] = [
    ['a negative mass', { ...good, object: { ...good.object, mass_kg: -1 } }, 'object.mass_kg'],
    ['a zero mass', { ...good, object: { ...good.object, mass_kg: 0 } }, 'object.mass_kg'],
    ['a string for a number', { ...good, object: { ...good.object, mass_kg: '2' } }, 'object.mass_kg'],
    ['a negative height', { ...good, release: { height_m: -3 } }, 'release.height_m'],
    ['an unknown shape', { ...good, object: { mass_kg: 2, shape: 'anvil', dimensions_m: { side: 1 } } }, 'object.shape'],
    ['quadratic drag without an area', { ...good, object: { mass_kg: 2, cd: 1 } }, 'object.area_m2'],
    ['an unknown drag model', { ...good, drag_model: 'cubic' }, 'drag_model'],
    ['JSON that is not an object', 'true', '(body)'],
  ];
  for (const [name, body, path] of bad) {
    it(`answers 400 naming ${path} for ${name}`, async () => {
      const { status, json } = await post(body);
      expect(status).toBe(400);
      expect(paths(json)).toContain(path);
    });
  }

  it('prefixes the index of a bad case in an array', async () => {
    const { status, json } = await post([good, good, { ...good, object: { ...good.object, mass_kg: -1 } }]);
    expect(status).toBe(400);
    expect(paths(json)).toEqual(['2.object.mass_kg']);
  });

  it('refuses more than 100 cases and an empty array', async () => {
    expect((await post(Array.from({ length: 101 }, () => good))).status).toBe(400);
    expect((await post([])).status).toBe(400);
  });

  it('answers 401 to a signed-out caller', async () => {
    signOutLocally();
    expect((await post(good)).status).toBe(401);
  });
});
