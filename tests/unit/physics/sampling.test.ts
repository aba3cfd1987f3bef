import { readFileSync } from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { simulateDrop } from '@/lib/physics';
import { dp45Fall } from '@/lib/physics/rk45';
import { REFERENCE_DROP_ZONE } from '@/bench/reference-drop-zone';
import { dropZoneStatistics, mulberry32, percentile } from '@/lib/physics/sampling';

// The 10,000-case drop zone the benchmark times; its reference percentiles come from SciPy (below).
const spec = REFERENCE_DROP_ZONE;
const scipyZone = JSON.parse(readFileSync(path.join(__dirname, 'fixtures', 'scipy-drop-zone.json'), 'utf8')) as {
  landing_distance_m: Record<'p50' | 'p90' | 'p95' | 'p99' | 'p99_9' | 'max', number>;
  mean_fall_time_s: number;
  first_distances_m: number[];
};

describe('drop-zone sampling', () => {
  it('reproduces SciPy\'s percentiles of the same 10,000 draws', () => {
    // Reference: tests/unit/physics/fixtures/scipy-drop-zone.json from scripts/reference/drop_zone.py
    // (Mulberry32 ported to Python, each fall solved by SciPy's DOP853 at rtol 1e-12, NumPy's
    // type-7 percentiles): p95 8.392483 m, p99 9.452142 m. The kernel runs at its own 1e-8.
    const r = dropZoneStatistics(spec, { keepDistances: true });
    const ref = scipyZone.landing_distance_m;
    for (const key of ['p50', 'p90', 'p95', 'p99', 'p99_9', 'max'] as const) expect(Math.abs(r.landing_distance_m[key] - ref[key])).toBeLessThan(1e-6);
    expect(Math.abs(r.mean_fall_time_s - scipyZone.mean_fall_time_s)).toBeLessThan(1e-8);
    // Same draws in the same order: the first cases agree one by one.
    scipyZone.first_distances_m.forEach((d, i) => expect(Math.abs(r.distances_m![i] - d)).toBeLessThan(1e-6));
  });

  it('the fast pair agrees with odex at tight tolerance on the same draws', () => {
    // Reference: this project's odex path at rtol 1e-12 (odex is the verified reference integrator).
    const r = dropZoneStatistics({ ...spec, cases: 300 }, { keepDistances: true });
    const random = mulberry32(spec.seed);
    for (let i = 0; i < 300; i++) {
      const cd = 0.8 + 0.5 * random();
      const wind = 15 * random();
      const push = 2 * random();
      const ref = simulateDrop(
        { object: { mass_kg: 2, cd, area_m2: 0.01 }, drag_model: 'quadratic', medium: { density_kg_m3: 1.225 }, release: { height_m: 50, velocity_m_s: [push, 0] }, wind_m_s: wind },
        { integrator: { relativeTolerance: 1e-12, absoluteTolerance: 1e-12 } },
      );
      expect(Math.abs(r.distances_m![i] - ref.drift_m)).toBeLessThan(1e-6);
    }
  });

  it('the same seed gives the same statistics', () => {
    expect(dropZoneStatistics({ ...spec, cases: 500 })).toEqual(dropZoneStatistics({ ...spec, cases: 500 }));
    expect(dropZoneStatistics({ ...spec, cases: 500, seed: 1 })).not.toEqual(dropZoneStatistics({ ...spec, cases: 500 }));
  });

  it('percentiles interpolate between order statistics', () => {
    // Hyndman & Fan (1996) definition 7: position (n − 1)·p, linear between neighbours.
    expect(percentile([1, 2, 3, 4], 0.5)).toBe(2.5);
    expect(percentile([1, 2, 3, 4], 1)).toBe(4);
    expect(percentile([10, 20], 0.95)).toBeCloseTo(19.5, 12);
  });

  it('rejects bad specifications naming the field', () => {
    expect(() => dropZoneStatistics({ ...spec, cases: 0 })).toThrow(expect.objectContaining({ field: 'cases' }));
    expect(() => dropZoneStatistics({ ...spec, cd: [1.3, 0.8] })).toThrow(expect.objectContaining({ field: 'cd' }));
    expect(() => dropZoneStatistics({ ...spec }, { relativeTolerance: 0 })).toThrow(expect.objectContaining({ field: 'options.relativeTolerance' }));
  });
});

describe('embedded Dormand–Prince pair against odex', () => {
  it('agrees within 1e-6 relative across random 2-D falls', () => {
    // Reference: odex (Hairer & Wanner's ODEX) through simulateDrop at rtol 1e-12.
    fc.assert(
      fc.property(
        fc.record({
          m: fc.double({ min: 0.1, max: 50, noNaN: true }),
          cdA: fc.double({ min: 1e-4, max: 0.5, noNaN: true }),
          b: fc.double({ min: 0, max: 0.3, noNaN: true }),
          h: fc.double({ min: 0.5, max: 300, noNaN: true }),
          vx0: fc.double({ min: -5, max: 5, noNaN: true }),
          vy0: fc.double({ min: -10, max: 10, noNaN: true }),
          w: fc.double({ min: -20, max: 20, noNaN: true }),
        }),
        (p) => {
          const fast = dp45Fall({ height_m: p.h, vx0: p.vx0, vy0: p.vy0, gravity: 9.80665, linear_per_s: p.b / p.m, quadratic_per_m: (0.5 * 1.225 * p.cdA) / p.m, flow_m_s: p.w });
          const ref = simulateDrop(
            { object: { mass_kg: p.m, cd: 1, area_m2: p.cdA, linear_coeff_kg_s: p.b }, drag_model: 'linear_quadratic', medium: { density_kg_m3: 1.225 }, release: { height_m: p.h, velocity_m_s: [p.vx0, p.vy0] }, wind_m_s: p.w },
            { integrator: { relativeTolerance: 1e-12, absoluteTolerance: 1e-12 } },
          );
          expect(Math.abs(fast.fall_time_s / ref.fall_time_s - 1)).toBeLessThan(1e-6);
          // Drift relative to the height of the fall (the length scale of the case).
          expect(Math.abs(fast.drift_m - ref.drift_m)).toBeLessThan(1e-6 * Math.max(p.h, Math.abs(ref.drift_m)));
          expect(Math.abs(Math.hypot(fast.vx, fast.vy) / ref.impact_speed_m_s - 1)).toBeLessThan(1e-6);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('rejects invalid parameters naming the field', () => {
    expect(() => dp45Fall({ height_m: -1, vx0: 0, vy0: 0, gravity: 9.8, linear_per_s: 0, quadratic_per_m: 0.01, flow_m_s: 0 })).toThrow(
      expect.objectContaining({ field: 'params.height_m' }),
    );
  });
});
