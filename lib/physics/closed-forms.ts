import { bracketedRoot, lambertW0 } from './roots';

/**
 * Closed-form falls of one body in one uniform medium. The equation of motion, per unit of
 * the inertial mass M = m + m_a, is dv/dt = −G·ŷ − (β + κ·|u|)·u with u = v − (w, 0),
 * G = (m − ρ·V)·g / M, β = b / M and κ = c / M. These are the independent reference the
 * integrator is verified against, so they share no code with it.
 */
export interface ClosedFormParams {
  /** Height above the impact surface, m (≥ 0). */
  readonly height_m: number;
  readonly vx0: number;
  readonly vy0: number;
  /** Effective gravity G, m/s² (> 0). */
  readonly gravity: number;
  /** β, 1/s. */
  readonly linear_per_s: number;
  /** κ, 1/m. */
  readonly quadratic_per_m: number;
  /** Horizontal flow of the medium, m/s. */
  readonly flow_m_s: number;
}

export interface ClosedFormFall {
  readonly fall_time_s: number;
  readonly impact_velocity_m_s: readonly [number, number];
  readonly impact_speed_m_s: number;
  readonly drift_m: number;
  readonly apex_height_m: number | null;
  readonly method: 'vacuum' | 'linear' | 'quadratic' | 'linear_quadratic';
}

/**
 * The closed form for a case, or null where none applies: quadratic drag couples the
 * horizontal and vertical motion, so with a horizontal release speed or a cross flow only
 * vacuum and linear drag have one.
 */
export function closedFormFall(p: ClosedFormParams): ClosedFormFall | null {
  const { linear_per_s: beta, quadratic_per_m: kappa } = p;
  if (p.height_m === 0 && p.vy0 <= 0) {
    return { fall_time_s: 0, impact_velocity_m_s: [p.vx0, p.vy0], impact_speed_m_s: Math.hypot(p.vx0, p.vy0), drift_m: 0, apex_height_m: null, method: beta === 0 && kappa === 0 ? 'vacuum' : kappa === 0 ? 'linear' : beta === 0 ? 'quadratic' : 'linear_quadratic' };
  }
  if (beta === 0 && kappa === 0) return vacuumFall(p.height_m, p.vx0, p.vy0, p.gravity);
  if (kappa === 0) return linearFall(p);
  if (p.vx0 !== 0 || p.flow_m_s !== 0) return null;
  if (beta === 0) return quadraticFall(p.height_m, p.vy0, p.gravity, kappa);
  return linearQuadraticFall(p.height_m, p.vy0, p.gravity, beta, kappa);
}

/**
 * Speed against time for a release from rest in still fluid, where a closed form for the whole history is
 * textbook: vacuum v = G·t, linear drag v = v_t·(1 − e^(−β·t)) with v_t = G/β, quadratic drag v = v_t·tanh(G·t/v_t)
 * with v_t = √(G/κ). Null for a thrown release, a cross flow, a floating body or both drag terms at once.
 */
export function closedFormSpeeds(p: ClosedFormParams, times: readonly number[]): number[] | null {
  const { gravity: G, linear_per_s: beta, quadratic_per_m: kappa } = p;
  if (p.vx0 !== 0 || p.vy0 !== 0 || p.flow_m_s !== 0 || !(G > 0)) return null;
  if (beta === 0 && kappa === 0) return times.map((t) => G * t);
  if (kappa === 0) return times.map((t) => (G / beta) * -Math.expm1(-beta * t));
  if (beta === 0) {
    const vt = Math.sqrt(G / kappa);
    return times.map((t) => vt * Math.tanh((G * t) / vt));
  }
  return null;
}

export function vacuumFall(h: number, vx0: number, vy0: number, g: number): ClosedFormFall {
  const root = Math.sqrt(vy0 * vy0 + 2 * g * h);
  // The second form avoids cancellation for a fast downward throw.
  const t = vy0 >= 0 ? (vy0 + root) / g : (2 * h) / (root - vy0);
  return {
    fall_time_s: t,
    impact_velocity_m_s: [vx0, -root],
    impact_speed_m_s: Math.hypot(vx0, root),
    drift_m: vx0 * t,
    apex_height_m: vy0 > 0 ? h + (vy0 * vy0) / (2 * g) : null,
    method: 'vacuum',
  };
}

/** (1 − e^(−s)) / s, accurate near s = 0. */
function phi1(s: number): number {
  if (Math.abs(s) < 1e-4) return 1 - s / 2 + (s * s) / 6 - (s * s * s) / 24;
  return -Math.expm1(-s) / s;
}

/**
 * (s − 1 + e^(−s)) / s², accurate near s = 0. For s ≥ 1 it is written (1 − φ₁(s)) / s, which
 * neither cancels there nor overflows where s² would (β·t beyond 1e154).
 */
function phi2(s: number): number {
  if (Math.abs(s) < 1e-3) return 0.5 - s / 6 + (s * s) / 24 - (s * s * s) / 120 + (s * s * s * s) / 720;
  if (s >= 1) return (1 - phi1(s)) / s;
  return (s + Math.expm1(-s)) / (s * s);
}

/**
 * Linear drag: y(t) = h + v₀·t·φ₁(βt) − G·t²·φ₂(βt). The fall time is
 * t = [C + W₀(−D·e^(−C))] / β with v_t = G/β, C = β·(h + (v₀ + v_t)/β)/v_t, D = (v₀ + v_t)/v_t;
 * that form loses digits when βt is small, so two Newton steps on the φ form polish it.
 */
export function linearFall(p: ClosedFormParams): ClosedFormFall {
  const { height_m: h, vx0, vy0, gravity: G, linear_per_s: beta, flow_m_s: w } = p;
  const vt = G / beta;
  // t·(v₀·φ₁ − G·t·φ₂) rather than G·t², which overflows for the longest falls.
  const y = (t: number) => h + t * (vy0 * phi1(beta * t) - G * (t * phi2(beta * t)));
  const vy = (t: number) => vy0 * Math.exp(-beta * t) - G * t * phi1(beta * t);
  const tApex = vy0 > 0 ? Math.log1p(vy0 / vt) / beta : null;
  let t = 0;
  if (h > 0 || vy0 > 0) {
    const D = (vy0 + vt) / vt;
    const C = (beta * h) / vt + D;
    const arg = -D * Math.exp(-C);
    const estimate = Number.isFinite(arg) ? (C + lambertW0(Math.max(arg, -1 / Math.E))) / beta : Number.NaN;
    // Near the branch point of W (tiny drag, or a throw from the ground) the estimate loses
    // digits, so it only seeds a bracket for a safeguarded Newton solve on the φ form.
    const lo = tApex ?? 0;
    let hi = estimate > lo && Number.isFinite(estimate) ? estimate * (1 + 1e-6) : Math.max(lo, vacuumFall(h, 0, vy0, G).fall_time_s);
    if (!(hi > lo)) hi = lo + 1e-9 + vacuumFall(h, 0, Math.max(vy0, 0), G).fall_time_s;
    while (y(hi) > 0) hi = lo + 2 * (hi - lo);
    t = bracketedRoot(y, lo, hi, { df: vy, fTol: 1e-15 * Math.max(h, 1e-300) });
  }
  const vyImpact = vy(t);
  const vxImpact = w + (vx0 - w) * Math.exp(-beta * t);
  return {
    fall_time_s: t,
    impact_velocity_m_s: [vxImpact, vyImpact],
    impact_speed_m_s: Math.hypot(vxImpact, vyImpact),
    drift_m: w * t + (vx0 - w) * t * phi1(beta * t),
    apex_height_m: tApex === null ? null : y(tApex),
    method: 'linear',
  };
}

/** arcosh(e^L) for L ≥ 0 without overflow or cancellation. */
function arcoshExp(L: number): number {
  return L + Math.log1p(Math.sqrt(-Math.expm1(-2 * L)));
}

/** asinh(e^L) without overflow. */
function asinhExp(L: number): number {
  return L < 0 ? Math.asinh(Math.exp(L)) : L + Math.log1p(Math.sqrt(1 + Math.exp(-2 * L)));
}

/** ln sinh(x) for x > 0 without overflow. */
function logSinh(x: number): number {
  return x < 1 ? Math.log(Math.sinh(x)) : x + Math.log1p(-Math.exp(-2 * x)) - Math.LN2;
}

/** ln cosh(x) without overflow or loss of digits near zero. */
function logCosh(x: number): number {
  const a = Math.abs(x);
  // cosh x − 1 = 2·sinh²(x/2) keeps the digits of a small argument.
  if (a < 1) return Math.log1p(2 * Math.sinh(a / 2) ** 2);
  return a + Math.log1p(Math.exp(-2 * a)) - Math.LN2;
}

/**
 * Quadratic drag, vertical. Falling from speed s₀ = a·v_t, the distance after t is
 * L·ln(cosh τ + a·sinh τ) with τ = G·t/v_t and L = v_t²/G (from rest a = 0: the textbook
 * y = h − L·ln cosh(G·t/v_t); above v_t the coth branch gives the same expression), so the
 * fall time is one monotone root in τ, solved in a form that neither cancels for a drop much
 * shorter than L nor overflows for one much longer. An upward throw first rises
 * (L/2)·ln(1 + v₀²/v_t²) in (v_t/G)·atan(v₀/v_t), then falls from rest.
 */
export function quadraticFall(h: number, vy0: number, G: number, kappa: number): ClosedFormFall {
  const vt = Math.sqrt(G / kappa);
  const T = vt / G;
  const Lg = (vt * vt) / G;
  let t: number;
  let speed: number;
  let apex: number | null = null;
  if (vy0 > 0) {
    const rise = 0.5 * Lg * Math.log1p((vy0 / vt) ** 2);
    apex = h + rise;
    const tau = descentPhase((h + rise) / Lg, 0);
    t = T * Math.atan(vy0 / vt) + T * tau;
    speed = vt * Math.tanh(tau);
  } else {
    const s0 = -vy0;
    t = T * descentPhase(h / Lg, s0 / vt);
    // v² relaxes to v_t² exponentially with the distance fallen: v² = v_t² + (v₀² − v_t²)·e^(−2h/L).
    // Written with expm1 so a short drop (h ≪ v_t²/G) keeps its digits.
    speed = Math.sqrt(-vt * vt * Math.expm1((-2 * h) / Lg) + s0 * s0 * Math.exp((-2 * h) / Lg));
  }
  return {
    fall_time_s: t,
    impact_velocity_m_s: [0, -speed],
    impact_speed_m_s: speed,
    drift_m: 0,
    apex_height_m: apex,
    method: 'quadratic',
  };
}

/**
 * The τ ≥ 0 with ln(cosh τ + a·sinh τ) = H, for a ≥ 0 and H ≥ 0. The textbook forms
 * (arcosh from rest; with φ = artanh a or artanh(1/a), arcosh/arsinh of e^(ln cosh φ + H) − φ)
 * give it directly but cancel when H ≪ ln cosh φ, a short drop thrown down, so Newton steps on
 * the equation itself finish the job: it is convex in τ for a < 1 and concave for a > 1, so
 * Newton converges monotonically after its first step from any start at or below the root.
 */
function descentPhase(H: number, a: number): number {
  if (H === 0) return 0;
  if (a === 0) return arcoshExp(H);
  if (a === 1) return H;
  let tau = a < 1 ? arcoshExp(logCosh(Math.atanh(a)) + H) - Math.atanh(a) : asinhExp(logSinh(Math.atanh(1 / a)) + H) - Math.atanh(1 / a);
  if (!(tau > 0)) tau = 0;
  for (let i = 0; i < 100; i++) {
    let F: number;
    let dF: number;
    if (tau < 20) {
      // cosh τ − 1 = 2·sinh²(τ/2) keeps the digits of a small τ.
      const sh = Math.sinh(tau);
      const ch = Math.cosh(tau);
      F = Math.log1p(2 * Math.sinh(tau / 2) ** 2 + a * sh) - H;
      dF = (sh + a * ch) / (ch + a * sh);
    } else {
      // Past τ = 20 the e^(−2τ) terms are below rounding beside 1 + a: no overflow.
      const e = Math.exp(-2 * tau);
      F = tau + Math.log(0.5 * (1 + a) + 0.5 * (1 - a) * e) - H;
      dF = (1 + a - (1 - a) * e) / (1 + a + (1 - a) * e);
    }
    const step = F / dF;
    tau -= step;
    if (Math.abs(step) <= 1e-15 * tau) break;
  }
  return tau;
}

/**
 * Linear plus quadratic drag, vertical. Falling at speed s, ds/dt = G − β·s − κ·s²: the
 * Riccati solution is s = −β/2κ + (q/2κ)·tanh(q·t/2 + φ₀) with q = √(β² + 4κG). It is evaluated
 * in the equivalent Bernoulli form δ = s − s_t = δ₀·e^(−qt) / (1 + (κδ₀/q)(1 − e^(−qt))), whose
 * distance s_t·t + ln(1 + (κδ₀/q)(1 − e^(−qt)))/κ stays exact as κ → 0; t(h) is a root solve.
 */
export function linearQuadraticFall(h: number, vy0: number, G: number, beta: number, kappa: number): ClosedFormFall {
  let apex: number | null = null;
  let tUp = 0;
  let drop = h;
  let s0 = -vy0;
  if (vy0 > 0) {
    const rise = ascent(vy0, G, beta, kappa);
    tUp = rise.time;
    apex = h + rise.height;
    drop = apex;
    s0 = 0;
  }
  const q = Math.sqrt(beta * beta + 4 * kappa * G);
  const st = (2 * G) / (beta + q);
  const d0 = s0 - st;
  const a = (kappa * d0) / q;
  const distance = (t: number) => st * t + relaxedDistance(a, kappa, d0, q, t);
  const speed = (t: number) => {
    const e = Math.exp(-q * t);
    return st + (d0 * e) / (1 - a * Math.expm1(-q * t));
  };
  let t = 0;
  if (drop > 0) {
    const tHi = d0 < 0 ? (drop - relaxedDistance(a, kappa, d0, q, Infinity)) / st : drop / st;
    t = bracketedRoot((x) => distance(x) - drop, 0, tHi * (1 + 1e-12), { df: speed, fTol: 1e-14 * drop });
  }
  const s = speed(t);
  return {
    fall_time_s: tUp + t,
    impact_velocity_m_s: [0, -s],
    impact_speed_m_s: s,
    drift_m: 0,
    apex_height_m: apex,
    method: 'linear_quadratic',
  };
}

/** ∫₀ᵗ δ dt for the Bernoulli relaxation; the κ → 0 limit is δ₀·(1 − e^(−qt))/q. */
function relaxedDistance(a: number, kappa: number, d0: number, q: number, t: number): number {
  const x = -Math.expm1(-q * t);
  if (Math.abs(a * x) < 1e-8) return (d0 * x * (1 - (a * x) / 2 + (a * x * a * x) / 3)) / q;
  return Math.log1p(a * x) / kappa;
}

/**
 * Rise of an upward throw under G + β·v + κ·v² (v upward): time to the apex and height gained.
 * With Δ = β² − 4κG the integrals are logarithmic (Δ > 0, written in the same Bernoulli form as
 * the descent) or arctangent (Δ < 0).
 */
function ascent(v0: number, G: number, beta: number, kappa: number): { time: number; height: number } {
  const disc = beta * beta - 4 * kappa * G;
  if (disc > 1e-12 * beta * beta) {
    const p = Math.sqrt(disc);
    // v + r with r = 2G/(β + p) the magnitude of the root nearer zero.
    const r = (2 * G) / (beta + p);
    const d0 = v0 + r;
    const a = (kappa * d0) / p;
    const time = Math.log((d0 + r * a) / (r * (1 + a))) / p;
    return { time, height: -r * time + relaxedDistance(a, kappa, d0, p, time) };
  }
  let time: number;
  if (disc < -1e-12 * beta * beta) {
    const p = Math.sqrt(-disc);
    time = (2 / p) * Math.atan(((2 * kappa * v0) / p) / (1 + ((2 * kappa * v0 + beta) * beta) / (p * p)));
  } else {
    const c = beta / (2 * kappa);
    time = (1 / kappa) * (1 / c - 1 / (v0 + c));
  }
  const height = Math.log1p((kappa * v0 * v0 + beta * v0) / G) / (2 * kappa) - (beta / (2 * kappa)) * time;
  return { time, height };
}
