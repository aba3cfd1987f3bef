import { describe, expect, it } from 'vitest';
import { closedFormSpeedCurve } from '@/lib/calculator/closed-form-curve';
import { simulateDrop, type DropCase } from '@/lib/physics';

/**
 * The calculator's closed-form speed curve. Check values: the textbook speed histories from rest,
 * evaluated by hand in Python (g = 9.80665 m/s²) and written out here, and the integrated
 * samples of simulateDrop (odex) for the same case.
 */
const times = [0.5, 2, 5, 20];

describe('closed-form speed curve', () => {
  it('quadratic drag: v = v_t·tanh(g·t/v_t), v_t = √(2mg/(ρ·C_d·A))', () => {
    // m 80 kg, C_d 1, A 0.7 m², ρ 1.225 kg/m³: v_t = 42.7763047130 m/s.
    const c: DropCase = { object: { mass_kg: 80, cd: 1, area_m2: 0.7 }, drag_model: 'quadratic', medium: { density_kg_m3: 1.225 }, release: { height_m: 3000 } };
    const v = closedFormSpeedCurve(c, times)!;
    [4.88196172500391, 18.34538104503078, 34.927497235263445, 42.76739971790132].forEach((ref, i) => expect(v[i] / ref).toBeCloseTo(1, 12));
  });

  it('linear drag: v = v_t·(1 − e^(−b·t/m)), v_t = m·g/b', () => {
    // m 1 kg, b 0.2 kg/s: v_t = 49.03325 m/s.
    const c: DropCase = { object: { mass_kg: 1, linear_coeff_kg_s: 0.2 }, drag_model: 'linear', medium: { density_kg_m3: 1.225 }, release: { height_m: 3000 } };
    const v = closedFormSpeedCurve(c, times)!;
    [4.666130672088287, 16.165279602722986, 30.994925391180374, 48.13517469945897].forEach((ref, i) => expect(v[i] / ref).toBeCloseTo(1, 12));
  });

  it('vacuum: v = g·t', () => {
    const v = closedFormSpeedCurve({ object: { mass_kg: 1 }, drag_model: 'none', medium: { preset: 'isa' }, release: { height_m: 3000 } }, times)!;
    times.forEach((t, i) => expect(v[i]).toBeCloseTo(9.80665 * t, 12));
  });

  it('lies on the integrated samples of the same fall', () => {
    const c: DropCase = { object: { mass_kg: 12, cd: 1.1, area_m2: 0.09 }, drag_model: 'quadratic', medium: { preset: 'isa' }, release: { height_m: 120 }, samples: 40 };
    const r = simulateDrop(c);
    const v = closedFormSpeedCurve(c, r.samples!.t)!;
    r.samples!.speed.forEach((s, i) => expect(Math.abs(v[i] - s)).toBeLessThan(1e-7 * r.impact_speed_m_s));
  });

  it('is not drawn where no whole-history closed form exists', () => {
    const base: DropCase = { object: { mass_kg: 2, cd: 1, area_m2: 0.01 }, drag_model: 'quadratic', medium: { preset: 'isa' }, release: { height_m: 10 } };
    expect(closedFormSpeedCurve({ ...base, wind_m_s: 5 }, times)).toBeNull();
    expect(closedFormSpeedCurve({ ...base, release: { height_m: 10, velocity_m_s: [0, 3] } }, times)).toBeNull();
    expect(closedFormSpeedCurve({ ...base, drag_model: 'linear_quadratic', object: { ...base.object, linear_coeff_kg_s: 0.1 } }, times)).toBeNull();
  });
});
