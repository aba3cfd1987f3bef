import { resolveDropCase, type DropCase, type ResolvedCase, type ResolvedLayer, type ResolvedObject } from './case';
import { reynoldsRegime, regimeMismatch, relativeDeviation, verify, type ReynoldsRegime, type Verification } from './classification';
import { closedFormFall, closedFormSpeeds, type ClosedFormParams } from './closed-forms';
import { MAX_SAMPLES, MODEL_VERSION, VERIFICATION_THRESHOLD } from './constants';
import { PhysicsInputError, PhysicsSolveError, requireInteger } from './errors';
import {
  integrate,
  IntegrationBudgetError,
  validateIntegratorOptions,
  type IntegrationRequest,
  type IntegratorOptions,
  type OdeEvent,
} from './integrator';

export interface SimulateOptions {
  /**
   * Tolerances and step budget of the odex integrator. The absolute tolerance is a single number
   * in units of the case's own length and speed scales (layer thickness, fall speed), so one
   * setting suits a dust particle and a 10 km fall alike.
   */
  readonly integrator?: IntegratorOptions;
  /** Plot samples; overrides the case's `samples`. 0 for none, otherwise 2 to 2000. */
  readonly samples?: number;
  /** Integrate the work of drag alongside the motion and report the energy balance. */
  readonly energyAudit?: boolean;
}

export interface LayerReport {
  readonly index: number;
  readonly medium: string;
  readonly phase: 'gas' | 'liquid';
  readonly top_m: number;
  readonly bottom_m: number;
  readonly terminal_speed_m_s: number | null;
  /** Arrival at the top of the layer (its upper surface); null below the layer the object floats in. */
  readonly entry_time_s: number | null;
  readonly entry_speed_m_s: number | null;
  readonly entry_velocity_m_s: [number, number] | null;
  /** ½·m·v² on arrival. */
  readonly entry_kinetic_energy_j: number | null;
  /** ½·(m + m_a)·v² on arrival, with the added mass of this layer's medium (zero in a gas). */
  readonly entry_effective_energy_j: number | null;
  /** Null when the object does not pass through the layer (it floats in it or above it). */
  readonly exit_time_s: number | null;
  /** Set where the analytic terminal tail finished the layer. */
  readonly analytic_tail: TailReport | null;
}

/** Arrival at one surface: a water surface or the bottom. */
export interface SurfaceArrival {
  /** The layer whose top (water entry) or bottom (seabed) this is. */
  readonly layer_index: number;
  readonly time_s: number;
  readonly speed_m_s: number;
  readonly velocity_m_s: [number, number];
  readonly kinetic_energy_j: number;
  /** With the added mass of the liquid: what a struck body takes, per DNV-RP-F107's E = ½(m + m_a)v². */
  readonly effective_energy_j: number;
}

/** Where the analytic terminal tail took over a layer, and a bound on the error it adds. */
export interface TailReport {
  readonly from_time_s: number;
  /** Distance from terminal velocity there, relative to the terminal speed. */
  readonly deviation: number;
  readonly time_error_bound_s: number;
}

export interface DropSamples {
  readonly t: number[];
  readonly x: number[];
  readonly y: number[];
  readonly v_x: number[];
  readonly v_y: number[];
  readonly speed: number[];
  /** Speed at the same times from the closed form (lib/physics/closed-forms.ts), where one exists for the whole fall. */
  readonly closed_form_speed: number[] | null;
}

export interface EnergyAudit {
  /** Change of kinetic energy (with added mass in liquids), summed over the layers. */
  readonly kinetic_change_j: number;
  readonly gravity_work_j: number;
  readonly buoyancy_work_j: number;
  readonly drag_work_j: number;
  /** kinetic change − (gravity + buoyancy + drag work); zero up to the integration tolerance. */
  readonly residual_j: number;
}

export interface DropResult {
  readonly model_version: string;
  /** The object as the model used it: given values, or the shape catalogue's with their ranges and sources. */
  readonly object: ResolvedObject;
  /** False when the object floats in a layer and never reaches the bottom. */
  readonly sinks: boolean;
  /** The medium whose surface a floating object stops at (its impact values are those on arrival there); null when it sinks. */
  readonly floats_at: string | null;
  readonly fall_time_s: number;
  readonly impact_speed_m_s: number;
  readonly impact_velocity_m_s: [number, number];
  readonly impact_energy_j: number;
  readonly effective_impact_energy_j: number;
  readonly impact_momentum_kg_m_s: number;
  /** Terminal speed in the layer where the fall ends; null without drag or when it floats. */
  readonly terminal_speed_m_s: number | null;
  readonly terminal_speeds_m_s: (number | null)[];
  /** Speed relative to the medium at impact over the terminal speed of that layer. */
  readonly fraction_of_terminal: number | null;
  readonly drift_m: number;
  readonly apex_height_m: number | null;
  readonly reynolds_at_impact: number | null;
  readonly reynolds_regime: { readonly regime: ReynoldsRegime; readonly note: string };
  readonly closed_form: { fall_time_s: number; impact_speed_m_s: number } | null;
  readonly closed_form_rel_deviation: number | null;
  readonly verification: Verification | null;
  readonly vacuum: { fall_time_s: number; impact_speed_m_s: number; impact_energy_j: number };
  readonly layers: LayerReport[];
  /**
   * First passage from a gas into a liquid: what a boat, a lower landing or a person in the
   * water takes. Null when the fall starts in the liquid or never meets one.
   */
  readonly water_entry: SurfaceArrival | null;
  /** Arrival at the bottom of a liquid bottom layer: what subsea equipment takes. Null if it floats or the bottom is dry. */
  readonly seabed: SurfaceArrival | null;
  readonly energy_audit?: EnergyAudit;
  readonly warnings: string[];
  readonly notice: string;
  readonly samples?: DropSamples;
}

const NOTICE =
  'Planning estimate from an idealised model (rigid body, uniform media, fixed drag coefficient). It is not a certification; confirm against the codes and procedures that apply at the site.';

interface LayerRun {
  readonly layer: ResolvedLayer;
  readonly t0: number;
  readonly s0: number[];
  readonly t1: number;
  readonly s1: number[];
  readonly apex: number | null;
  /** The odex request and options, kept so plot samples can replay exactly the same steps. */
  readonly request: IntegrationRequest | null;
  readonly options: Required<IntegratorOptions> | null;
  /** Where the state (relative frame) reached terminal velocity and the analytic tail took over. */
  readonly steadyFrom: { t: number; s: number[] } | null;
  readonly tail: TailReport | null;
}

interface ValidOptions {
  readonly integrator: Required<IntegratorOptions>;
  readonly samples: number | null;
  readonly energyAudit: boolean;
}

function validateOptions(options: SimulateOptions): ValidOptions {
  if (options === null || typeof options !== 'object') throw new PhysicsInputError('options', 'must be an object');
  const integrator = validateIntegratorOptions(options.integrator ?? {}, 'options.integrator');
  if (typeof integrator.absoluteTolerance !== 'number') {
    throw new PhysicsInputError('options.integrator.absoluteTolerance', 'must be a single number (it is scaled to the case)');
  }
  let samples: number | null = null;
  if (options.samples !== undefined) {
    samples = requireInteger('options.samples', options.samples, 0, MAX_SAMPLES);
    if (samples === 1) throw new PhysicsInputError('options.samples', `must be 0 or from 2 to ${MAX_SAMPLES}`);
  }
  if (options.energyAudit !== undefined && typeof options.energyAudit !== 'boolean') {
    throw new PhysicsInputError('options.energyAudit', 'must be true or false');
  }
  return { integrator, samples, energyAudit: options.energyAudit ?? false };
}

/** The fall of one object released at the top of its medium or layer stack. */
export function simulateDrop(input: DropCase, options: SimulateOptions = {}): DropResult {
  const opts = validateOptions(options);
  const c = resolveDropCase(input);
  const sampleCount = opts.samples ?? c.samples;
  const [vx0, vy0] = c.release_velocity;

  const runs: LayerRun[] = [];
  let t = 0;
  let state = [0, c.height_m, vx0, vy0, 0];
  let floatsIn: ResolvedLayer | null = null;
  for (const layer of c.layers) {
    if (layer.net_weight_n <= 0) {
      floatsIn = layer;
      break;
    }
    const run = runLayer(layer, t, state, layer.index === 0 && vy0 > 0, opts);
    runs.push(run);
    t = run.t1;
    state = run.s1;
  }

  const endLayer = floatsIn ?? c.layers[c.layers.length - 1];
  const m = c.object.mass_kg;
  const [vx, vy] = [state[2], state[3]];
  const speed = Math.hypot(vx, vy);
  const airspeed = Math.hypot(vx - endLayer.flow_m_s, vy);
  const vt = endLayer.terminal_speed_m_s;
  const terminal = Number.isFinite(vt) && vt > 0 ? vt : null;
  const mu = endLayer.medium.viscosity_pa_s;
  const length = c.object.characteristic_length_m;
  const reynolds = mu !== null && length !== null ? (endLayer.medium.density_kg_m3 * airspeed * length) / mu : null;
  const regime = reynoldsRegime(reynolds);

  const closed = floatsIn === null && c.single_medium ? closedFormFor(c) : null;
  const deviation = closed ? relativeDeviation({ fall_time_s: t, impact_speed_m_s: speed }, closed) : null;
  const verification = deviation === null ? null : verify(deviation);

  const vac = closedFormFall({ height_m: c.height_m, vx0, vy0, gravity: c.gravity_m_s2, linear_per_s: 0, quadratic_per_m: 0, flow_m_s: 0 })!;

  const layers = layerReports(c, runs);
  const result: DropResult = {
    model_version: MODEL_VERSION,
    object: c.object,
    sinks: floatsIn === null,
    floats_at: floatsIn ? floatsIn.medium.label : null,
    fall_time_s: t,
    impact_speed_m_s: speed,
    impact_velocity_m_s: [vx, vy],
    impact_energy_j: 0.5 * m * speed * speed,
    effective_impact_energy_j: 0.5 * (m + (floatsIn ? 0 : endLayer.added_mass_kg)) * speed * speed,
    impact_momentum_kg_m_s: m * speed,
    terminal_speed_m_s: floatsIn ? null : terminal,
    terminal_speeds_m_s: c.layers.map((l) => (Number.isFinite(l.terminal_speed_m_s) && l.net_weight_n > 0 ? l.terminal_speed_m_s : null)),
    fraction_of_terminal: terminal && !floatsIn ? airspeed / terminal : null,
    drift_m: state[0],
    apex_height_m: runs.length > 0 ? runs[0].apex : null,
    reynolds_at_impact: reynolds,
    reynolds_regime: regime,
    closed_form: closed ? { fall_time_s: closed.fall_time_s, impact_speed_m_s: closed.impact_speed_m_s } : null,
    closed_form_rel_deviation: deviation,
    verification,
    vacuum: { fall_time_s: vac.fall_time_s, impact_speed_m_s: vac.impact_speed_m_s, impact_energy_j: 0.5 * m * vac.impact_speed_m_s ** 2 },
    layers,
    water_entry: waterEntry(c, layers),
    seabed: floatsIn === null && endLayer.medium.phase === 'liquid' ? arrival(endLayer, m, t, vx, vy) : null,
    warnings: warningsFor(c, runs, floatsIn, regime.regime, deviation, t),
    notice: NOTICE,
  };
  const extras: { energy_audit?: EnergyAudit; samples?: DropSamples } = {};
  if (opts.energyAudit) extras.energy_audit = energyAudit(c, runs);
  if (sampleCount > 0) {
    const samples = sampleRuns(runs, t, state, sampleCount);
    // One medium only: the closed forms know no layer boundary.
    const closedSpeed = c.layers.length === 1 ? closedFormSpeeds(closedFormParams(c), samples.t) : null;
    extras.samples = { ...samples, closed_form_speed: closedSpeed };
  }
  const full = { ...result, ...extras };
  requireFiniteResult(full, 'result');
  return full;
}

/**
 * Inside the input limits every number is finite; this guard makes sure no NaN or infinity
 * can ever reach a caller (JSON would print it as null, silently) even if that reasoning fails.
 */
function requireFiniteResult(value: object, path: string): void {
  // Paths are only built for the error: this runs on every result.
  const values = value as Record<string, unknown>;
  for (const key in values) {
    const v = values[key];
    if (typeof v === 'number') {
      if (v - v !== 0) throw new PhysicsSolveError(`${path}.${key} came out as ${v}; no result is given rather than a wrong one (please report the case)`);
    } else if (v !== null && typeof v === 'object') {
      requireFiniteResult(v, `${path}.${key}`);
    }
  }
}

/** The first layer's equation of motion per unit inertial mass, as the closed forms take it. */
function closedFormParams(c: ResolvedCase): ClosedFormParams {
  const l = c.layers[0];
  const M = l.inertial_mass_kg;
  return {
    height_m: c.height_m,
    vx0: c.release_velocity[0],
    vy0: c.release_velocity[1],
    gravity: l.net_weight_n / M,
    linear_per_s: l.drag.linear_kg_s / M,
    quadratic_per_m: l.drag.quadratic_kg_m / M,
    flow_m_s: l.flow_m_s,
  };
}

function closedFormFor(c: ResolvedCase) {
  return closedFormFall(closedFormParams(c));
}

/**
 * Right-hand side over (x, y, u_x, u_y), per unit inertial mass, in the frame of velocities
 * relative to the medium: u = v − (w, 0). Near terminal velocity u is small beside a strong
 * wind, and in this frame its tolerance can follow the terminal speed instead of the wind.
 * The work done by drag is a fifth component when the energy is audited (left out otherwise:
 * it costs a fifth of the time).
 */
function rightHandSide(layer: ResolvedLayer, audit: boolean): (t: number, s: number[]) => number[] {
  const M = layer.inertial_mass_kg;
  const g = layer.net_weight_n / M;
  const b = layer.drag.linear_kg_s / M;
  const k = layer.drag.quadratic_kg_m / M;
  const w = layer.flow_m_s;
  if (audit) {
    return (_t, s) => {
      const ux = s[2];
      const uy = s[3];
      const d = b + k * Math.sqrt(ux * ux + uy * uy);
      const ax = -d * ux;
      const ay = -d * uy;
      return [ux + w, uy, ax, ay - g, M * (ax * (ux + w) + ay * uy)];
    };
  }
  return (_t, s) => {
    const ux = s[2];
    const uy = s[3];
    const d = b + k * Math.sqrt(ux * ux + uy * uy);
    return [ux + w, uy, -d * ux, -d * uy - g];
  };
}

const toRelative = (layer: ResolvedLayer, s: readonly number[]) => [s[0], s[1], s[2] - layer.flow_m_s, s[3], s[4]];
const toGround = (layer: ResolvedLayer, s: readonly number[]) => [s[0], s[1], s[2] + layer.flow_m_s, s[3], s[4]];

/**
 * Height an upward throw gains against net gravity G and drag β·u + κ·u². Each drag term alone
 * gives a closed form (quadratic: ln(1 + κv₀²/G)/2κ; linear: v₀/β − (G/β²)·ln(1 + βv₀/G)), and
 * with both the rise is below either, so the smallest is a true scale within a small factor.
 * The vacuum apex v₀²/2G alone can exceed the real rise 1e8 times for a near-neutral object.
 */
export function riseScale(v0: number, G: number, beta: number, kappa: number): number {
  if (v0 <= 0) return 0;
  let rise = (v0 * v0) / (2 * G);
  if (kappa > 0) rise = Math.min(rise, Math.log1p((kappa * v0 * v0) / G) / (2 * kappa));
  // Below βv₀/G ≈ 1e-3 the linear form cancels and the vacuum value is within 0.1 % of it.
  if (beta > 0 && (beta * v0) / G > 1e-3) rise = Math.min(rise, v0 / beta - (G / (beta * beta)) * Math.log1p((beta * v0) / G));
  return rise;
}

/**
 * The absolute speed tolerance is at most this many terminal speeds (times the tolerance): the
 * integrator then settles within about 1e-7·v_t of terminal velocity at the default 1e-10,
 * far inside the steady fraction, while a fall that enters a layer far above its terminal
 * speed (air into water) is not held to digits it does not need. 1 costs about 15 % more on
 * such falls for no gain in verified accuracy; 100 lets near-neutral throws drift to 3e-7.
 */
const TERMINAL_SPEED_SCALE = 10;

/** Length, speed and time scales of one layer's motion, from which tolerances and steps follow. */
export interface LayerScales {
  readonly length_m: number;
  readonly speed_m_s: number;
  /** The shortest time scale of the case; the first step is a quarter of it. */
  readonly time_s: number;
  readonly horizon_s: number;
}

export function layerScales(layer: ResolvedLayer, s0: readonly number[]): LayerScales {
  const M = layer.inertial_mass_kg;
  const G = layer.net_weight_n / M;
  const beta = layer.drag.linear_kg_s / M;
  const kappa = layer.drag.quadratic_kg_m / M;
  const vt = layer.terminal_speed_m_s;
  const hasVt = Number.isFinite(vt) && vt > 0;
  const thickness = s0[1] - layer.bottom_m;
  const [ux0, vy0] = [s0[2] - layer.flow_m_s, s0[3]];
  const u0 = Math.hypot(ux0, vy0);
  // The vacuum speed after falling the layer: an upper bound on the speed gained in it.
  const fallSpeed = Math.sqrt(vy0 * vy0 + 2 * G * thickness);
  const rise = riseScale(vy0, G, beta, kappa);
  const free = (Math.max(vy0, 0) + fallSpeed) / G;
  const times = [
    free,
    // Relaxation to terminal velocity, by either drag term.
    hasVt ? vt / G : Infinity,
    beta > 0 ? 1 / beta : Infinity,
    // Quadratic drag halves an initial relative speed u₀ in 1/(κ·u₀).
    kappa > 0 && u0 > 0 ? 1 / (kappa * u0) : Infinity,
    // Crossing a thin layer at the release speed.
    thickness > 0 && vy0 !== 0 ? thickness / Math.abs(vy0) : Infinity,
  ];
  return {
    length_m: Math.max(thickness, rise, Number.MIN_VALUE),
    // Speeds relative to the medium end at terminal speed; while they are larger the relative
    // tolerance governs, so the absolute one can follow v_t even in a strong wind.
    speed_m_s: Math.max(Math.min(hasVt ? TERMINAL_SPEED_SCALE * vt : Infinity, Math.max(fallSpeed, u0)), Number.MIN_VALUE),
    time_s: Math.min(...times),
    // A generous horizon: the real end is the bottom event.
    horizon_s: 10 * ((Math.max(vy0, 0) * 2) / G + fallSpeed / G + (hasVt ? thickness / vt + vt / G : 0)) + 1,
  };
}

/**
 * Relative distance from terminal velocity at which the rest of a layer is solved analytically:
 * √rtol, so the tail's second-order error (≈ θ², see terminalTail) matches the tolerance, but
 * at least 1e4·rtol so the integrator, which hovers within some hundred tolerances of a stiff
 * fixed point, always gets there. Capped so a loose tolerance still gives a linear tail.
 */
export function steadyFraction(rtol: number): number {
  return Math.min(1e-2, Math.max(Math.sqrt(rtol), 1e4 * rtol));
}

function runLayer(layer: ResolvedLayer, t0: number, s0: number[], trackApex: boolean, opts: ValidOptions): LayerRun {
  const bottom = layer.bottom_m;
  if (s0[1] <= bottom && s0[3] <= 0) {
    return { layer, t0, s0, t1: t0, s1: s0.slice(), apex: null, request: null, options: null, steadyFrom: null, tail: null };
  }
  const M = layer.inertial_mass_kg;
  const G = layer.net_weight_n / M;
  const vt = layer.terminal_speed_m_s;
  const scales = layerScales(layer, s0);
  const atolScalar = opts.integrator.absoluteTolerance as number;
  const audit = opts.energyAudit;
  const atol = [atolScalar * scales.length_m, atolScalar * scales.length_m, atolScalar * scales.speed_m_s, atolScalar * scales.speed_m_s];
  if (audit) atol.push(atolScalar * M * (scales.speed_m_s ** 2 + G * scales.length_m));
  const events: OdeEvent[] = [{ component: 1, level: bottom, direction: -1, terminal: true }];
  if (trackApex) events.push({ component: 3, level: 0, direction: -1, terminal: false });
  // Near terminal velocity an explicit method on a stiff case (a particle, a plate in water)
  // hovers about the fixed point without settling and would take millions of steps; from
  // within the steady fraction, the rest of the layer follows the linearised relaxation.
  const steadyTol = steadyFraction(opts.integrator.relativeTolerance) * (Number.isFinite(vt) ? vt : 0);
  const rel = toRelative(layer, s0);
  const request: IntegrationRequest = {
    timeScale: scales.time_s,
    initialStep: 0.25 * scales.time_s,
    f: rightHandSide(layer, audit),
    t0,
    y0: audit ? rel : rel.slice(0, 4),
    tEnd: t0 + scales.horizon_s,
    events,
    stopWhen: Number.isFinite(vt) && vt > 0 ? (_t, y) => Math.abs(y[2]) <= steadyTol && Math.abs(y[3] + vt) <= steadyTol : undefined,
  };
  const options = { ...opts.integrator, absoluteTolerance: atol };
  let out;
  try {
    out = integrate(request, options);
  } catch (e) {
    if (e instanceof IntegrationBudgetError) {
      throw new PhysicsSolveError(`${layer.medium.label} (layer ${layer.index}): ${e.message}; this is a fault of the solver for this case, please report it`);
    }
    throw e;
  }
  const apexHit = out.hits.find((h) => h.event === 1);
  const apex = apexHit ? apexHit.y[1] : null;
  // Without the audit the drag-work slot is carried unchanged.
  const full = (y: number[]) => (audit ? y : [...y, s0[4]]);
  if (out.status === 'event') return { layer, t0, s0, t1: out.t, s1: toGround(layer, full(out.y)), apex, request, options, steadyFrom: null, tail: null };
  if (out.status === 'stopped') {
    const s = full(out.y);
    const tail = terminalTail(layer, s);
    return { layer, t0, s0, t1: out.t + tail.dt, s1: toGround(layer, tail.state), apex, request, options, steadyFrom: { t: out.t, s }, tail: tailReport(layer, out.t, s) };
  }
  throw new PhysicsSolveError(`${layer.medium.label} (layer ${layer.index}): the object did not reach the bottom of the layer within ${scales.horizon_s.toPrecision(3)} s`);
}

/**
 * Bound on the tail's error. With δ the deviation from terminal velocity, the equations are
 * δ' = J·δ + r(δ), |r| ≤ 2κ|δ|² (the second derivatives of κ|u|·u are at most about 4κ), and
 * the linear part decays at least as fast as e^(−t/τ_x). The neglected r then moves the object
 * by at most κ·|δ₀|²·τ_x² in all, which at the terminal speed is a time of κ|δ₀|²τ_x²/v_t;
 * twice that is reported. Linear drag has r = 0 and an exact tail.
 */
function tailReport(layer: ResolvedLayer, t: number, s: number[]): TailReport {
  const M = layer.inertial_mass_kg;
  const vt = layer.terminal_speed_m_s;
  const kappa = layer.drag.quadratic_kg_m / M;
  const tauX = M / (layer.drag.linear_kg_s + layer.drag.quadratic_kg_m * vt);
  const d2 = s[2] * s[2] + (s[3] + vt) ** 2;
  return { from_time_s: t, deviation: Math.sqrt(d2) / vt, time_error_bound_s: (2 * kappa * d2 * tauX * tauX) / vt };
}

/**
 * Motion from a state (relative frame) near terminal velocity, to the bottom of the layer or
 * for a given time. Linearised about terminal velocity, the deviations relax exponentially:
 * vertically with time constant M/(b + 2c·v_t), horizontally with M/(b + c·v_t). The drag work
 * of the tail follows from the energy balance of this tail motion.
 */
function terminalTail(layer: ResolvedLayer, s: number[], dtGiven?: number): { dt: number; state: number[] } {
  const M = layer.inertial_mass_kg;
  const b = layer.drag.linear_kg_s;
  const c = layer.drag.quadratic_kg_m;
  const vt = layer.terminal_speed_m_s;
  const w = layer.flow_m_s;
  const tauY = M / (b + 2 * c * vt);
  const tauX = M / (b + c * vt);
  const dy = s[3] + vt;
  const dx = s[2];
  const fallen = (dt: number) => vt * dt + dy * tauY * Math.expm1(-dt / tauY);
  let dt = dtGiven ?? 0;
  if (dtGiven === undefined) {
    const distance = s[1] - layer.bottom_m;
    dt = (distance + dy * tauY) / vt;
    for (let i = 0; i < 4; i++) dt -= (fallen(dt) - distance) / (vt - dy * Math.exp(-dt / tauY));
  }
  const ux = dx * Math.exp(-dt / tauX);
  const vy = -vt + dy * Math.exp(-dt / tauY);
  const drop = fallen(dt);
  const kinetic = 0.5 * M * ((ux + w) ** 2 + vy * vy - (s[2] + w) ** 2 - s[3] * s[3]);
  return {
    dt,
    state: [
      s[0] + w * dt - dx * tauX * Math.expm1(-dt / tauX),
      dtGiven === undefined ? layer.bottom_m : s[1] - drop,
      ux,
      vy,
      s[4] + kinetic - layer.net_weight_n * drop,
    ],
  };
}

function arrival(layer: ResolvedLayer, m: number, t: number, vx: number, vy: number): SurfaceArrival {
  const v2 = vx * vx + vy * vy;
  return {
    layer_index: layer.index,
    time_s: t,
    speed_m_s: Math.sqrt(v2),
    velocity_m_s: [vx, vy],
    kinetic_energy_j: 0.5 * m * v2,
    effective_energy_j: 0.5 * (m + layer.added_mass_kg) * v2,
  };
}

function layerReports(c: ResolvedCase, runs: LayerRun[]): LayerReport[] {
  const m = c.object.mass_kg;
  return c.layers.map((layer, i) => {
    const run = runs[i];
    // The layer after the last one run is where the object arrived and floats.
    const floatsHere = !run && i === runs.length ? (runs.length > 0 ? { t: runs[i - 1].t1, s: runs[i - 1].s1 } : { t: 0, s: [0, 0, ...c.release_velocity] }) : null;
    const entry = run ? { t: run.t0, s: run.s0 } : floatsHere;
    const at = entry ? arrival(layer, m, entry.t, entry.s[2], entry.s[3]) : null;
    return {
      index: layer.index,
      medium: layer.medium.label,
      phase: layer.medium.phase,
      top_m: layer.top_m,
      bottom_m: layer.bottom_m,
      terminal_speed_m_s: Number.isFinite(layer.terminal_speed_m_s) && layer.net_weight_n > 0 ? layer.terminal_speed_m_s : null,
      entry_time_s: at ? at.time_s : null,
      entry_speed_m_s: at ? at.speed_m_s : null,
      entry_velocity_m_s: at ? at.velocity_m_s : null,
      entry_kinetic_energy_j: at ? at.kinetic_energy_j : null,
      entry_effective_energy_j: at ? at.effective_energy_j : null,
      exit_time_s: run ? run.t1 : null,
      analytic_tail: run ? run.tail : null,
    };
  });
}

function waterEntry(c: ResolvedCase, layers: LayerReport[]): SurfaceArrival | null {
  for (let i = 1; i < layers.length; i++) {
    const l = layers[i];
    if (l.phase !== 'liquid' || layers[i - 1].phase !== 'gas' || l.entry_time_s === null) continue;
    return {
      layer_index: l.index,
      time_s: l.entry_time_s,
      speed_m_s: l.entry_speed_m_s!,
      velocity_m_s: l.entry_velocity_m_s!,
      kinetic_energy_j: l.entry_kinetic_energy_j!,
      effective_energy_j: l.entry_effective_energy_j!,
    };
  }
  return null;
}

function energyAudit(c: ResolvedCase, runs: LayerRun[]): EnergyAudit {
  let kinetic = 0;
  let gravity = 0;
  let buoyancy = 0;
  let drag = 0;
  const g = c.gravity_m_s2;
  for (const run of runs) {
    const M = run.layer.inertial_mass_kg;
    const drop = run.s0[1] - run.s1[1];
    kinetic += 0.5 * M * (run.s1[2] ** 2 + run.s1[3] ** 2 - run.s0[2] ** 2 - run.s0[3] ** 2);
    gravity += c.object.mass_kg * g * drop;
    buoyancy -= run.layer.medium.density_kg_m3 * c.object.volume_m3 * g * drop;
    drag += run.s1[4] - run.s0[4];
  }
  return { kinetic_change_j: kinetic, gravity_work_j: gravity, buoyancy_work_j: buoyancy, drag_work_j: drag, residual_j: kinetic - gravity - buoyancy - drag };
}

/** Samples evenly spaced in time, read from the dense output of a replay of the same steps. */
function sampleRuns(runs: LayerRun[], tEnd: number, sEnd: number[], count: number): Omit<DropSamples, 'closed_form_speed'> {
  const out: Omit<DropSamples, 'closed_form_speed'> = { t: [], x: [], y: [], v_x: [], v_y: [], speed: [] };
  const push = (t: number, x: number, y: number, vx: number, vy: number) => {
    out.t.push(t);
    out.x.push(x);
    out.y.push(y);
    out.v_x.push(vx);
    out.v_y.push(vy);
    out.speed.push(Math.hypot(vx, vy));
  };
  const times = Array.from({ length: count - 1 }, (_, k) => (tEnd * k) / (count - 1));
  const first = runs.length > 0 ? runs[0].s0 : sEnd;
  push(0, first[0], first[1], first[2], first[3]);
  let k = 1;
  for (const run of runs) {
    if (!run.request || !run.options) continue;
    const odeEnd = run.steadyFrom ? run.steadyFrom.t : run.t1;
    integrate(
      {
        ...run.request,
        onStep: (_tOld, t, dense) => {
          while (k < times.length && times[k] <= Math.min(t, odeEnd)) {
            const tk = times[k];
            push(tk, dense(0, tk), dense(1, tk), dense(2, tk) + run.layer.flow_m_s, dense(3, tk));
            k++;
          }
        },
      },
      run.options,
    );
    if (run.steadyFrom) {
      const { t: ts, s } = run.steadyFrom;
      while (k < times.length && times[k] <= run.t1) {
        const p = toGround(run.layer, terminalTail(run.layer, s, times[k] - ts).state);
        push(times[k], p[0], p[1], p[2], p[3]);
        k++;
      }
    }
  }
  // Steps that end a hair before a sample time (rounding) leave it to the impact state.
  while (k < times.length) {
    push(times[k], sEnd[0], sEnd[1], sEnd[2], sEnd[3]);
    k++;
  }
  push(tEnd, sEnd[0], sEnd[1], sEnd[2], sEnd[3]);
  return out;
}

/** Gas layers thicker than this get a note that their density is taken as uniform (common practice). */
const UNIFORM_GAS_LAYER_LIMIT_M = 1000;

function warningsFor(
  c: ResolvedCase,
  runs: LayerRun[],
  floatsIn: ResolvedLayer | null,
  regime: ReynoldsRegime,
  deviation: number | null,
  fallTime: number,
): string[] {
  const w: string[] = [];
  const o = c.object;
  if (floatsIn) {
    const buoyancy = floatsIn.medium.density_kg_m3 * o.volume_m3 * c.gravity_m_s2;
    w.push(
      `The object floats in ${floatsIn.medium.label} (buoyancy ${buoyancy.toPrecision(4)} N is at least its weight ${(o.mass_kg * c.gravity_m_s2).toPrecision(4)} N), ` +
        `so it stops at the surface of the ${floatsIn.medium.label} and does not reach the bottom. The impact values are those on arrival at that surface.`,
    );
  }
  if (c.drag_model === 'none') {
    w.push('No drag: the speeds and energies are vacuum values, an upper bound for a release at rest; real falls are slower.');
  }
  if (o.shape && !o.explicit.cd && c.drag_model !== 'none' && c.drag_model !== 'linear') {
    w.push(
      `C_d ${o.cd} is the typical catalogue value for a ${o.shape.shape.replace(/_/g, ' ')}; its plausible range is ${o.shape.cd_range[0]}-${o.shape.cd_range[1]}. ` +
        'The low end gives the higher impact energy.',
    );
  }
  for (const layer of c.layers) {
    if (floatsIn && layer.index > floatsIn.index) break;
    if (layer.medium.phase === 'liquid' && o.volume_m3 === 0) {
      w.push(`No volume given: buoyancy and added mass are ignored in ${layer.medium.label}, which overstates the sinking speed.`);
    } else if (layer.medium.phase === 'liquid' && o.added_mass_coeff === 0) {
      w.push(`No added-mass coefficient given: in ${layer.medium.label} the effective impact energy equals the kinetic energy, which understates it.`);
    }
    if (layer.medium.phase === 'gas' && layer.top_m - layer.bottom_m > UNIFORM_GAS_LAYER_LIMIT_M) {
      w.push(
        `Layer ${layer.index} is ${(layer.top_m - layer.bottom_m).toFixed(0)} m of air at one density; over more than about ${UNIFORM_GAS_LAYER_LIMIT_M} m the density changes noticeably, so split it into layers by altitude.`,
      );
    }
  }
  const entersLiquid = runs.some((r, i) => i > 0 && r.layer.medium.phase === 'liquid' && runs[i - 1].layer.medium.phase === 'gas');
  if (entersLiquid) {
    w.push('The speed is carried unchanged through the water surface: the entry slam, splash and air cavity are not modelled.');
  }
  const mismatch = regimeMismatch(c.drag_model, regime);
  if (mismatch) w.push(mismatch);
  const tailError = runs.reduce((sum, r) => sum + (r.tail ? r.tail.time_error_bound_s : 0), 0);
  if (tailError > VERIFICATION_THRESHOLD * fallTime) {
    w.push(`The analytic terminal tail may add up to ${tailError.toExponential(2)} s to the fall time (more than ${VERIFICATION_THRESHOLD.toExponential(0)} of it): tighten the integration tolerance.`);
  }
  if (deviation !== null && deviation > VERIFICATION_THRESHOLD) {
    w.push(`The integration deviates from the closed-form solution by ${deviation.toExponential(2)} (limit ${VERIFICATION_THRESHOLD.toExponential(0)}): do not rely on this result.`);
  }
  return w;
}
