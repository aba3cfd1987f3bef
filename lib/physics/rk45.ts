import { PhysicsInputError, PhysicsSolveError, requireInteger, requirePositive } from './errors';
import type { ClosedFormParams } from './closed-forms';

/**
 * An embedded Dormand–Prince 5(4) pair (Dormand & Prince, J. Comput. Appl. Math. 6, 1980;
 * step control as in Hairer, Nørsett & Wanner, Solving ODEs I, §II.4) specialised to one body
 * falling to the ground through one uniform medium. It serves the Monte-Carlo sampling path
 * only, where thousands of falls must each take microseconds; `simulateDrop` uses odex. Because
 * drag in a uniform medium does not depend on position, only the velocity stages are formed
 * and the state is held in scalars, which is what makes it an order of magnitude faster.
 */
/** The same reduced parameters as the closed forms: per unit inertial mass, one layer. */
export type FastFallParams = ClosedFormParams;

export interface FastFallOptions {
  readonly relativeTolerance?: number;
  readonly absoluteTolerance?: number;
  readonly maxSteps?: number;
}

export interface FastFallResult {
  readonly fall_time_s: number;
  readonly drift_m: number;
  readonly vx: number;
  readonly vy: number;
  readonly steps: number;
}

export type ValidFastFallOptions = Required<FastFallOptions>;

export function validateFastFallOptions(options: FastFallOptions = {}, field = 'options'): ValidFastFallOptions {
  const rtol = requirePositive(`${field}.relativeTolerance`, options.relativeTolerance ?? 1e-9);
  if (rtol < 1e-13 || rtol > 1e-3) throw new PhysicsInputError(`${field}.relativeTolerance`, `must be from 1e-13 to 1e-3, got ${rtol}`);
  return {
    relativeTolerance: rtol,
    absoluteTolerance: requirePositive(`${field}.absoluteTolerance`, options.absoluteTolerance ?? 1e-9),
    maxSteps: requireInteger(`${field}.maxSteps`, options.maxSteps ?? 100_000, 10, 10_000_000),
  };
}

export function dp45Fall(params: FastFallParams, options: FastFallOptions = {}): FastFallResult {
  const p = params;
  requirePositive('params.gravity', p.gravity);
  for (const key of ['height_m', 'linear_per_s', 'quadratic_per_m'] as const) {
    const v = p[key];
    if (typeof v !== 'number' || !(v >= 0) || !Number.isFinite(v)) throw new PhysicsInputError(`params.${key}`, `must be a finite number ≥ 0, got ${v}`);
  }
  for (const key of ['vx0', 'vy0', 'flow_m_s'] as const) {
    if (typeof p[key] !== 'number' || !Number.isFinite(p[key])) throw new PhysicsInputError(`params.${key}`, `must be a finite number, got ${p[key]}`);
  }
  return dp45FallUnchecked(p, validateFastFallOptions(options));
}

// Dormand–Prince 5(4) coefficients.
const A21 = 1 / 5;
const A31 = 3 / 40, A32 = 9 / 40;
const A41 = 44 / 45, A42 = -56 / 15, A43 = 32 / 9;
const A51 = 19372 / 6561, A52 = -25360 / 2187, A53 = 64448 / 6561, A54 = -212 / 729;
const A61 = 9017 / 3168, A62 = -355 / 33, A63 = 46732 / 5247, A64 = 49 / 176, A65 = -5103 / 18656;
const B1 = 35 / 384, B3 = 500 / 1113, B4 = 125 / 192, B5 = -2187 / 6784, B6 = 11 / 84;
const E1 = 71 / 57600, E3 = -71 / 16695, E4 = 71 / 1920, E5 = -17253 / 339200, E6 = 22 / 525, E7 = -1 / 40;

/** b + κ·|u|, the drag factor per unit inertial mass. */
function dragFactor(beta: number, kappa: number, rx: number, uy: number): number {
  return beta + kappa * Math.sqrt(rx * rx + uy * uy);
}

/**
 * One Dormand–Prince step of size h from s = (x, y, v_x, v_y, a_x, a_y) (the acceleration is the
 * first stage, reused from the previous step's last one). Writes the new state, its
 * acceleration and the error estimate into out = (x, y, v_x, v_y, a_x, a_y, e_x, e_y, e_vx, e_vy).
 */
function dpStep(s: Float64Array, h: number, G: number, beta: number, kappa: number, w: number, out: Float64Array): void {
  const vx = s[2], vy = s[3], a1x = s[4], a1y = s[5];
  let d: number;
  const v2x = vx + h * A21 * a1x;
  const v2y = vy + h * A21 * a1y;
  d = dragFactor(beta, kappa, v2x - w, v2y);
  const a2x = -d * (v2x - w), a2y = -G - d * v2y;
  const v3x = vx + h * (A31 * a1x + A32 * a2x);
  const v3y = vy + h * (A31 * a1y + A32 * a2y);
  d = dragFactor(beta, kappa, v3x - w, v3y);
  const a3x = -d * (v3x - w), a3y = -G - d * v3y;
  const v4x = vx + h * (A41 * a1x + A42 * a2x + A43 * a3x);
  const v4y = vy + h * (A41 * a1y + A42 * a2y + A43 * a3y);
  d = dragFactor(beta, kappa, v4x - w, v4y);
  const a4x = -d * (v4x - w), a4y = -G - d * v4y;
  const v5x = vx + h * (A51 * a1x + A52 * a2x + A53 * a3x + A54 * a4x);
  const v5y = vy + h * (A51 * a1y + A52 * a2y + A53 * a3y + A54 * a4y);
  d = dragFactor(beta, kappa, v5x - w, v5y);
  const a5x = -d * (v5x - w), a5y = -G - d * v5y;
  const v6x = vx + h * (A61 * a1x + A62 * a2x + A63 * a3x + A64 * a4x + A65 * a5x);
  const v6y = vy + h * (A61 * a1y + A62 * a2y + A63 * a3y + A64 * a4y + A65 * a5y);
  d = dragFactor(beta, kappa, v6x - w, v6y);
  const a6x = -d * (v6x - w), a6y = -G - d * v6y;
  const nvx = vx + h * (B1 * a1x + B3 * a3x + B4 * a4x + B5 * a5x + B6 * a6x);
  const nvy = vy + h * (B1 * a1y + B3 * a3y + B4 * a4y + B5 * a5y + B6 * a6y);
  d = dragFactor(beta, kappa, nvx - w, nvy);
  const a7x = -d * (nvx - w), a7y = -G - d * nvy;
  // The position stages are the stage velocities, so the same weights apply to them.
  out[0] = s[0] + h * (B1 * vx + B3 * v3x + B4 * v4x + B5 * v5x + B6 * v6x);
  out[1] = s[1] + h * (B1 * vy + B3 * v3y + B4 * v4y + B5 * v5y + B6 * v6y);
  out[2] = nvx;
  out[3] = nvy;
  out[4] = a7x;
  out[5] = a7y;
  out[6] = h * (E1 * vx + E3 * v3x + E4 * v4x + E5 * v5x + E6 * v6x + E7 * nvx);
  out[7] = h * (E1 * vy + E3 * v3y + E4 * v4y + E5 * v5y + E6 * v6y + E7 * nvy);
  out[8] = h * (E1 * a1x + E3 * a3x + E4 * a4x + E5 * a5x + E6 * a6x + E7 * a7x);
  out[9] = h * (E1 * a1y + E3 * a3y + E4 * a4y + E5 * a5y + E6 * a6y + E7 * a7y);
}

/** Quintic Hermite interpolant on [0, 1] from values, first and second derivatives (scaled by h, h²). */
function quinticHermite(th: number, y0: number, d0: number, s0: number, y1: number, d1: number, s1: number): number {
  const t2 = th * th, t3 = t2 * th, t4 = t3 * th, t5 = t4 * th;
  return (
    (1 - 10 * t3 + 15 * t4 - 6 * t5) * y0 +
    (th - 6 * t3 + 8 * t4 - 3 * t5) * d0 +
    0.5 * (t2 - 3 * t3 + 3 * t4 - t5) * s0 +
    0.5 * (t3 - 2 * t4 + t5) * s1 +
    (-4 * t3 + 7 * t4 - 3 * t5) * d1 +
    (10 * t3 - 15 * t4 + 6 * t5) * y1
  );
}

/** For callers that validated once for many cases (the sampling loop). */
export function dp45FallUnchecked(p: FastFallParams, o: ValidFastFallOptions): FastFallResult {
  const G = p.gravity;
  const beta = p.linear_per_s;
  const kappa = p.quadratic_per_m;
  const w = p.flow_m_s;
  const rtol = o.relativeTolerance;
  if (p.height_m <= 0 && p.vy0 <= 0) return { fall_time_s: 0, drift_m: 0, vx: p.vx0, vy: p.vy0, steps: 0 };
  // Absolute tolerances scaled to the case, as in simulateDrop.
  const vacuumSpeed = Math.sqrt(p.vy0 * p.vy0 + 2 * G * p.height_m);
  const lScale = Math.max(p.height_m, p.vy0 > 0 ? (p.vy0 * p.vy0) / (2 * G) : 0, 1e-9);
  const vScale = Math.max(Math.abs(p.vx0), Math.abs(p.vy0), Math.abs(w), Math.min(vacuumSpeed, G / Math.max(beta, Math.sqrt(G * kappa), 1e-300)), 1e-12);
  const atolL = o.absoluteTolerance * lScale;
  const atolV = o.absoluteTolerance * vScale;

  const s = new Float64Array(6);
  const n = new Float64Array(10);
  s[1] = p.height_m;
  s[2] = p.vx0;
  s[3] = p.vy0;
  let d = dragFactor(beta, kappa, p.vx0 - w, p.vy0);
  s[4] = -d * (p.vx0 - w);
  s[5] = -G - d * p.vy0;

  // Initial step after Hairer, Nørsett & Wanner, II.4 (HINIT), with the same weighted norm.
  const sL = atolL + rtol * s[1];
  const sV = atolV + rtol * Math.max(Math.abs(s[2]), Math.abs(s[3]));
  const d0 = Math.sqrt((s[1] / sL) ** 2 + (s[2] / sV) ** 2 + (s[3] / sV) ** 2) / 2;
  const d1 = Math.sqrt((s[2] / sL) ** 2 + (s[3] / sL) ** 2 + (s[4] / sV) ** 2 + (s[5] / sV) ** 2) / 2;
  let h = d0 < 1e-5 || d1 < 1e-5 ? 1e-6 : (0.01 * d0) / d1;
  const ux1 = s[2] + h * s[4] - w;
  const uy1 = s[3] + h * s[5];
  d = dragFactor(beta, kappa, ux1, uy1);
  const d2 = Math.sqrt(((h * s[4]) / sL) ** 2 + ((h * s[5]) / sL) ** 2 + ((-d * ux1 - s[4]) / sV) ** 2 + ((-G - d * uy1 - s[5]) / sV) ** 2) / 2 / h;
  const dMax = Math.max(d1, d2);
  h = Math.min(100 * h, dMax <= 1e-15 ? Math.max(1e-6, h * 1e-3) : Math.pow(0.01 / dMax, 1 / 5));

  let t = 0;
  let steps = 0;
  let rejectedLast = false;
  for (;;) {
    if (steps >= o.maxSteps) throw new PhysicsSolveError(`the fall did not finish within ${o.maxSteps} steps`);
    steps++;
    dpStep(s, h, G, beta, kappa, w, n);
    const scx = atolL + rtol * Math.max(Math.abs(s[0]), Math.abs(n[0]));
    const scy = atolL + rtol * Math.max(Math.abs(s[1]), Math.abs(n[1]));
    const scvx = atolV + rtol * Math.max(Math.abs(s[2]), Math.abs(n[2]));
    const scvy = atolV + rtol * Math.max(Math.abs(s[3]), Math.abs(n[3]));
    const err = Math.sqrt(((n[6] / scx) ** 2 + (n[7] / scy) ** 2 + (n[8] / scvx) ** 2 + (n[9] / scvy) ** 2) / 4);
    // Written so a NaN estimate (an overflowing trial step) is a rejection, not an acceptance.
    if (!(err <= 1)) {
      h *= err > 1 ? Math.max(0.2, 0.9 * Math.pow(err, -0.2)) : 0.2;
      rejectedLast = true;
      continue;
    }
    if (n[1] <= 0) return landing(s, n, h, t, G, beta, kappa, w, steps);
    t += h;
    for (let i = 0; i < 6; i++) s[i] = n[i];
    const grow = err === 0 ? 10 : Math.min(10, Math.max(0.2, 0.9 * Math.pow(err, -0.2)));
    h *= rejectedLast ? Math.min(1, grow) : grow;
    rejectedLast = false;
  }
}

/**
 * The ground lies inside the step from s to n: find it on the quintic Hermite interpolant of the
 * height (values, velocities and accelerations at both ends), take a fresh step of that length
 * from s, and remove the remaining height error with one Newton correction.
 */
function landing(s: Float64Array, n: Float64Array, h: number, t: number, G: number, beta: number, kappa: number, w: number, steps: number): FastFallResult {
  const y0 = s[1], d0 = s[3] * h, s0 = s[5] * h * h;
  const y1 = n[1], d1 = n[3] * h, s1 = n[5] * h * h;
  let lo = 0, hi = 1, flo = y0, fhi = y1, side = 0;
  let th = y0 / (y0 - y1);
  for (let i = 0; i < 60; i++) {
    const f = quinticHermite(th, y0, d0, s0, y1, d1, s1);
    if (f > 0) {
      lo = th;
      flo = f;
      if (side === -1) fhi *= 0.5;
      side = -1;
    } else {
      hi = th;
      fhi = f;
      if (side === 1) flo *= 0.5;
      side = 1;
    }
    if (hi - lo < 1e-14 || Math.abs(f) <= 1e-15 * y0) break;
    th = lo - (flo * (hi - lo)) / (fhi - flo);
  }
  const hEvent = th * h;
  dpStep(s, hEvent, G, beta, kappa, w, n);
  const dt = n[1] / n[3];
  return {
    fall_time_s: t + hEvent - dt,
    drift_m: n[0] - n[2] * dt,
    vx: n[2] - n[4] * dt,
    vy: n[3] - n[5] * dt,
    steps,
  };
}
