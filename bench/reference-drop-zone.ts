import type { DropZoneSpec } from '@/lib/physics/sampling';

/**
 * The drop-zone case the benchmark times and the tests check against SciPy (p95 8.3925 m, p99 9.4521 m; see
 * scripts/reference/drop_zone.py and its fixture):
 * m 2 kg, A 0.01 m², ρ 1.225 kg/m³, h 50 m, C_d uniform in [0.8, 1.3], wind uniform in [0, 15] m/s, horizontal
 * release speed uniform in [0, 2] m/s, 10,000 cases.
 */
export const REFERENCE_DROP_ZONE: DropZoneSpec = {
  cases: 10_000,
  seed: 12345,
  mass_kg: 2,
  area_m2: 0.01,
  density_kg_m3: 1.225,
  height_m: 50,
  cd: [0.8, 1.3],
  wind_m_s: [0, 15],
  release_speed_m_s: [0, 2],
};
