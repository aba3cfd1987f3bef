import { describe, expect, it } from 'vitest';
import { classify } from '@/lib/domain';
import { computeItem, inputsHash, itemDropCase, type FallSetting, type ItemPhysics } from '@/lib/register/compute';
import { DEFAULT_LADDER } from '@/lib/domain/default-ladder';
import { itemSchema } from '@/lib/validation/item';
import { ladderSchema } from '@/lib/validation/consequence-level';
import { siteSchema } from '@/lib/validation/site';
import { unflatten } from '@/lib/validation/input';

const g0 = 9.80665; // CGPM 1901, standard acceleration of gravity (exact)
const FT_LBF_J = 0.3048 * 0.45359237 * g0; // NIST SP 811: ft and lb exact; 1 ft·lbf = 1.355 817 948 J
const LADDER = DEFAULT_LADDER.map((l) => ({ id: l.name, lower_bound_j: l.lower_bound_j }));

const ground: FallSetting = { floor_height_m: 20, surface: 'ground', water_depth_m: null, altitude_m: 0, design_wind_m_s: 0, current_m_s: 0 };
const steelBall: ItemPhysics = { mass_kg: 4, shape: 'sphere', dimensions_m: { diameter: 0.1 }, cd: 0.47, area_m2: null, volume_m3: null, height_m: null };

describe('the default ladder sits at published reference energies', () => {
  it.each([
    ['Injury possible', 11 * FT_LBF_J, '14 CFR Part 417, Appendix C: 11 ft·lbf'],
    ['Beyond helmet test', 5 * 9.81 * 1, 'EN 397:2012 shock test: 5 kg from 1 m (g taken as 9.81 m/s² in the standard)'],
    ['Hazardous fragment', 58 * FT_LBF_J, 'DDESB Technical Paper 12: 58 ft·lbf'],
    ['Beyond net test', 100 * 9.81 * 7, 'EN 1263-1:2014 dynamic test: 100 kg from 7 m'],
  ])('%s starts at %f J (%s)', (name, joules) => {
    const level = DEFAULT_LADDER.find((l) => l.name === name)!;
    // Bounds are stated to the figures their sources give, so they agree to 1 %.
    expect(level.lower_bound_j).toBeGreaterThan(joules * 0.99);
    expect(level.lower_bound_j).toBeLessThan(joules * 1.01);
  });

  it('is a valid ladder by its own schema: starts at 0 J, rises, names unique', () => {
    expect(ladderSchema.safeParse({ levels: DEFAULT_LADDER }).success).toBe(true);
  });
});

describe('classification', () => {
  it('puts an energy on the level whose bound is the highest at or below it', () => {
    expect(classify(0, LADDER)).toBe('Under debris threshold');
    expect(classify(14.89, LADDER)).toBe('Under debris threshold');
    expect(classify(14.9, LADDER)).toBe('Injury possible');
    expect(classify(49, LADDER)).toBe('Beyond helmet test');
    expect(classify(78.99, LADDER)).toBe('Beyond helmet test');
    expect(classify(1e6, LADDER)).toBe('Beyond net test');
  });

  it('leaves a missing energy unclassified', () => {
    expect(classify(null, LADDER)).toBeNull();
    expect(classify(Number.NaN, LADDER)).toBeNull();
  });

  it('does not depend on the order the ladder is given in', () => {
    expect(classify(50, [...LADDER].reverse())).toBe('Beyond helmet test');
  });
});

describe('an item as a drop case', () => {
  it('falls from its level’s floor height unless it has its own, in the site’s wind', () => {
    const c = itemDropCase(steelBall, { ...ground, design_wind_m_s: 9 });
    expect(c.release?.height_m).toBe(20);
    expect(c.wind_m_s).toBe(9);
    expect(itemDropCase({ ...steelBall, height_m: 7.5 }, ground).release?.height_m).toBe(7.5);
  });

  it('over the sea falls through air to the surface, then seawater to the seabed', () => {
    const c = itemDropCase(steelBall, { ...ground, surface: 'water', water_depth_m: 60, design_wind_m_s: 15, current_m_s: 0.5 });
    expect(c.layers?.map((l) => l.thickness_m)).toEqual([20, 60]);
    expect(c.layers?.map((l) => l.flow_m_s)).toEqual([15, 0.5]);
    expect(c.layers?.[1].medium).toEqual({ preset: 'seawater' });
  });

  it('matches the closed form of Newton’s drag law, v = v_t·tanh(g·t/v_t), in still air', () => {
    // ISA sea level: ρ = 1.225 kg/m³ (US Standard Atmosphere 1976, Table I); C_d 0.47 for a sphere (Hoerner, Fluid-Dynamic Drag, recalled from memory).
    const r = computeItem(steelBall, ground, LADDER);
    // Buoyancy in air is kept: the net weight is (m − ρV)·g, about 1.6e-4 of the weight for a 10 cm steel ball.
    const area = (Math.PI * 0.1 ** 2) / 4;
    const volume = (Math.PI * 0.1 ** 3) / 6;
    const gEff = ((4 - 1.225 * volume) * g0) / 4;
    const vt = Math.sqrt((2 * 4 * gEff) / (1.225 * 0.47 * area));
    const v = vt * Math.tanh((gEff * r.fall_time_s!) / vt);
    expect(Math.abs(r.impact_speed_m_s! - v) / v).toBeLessThan(1e-5);
    // The vacuum rule E = m·g·h bounds it from above: drag only takes energy away.
    expect(r.impact_energy_j!).toBeLessThan(4 * g0 * 20);
    expect(r.effective_energy_j).toBe(r.impact_energy_j);
    expect(r.consequence_level_id).toBe(classify(r.effective_energy_j, LADDER));
  });

  it('keeps a floating object as a result that does not sink, at its arrival on the water', () => {
    // 0.01 kg in 1 litre: 10 kg/m³, far below seawater's 1025 kg/m³ (common practice value for seawater).
    const floating = computeItem({ ...steelBall, mass_kg: 0.01, shape: 'direct', dimensions_m: {}, cd: 1, area_m2: 0.01, volume_m3: 0.001 }, { ...ground, surface: 'water', water_depth_m: 10 }, LADDER);
    expect(floating.compute_error).toBeNull();
    expect(floating.sinks).toBe(false);
  });

  it('stores an error, never a number, for a case the physics core refuses', () => {
    const impossible = computeItem({ ...steelBall, shape: 'direct', dimensions_m: {}, cd: null, area_m2: null }, ground, LADDER);
    expect(impossible.compute_error).toMatch(/\w/);
    expect(impossible.impact_energy_j).toBeNull();
    expect(impossible.consequence_level_id).toBeNull();
  });
});

describe('the inputs hash', () => {
  it('ignores key order, which jsonb does not keep, and changes with any input', () => {
    const a = inputsHash(itemDropCase({ ...steelBall, shape: 'tumbling_box', dimensions_m: { length: 0.3, width: 0.2, height: 0.1 } }, ground));
    const b = inputsHash(itemDropCase({ ...steelBall, shape: 'tumbling_box', dimensions_m: { width: 0.2, height: 0.1, length: 0.3 } }, ground));
    const c = inputsHash(itemDropCase({ ...steelBall, shape: 'tumbling_box', dimensions_m: { width: 0.2, height: 0.1, length: 0.31 } }, ground));
    expect(a).toBe(b);
    expect(a).not.toBe(c);
  });
});

describe('register schemas in the user’s units', () => {
  it('reads pounds and feet into SI exactly', () => {
    // NIST SP 811, Appendix B: 1 lb = 0.453 592 37 kg and 1 ft = 0.3048 m, both exact.
    const item = itemSchema('us').parse({
      tag: 'A',
      description: 'Hammer',
      category: 'hand_tool',
      mass: '3',
      shape: 'long_bar',
      dimensions: { length: '1', width: '0.25' },
      level_id: '7d0e2c8e-4d1a-4f5b-9a3e-2b6c8d9e0f11',
      height: '100',
      securing: 'tethered',
    });
    expect(item.mass_kg).toBeCloseTo(3 * 0.45359237, 14);
    expect(item.dimensions_m).toEqual({ length: 0.3048, width: 0.0762 });
    expect(item.height_m).toBeCloseTo(30.48, 12);
  });

  it('names the field and states the limit in the units typed', () => {
    const r = siteSchema('us').safeParse({ name: 'X', kind: 'crane', surface: 'water', design_wind: '300' });
    expect(r.success).toBe(false);
    const issues = r.error!.issues.map((i) => [i.path.join('.'), i.message]);
    expect(issues).toContainEqual(['design_wind', 'Design wind speed must be at most 229.7 ft/s.']);
  });

  it('asks for water depth only where the sea is below', () => {
    const sea = siteSchema('si').safeParse({ name: 'Jetty', kind: 'offshore_deck', surface: 'water', design_wind: 10 });
    expect(sea.error!.issues.map((i) => i.path.join('.'))).toEqual(['water_depth']);
    const land = siteSchema('si').parse({ name: 'Yard', kind: 'building', surface: 'ground', design_wind: 10, water_depth: 30 });
    expect(land.water_depth).toBeNull();
  });

  it('turns dotted form names into nested objects and lists', () => {
    expect(unflatten({ 'dimensions.length': '1', 'levels.1.name': 'b', 'levels.0.name': 'a', tag: 'T' })).toEqual({
      dimensions: { length: '1' },
      levels: [{ name: 'a' }, { name: 'b' }],
      tag: 'T',
    });
  });
});
