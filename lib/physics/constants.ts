/** Reported with every result so stored results can be traced to the model that produced them. */
export const MODEL_VERSION = 'plumbline-physics 1.1.0';

/** Standard acceleration of gravity, m/s² (3rd CGPM, 1901). */
export const STANDARD_GRAVITY = 9.80665;

export const ZERO_CELSIUS_K = 273.15;

/** Relative deviation from a closed form above which a result fails verification. */
export const VERIFICATION_THRESHOLD = 1e-6;

/** Plot time series are bounded so a result stays a small JSON document. */
export const MAX_SAMPLES = 2000;
