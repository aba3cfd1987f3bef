import { describe, expect, it } from 'vitest';
import solveDrops from '@/lib/compute/drop-worker';
import { closedFormSpeeds, type ClosedFormParams, type DropCase, type DropResult } from '@/lib/physics';

/**
 * The closed-form speed curve the drops answer carries for the calculator's speed plot. Check values: the textbook
 * speed histories from rest, evaluated by hand in Python (g = 9.80665 m/s²) and written out here; a published
 * worked example of Newton's drag law; and the integrated samples (odex) of the same fall.
 */
const times = [0.5, 2, 5, 20];
const still = { height_m: 3000, vx0: 0, vy0: 0, gravity: 9.80665, flow_m_s: 0 };

/** The answer POST /api/v1/drops sends for one case: the worker's JSON, as the route passes it on. */
function answer(c: DropCase): DropResult {
  const outcome = solveDrops({ cases: [c], batch: false });
  if (!outcome.ok) throw new Error(JSON.stringify(outcome));
  return JSON.parse(outcome.json) as DropResult;
}

describe('closedFormSpeeds', () => {
  it('quadratic drag: v = v_t·tanh(g·t/v_t), v_t = √(2mg/(ρ·C_d·A))', () => {
    // m 80 kg, C_d 1, A 0.7 m², ρ 1.225 kg/m³: κ = ρ·C_d·A/(2m), v_t = 42.7763047130 m/s.
    const p: ClosedFormParams = { ...still, linear_per_s: 0, quadratic_per_m: (1.225 * 0.7) / (2 * 80) };
    const v = closedFormSpeeds(p, times)!;
    [4.88196172500391, 18.34538104503078, 34.927497235263445, 42.76739971790132].forEach((ref, i) => expect(v[i] / ref).toBeCloseTo(1, 12));
  });

  it('linear drag: v = v_t·(1 − e^(−b·t/m)), v_t = m·g/b', () => {
    // m 1 kg, b 0.2 kg/s: v_t = 49.03325 m/s.
    const v = closedFormSpeeds({ ...still, linear_per_s: 0.2, quadratic_per_m: 0 }, times)!;
    [4.666130672088287, 16.165279602722986, 30.994925391180374, 48.13517469945897].forEach((ref, i) => expect(v[i] / ref).toBeCloseTo(1, 12));
  });

  it('vacuum: v = g·t', () => {
    const v = closedFormSpeeds({ ...still, linear_per_s: 0, quadratic_per_m: 0 }, times)!;
    times.forEach((t, i) => expect(v[i]).toBeCloseTo(9.80665 * t, 12));
  });

  it('has no curve for a throw, a cross flow, a floating body or both drag terms', () => {
    const q = { ...still, linear_per_s: 0, quadratic_per_m: 0.01 };
    expect(closedFormSpeeds({ ...q, vy0: 3 }, times)).toBeNull();
    expect(closedFormSpeeds({ ...q, vx0: 1 }, times)).toBeNull();
    expect(closedFormSpeeds({ ...q, flow_m_s: 5 }, times)).toBeNull();
    expect(closedFormSpeeds({ ...q, gravity: -0.5 }, times)).toBeNull();
    expect(closedFormSpeeds({ ...q, linear_per_s: 0.1 }, times)).toBeNull();
  });
});

describe('the drops answer', () => {
  // Worked example: 70 kg skydiver, spread eagle, A 1.1 m², C_D 1.5, ρ 1.22 kg/m³, g 9.8 m/s²: terminal velocity
  // 26.1 m/s (engineeringprep.com, FE problem 362, "Terminal Velocity").
  const skydiver: DropCase = {
    object: { mass_kg: 70, cd: 1.5, area_m2: 1.1, volume_m3: 0 },
    drag_model: 'quadratic',
    medium: { density_kg_m3: 1.22 },
    release: { height_m: 500 },
    gravity_m_s2: 9.8,
    samples: 60,
  };
  const r = answer(skydiver);
  const s = r.samples!;

  it('reproduces the published terminal speed, and its curve follows v_t·tanh(g·t/v_t) with it', () => {
    expect(r.terminal_speed_m_s!).toBeCloseTo(26.1, 1);
    const vt = 26.1;
    // The published v_t has three figures, so the curve agrees with it to about 0.2 %.
    s.t.forEach((t, i) => expect(Math.abs(s.closed_form_speed![i] - vt * Math.tanh((9.8 * t) / vt))).toBeLessThan(0.002 * vt));
  });

  it('carries the curve lib/physics/closed-forms.ts gives at the sample times', () => {
    const kappa = (1.22 * 1.5 * 1.1) / (2 * 70);
    const ref = closedFormSpeeds({ height_m: 500, vx0: 0, vy0: 0, gravity: 9.8, linear_per_s: 0, quadratic_per_m: kappa, flow_m_s: 0 }, s.t)!;
    expect(s.closed_form_speed).toHaveLength(s.t.length);
    for (const i of [1, 10, 30, s.t.length - 1]) expect(s.closed_form_speed![i] / ref[i]).toBeCloseTo(1, 12);
  });

  it('lies on the integrated speed samples of the same fall', () => {
    s.speed.forEach((v, i) => expect(Math.abs(s.closed_form_speed![i] - v)).toBeLessThan(1e-6 * r.impact_speed_m_s));
  });

  it('carries the object as the model resolved it, shape values with their range and sources', () => {
    const ball = answer({ object: { mass_kg: 4, shape: 'sphere', dimensions_m: { diameter: 0.2 } }, drag_model: 'quadratic', medium: { preset: 'isa' }, release: { height_m: 10 } });
    // Sphere of diameter d: A = π·d²/4, V = π·d³/6.
    expect(ball.object.mass_kg).toBe(4);
    expect(ball.object.area_m2).toBeCloseTo(Math.PI * 0.01, 12);
    expect(ball.object.volume_m3).toBeCloseTo((Math.PI * 0.008) / 6, 12);
    // Subcritical smooth sphere, C_d about 0.47 (Hoerner, Fluid-Dynamic Drag, recalled from memory).
    expect(ball.object.cd).toBeCloseTo(0.47, 2);
    expect(ball.object.shape!.cd_range[0]).toBeLessThan(ball.object.cd!);
    expect(ball.object.shape!.cd_range[1]).toBeGreaterThan(ball.object.cd!);
    expect(ball.object.shape!.sources.length).toBeGreaterThan(0);
    expect(ball.object.explicit.cd).toBe(false);
  });

  it('has no closed-form curve where none exists for the whole fall', () => {
    expect(answer({ ...skydiver, wind_m_s: 5 }).samples!.closed_form_speed).toBeNull();
    expect(answer({ ...skydiver, release: { height_m: 500, velocity_m_s: [0, 3] } }).samples!.closed_form_speed).toBeNull();
    const layered = answer({ ...skydiver, medium: undefined, release: undefined, layers: [{ medium: { preset: 'isa' }, thickness_m: 20 }, { medium: { preset: 'seawater' }, thickness_m: 30 }] });
    expect(layered.samples!.closed_form_speed).toBeNull();
  });
});
