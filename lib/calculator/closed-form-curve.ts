import { resolveDropCase, type DropCase } from '@/lib/physics';

/**
 * Speed against time from the closed forms, for the plot beside the integrated curve. Drawn only where a closed
 * form for the whole history is textbook: one still medium, released from rest, vacuum, linear or quadratic drag
 * (v = G·t; v = v_t·(1 − e^(−G·t/v_t)); v = v_t·tanh(G·t/v_t)), with G the net weight over the inertial mass.
 */
export function closedFormSpeedCurve(dropCase: DropCase, times: readonly number[]): number[] | null {
  const c = resolveDropCase(dropCase);
  if (c.layers.length !== 1) return null;
  const [layer] = c.layers;
  if (layer.flow_m_s !== 0 || c.release_velocity[0] !== 0 || c.release_velocity[1] !== 0) return null;
  if (layer.net_weight_n <= 0) return null;
  const G = layer.net_weight_n / layer.inertial_mass_kg;
  const beta = layer.drag.linear_kg_s / layer.inertial_mass_kg;
  const kappa = layer.drag.quadratic_kg_m / layer.inertial_mass_kg;
  if (c.drag_model === 'none' || (beta === 0 && kappa === 0)) return times.map((t) => G * t);
  if (c.drag_model === 'linear' || kappa === 0) return times.map((t) => (G / beta) * -Math.expm1(-beta * t));
  if (c.drag_model === 'quadratic' || beta === 0) {
    const vt = Math.sqrt(G / kappa);
    return times.map((t) => vt * Math.tanh((G * t) / vt));
  }
  return null;
}
