import { PhysicsInputError, requireFinite } from './errors';

/**
 * Physical input limits, SI. They reach well past every real dropped object, from a 0.1 µm
 * particle to a 10,000 t module, and stop where the numbers would stop meaning anything or
 * where products of them could leave double precision. Inside them every case solves; outside
 * them the input is refused naming its field. The README lists them beside the drop-case JSON.
 * (Each bound is common practice for this tool, chosen with margin, not taken from a standard.)
 */
export interface InputLimit {
  readonly min: number;
  readonly max: number;
  readonly unit: string;
}

export const INPUT_LIMITS = {
  /** A 0.1 µm mineral particle weighs about 1e-18 kg; the heaviest offshore lifts about 1e7 kg. */
  mass_kg: { min: 1e-18, max: 1e7, unit: 'kg' },
  /** Drop height or layer thickness: from a micrometre to 100 km. */
  height_m: { min: 1e-6, max: 1e5, unit: 'm' },
  area_m2: { min: 1e-16, max: 1e4, unit: 'm²' },
  volume_m3: { min: 0, max: 1e6, unit: 'm³' },
  cd: { min: 0, max: 100, unit: '' },
  added_mass_coeff: { min: 0, max: 10, unit: '' },
  linear_coeff_kg_s: { min: 0, max: 1e6, unit: 'kg/s' },
  /** Each release velocity component, m/s (a sling or a blast, not a projectile). */
  velocity_m_s: { min: -1000, max: 1000, unit: 'm/s' },
  /** Wind or current along +x; the strongest gusts recorded are near 110 m/s. */
  flow_m_s: { min: -300, max: 300, unit: 'm/s' },
  gravity_m_s2: { min: 0.1, max: 100, unit: 'm/s²' },
  density_kg_m3: { min: 1e-4, max: 3e4, unit: 'kg/m³' },
  viscosity_pa_s: { min: 1e-7, max: 1e5, unit: 'Pa·s' },
  /** Shape dimensions; 100 m keeps a shape's area and volume inside the limits above. */
  dimension_m: { min: 1e-7, max: 100, unit: 'm' },
} as const satisfies Record<string, InputLimit>;

export type LimitName = keyof typeof INPUT_LIMITS;

/** A finite number inside the named limit, or a PhysicsInputError naming the field. */
export function requireWithin(field: string, value: unknown, name: LimitName): number {
  const v = requireFinite(field, value);
  const { min, max, unit } = INPUT_LIMITS[name];
  if (v < min || v > max) {
    throw new PhysicsInputError(field, `must be from ${plain(min)} to ${plain(max)}${unit ? ' ' + unit : ''} (the limits of the model), got ${v}`);
  }
  return v;
}

/** 1e-6 and 1e7 rather than 0.000001 and 10000000. */
function plain(n: number): string {
  return n !== 0 && (Math.abs(n) < 1e-3 || Math.abs(n) >= 1e5) ? n.toExponential().replace('e+', 'e') : String(n);
}
