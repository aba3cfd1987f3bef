import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { simulateDrop, type DropCase } from '@/lib/physics';

/**
 * Reference: tests/unit/physics/fixtures/scipy-falls.json, written by scripts/reference/falls.py
 * (SciPy solve_ivp, DOP853 or Radau at rtol 1e-12, equations written out there independently).
 * The cases include those that used to stop at the step budget (micrometre spheres in wind,
 * upward throws of particles, near-neutral objects thrown or in a current), a light sheet thrown
 * into a head wind whose first steps overflowed, and falls through several layers.
 */
interface Arrival {
  time_s: number;
  velocity_m_s: [number, number];
  x_m: number;
}
interface Reference {
  fall_time_s: number;
  impact_velocity_m_s: [number, number];
  drift_m: number;
  layer_entries: Arrival[];
}
const fixture = JSON.parse(readFileSync(path.join(__dirname, 'fixtures', 'scipy-falls.json'), 'utf8')) as {
  cases: { name: string; case: DropCase; reference: Reference }[];
};

/** Differences relative to the case's own scale, so a zero component is not held to zero digits. */
const rel = (a: number, b: number, scale: number) => Math.abs(a - b) / Math.max(Math.abs(b), scale);

describe('falls against SciPy (independent reference, rtol 1e-12)', () => {
  it('the fixture holds the designed cases', () => {
    expect(fixture.cases.length).toBeGreaterThanOrEqual(15);
  });

  it.each(fixture.cases.map((c) => [c.name, c] as const))('%s', (_name, { case: dropCase, reference: ref }) => {
    const r = simulateDrop(dropCase);
    const speed = Math.hypot(...ref.impact_velocity_m_s);
    const height = dropCase.layers ? dropCase.layers.reduce((s, l) => s + l.thickness_m, 0) : dropCase.release!.height_m!;
    // Measured agreement is 2e-10 or better; 1e-8 leaves room for other machines' rounding.
    expect(rel(r.fall_time_s, ref.fall_time_s, 0)).toBeLessThan(1e-8);
    expect(rel(r.impact_velocity_m_s[0], ref.impact_velocity_m_s[0], speed)).toBeLessThan(1e-8);
    expect(rel(r.impact_velocity_m_s[1], ref.impact_velocity_m_s[1], speed)).toBeLessThan(1e-8);
    expect(rel(r.drift_m, ref.drift_m, height)).toBeLessThan(1e-8);
    ref.layer_entries.forEach((entry, i) => {
      const layer = r.layers[i];
      expect(rel(layer.entry_time_s!, entry.time_s, ref.fall_time_s)).toBeLessThan(1e-8);
      expect(rel(layer.entry_speed_m_s!, Math.hypot(...entry.velocity_m_s), speed)).toBeLessThan(1e-8);
    });
  });
});
