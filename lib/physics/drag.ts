import { PhysicsInputError, requireNonNegative, requirePositive } from './errors';
import type { Medium } from './media';

/**
 * Drag laws, all of the form F = −(b + c·|u|)·u with u the velocity relative to the medium:
 * b (kg/s) is the linear (Stokes) part, c = ½·ρ·C_d·A (kg/m) the quadratic (Newton) part.
 * Keeping every law in this family lets one right-hand side, one terminal-speed formula and
 * one energy audit serve them all.
 */
export const DRAG_MODELS = ['none', 'linear', 'quadratic', 'linear_quadratic'] as const;
export type DragModel = (typeof DRAG_MODELS)[number];

export interface DragCoefficients {
  readonly linear_kg_s: number;
  readonly quadratic_kg_m: number;
}

export interface DragInputs {
  readonly cd?: number;
  readonly area_m2?: number;
  readonly linear_coeff_kg_s?: number;
  /** Set for spheres, so Stokes' law b = 3·π·μ·d can supply the linear coefficient. */
  readonly stokes_diameter_m?: number | null;
}

export function isDragModel(value: unknown): value is DragModel {
  return typeof value === 'string' && (DRAG_MODELS as readonly string[]).includes(value);
}

export function dragCoefficients(
  model: DragModel,
  inputs: DragInputs,
  medium: Medium,
  field = 'object',
  mediumField = 'medium',
): DragCoefficients {
  const usesLinear = model === 'linear' || model === 'linear_quadratic';
  const usesQuadratic = model === 'quadratic' || model === 'linear_quadratic';
  return {
    linear_kg_s: usesLinear ? linearCoefficient(inputs, medium, field, mediumField) : 0,
    quadratic_kg_m: usesQuadratic ? quadraticCoefficient(inputs, medium, field) : 0,
  };
}

function linearCoefficient(inputs: DragInputs, medium: Medium, field: string, mediumField: string): number {
  if (inputs.linear_coeff_kg_s !== undefined) return requireNonNegative(`${field}.linear_coeff_kg_s`, inputs.linear_coeff_kg_s);
  if (inputs.stokes_diameter_m) {
    if (medium.viscosity_pa_s === null) {
      throw new PhysicsInputError(`${mediumField}.viscosity_pa_s`, "is needed for Stokes' law (linear drag of a sphere)");
    }
    return 3 * Math.PI * medium.viscosity_pa_s * inputs.stokes_diameter_m;
  }
  throw new PhysicsInputError(
    `${field}.linear_coeff_kg_s`,
    "is required for linear drag unless the object is a sphere with a diameter (then Stokes' law supplies it)",
  );
}

function quadraticCoefficient(inputs: DragInputs, medium: Medium, field: string): number {
  if (inputs.cd === undefined) throw new PhysicsInputError(`${field}.cd`, 'is required for quadratic drag (give cd, or a shape with dimensions)');
  if (inputs.area_m2 === undefined) {
    throw new PhysicsInputError(`${field}.area_m2`, 'is required for quadratic drag (give area_m2, or a shape with dimensions)');
  }
  const cd = requireNonNegative(`${field}.cd`, inputs.cd);
  const area = requirePositive(`${field}.area_m2`, inputs.area_m2);
  return 0.5 * medium.density_kg_m3 * cd * area;
}

/**
 * Speed at which drag balances the net weight W = (m − ρ·V)·g in still fluid: the positive root
 * of b·v + c·v² = W, written to avoid cancellation when b dominates. Infinite without drag.
 * Added mass does not appear: it changes how fast terminal speed is approached, not its value.
 */
export function terminalSpeed(drag: DragCoefficients, netWeightN: number): number {
  const b = drag.linear_kg_s;
  const c = drag.quadratic_kg_m;
  if (netWeightN <= 0) return 0;
  if (c > 0) return (2 * netWeightN) / (b + Math.sqrt(b * b + 4 * c * netWeightN));
  if (b > 0) return netWeightN / b;
  return Infinity;
}
