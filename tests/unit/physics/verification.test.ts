import { describe, expect, it } from 'vitest';
import { simulateDrop, STANDARD_GRAVITY, VERIFICATION_THRESHOLD, type DropCase } from '@/lib/physics';

/**
 * The self-check every result carries: the integrated fall against the closed form. These tests
 * fail if verify() always passes, if the reported deviation is not the real one, or if the
 * warning goes missing; the reference values are recomputed here from the textbook formulas,
 * not from lib/physics/closed-forms.ts.
 */
const g = STANDARD_GRAVITY;
const m = 2;
const rho = 1.225;
const cd = 1;
const area = 0.05;
const h = 100;
const sheetLike: DropCase = { object: { mass_kg: m, cd, area_m2: area }, drag_model: 'quadratic', medium: { density_kg_m3: rho }, release: { height_m: h } };

/**
 * Quadratic drag from rest (textbook, e.g. any mechanics text's "falling with air resistance"):
 * v_t = √(2mg/(ρ·C_d·A)), y = h − (v_t²/g)·ln cosh(g·t/v_t), so the fall time is
 * (v_t/g)·arcosh(e^(g·h/v_t²)) and the impact speed v_t·√(1 − e^(−2g·h/v_t²)).
 */
function textbook() {
  const vt = Math.sqrt((2 * m * g) / (rho * cd * area));
  return { t: (vt / g) * Math.acosh(Math.exp((g * h) / (vt * vt))), v: vt * Math.sqrt(1 - Math.exp((-2 * g * h) / (vt * vt))) };
}

function deviationFrom(r: { fall_time_s: number; impact_speed_m_s: number }) {
  const ref = textbook();
  return Math.max(Math.abs(r.fall_time_s - ref.t) / ref.t, Math.abs(r.impact_speed_m_s - ref.v) / ref.v);
}

describe('verification against the closed form', () => {
  // A deliberately loose integration (1e-3 instead of 1e-10) lands about 1e-3 off the closed form.
  const loose = simulateDrop(sheetLike, { integrator: { relativeTolerance: 1e-3, absoluteTolerance: 1e-3 } });

  it('flags a loose integration', () => {
    const dev = deviationFrom(loose);
    expect(dev).toBeGreaterThan(10 * VERIFICATION_THRESHOLD);
    expect(loose.verification).toEqual({ passed: false, threshold: VERIFICATION_THRESHOLD });
  });

  it('warns in words with the deviation it found', () => {
    const w = loose.warnings.find((x) => x.includes('deviates from the closed-form solution'));
    expect(w).toBeDefined();
    expect(w).toContain(loose.closed_form_rel_deviation!.toExponential(2));
    expect(w).toContain('do not rely on this result');
  });

  it('reports the deviation that an independent recomputation finds', () => {
    const dev = deviationFrom(loose);
    expect(Math.abs(loose.closed_form_rel_deviation! - dev)).toBeLessThan(1e-6 * dev);
    // The closed form it reports is the textbook one.
    const ref = textbook();
    expect(loose.closed_form!.fall_time_s / ref.t).toBeCloseTo(1, 12);
    expect(loose.closed_form!.impact_speed_m_s / ref.v).toBeCloseTo(1, 12);
  });

  it('passes the default integration, whose deviation is also the recomputed one', () => {
    const r = simulateDrop(sheetLike);
    const dev = deviationFrom(r);
    expect(r.verification!.passed).toBe(true);
    expect(dev).toBeLessThan(VERIFICATION_THRESHOLD);
    // At 1e-10 both numbers are rounding-level: they agree to well below the threshold.
    expect(Math.abs(r.closed_form_rel_deviation! - dev)).toBeLessThan(1e-12);
    expect(r.warnings.some((x) => x.includes('deviates from the closed-form'))).toBe(false);
  });

  it('flags a loose linear-drag throw into wind as well', () => {
    const r = simulateDrop(
      { object: { mass_kg: 2, linear_coeff_kg_s: 0.3 }, drag_model: 'linear', medium: { density_kg_m3: 1.225 }, release: { height_m: 100, velocity_m_s: [3, 4] }, wind_m_s: 5 },
      { integrator: { relativeTolerance: 1e-4, absoluteTolerance: 1e-4 } },
    );
    expect(r.closed_form_rel_deviation!).toBeGreaterThan(VERIFICATION_THRESHOLD);
    expect(r.verification!.passed).toBe(false);
  });
});
