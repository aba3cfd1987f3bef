import { VERIFICATION_THRESHOLD } from './constants';
import type { DragModel } from './drag';

export type ReynoldsRegime = 'stokes' | 'intermediate' | 'newton' | 'drag_crisis' | 'unknown';

/**
 * Regime boundaries of the standard sphere drag curve (Re ≈ 1 for the end of Stokes flow,
 * ≈ 1e3 for the start of the nearly constant Newton C_d, ≈ 2e5 for the drag crisis of smooth
 * bodies; recalled from memory, e.g. White, Fluid Mechanics, sphere drag curve). Blunt,
 * sharp-edged bodies have no drag crisis, which the note says.
 */
export function reynoldsRegime(re: number | null): { regime: ReynoldsRegime; note: string } {
  if (re === null || !Number.isFinite(re)) {
    return { regime: 'unknown', note: 'Reynolds number unknown: give the medium viscosity and an area or shape.' };
  }
  if (re < 1) return { regime: 'stokes', note: `Re ${formatRe(re)}: Stokes regime, drag proportional to speed (linear drag applies).` };
  if (re < 1e3) {
    return { regime: 'intermediate', note: `Re ${formatRe(re)}: intermediate regime, neither linear nor quadratic drag is exact; linear plus quadratic is the closer model.` };
  }
  if (re < 2e5) return { regime: 'newton', note: `Re ${formatRe(re)}: Newton regime, drag proportional to speed squared with a nearly constant C_d.` };
  return {
    regime: 'drag_crisis',
    note: `Re ${formatRe(re)}: above about 2e5 smooth rounded bodies can lose much of their drag (drag crisis); sharp-edged bodies keep their C_d.`,
  };
}

/** A warning when the chosen drag law does not suit the regime at impact, or null. */
export function regimeMismatch(model: DragModel, regime: ReynoldsRegime): string | null {
  if (model === 'linear' && (regime === 'newton' || regime === 'drag_crisis' || regime === 'intermediate')) {
    return 'Linear (Stokes) drag is only valid for Re below about 1; at this Reynolds number it misstates drag badly. Use quadratic drag.';
  }
  if (model === 'quadratic' && regime === 'stokes') {
    return 'Quadratic drag underestimates drag in the Stokes regime (Re below about 1), so the fall is faster than modelled would be. Use linear or linear plus quadratic drag.';
  }
  if (model === 'quadratic' && regime === 'drag_crisis') {
    return 'Above Re ≈ 2e5 a smooth rounded object may have a much lower C_d than assumed; check the low end of the C_d range.';
  }
  return null;
}

function formatRe(re: number): string {
  return re >= 1e4 || re < 1e-2 ? re.toExponential(2) : re.toPrecision(3);
}

export interface Verification {
  readonly passed: boolean;
  readonly threshold: number;
}

/**
 * Relative deviation of the integrated fall time and impact speed from the closed form, the
 * larger of the two. A zero reference (a drop from zero height) is compared absolutely.
 */
export function relativeDeviation(
  integrated: { fall_time_s: number; impact_speed_m_s: number },
  closed: { fall_time_s: number; impact_speed_m_s: number },
): number {
  const dev = (a: number, b: number) => (b === 0 ? Math.abs(a) : Math.abs(a - b) / Math.abs(b));
  return Math.max(dev(integrated.fall_time_s, closed.fall_time_s), dev(integrated.impact_speed_m_s, closed.impact_speed_m_s));
}

export function verify(deviation: number): Verification {
  return { passed: deviation <= VERIFICATION_THRESHOLD, threshold: VERIFICATION_THRESHOLD };
}
