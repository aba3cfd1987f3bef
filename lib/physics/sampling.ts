import { STANDARD_GRAVITY } from './constants';
import { PhysicsInputError, requireFinite, requireInteger, requireNonNegative, requirePositive } from './errors';
import { dp45FallUnchecked, validateFastFallOptions, type FastFallOptions } from './rk45';

/**
 * Monte-Carlo landing distances of one object released at rest or with a horizontal push into
 * a wind, for drop-zone radii. Uncertain inputs are drawn uniformly and independently from a
 * seeded generator, so a run is reproducible from its seed. Wind and release push both act
 * along +x (the cautious alignment: it gives the largest drift).
 */
export interface DropZoneSpec {
  readonly cases: number;
  readonly seed: number;
  readonly mass_kg: number;
  readonly area_m2: number;
  readonly density_kg_m3: number;
  readonly height_m: number;
  readonly gravity_m_s2?: number;
  /** [low, high] of a uniform draw; equal ends give a fixed value. */
  readonly cd: readonly [number, number];
  readonly wind_m_s: readonly [number, number];
  readonly release_speed_m_s: readonly [number, number];
}

export interface DropZoneOptions extends FastFallOptions {
  /** Return every landing distance (in draw order) as well as the percentiles. */
  readonly keepDistances?: boolean;
}

export interface DropZoneStatistics {
  readonly cases: number;
  readonly seed: number;
  /** Percentiles by linear interpolation between order statistics (Hyndman & Fan type 7). */
  readonly landing_distance_m: { readonly p50: number; readonly p90: number; readonly p95: number; readonly p99: number; readonly p99_9: number; readonly max: number };
  readonly mean_fall_time_s: number;
  readonly distances_m?: Float64Array;
}

export const MAX_CASES = 1_000_000;

/**
 * Mulberry32 (Tommy Ettinger's 32-bit generator, public domain): fast, seedable, and good
 * enough for drawing a few independent uniforms per case; not for cryptography.
 */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let z = a;
    z = Math.imul(z ^ (z >>> 15), z | 1);
    z ^= z + Math.imul(z ^ (z >>> 7), z | 61);
    return ((z ^ (z >>> 14)) >>> 0) / 4294967296;
  };
}

function range(field: string, value: unknown, check: (f: string, v: unknown) => number): [number, number] {
  if (!Array.isArray(value) || value.length !== 2) throw new PhysicsInputError(field, 'must be [low, high]');
  const lo = check(`${field}.0`, value[0]);
  const hi = check(`${field}.1`, value[1]);
  if (hi < lo) throw new PhysicsInputError(field, `high end ${hi} is below low end ${lo}`);
  return [lo, hi];
}

/** Linear interpolation between order statistics of sorted data (type 7). */
export function percentile(sorted: ArrayLike<number>, p: number): number {
  const pos = (sorted.length - 1) * p;
  const i = Math.floor(pos);
  const frac = pos - i;
  return i + 1 < sorted.length ? sorted[i] + frac * (sorted[i + 1] - sorted[i]) : sorted[i];
}

export function dropZoneStatistics(spec: DropZoneSpec, options: DropZoneOptions = {}): DropZoneStatistics {
  const cases = requireInteger('cases', spec.cases, 1, MAX_CASES);
  const seed = requireInteger('seed', spec.seed, 0, 0xffffffff);
  const mass = requirePositive('mass_kg', spec.mass_kg);
  const area = requirePositive('area_m2', spec.area_m2);
  const density = requireNonNegative('density_kg_m3', spec.density_kg_m3);
  const height = requireNonNegative('height_m', spec.height_m);
  const g = spec.gravity_m_s2 === undefined ? STANDARD_GRAVITY : requirePositive('gravity_m_s2', spec.gravity_m_s2);
  const [cdLo, cdHi] = range('cd', spec.cd, requireNonNegative);
  const [wLo, wHi] = range('wind_m_s', spec.wind_m_s, requireFinite);
  const [uLo, uHi] = range('release_speed_m_s', spec.release_speed_m_s, requireFinite);
  const fast = validateFastFallOptions(options, 'options');
  if (options.keepDistances !== undefined && typeof options.keepDistances !== 'boolean') {
    throw new PhysicsInputError('options.keepDistances', 'must be true or false');
  }

  const random = mulberry32(seed);
  const distances = new Float64Array(cases);
  const kPerCd = (0.5 * density * area) / mass;
  let timeSum = 0;
  for (let i = 0; i < cases; i++) {
    // Draw order is part of the reproducibility contract: C_d, wind, release speed.
    const cd = cdLo + (cdHi - cdLo) * random();
    const wind = wLo + (wHi - wLo) * random();
    const push = uLo + (uHi - uLo) * random();
    const r = dp45FallUnchecked(
      { height_m: height, vx0: push, vy0: 0, gravity: g, linear_per_s: 0, quadratic_per_m: kPerCd * cd, flow_m_s: wind },
      fast,
    );
    distances[i] = Math.abs(r.drift_m);
    timeSum += r.fall_time_s;
  }
  const sorted = Float64Array.from(distances).sort();
  const result: DropZoneStatistics = {
    cases,
    seed,
    landing_distance_m: {
      p50: percentile(sorted, 0.5),
      p90: percentile(sorted, 0.9),
      p95: percentile(sorted, 0.95),
      p99: percentile(sorted, 0.99),
      p99_9: percentile(sorted, 0.999),
      max: sorted[cases - 1],
    },
    mean_fall_time_s: timeSum / cases,
  };
  return options.keepDistances ? { ...result, distances_m: distances } : result;
}
