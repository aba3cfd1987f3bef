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
      expect(rel(layer.entry_velocity_m_s![0], entry.velocity_m_s[0], speed)).toBeLessThan(1e-8);
      expect(rel(layer.entry_velocity_m_s![1], entry.velocity_m_s[1], speed)).toBeLessThan(1e-8);
    });
  });
});

describe('energies at each surface, over the sea', () => {
  const box = fixture.cases.find((c) => c.name === '30 kg box, air over seawater')!;
  const r = simulateDrop(box.case);
  const o = box.case.object;
  // DNV-RP-F107's impact energy E = ½·(m + m_a)·v² with m_a = ρ·C_a·V; ½·m·v² without added mass.
  const addedMass = 1025 * o.added_mass_coeff! * o.volume_m3!;
  const entry = box.reference.layer_entries[1];
  const v2 = entry.velocity_m_s[0] ** 2 + entry.velocity_m_s[1] ** 2;

  it('water entry: time, velocity and both energies at the sea surface', () => {
    const w = r.water_entry!;
    expect(w.layer_index).toBe(1);
    expect(rel(w.time_s, entry.time_s, 0)).toBeLessThan(1e-8);
    expect(rel(w.kinetic_energy_j, 0.5 * o.mass_kg * v2, 0)).toBeLessThan(1e-8);
    expect(rel(w.effective_energy_j, 0.5 * (o.mass_kg + addedMass) * v2, 0)).toBeLessThan(1e-8);
    expect(r.layers[1].entry_effective_energy_j).toBe(w.effective_energy_j);
    // In the air above, the entry energy has no added mass.
    expect(r.layers[0].entry_effective_energy_j).toBe(r.layers[0].entry_kinetic_energy_j);
  });

  it('seabed: the arrival at the bottom, with the added mass of seawater', () => {
    const b = r.seabed!;
    const vb = box.reference.impact_velocity_m_s;
    const vb2 = vb[0] ** 2 + vb[1] ** 2;
    expect(b.layer_index).toBe(1);
    expect(b.time_s).toBe(r.fall_time_s);
    expect(rel(b.effective_energy_j, 0.5 * (o.mass_kg + addedMass) * vb2, 0)).toBeLessThan(1e-8);
    expect(rel(b.effective_energy_j, r.effective_impact_energy_j, 0)).toBeLessThan(1e-14);
    // Far more energy reaches the sea surface than the seabed, 60 m below at terminal speed.
    expect(r.water_entry!.kinetic_energy_j).toBeGreaterThan(100 * b.kinetic_energy_j);
  });

  it('no water entry or seabed for a fall in air, and no seabed when the object floats', () => {
    expect(simulateDrop({ object: { mass_kg: 2, cd: 1, area_m2: 0.01 }, drag_model: 'quadratic', medium: { preset: 'isa' }, release: { height_m: 10 } })).toMatchObject({ water_entry: null, seabed: null });
    const floating = simulateDrop({
      object: { mass_kg: 1, cd: 1, area_m2: 0.02, volume_m3: 0.003 },
      drag_model: 'quadratic',
      layers: [
        { medium: { preset: 'isa' }, thickness_m: 10 },
        { medium: { preset: 'seawater' }, thickness_m: 50 },
      ],
    });
    expect(floating.seabed).toBeNull();
    expect(floating.water_entry!.speed_m_s).toBe(floating.impact_speed_m_s);
  });
});

describe('the analytic terminal tail', () => {
  it('finishes the stiff cases from within √rtol of terminal velocity, with a bound far below the verification threshold', () => {
    for (const name of ['1 um sphere in 20 m/s wind', 'near-neutral object in a current', '30 kg box, air over seawater']) {
      const c = fixture.cases.find((x) => x.name === name)!;
      const r = simulateDrop(c.case);
      const tails = r.layers.map((l) => l.analytic_tail).filter((t) => t !== null);
      expect(tails.length, name).toBeGreaterThan(0);
      for (const t of tails) {
        // θ = max(√1e-10, 1e4·1e-10) = 1e-5 at the default tolerance (DEVELOPERS.md, the terminal tail).
        expect(t.deviation).toBeLessThanOrEqual(1e-5);
        expect(t.time_error_bound_s).toBeLessThan(1e-6 * r.fall_time_s);
        expect(t.from_time_s).toBeLessThan(r.fall_time_s);
      }
      // The bound holds against SciPy: the fall time is off by less than bound plus the integration tolerance.
      const bound = tails.reduce((s, t) => s + t.time_error_bound_s, 0);
      expect(Math.abs(r.fall_time_s - c.reference.fall_time_s)).toBeLessThan(bound + 1e-8 * c.reference.fall_time_s);
    }
  });
});
