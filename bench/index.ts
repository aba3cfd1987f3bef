/**
 * Speed figures for the physics core (`npm run bench`). Prints medians beside their targets and
 * the closed-form time; it asserts nothing, because timings depend on the machine and its load.
 */
import numeric from 'numeric';
import { closedFormFall, simulateDrop, type DropCase } from '@/lib/physics';
import { dp45Fall, type FastFallParams } from '@/lib/physics/rk45';
import { dropZoneStatistics } from '@/lib/physics/sampling';
import { REFERENCE_DROP_ZONE } from './reference-drop-zone';
import { cliFigures } from './cli';

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : 0.5 * (s[m - 1] + s[m]);
}

/** Median time per call in µs over `batches` batches of `perBatch` calls, after a warm-up. */
function perCall(fn: () => unknown, perBatch: number, batches = 15): number {
  for (let i = 0; i < perBatch * 3; i++) fn();
  const times: number[] = [];
  for (let b = 0; b < batches; b++) {
    const t0 = performance.now();
    for (let i = 0; i < perBatch; i++) fn();
    times.push(((performance.now() - t0) * 1000) / perBatch);
  }
  return median(times);
}

const k = (0.5 * 1.225 * 1.0 * 0.01) / 2;
const vertical: DropCase = { object: { mass_kg: 2, cd: 1.0, area_m2: 0.01 }, drag_model: 'quadratic', medium: { density_kg_m3: 1.225 }, release: { height_m: 50 } };
const windy: DropCase = { ...vertical, wind_m_s: 10, release: { height_m: 50, velocity_m_s: [1, 0] } };
const fastVertical: FastFallParams = { height_m: 50, vx0: 0, vy0: 0, gravity: 9.80665, linear_per_s: 0, quadratic_per_m: k, flow_m_s: 0 };
const fastWindy: FastFallParams = { ...fastVertical, vx0: 1, flow_m_s: 10 };

const closed = perCall(() => closedFormFall({ height_m: 50, vx0: 0, vy0: 0, gravity: 9.80665, linear_per_s: 0, quadratic_per_m: k, flow_m_s: 0 }), 200_000);
const odexVertical = perCall(() => simulateDrop(vertical), 500);
const odexWindy = perCall(() => simulateDrop(windy), 500);
const dpVertical = perCall(() => dp45Fall(fastVertical), 20_000);
const dpWindy = perCall(() => dp45Fall(fastWindy), 20_000);

/**
 * The same two falls by numeric's dopri, the independent integrator the tests use: its one
 * absolute tolerance is set to 1e-10 of the case's scale (50 m), like simulateDrop's default,
 * and its ground event watches −y (numeric only detects rising crossings).
 */
function numericFall(vx0: number, wind: number) {
  const f = (_t: number, s: number[]) => {
    const ux = s[2] - wind;
    const d = k * Math.sqrt(ux * ux + s[3] * s[3]);
    return [s[2], s[3], -d * ux, -9.80665 - d * s[3]];
  };
  return numeric.dopri(0, 10, [0, 50, vx0, 0], f, 1e-10 * 50, 100_000, (_t, s) => -s[1]);
}
const numericVertical = perCall(() => numericFall(0, 0), 200);
const numericWindy = perCall(() => numericFall(1, 10), 200);

const spec = REFERENCE_DROP_ZONE;
dropZoneStatistics(spec);
const runs: number[] = [];
let zone = dropZoneStatistics(spec);
for (let i = 0; i < 7; i++) {
  const t0 = performance.now();
  zone = dropZoneStatistics(spec);
  runs.push(performance.now() - t0);
}

const rows: [string, string, string][] = [
  ['closed form, quadratic drag, 50 m', `${closed.toFixed(3)} µs`, 'reference (issue: about 0.1 µs)'],
  ['simulateDrop (odex), vertical 50 m fall with event', `${odexVertical.toFixed(1)} µs`, 'target ≤ 10 µs'],
  ['simulateDrop (odex), 2-D fall with wind', `${odexWindy.toFixed(1)} µs`, 'target ≤ 15 µs'],
  ['DP45 sampling kernel, vertical 50 m fall with event', `${dpVertical.toFixed(1)} µs`, 'target ≤ 10 µs'],
  ['DP45 sampling kernel, 2-D fall with wind', `${dpWindy.toFixed(1)} µs`, 'target ≤ 15 µs'],
  ['numeric.dopri (independent), vertical 50 m fall with event', `${numericVertical.toFixed(1)} µs`, `simulateDrop is ${(odexVertical / numericVertical).toFixed(2)}× this`],
  ['numeric.dopri (independent), 2-D fall with wind', `${numericWindy.toFixed(1)} µs`, `simulateDrop is ${(odexWindy / numericWindy).toFixed(2)}× this`],
  ['10,000-case drop zone, one thread', `${median(runs).toFixed(1)} ms`, 'target ≤ 100 ms'],
  ...cliFigures(),
];
const width = Math.max(...rows.map((r) => r[0].length));
console.log('Plumbline physics benchmark (medians; this machine, current load)\n');
for (const [name, value, target] of rows) console.log(`${name.padEnd(width)}  ${value.padStart(11)}   ${target}`);
console.log(`\nDP45 kernel beside numeric.dopri: ${(numericVertical / dpVertical).toFixed(1)}× faster vertical, ${(numericWindy / dpWindy).toFixed(1)}× with wind`);
console.log(`\nclosed form beside the solvers: odex ${(odexVertical / closed).toFixed(0)}× and DP45 ${(dpVertical / closed).toFixed(0)}× the closed-form time`);
console.log(
  `drop zone p95 ${zone.landing_distance_m.p95.toFixed(4)} m (SciPy reference 8.3925), p99 ${zone.landing_distance_m.p99.toFixed(4)} m (SciPy reference 9.4521), seed ${zone.seed}`,
);
