import { ZERO_CELSIUS_K } from './constants';
import { PhysicsInputError, requireFinite, requirePositive } from './errors';
import { requireWithin } from './limits';

export type Phase = 'gas' | 'liquid';

/** A uniform, resolved medium. Viscosity may be unknown for a custom medium (then no Reynolds number). */
export interface Medium {
  readonly phase: Phase;
  readonly density_kg_m3: number;
  readonly viscosity_pa_s: number | null;
  /** A plain description for results, stating the assumptions (temperature, altitude). */
  readonly label: string;
}

export type MediumSpec =
  | { density_kg_m3: number; viscosity_pa_s?: number; phase?: Phase }
  | { preset: 'isa'; altitude_m?: number; temperature_offset_c?: number }
  | { preset: 'seawater' }
  | { preset: 'freshwater'; temperature_c?: number };

// US Standard Atmosphere 1976 constants for the troposphere.
const R_STAR = 8.31432; // J/(mol·K), the value the 1976 standard adopted
const AIR_MOLAR_MASS = 0.0289644; // kg/mol
const SEA_LEVEL_T = 288.15; // K
const SEA_LEVEL_P = 101325; // Pa
const LAPSE_RATE = 0.0065; // K per geopotential metre
const EARTH_RADIUS = 6356766; // m, for geometric to geopotential altitude
const G0 = 9.80665; // the standard defines its geopotential with g0, independent of a case's gravity
const SUTHERLAND_BETA = 1.458e-6; // kg/(s·m·K^0.5)
const SUTHERLAND_S = 110.4; // K

/** The troposphere ends at 11 000 geopotential metres (11 019 m geometric). */
export const ISA_MIN_ALTITUDE_M = -500;
export const ISA_MAX_ALTITUDE_M = 11019;

/**
 * Density boundary used when a custom medium does not say its phase. Gases at site conditions
 * stay below about 10 kg/m³ and liquids above about 500 kg/m³ (common practice); anything
 * between is unusual enough that the caller should state the phase.
 */
const GAS_LIQUID_SPLIT_KG_M3 = 100;

export interface IsaOptions {
  altitude_m?: number;
  temperature_offset_c?: number;
}

/**
 * ISA troposphere at a geometric altitude. A temperature offset shifts the temperature at
 * standard pressure (the usual "ISA + ΔT" convention), changing density and viscosity.
 */
export function isaAir(options: IsaOptions = {}, field = 'medium'): Medium {
  const z = requireFinite(`${field}.altitude_m`, options.altitude_m ?? 0);
  const dT = requireFinite(`${field}.temperature_offset_c`, options.temperature_offset_c ?? 0);
  if (z < ISA_MIN_ALTITUDE_M || z > ISA_MAX_ALTITUDE_M) {
    throw new PhysicsInputError(
      `${field}.altitude_m`,
      `the troposphere model covers ${ISA_MIN_ALTITUDE_M} m to ${ISA_MAX_ALTITUDE_M} m, got ${z}`,
    );
  }
  const hGeopotential = (EARTH_RADIUS * z) / (EARTH_RADIUS + z);
  const tStd = SEA_LEVEL_T - LAPSE_RATE * hGeopotential;
  const p = SEA_LEVEL_P * Math.pow(tStd / SEA_LEVEL_T, (G0 * AIR_MOLAR_MASS) / (R_STAR * LAPSE_RATE));
  const t = tStd + dT;
  if (t < 150 || dT > 60) {
    throw new PhysicsInputError(`${field}.temperature_offset_c`, `gives an implausible air temperature of ${(t - ZERO_CELSIUS_K).toFixed(1)} °C`);
  }
  const density = (p * AIR_MOLAR_MASS) / (R_STAR * t);
  const viscosity = (SUTHERLAND_BETA * Math.pow(t, 1.5)) / (t + SUTHERLAND_S);
  const offset = dT === 0 ? '' : ` ${dT > 0 ? '+' : '−'} ${Math.abs(dT)} K`;
  return {
    phase: 'gas',
    density_kg_m3: density,
    viscosity_pa_s: viscosity,
    label: `ISA air${offset} at ${z} m (${(t - ZERO_CELSIUS_K).toFixed(1)} °C, ${(p / 100).toFixed(1)} hPa)`,
  };
}

/**
 * Seawater at the common design density of 1025 kg/m³. The viscosity is that of seawater at
 * 15 °C and salinity 35 g/kg (ITTC recommended procedure 7.5-02-01-03, recalled from memory,
 * rounded), used only for the Reynolds number.
 */
export function seawater(): Medium {
  return { phase: 'liquid', density_kg_m3: 1025, viscosity_pa_s: 1.22e-3, label: 'seawater (1025 kg/m³ design value)' };
}

export const FRESHWATER_DEFAULT_TEMPERATURE_C = 20;

/**
 * Air-free fresh water at a stated temperature, 0-40 °C. Density from the formula of Tanaka et
 * al., Metrologia 38 (2001) 301; viscosity from the Vogel equation with the constants commonly
 * used in engineering (A = 2.414e-5 Pa·s, B = 247.8 K, C = 140 K; recalled from memory).
 */
export function freshwater(temperature_c: number = FRESHWATER_DEFAULT_TEMPERATURE_C, field = 'medium'): Medium {
  const t = requireFinite(`${field}.temperature_c`, temperature_c);
  if (t < 0 || t > 40) throw new PhysicsInputError(`${field}.temperature_c`, `must be from 0 to 40 °C (liquid water), got ${t}`);
  const a1 = -3.983035;
  const a2 = 301.797;
  const a3 = 522528.9;
  const a4 = 69.34881;
  const a5 = 999.97495;
  const density = a5 * (1 - ((t + a1) * (t + a1) * (t + a2)) / (a3 * (t + a4)));
  const viscosity = 2.414e-5 * Math.pow(10, 247.8 / (t + ZERO_CELSIUS_K - 140));
  return { phase: 'liquid', density_kg_m3: density, viscosity_pa_s: viscosity, label: `fresh water at ${t} °C` };
}

export function customMedium(
  spec: { density_kg_m3: number; viscosity_pa_s?: number; phase?: Phase },
  field = 'medium',
): Medium {
  const density = requireWithin(`${field}.density_kg_m3`, requirePositive(`${field}.density_kg_m3`, spec.density_kg_m3), 'density_kg_m3');
  const viscosity = spec.viscosity_pa_s === undefined ? null : requireWithin(`${field}.viscosity_pa_s`, requirePositive(`${field}.viscosity_pa_s`, spec.viscosity_pa_s), 'viscosity_pa_s');
  if (spec.phase !== undefined && spec.phase !== 'gas' && spec.phase !== 'liquid') {
    throw new PhysicsInputError(`${field}.phase`, `must be "gas" or "liquid"`);
  }
  const phase: Phase = spec.phase ?? (density < GAS_LIQUID_SPLIT_KG_M3 ? 'gas' : 'liquid');
  return { phase, density_kg_m3: density, viscosity_pa_s: viscosity, label: `custom ${phase} (${density} kg/m³)` };
}

export function resolveMedium(spec: MediumSpec, field = 'medium'): Medium {
  if (spec === null || typeof spec !== 'object') throw new PhysicsInputError(field, 'must be an object');
  if ('preset' in spec) {
    switch (spec.preset) {
      case 'isa':
        return isaAir(spec, field);
      case 'seawater':
        return seawater();
      case 'freshwater':
        return freshwater(spec.temperature_c ?? FRESHWATER_DEFAULT_TEMPERATURE_C, field);
      default:
        throw new PhysicsInputError(`${field}.preset`, `must be "isa", "seawater" or "freshwater", got ${JSON.stringify((spec as { preset: unknown }).preset)}`);
    }
  }
  return customMedium(spec, field);
}
