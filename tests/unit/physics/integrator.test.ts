import { describe, expect, it } from 'vitest';
import { integrate, validateIntegratorOptions } from '@/lib/physics/integrator';

const options = validateIntegratorOptions({ relativeTolerance: 1e-10, absoluteTolerance: 1e-12 });

describe('odex wrapper: steps that leave a non-finite state', () => {
  it('retries a step that produced NaN and still solves y′ = −y exactly', () => {
    // The right-hand side is NaN more than 0.05 past the last accepted step, as a drag law
    // overflows when a first step is far too long. odex's error test is false both ways for a
    // NaN estimate, so without the wrapper's check the NaN step is accepted.
    // Reference: the exact solution y(t) = e^(−t) (textbook).
    let lastAccepted = 0;
    const out = integrate(
      {
        f: (t, y) => (t - lastAccepted > 0.05 ? [Number.NaN] : [-y[0]]),
        t0: 0,
        y0: [1],
        tEnd: 0.5,
        events: [],
        initialStep: 1,
        onStep: (_tOld, t) => {
          lastAccepted = t;
        },
      },
      options,
    );
    expect(out.status).toBe('end');
    expect(Number.isFinite(out.y[0])).toBe(true);
    expect(Math.abs(out.y[0] / Math.exp(-0.5) - 1)).toBeLessThan(1e-9);
  });

  it('finds a terminal event after retries: y = 1 − t²/2 reaches 0 at t = √2', () => {
    // Reference: exact kinematics of y″ = −1 from rest at y = 1 (t = √2 at y = 0).
    let lastAccepted = 0;
    const out = integrate(
      {
        f: (t, y) => (t - lastAccepted > 0.2 ? [Number.NaN, Number.NaN] : [y[1], -1]),
        t0: 0,
        y0: [1, 0],
        tEnd: 10,
        events: [{ component: 0, level: 0, direction: -1, terminal: true }],
        initialStep: 5,
        onStep: (_tOld, t) => {
          lastAccepted = t;
        },
      },
      options,
    );
    expect(out.status).toBe('event');
    expect(out.t).toBeCloseTo(Math.SQRT2, 10);
  });
});
