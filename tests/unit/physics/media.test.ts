import { describe, expect, it } from 'vitest';
import {
  customMedium,
  freshwater,
  isaAir,
  PhysicsInputError,
  resolveMedium,
  seawater,
  STANDARD_GRAVITY,
} from '@/lib/physics';

describe('ISA troposphere', () => {
  // U.S. Standard Atmosphere, 1976 (NOAA/NASA/USAF), table of density by geometric altitude;
  // the table gives four decimals, so agreement is to half a unit in the last place.
  it.each([
    [0, 1.225],
    [1000, 1.1117],
    [3000, 0.9093],
  ])('density at %d m is %f kg/m³', (z, rho) => {
    expect(Math.abs(isaAir({ altitude_m: z }).density_kg_m3 - rho)).toBeLessThanOrEqual(5e-5);
  });

  it('sea-level viscosity matches the standard', () => {
    // U.S. Standard Atmosphere, 1976: dynamic viscosity 1.7894e-5 Pa·s at sea level (recalled from memory).
    expect(isaAir().viscosity_pa_s!).toBeCloseTo(1.7894e-5, 8);
  });

  it('a warmer day at standard pressure is less dense in proportion to absolute temperature', () => {
    // Ideal-gas law at fixed pressure: ρ ∝ 1/T; ISA sea level 288.15 K (U.S. Standard Atmosphere, 1976).
    const ratio = isaAir({ temperature_offset_c: 20 }).density_kg_m3 / isaAir().density_kg_m3;
    expect(ratio).toBeCloseTo(288.15 / 308.15, 12);
  });

  it('rejects altitudes outside the troposphere, naming the field', () => {
    expect(() => resolveMedium({ preset: 'isa', altitude_m: 12000 }, 'layers.0.medium')).toThrow(
      expect.objectContaining({ name: 'PhysicsInputError', field: 'layers.0.medium.altitude_m' }),
    );
  });
});

describe('water', () => {
  it('fresh water density follows the published table', () => {
    // Tanaka et al., Metrologia 38 (2001) 301, Table 1: 999.9750 kg/m³ at 4 °C, 998.2067 at 20 °C (recalled from memory).
    expect(freshwater(4).density_kg_m3).toBeCloseTo(999.975, 3);
    expect(freshwater(20).density_kg_m3).toBeCloseTo(998.2067, 3);
  });

  it('fresh water viscosity at 20 °C', () => {
    // IAPWS 2008 formulation: 1.0016 mPa·s at 20 °C and 0.1 MPa (recalled from memory); Vogel's fit is within 0.5 %.
    expect(Math.abs(freshwater(20).viscosity_pa_s! / 1.0016e-3 - 1)).toBeLessThan(0.005);
  });

  it('seawater uses the common design density', () => {
    // 1025 kg/m³: common design value for seawater (common practice), as the issue specifies.
    expect(seawater().density_kg_m3).toBe(1025);
    expect(seawater().phase).toBe('liquid');
  });

  it('fresh water outside 0-40 °C is refused', () => {
    expect(() => freshwater(60)).toThrow(PhysicsInputError);
  });
});

describe('custom media and units', () => {
  it('infers the phase from density unless given', () => {
    expect(customMedium({ density_kg_m3: 1.2 }).phase).toBe('gas');
    expect(customMedium({ density_kg_m3: 870 }).phase).toBe('liquid');
    expect(customMedium({ density_kg_m3: 870, phase: 'gas' }).phase).toBe('gas');
  });

  it('uses standard gravity', () => {
    // Standard gravity 9.80665 m/s², 3rd CGPM (1901).
    expect(STANDARD_GRAVITY).toBe(9.80665);
  });
});
