import fc from 'fast-check';
import numeric from 'numeric';
import { describe, expect, it } from 'vitest';
import { PhysicsInputError, simulateDrop, STANDARD_GRAVITY, type DropCase } from '@/lib/physics';

const g0 = STANDARD_GRAVITY;

/** The same equations of motion written out independently for numeric's Dormand–Prince solver. */
function dopriFall(c: { m: number; c: number; b: number; h: number; vx0: number; vy0: number; w: number }, span: number) {
  const f = (_t: number, s: number[]) => {
    const ux = s[2] - c.w;
    const uy = s[3];
    const k = (c.b + c.c * Math.sqrt(ux * ux + uy * uy)) / c.m;
    return [s[2], s[3], -k * ux, -g0 - k * uy];
  };
  // numeric's first step is a tenth of its span and cannot be set. A light, broad object relaxes to its terminal
  // speed within m/(b + c·|u|) seconds but may take minutes to land, so one call over the whole fall starts with
  // a step hundreds of times that relaxation time and blows up. The fall is integrated in windows of twenty
  // relaxation times instead, each continuing from where the last ended, until the ground event stops one early.
  const vt = c.c > 0 ? (-c.b + Math.sqrt(c.b * c.b + 4 * c.c * c.m * g0)) / (2 * c.c) : (c.m * g0) / c.b;
  const fastest = c.b + c.c * (vt + Math.abs(c.w) + Math.hypot(c.vx0, c.vy0));
  const window = Math.min(span, 20 * (fastest > 0 ? c.m / fastest : span));
  let t = 0;
  let y = [0, c.h, c.vx0, c.vy0];
  while (t < span) {
    const end = Math.min(span, t + window);
    // numeric's events fire on a rising sign change only, so the ground is watched as −y.
    const sol = numeric.dopri(t, end, y, f, 1e-11, 1e6, (_t, s) => -s[1]);
    const n = sol.x.length - 1;
    t = sol.x[n];
    y = sol.y[n];
    if (t < end) break;
  }
  return { t, y };
}

describe('integrator against numeric.dopri (independent implementation, 2-D with wind)', () => {
  it('agrees within 1e-6 relative on random windy falls', () => {
    // Reference: numeric 1.2.6 numeric.dopri, an independent Dormand–Prince implementation from the npm registry.
    fc.assert(
      fc.property(
        fc.record({
          m: fc.double({ min: 0.1, max: 50, noNaN: true }),
          cd: fc.double({ min: 0.3, max: 2, noNaN: true }),
          area: fc.double({ min: 0.001, max: 0.5, noNaN: true }),
          b: fc.double({ min: 0, max: 0.5, noNaN: true }),
          h: fc.double({ min: 1, max: 200, noNaN: true }),
          vx0: fc.double({ min: -5, max: 5, noNaN: true }),
          vy0: fc.double({ min: -10, max: 10, noNaN: true }),
          w: fc.double({ min: -20, max: 20, noNaN: true }),
        }),
        (p) => {
          const r = simulateDrop({
            object: { mass_kg: p.m, cd: p.cd, area_m2: p.area, linear_coeff_kg_s: p.b },
            drag_model: 'linear_quadratic',
            medium: { density_kg_m3: 1.225 },
            release: { height_m: p.h, velocity_m_s: [p.vx0, p.vy0] },
            wind_m_s: p.w,
          });
          const ref = dopriFall({ m: p.m, c: 0.5 * 1.225 * p.cd * p.area, b: p.b, h: p.h, vx0: p.vx0, vy0: p.vy0, w: p.w }, 2 * r.fall_time_s + 1);
          expect(ref.y[1]).toBeCloseTo(0, 9);
          // Components are compared relative to the scale of the case (height, impact speed), so a
          // drift of a few millimetres in a 100 m fall is not held to nanometres.
          const rel = (a: number, b: number, scale: number) => Math.abs(a - b) / Math.max(Math.abs(b), scale);
          const speed = Math.hypot(ref.y[2], ref.y[3]);
          expect(rel(r.fall_time_s, ref.t, 1e-9)).toBeLessThan(1e-6);
          expect(rel(r.drift_m, ref.y[0], p.h)).toBeLessThan(1e-6);
          expect(rel(r.impact_velocity_m_s[0], ref.y[2], speed)).toBeLessThan(1e-6);
          expect(rel(r.impact_velocity_m_s[1], ref.y[3], speed)).toBeLessThan(1e-6);
        },
      ),
      { numRuns: 60 },
    );
  });
});

const restCase = fc
  .record({
    model: fc.constantFrom<DropCase['drag_model']>('linear', 'quadratic', 'linear_quadratic'),
    m: fc.double({ min: 0.1, max: 100, noNaN: true }),
    cd: fc.double({ min: 0.3, max: 2, noNaN: true }),
    area: fc.double({ min: 0.001, max: 1, noNaN: true }),
    b: fc.double({ min: 0.001, max: 2, noNaN: true }),
    h: fc.double({ min: 0.1, max: 300, noNaN: true }),
    w: fc.double({ min: -15, max: 15, noNaN: true }),
  })
  .map(
    (p): DropCase => ({
      object: { mass_kg: p.m, cd: p.cd, area_m2: p.area, linear_coeff_kg_s: p.b },
      drag_model: p.model,
      medium: { preset: 'isa' },
      release: { height_m: p.h },
      wind_m_s: p.w,
    }),
  );

describe('physical invariants', () => {
  it('drag never raises the impact energy above the vacuum value for a release at rest in still air', () => {
    // Drag only removes energy when the medium is still (it opposes the motion): common practice invariant.
    fc.assert(
      fc.property(restCase, (c) => {
        const r = simulateDrop({ ...c, wind_m_s: 0 });
        expect(r.impact_energy_j).toBeLessThanOrEqual(r.vacuum.impact_energy_j * (1 + 1e-12));
        expect(r.fall_time_s).toBeGreaterThanOrEqual(r.vacuum.fall_time_s * (1 - 1e-12));
      }),
    );
  });

  it('energy balance closes: kinetic change = work of gravity + buoyancy + drag', () => {
    // Work-energy theorem for the equations of motion (m + m_a)·dv/dt = −(m − ρV)g ŷ + F_drag.
    fc.assert(
      fc.property(restCase, fc.double({ min: 0, max: 0.002, noNaN: true }), (c, volume) => {
        const layered: DropCase = {
          object: { ...c.object, volume_m3: volume, added_mass_coeff: 0.8 },
          drag_model: c.drag_model,
          layers: [
            { medium: { preset: 'isa' }, thickness_m: c.release!.height_m!, flow_m_s: c.wind_m_s },
            { medium: { preset: 'seawater' }, thickness_m: 20, flow_m_s: 0.5 },
          ],
        };
        const r = simulateDrop(layered, { energyAudit: true });
        const a = r.energy_audit!;
        const scale = Math.abs(a.gravity_work_j) + Math.abs(a.buoyancy_work_j) + Math.abs(a.drag_work_j) + Math.abs(a.kinetic_change_j);
        expect(Math.abs(a.residual_j)).toBeLessThanOrEqual(1e-7 * scale);
      }),
      { numRuns: 60 },
    );
  });

  it('terminal speed does not depend on added mass, though the approach to it does', () => {
    // Added mass enters only the inertia, not the force balance at terminal speed (DNV-RP-F107 treats it the same way).
    const base = (ca: number): DropCase => ({
      object: { mass_kg: 20, cd: 1.0, area_m2: 0.05, volume_m3: 0.004, added_mass_coeff: ca },
      drag_model: 'quadratic',
      medium: { preset: 'seawater' },
      release: { height_m: 30 },
    });
    const a = simulateDrop(base(0));
    const b = simulateDrop(base(2));
    expect(a.terminal_speed_m_s!).toBeCloseTo(b.terminal_speed_m_s!, 12);
    expect(b.fall_time_s).toBeGreaterThan(a.fall_time_s);
    expect(b.effective_impact_energy_j).toBeGreaterThan(b.impact_energy_j);
  });

  it('results do not depend on the number of plot samples', () => {
    const c: DropCase = {
      object: { mass_kg: 15, shape: 'tumbling_box', dimensions_m: { length: 0.3, width: 0.2, height: 0.1 } },
      drag_model: 'quadratic',
      layers: [
        { medium: { preset: 'isa' }, thickness_m: 25, flow_m_s: 8 },
        { medium: { preset: 'seawater' }, thickness_m: 40, flow_m_s: 0.7 },
      ],
    };
    const plain = simulateDrop(c);
    for (const n of [2, 17, 2000]) {
      const { samples, ...rest } = simulateDrop(c, { samples: n });
      expect(rest).toEqual(plain);
      expect(samples!.t).toHaveLength(n);
      expect(samples!.t[0]).toBe(0);
      expect(samples!.t[n - 1]).toBe(plain.fall_time_s);
      expect(samples!.y[n - 1]).toBe(0);
      for (let i = 1; i < n; i++) expect(samples!.y[i]).toBeLessThanOrEqual(samples!.y[i - 1] + 1e-9);
    }
  });

  it('plot samples lie on the solution', () => {
    // Vacuum kinematics y = h − g t²/2 (textbook) checked at every sample.
    const r = simulateDrop({ object: { mass_kg: 1 }, drag_model: 'none', medium: { preset: 'isa' }, release: { height_m: 20 }, samples: 50 });
    r.samples!.t.forEach((t, i) => expect(r.samples!.y[i]).toBeCloseTo(20 - 0.5 * g0 * t * t, 9));
  });
});

describe('layers, events and edge cases', () => {
  it('a layer stack of one medium equals the single-medium fall', () => {
    const single = simulateDrop({ object: { mass_kg: 2, cd: 1, area_m2: 0.01 }, drag_model: 'quadratic', medium: { density_kg_m3: 1.225 }, release: { height_m: 50 } });
    const stacked = simulateDrop({
      object: { mass_kg: 2, cd: 1, area_m2: 0.01 },
      drag_model: 'quadratic',
      layers: [10, 15, 25].map((t) => ({ medium: { density_kg_m3: 1.225 }, thickness_m: t })),
    });
    // Each boundary restarts the integrator, so agreement is at the tolerance (1e-10 relative per layer).
    expect(Math.abs(stacked.fall_time_s / single.fall_time_s - 1)).toBeLessThan(1e-7);
    expect(Math.abs(stacked.impact_speed_m_s / single.impact_speed_m_s - 1)).toBeLessThan(1e-7);
    expect(stacked.layers.map((l) => l.top_m)).toEqual([50, 40, 25]);
    expect(stacked.closed_form).toBeNull();
  });

  it('air over seawater: boundary crossings, terminal speeds per layer and effective energy', () => {
    const r = simulateDrop({
      object: { mass_kg: 50, shape: 'cylinder_side_on', dimensions_m: { length: 1, diameter: 0.15 } },
      drag_model: 'quadratic',
      layers: [
        { medium: { preset: 'isa' }, thickness_m: 30, flow_m_s: 10 },
        { medium: { preset: 'seawater' }, thickness_m: 100, flow_m_s: 1 },
      ],
    });
    expect(r.sinks).toBe(true);
    expect(r.terminal_speeds_m_s).toHaveLength(2);
    expect(r.terminal_speed_m_s).toBe(r.terminal_speeds_m_s[1]);
    expect(r.layers[1].entry_time_s).toBeGreaterThan(0);
    expect(r.layers[1].exit_time_s).toBe(r.fall_time_s);
    // 100 m of water is far beyond the relaxation length: the impact is at terminal speed.
    expect(r.fraction_of_terminal!).toBeCloseTo(1, 6);
    expect(r.effective_impact_energy_j).toBeGreaterThan(r.impact_energy_j);
    expect(r.warnings.some((w) => w.includes('water surface'))).toBe(true);
  });

  it('an object that floats stops at the surface with a plain warning', () => {
    const r = simulateDrop({
      object: { mass_kg: 1, cd: 1, area_m2: 0.02, volume_m3: 0.003 },
      drag_model: 'quadratic',
      layers: [
        { medium: { preset: 'isa' }, thickness_m: 10 },
        { medium: { preset: 'seawater' }, thickness_m: 50 },
      ],
    });
    expect(r.sinks).toBe(false);
    expect(r.layers[1].exit_time_s).toBeNull();
    expect(r.layers[1].entry_speed_m_s).toBe(r.impact_speed_m_s);
    expect(r.fall_time_s).toBe(r.layers[0].exit_time_s);
    expect(r.terminal_speed_m_s).toBeNull();
    expect(r.warnings[0]).toMatch(/floats/);
    // The surface is named by its medium, not by a layer number a reader would count from 1.
    expect(r.floats_at).toMatch(/^seawater/);
    expect(r.warnings[0]).toMatch(/stops at the surface of the seawater/);
    expect(r.warnings[0]).not.toMatch(/layer \d/);
  });

  it('zero height gives an immediate impact', () => {
    const r = simulateDrop({ object: { mass_kg: 1, cd: 1, area_m2: 0.01 }, drag_model: 'quadratic', medium: { preset: 'isa' }, release: { height_m: 0, velocity_m_s: [1, -2] } });
    expect(r.fall_time_s).toBe(0);
    expect(r.impact_speed_m_s).toBeCloseTo(Math.sqrt(5), 14);
  });

  it('a 10 km fall at terminal speed verifies against the closed form', () => {
    const r = simulateDrop({ object: { mass_kg: 80, cd: 1, area_m2: 0.7 }, drag_model: 'quadratic', medium: { density_kg_m3: 1.0 }, release: { height_m: 10000 } });
    expect(r.verification!.passed).toBe(true);
    expect(r.warnings.some((w) => w.includes('split it into layers'))).toBe(true);
  });

  it("a Stokes-sized particle settles at Stokes' terminal speed", () => {
    // Stokes' law: v_t = (ρ_p − ρ_f)·g·d² / (18 μ) for a sphere at Re ≪ 1.
    const d = 20e-6;
    const rhoP = 2650;
    const air = { density_kg_m3: 1.2, viscosity_pa_s: 1.8e-5 };
    const mass = (rhoP * Math.PI * d ** 3) / 6;
    const r = simulateDrop({ object: { mass_kg: mass, shape: 'sphere', dimensions_m: { diameter: d } }, drag_model: 'linear', medium: air, release: { height_m: 2 } });
    expect(r.terminal_speed_m_s! / (((rhoP - 1.2) * g0 * d * d) / (18 * 1.8e-5))).toBeCloseTo(1, 12);
    expect(r.verification!.passed).toBe(true);
    expect(r.reynolds_regime.regime).toBe('stokes');
  });

  it('near-zero drag approaches the vacuum values', () => {
    const r = simulateDrop({ object: { mass_kg: 5, cd: 1e-9, area_m2: 0.01 }, drag_model: 'quadratic', medium: { preset: 'isa' }, release: { height_m: 40 } });
    expect(r.fall_time_s).toBeCloseTo(r.vacuum.fall_time_s, 8);
    expect(r.verification!.passed).toBe(true);
  });

  it('huge drag (a light sheet) verifies against the closed form', () => {
    const r = simulateDrop({ object: { mass_kg: 0.01, cd: 2, area_m2: 1, linear_coeff_kg_s: 0.01 }, drag_model: 'linear_quadratic', medium: { density_kg_m3: 1.225, viscosity_pa_s: 1.8e-5 }, release: { height_m: 30 } });
    expect(r.verification!.passed).toBe(true);
  });
});

describe('bad parameters give named errors naming the field', () => {
  const good: DropCase = { object: { mass_kg: 2, cd: 1, area_m2: 0.01 }, drag_model: 'quadratic', medium: { preset: 'isa' }, release: { height_m: 10 } };
  const cases: [string, unknown, string][] = [
    ['zero mass', { ...good, object: { ...good.object, mass_kg: 0 } }, 'object.mass_kg'],
    ['negative mass', { ...good, object: { ...good.object, mass_kg: -1 } }, 'object.mass_kg'],
    ['negative height', { ...good, release: { height_m: -1 } }, 'release.height_m'],
    ['NaN height', { ...good, release: { height_m: Number.NaN } }, 'release.height_m'],
    ['infinite mass', { ...good, object: { ...good.object, mass_kg: Infinity } }, 'object.mass_kg'],
    ['unknown shape', { ...good, object: { mass_kg: 1, shape: 'anvil', dimensions_m: { side: 1 } } }, 'object.shape'],
    ['missing area for quadratic drag', { ...good, object: { mass_kg: 2, cd: 1 } }, 'object.area_m2'],
    ['string for a number', { ...good, object: { ...good.object, mass_kg: '2' } }, 'object.mass_kg'],
    ['string velocity', { ...good, release: { height_m: 1, velocity_m_s: ['1', 0] } }, 'release.velocity_m_s.0'],
    ['bad layer thickness', { object: good.object, drag_model: 'quadratic', layers: [{ medium: { preset: 'isa' }, thickness_m: 0 }] }, 'layers.0.thickness_m'],
    ['missing linear coefficient', { ...good, drag_model: 'linear' }, 'object.linear_coeff_kg_s'],
    ['unknown drag model', { ...good, drag_model: 'cubic' }, 'drag_model'],
  ];
  it.each(cases)('%s', (_label, input, field) => {
    expect(() => simulateDrop(input as DropCase)).toThrow(PhysicsInputError);
    try {
      simulateDrop(input as DropCase);
    } catch (e) {
      expect((e as PhysicsInputError).field).toBe(field);
    }
  });

  it('options are validated eagerly', () => {
    expect(() => simulateDrop(good, { samples: 5000 })).toThrow(expect.objectContaining({ field: 'options.samples' }));
    expect(() => simulateDrop(good, { integrator: { relativeTolerance: -1 } })).toThrow(expect.objectContaining({ field: 'options.integrator.relativeTolerance' }));
  });
});
