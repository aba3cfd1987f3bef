import { Solver } from './odex-runtime';
import { PhysicsInputError, requireInteger, requirePositive } from './errors';
import { bracketedRoot } from './roots';

/**
 * odex (Hairer & Wanner's extrapolation code) with events located on its dense output.
 * An event is a component crossing a level in a given direction; the first terminal event
 * ends the integration and its state is captured inside the output callback, because odex
 * hands back the state after the step that overshot it.
 */
export interface OdeEvent {
  readonly component: number;
  readonly level: number;
  /** −1: crossing downwards (value decreasing through the level); +1 upwards. */
  readonly direction: -1 | 1;
  readonly terminal: boolean;
}

export interface EventHit {
  readonly event: number;
  readonly t: number;
  readonly y: number[];
}

export interface IntegratorOptions {
  /** Relative tolerance, applied to every component. */
  readonly relativeTolerance?: number;
  /** Absolute tolerance, one value or one per component. */
  readonly absoluteTolerance?: number | readonly number[];
  readonly maxSteps?: number;
  /** Event times are refined until the bracket is this small relative to the event time. */
  readonly eventTimeTolerance?: number;
}

/**
 * 1e-10 keeps deviations from the closed forms and from numeric's dopri near 1e-9 even for
 * the hardest cases met in the property tests (drops of a few micrometres, small cross-flow
 * components of fast falls); 1e-9 saves only about a tenth of the time.
 */
export const DEFAULT_INTEGRATOR_OPTIONS = {
  relativeTolerance: 1e-10,
  absoluteTolerance: 1e-10,
  maxSteps: 20000,
  eventTimeTolerance: 1e-15,
} as const;

export interface IntegrationRequest {
  readonly f: (t: number, y: number[]) => number[];
  readonly t0: number;
  readonly y0: readonly number[];
  readonly tEnd: number;
  readonly events: readonly OdeEvent[];
  /**
   * First step to try. odex starts from 1e-4 otherwise, and for a fall of a few seconds the
   * steps spent growing from there cost more than the rest of the solve.
   */
  readonly initialStep?: number;
  /**
   * Unit of time inside odex (the result is in the caller's units). odex never tries a first
   * step below 1e-4 time units, which would overshoot a fall lasting microseconds.
   */
  readonly timeScale?: number;
  /** Checked after each accepted step; true ends the integration there (status 'stopped'). */
  readonly stopWhen?: (t: number, y: readonly number[]) => boolean;
  /** Sees every accepted step with its interpolant; used to sample plots without changing steps. */
  readonly onStep?: (tOld: number, t: number, dense: (component: number, t: number) => number) => void;
}

export interface IntegrationResult {
  readonly status: 'event' | 'stopped' | 'end';
  readonly t: number;
  readonly y: number[];
  /** Events met, in time order, ending with the terminal one when status is 'event'. */
  readonly hits: EventHit[];
  readonly steps: number;
}

export class IntegrationBudgetError extends Error {
  constructor(steps: number, what = 'steps') {
    super(`the integration did not finish within ${steps} ${what}`);
    this.name = 'IntegrationBudgetError';
  }
}

export function validateIntegratorOptions(options: IntegratorOptions, field = 'options'): Required<IntegratorOptions> {
  const rtol = requirePositive(`${field}.relativeTolerance`, options.relativeTolerance ?? DEFAULT_INTEGRATOR_OPTIONS.relativeTolerance);
  if (rtol < 1e-14 || rtol > 1e-3) throw new PhysicsInputError(`${field}.relativeTolerance`, `must be from 1e-14 to 1e-3, got ${rtol}`);
  const atolRaw = options.absoluteTolerance ?? DEFAULT_INTEGRATOR_OPTIONS.absoluteTolerance;
  const atol = typeof atolRaw === 'number' ? requirePositive(`${field}.absoluteTolerance`, atolRaw) : atolRaw.map((v, i) => requirePositive(`${field}.absoluteTolerance.${i}`, v));
  return {
    relativeTolerance: rtol,
    absoluteTolerance: atol,
    maxSteps: requireInteger(`${field}.maxSteps`, options.maxSteps ?? DEFAULT_INTEGRATOR_OPTIONS.maxSteps, 10, 10_000_000),
    eventTimeTolerance: requirePositive(`${field}.eventTimeTolerance`, options.eventTimeTolerance ?? DEFAULT_INTEGRATOR_OPTIONS.eventTimeTolerance),
  };
}

/** A step that overflowed is retried from the last good state with this fraction of its size. */
const RETRY_SHRINK = 0.125;
const MAX_RETRIES = 40;

/**
 * odex accepts a step whose error estimate is NaN (both `err <= 1` and `err > 1` are false).
 * Its estimate is NaN only when the extrapolation table holds a NaN or an infinity, and the
 * accepted state is the first row of that table, so a non-finite state is the sign of such a
 * step. The wrapper then restarts odex from the last good state with a smaller first step.
 */
export function integrate(request: IntegrationRequest, options: Required<IntegratorOptions>): IntegrationResult {
  const T = request.timeScale ?? 1;
  const hits: EventHit[] = [];
  let tStart = request.t0;
  let yStart = request.y0.slice();
  let step = request.initialStep;
  let steps = 0;
  for (let attempt = 0; attempt <= MAX_RETRIES; attempt++) {
    const leg = solveLeg(request, options, T, tStart, yStart, step, hits, options.maxSteps - steps);
    steps += leg.steps;
    if (leg.status !== 'overflow') return { status: leg.status, t: leg.t, y: leg.y, hits, steps };
    tStart = leg.t;
    yStart = leg.y;
    step = RETRY_SHRINK * leg.failedStep;
    if (!(step > 0) || steps >= options.maxSteps) break;
  }
  throw new IntegrationBudgetError(steps, 'steps that kept overflowing to a non-finite state');
}

interface Leg {
  readonly status: IntegrationResult['status'] | 'overflow';
  readonly t: number;
  readonly y: number[];
  readonly steps: number;
  /** For an overflow: the size of the step that left a non-finite state. */
  readonly failedStep: number;
}

function allFinite(y: readonly number[]): boolean {
  for (let i = 0; i < y.length; i++) if (!Number.isFinite(y[i])) return false;
  return true;
}

/** One odex run from (t0, y0); stops at a terminal event, at stopWhen, or at a non-finite step. */
function solveLeg(
  request: IntegrationRequest,
  options: Required<IntegratorOptions>,
  T: number,
  t0: number,
  y0: number[],
  initialStep: number | undefined,
  hits: EventHit[],
  budget: number,
): Leg {
  const n = y0.length;
  const solver = new Solver(n);
  solver.relativeTolerance = options.relativeTolerance;
  solver.absoluteTolerance = typeof options.absoluteTolerance === 'number' ? options.absoluteTolerance : [...options.absoluteTolerance];
  solver.maxSteps = Math.max(budget, 1);
  solver.denseOutput = true;
  if (initialStep !== undefined) solver.initialStepSize = initialStep / T;
  const f = T === 1 ? request.f : (tau: number, y: number[]) => {
    const d = request.f(t0 + T * tau, y);
    for (let i = 0; i < d.length; i++) d[i] *= T;
    return d;
  };

  const events = request.events;
  const previous = y0.slice();
  let tPrevious = t0;
  let status: Leg['status'] = 'end';
  let tFinal = t0;
  let yFinal = y0.slice();
  let failedStep = 0;
  let steps = 0;

  const result = solver.solve(f, 0, y0.slice(), (request.tEnd - t0) / T, (_nr, tauOld, tau, y, denseTau) => {
    if (!denseTau) return;
    const tOld = t0 + T * tauOld;
    const t = t0 + T * tau;
    if (!allFinite(y)) {
      status = 'overflow';
      tFinal = tPrevious;
      yFinal = previous.slice();
      failedStep = t - tOld;
      return false;
    }
    const dense = (component: number, time: number) => denseTau(component, (time - t0) / T);
    steps++;
    let firstTerminal: EventHit | null = null;
    const stepHits: EventHit[] = [];
    for (let e = 0; e < events.length; e++) {
      const ev = events[e];
      const before = (previous[ev.component] - ev.level) * ev.direction;
      const after = (y[ev.component] - ev.level) * ev.direction;
      const g = (tau: number) => (dense(ev.component, tau) - ev.level) * ev.direction;
      let lo = tOld;
      if (before === 0 && after >= 0) {
        // Starting on the level (an upward throw from the ground): the crossing that counts is
        // the return, so look inside the step for the excursion to the other side first.
        lo = Number.NaN;
        for (let j = 1; j < 32; j++) {
          const tau = tOld + ((t - tOld) * j) / 32;
          if (g(tau) < 0) {
            lo = tau;
            break;
          }
        }
        if (Number.isNaN(lo)) continue;
      } else if (!(before < 0 && after >= 0)) {
        continue;
      }
      const tHit = bracketedRoot(g, lo, t, { xTol: options.eventTimeTolerance * Math.max(Math.abs(t), 1e-300) });
      const yHit = new Array<number>(n);
      for (let i = 0; i < n; i++) yHit[i] = dense(i, tHit);
      yHit[ev.component] = ev.level;
      const hit: EventHit = { event: e, t: tHit, y: yHit };
      if (ev.terminal) {
        if (!firstTerminal || tHit < firstTerminal.t) firstTerminal = hit;
      } else {
        stepHits.push(hit);
      }
    }
    const end = firstTerminal ? firstTerminal.t : t;
    for (const h of stepHits.sort((a, b) => a.t - b.t)) if (h.t <= end) hits.push(h);
    if (request.onStep) request.onStep(tOld, end, dense);
    if (firstTerminal) {
      hits.push(firstTerminal);
      status = 'event';
      tFinal = firstTerminal.t;
      yFinal = firstTerminal.y;
      return false;
    }
    for (let i = 0; i < n; i++) previous[i] = y[i];
    tPrevious = t;
    if (request.stopWhen && request.stopWhen(t, y)) {
      status = 'stopped';
      tFinal = t;
      yFinal = y.slice();
      return false;
    }
    return true;
  });
  if (result.outcome === 1) throw new IntegrationBudgetError(options.maxSteps);
  if (status === 'end') {
    if (!allFinite(result.y)) return { status: 'overflow', t: tPrevious, y: previous.slice(), steps, failedStep: request.tEnd - tPrevious };
    tFinal = request.tEnd;
    yFinal = result.y;
  }
  return { status, t: tFinal, y: yFinal, steps, failedStep };
}
