import { resolveDropCase, type DropCase, type ResolvedCase, type ResolvedLayer } from './case';
import { reynoldsRegime, regimeMismatch, relativeDeviation, verify, type ReynoldsRegime, type Verification } from './classification';
import { closedFormFall } from './closed-forms';
import { MAX_SAMPLES, MODEL_VERSION } from './constants';
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
  /** Null for layers below the one the object floats in. */
  readonly entry_time_s: number | null;
  readonly entry_speed_m_s: number | null;
  /** Null when the object does not pass through the layer (it floats in it or above it). */
  readonly exit_time_s: number | null;
}

export interface DropSamples {
  readonly t: number[];
  readonly x: number[];
  readonly y: number[];
  readonly v_x: number[];
  readonly v_y: number[];
  readonly speed: number[];
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
  /** False when the object floats in a layer and never reaches the bottom. */
  readonly sinks: boolean;
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
  /** Where the state reached terminal velocity and the rest of the layer is straight-line motion. */
  readonly steadyFrom: { t: number; s: number[] } | null;
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
    const run = runLayer(layer, t, state, layer.index === 0 && vy0 > 0, c, opts);
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

  const result: DropResult = {
    model_version: MODEL_VERSION,
    sinks: floatsIn === null,
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
    layers: layerReports(c, runs),
    warnings: warningsFor(c, runs, floatsIn, regime.regime, deviation),
    notice: NOTICE,
  };
  const extras: { energy_audit?: EnergyAudit; samples?: DropSamples } = {};
  if (opts.energyAudit) extras.energy_audit = energyAudit(c, runs);
  if (sampleCount > 0) extras.samples = sampleRuns(runs, t, state, sampleCount);
  return { ...result, ...extras };
}

function closedFormFor(c: ResolvedCase) {
  const l = c.layers[0];
  const M = l.inertial_mass_kg;
  return closedFormFall({
    height_m: c.height_m,
    vx0: c.release_velocity[0],
    vy0: c.release_velocity[1],
    gravity: l.net_weight_n / M,
    linear_per_s: l.drag.linear_kg_s / M,
    quadratic_per_m: l.drag.quadratic_kg_m / M,
    flow_m_s: l.flow_m_s,
  });
}

/**
 * Right-hand side over (x, y, v_x, v_y), per unit inertial mass, with the work done by drag as a
 * fifth component when the energy is audited (left out otherwise: it costs a fifth of the time).
 */
function rightHandSide(layer: ResolvedLayer, audit: boolean): (t: number, s: number[]) => number[] {
  const M = layer.inertial_mass_kg;
  const g = layer.net_weight_n / M;
  const b = layer.drag.linear_kg_s / M;
  const k = layer.drag.quadratic_kg_m / M;
  const w = layer.flow_m_s;
  if (audit) {
    return (_t, s) => {
      const ux = s[2] - w;
      const uy = s[3];
      const d = b + k * Math.sqrt(ux * ux + uy * uy);
      const ax = -d * ux;
      const ay = -d * uy;
      return [s[2], s[3], ax, ay - g, M * (ax * s[2] + ay * s[3])];
    };
  }
  return (_t, s) => {
    const ux = s[2] - w;
    const uy = s[3];
    const d = b + k * Math.sqrt(ux * ux + uy * uy);
    return [s[2], s[3], -d * ux, -d * uy - g];
  };
}

function runLayer(layer: ResolvedLayer, t0: number, s0: number[], trackApex: boolean, c: ResolvedCase, opts: ValidOptions): LayerRun {
  const bottom = layer.bottom_m;
  if (s0[1] <= bottom && s0[3] <= 0) {
    return { layer, t0, s0, t1: t0, s1: s0.slice(), apex: null, request: null, options: null, steadyFrom: null };
  }
  const M = layer.inertial_mass_kg;
  const G = layer.net_weight_n / M;
  const vt = layer.terminal_speed_m_s;
  const thickness = s0[1] - bottom;
  const [vx0, vy0] = [s0[2], s0[3]];
  const fallSpeed = Math.sqrt(vy0 * vy0 + 2 * G * thickness);
  const vScale = Math.max(Math.abs(vx0), Math.abs(vy0), Math.abs(layer.flow_m_s), Math.min(vt, fallSpeed), 1e-12);
  const rtol = opts.integrator.relativeTolerance;
  const atolScalar = opts.integrator.absoluteTolerance as number;
  const lScale = Math.max(thickness, (vy0 > 0 ? vy0 * vy0 : 0) / (2 * G), 1e-9);
  // Absolute tolerances follow the scales of the case so that a 20 µm particle and a 10 km fall
  // are both solved to the same relative accuracy.
  const audit = opts.energyAudit;
  const atol = [atolScalar * lScale, atolScalar * lScale, atolScalar * vScale, atolScalar * vScale];
  if (audit) atol.push(atolScalar * M * (vScale * vScale + G * lScale));
  const events: OdeEvent[] = [{ component: 1, level: bottom, direction: -1, terminal: true }];
  if (trackApex) events.push({ component: 3, level: 0, direction: -1, terminal: false });
  // A generous horizon: the real end is the bottom event.
  const tHorizon = 10 * ((Math.max(vy0, 0) * 2) / G + fallSpeed / G + (Number.isFinite(vt) && vt > 0 ? thickness / vt + vt / G : 0)) + 1;
  // Near terminal velocity an explicit method on a stiff case (a particle, a plate in water)
  // hovers about the fixed point within some hundred tolerances without settling, and would
  // take millions of steps. Once within STEADY_FRACTION of terminal velocity, the rest of the
  // layer follows the linearised relaxation exactly (see terminalTail), leaving an error of
  // order STEADY_FRACTION squared.
  const steadyTol = STEADY_FRACTION * (Number.isFinite(vt) ? vt : 0);
  const w = layer.flow_m_s;
  const relaxTime = Math.min(Number.isFinite(vt) && vt > 0 ? vt / G : Infinity, layer.drag.linear_kg_s > 0 ? M / layer.drag.linear_kg_s : Infinity);
  const request: IntegrationRequest = {
    timeScale: (Math.max(vy0, 0) + fallSpeed) / G,
    initialStep: 0.25 * Math.min((Math.max(vy0, 0) + fallSpeed) / G, relaxTime),
    f: rightHandSide(layer, audit),
    t0,
    y0: audit ? s0 : s0.slice(0, 4),
    tEnd: t0 + tHorizon,
    events,
    stopWhen: Number.isFinite(vt) && vt > 0 ? (_t, y) => Math.abs(y[2] - w) <= steadyTol && Math.abs(y[3] + vt) <= steadyTol : undefined,
  };
  const options = { ...opts.integrator, absoluteTolerance: atol };
  let out;
  try {
    out = integrate(request, options);
  } catch (e) {
    if (e instanceof IntegrationBudgetError) {
      throw new PhysicsSolveError(
        `${layer.medium.label} (layer ${layer.index}): ${e.message}; the case is too stiff or too long for the step budget (raise options.integrator.maxSteps)`,
      );
    }
    throw e;
  }
  const apexHit = out.hits.find((h) => h.event === 1);
  const apex = apexHit ? apexHit.y[1] : null;
  // Without the audit the drag-work slot is carried unchanged.
  const full = (y: number[]) => (audit ? y : [...y, s0[4]]);
  if (out.status === 'event') return { layer, t0, s0, t1: out.t, s1: full(out.y), apex, request, options, steadyFrom: null };
  if (out.status === 'stopped') {
    const s = full(out.y);
    const tail = terminalTail(layer, s);
    return { layer, t0, s0, t1: out.t + tail.dt, s1: tail.state, apex, request, options, steadyFrom: { t: out.t, s } };
  }
  throw new PhysicsSolveError(`${layer.medium.label} (layer ${layer.index}): the object did not reach the bottom of the layer within ${tHorizon.toPrecision(3)} s`);
}

/** Relative distance from terminal velocity at which the remaining fall is solved analytically. */
const STEADY_FRACTION = 1e-6;

/**
 * Motion from a state within STEADY_FRACTION of terminal velocity, to the bottom of the layer
 * or for a given time. Linearised about terminal velocity, the deviations relax exponentially:
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
  const dx = s[2] - w;
  const fallen = (dt: number) => vt * dt + dy * tauY * Math.expm1(-dt / tauY);
  let dt = dtGiven ?? 0;
  if (dtGiven === undefined) {
    const distance = s[1] - layer.bottom_m;
    dt = (distance + dy * tauY) / vt;
    for (let i = 0; i < 4; i++) dt -= (fallen(dt) - distance) / (vt - dy * Math.exp(-dt / tauY));
  }
  const vx = w + dx * Math.exp(-dt / tauX);
  const vy = -vt + dy * Math.exp(-dt / tauY);
  const drop = fallen(dt);
  const kinetic = 0.5 * M * (vx * vx + vy * vy - s[2] * s[2] - s[3] * s[3]);
  return {
    dt,
    state: [
      s[0] + w * dt - dx * tauX * Math.expm1(-dt / tauX),
      dtGiven === undefined ? layer.bottom_m : s[1] - drop,
      vx,
      vy,
      s[4] + kinetic - layer.net_weight_n * drop,
    ],
  };
}

function layerReports(c: ResolvedCase, runs: LayerRun[]): LayerReport[] {
  return c.layers.map((layer, i) => {
    const run = runs[i];
    // The layer after the last one run is where the object arrived and floats.
    const arrival = !run && i === runs.length ? (runs.length > 0 ? { t: runs[i - 1].t1, s: runs[i - 1].s1 } : { t: 0, s: [0, 0, ...c.release_velocity] }) : null;
    const entry = run ? { t: run.t0, s: run.s0 } : arrival;
    return {
      index: layer.index,
      medium: layer.medium.label,
      phase: layer.medium.phase,
      top_m: layer.top_m,
      bottom_m: layer.bottom_m,
      terminal_speed_m_s: Number.isFinite(layer.terminal_speed_m_s) && layer.net_weight_n > 0 ? layer.terminal_speed_m_s : null,
      entry_time_s: entry ? entry.t : null,
      entry_speed_m_s: entry ? Math.hypot(entry.s[2], entry.s[3]) : null,
      exit_time_s: run ? run.t1 : null,
    };
  });
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
function sampleRuns(runs: LayerRun[], tEnd: number, sEnd: number[], count: number): DropSamples {
  const out: DropSamples = { t: [], x: [], y: [], v_x: [], v_y: [], speed: [] };
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
            push(tk, dense(0, tk), dense(1, tk), dense(2, tk), dense(3, tk));
            k++;
          }
        },
      },
      run.options,
    );
    if (run.steadyFrom) {
      const { t: ts, s } = run.steadyFrom;
      while (k < times.length && times[k] <= run.t1) {
        const p = terminalTail(run.layer, s, times[k] - ts).state;
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
): string[] {
  const w: string[] = [];
  const o = c.object;
  if (floatsIn) {
    const buoyancy = floatsIn.medium.density_kg_m3 * o.volume_m3 * c.gravity_m_s2;
    w.push(
      `The object floats in ${floatsIn.medium.label} (buoyancy ${buoyancy.toPrecision(4)} N is at least its weight ${(o.mass_kg * c.gravity_m_s2).toPrecision(4)} N), ` +
        `so it stops at the top of layer ${floatsIn.index} and does not reach the bottom. The impact values are those on arrival at that surface.`,
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
  if (deviation !== null && deviation > 1e-6) {
    w.push(`The integration deviates from the closed-form solution by ${deviation.toExponential(2)} (limit 1e-6): do not rely on this result.`);
  }
  return w;
}
