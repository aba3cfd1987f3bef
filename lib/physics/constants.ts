/** Reported with every result so stored results can be traced to the model that produced them. */
export const MODEL_VERSION = 'plumbline-physics 1.1.0';

/** Standard acceleration of gravity, m/s² (3rd CGPM, 1901). */
export const STANDARD_GRAVITY = 9.80665;

/** Exact definitions of the international foot and pound (1959 agreement). */
export const METRES_PER_FOOT = 0.3048;
export const KILOGRAMS_PER_POUND = 0.45359237;

export const ZERO_CELSIUS_K = 273.15;

/** Relative deviation from a closed form above which a result fails verification. */
export const VERIFICATION_THRESHOLD = 1e-6;

/** Plot time series are bounded so a result stays a small JSON document. */
export const MAX_SAMPLES = 2000;

export function feetToMetres(ft: number): number {
  return ft * METRES_PER_FOOT;
}

export function poundsToKilograms(lb: number): number {
  return lb * KILOGRAMS_PER_POUND;
}
