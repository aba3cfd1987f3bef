import type { CalculatorRuleKey } from '@/lib/domain';
import { material } from '@/lib/materials';
import type { DropCase } from '@/lib/physics';
import type { DragModel } from '@/lib/physics/drag';
import { shapeProperties } from '@/lib/physics/shapes';
import { dimensionsOf } from '@/lib/shape-choice';
import { checkNumber } from './schema';
import type { CalculatorValues } from './values';

/** A valid calculator form as the SI drop case the physics core and POST /api/v1/drops take. */

function si(v: CalculatorValues, key: CalculatorRuleKey): number {
  const r = checkNumber(key, v[key], v.units);
  if ('message' in r) throw new Error(`${key}: ${r.message}`);
  return r.value;
}

function optionalSI(v: CalculatorValues, key: CalculatorRuleKey): number | undefined {
  return v[key].trim() ? si(v, key) : undefined;
}

/** Metres for each dimension the shape needs. */
export function dimensionsSI(v: CalculatorValues): Record<string, number> {
  return Object.fromEntries(dimensionsOf(v.shape).map((k) => [k, si(v, k)]));
}

/** Mass in kg: typed, or material density times the shape's volume. */
export function massSI(v: CalculatorValues): number {
  if (v.massSource === 'typed' || v.shape === 'direct') return si(v, 'mass');
  const volume = optionalSI(v, 'volume') ?? shapeProperties(v.shape, dimensionsSI(v), 1).volume_m3;
  return material(v.material).density_kg_m3 * volume;
}

/** The drag model to run: "auto" is Newton's quadratic law, the regime of almost every dropped object. */
export function chosenModel(v: CalculatorValues): DragModel {
  return v.model === 'auto' ? 'quadratic' : v.model;
}

/** A valid form as the SI drop case of the physics core and POST /api/v1/drops. */
export function toDropCase(v: CalculatorValues, samples = 0): DropCase {
  const object: DropCase['object'] = { mass_kg: massSI(v) };
  if (v.shape !== 'direct') {
    object.shape = v.shape;
    object.dimensions_m = dimensionsSI(v);
  }
  const cd = optionalSI(v, 'cd');
  const area = optionalSI(v, 'area');
  const volume = optionalSI(v, 'volume');
  const addedMass = optionalSI(v, 'addedMass');
  const linear = optionalSI(v, 'linearCoeff');
  if (cd !== undefined) object.cd = cd;
  if (area !== undefined) object.area_m2 = area;
  if (volume !== undefined) object.volume_m3 = volume;
  if (addedMass !== undefined) object.added_mass_coeff = addedMass;
  if (linear !== undefined) object.linear_coeff_kg_s = linear;

  const speed = v.release === 'rest' ? 0 : si(v, 'releaseSpeed');
  const angle = v.release === 'rest' ? 0 : (si(v, 'releaseAngle') * Math.PI) / 180;
  const velocity: [number, number] = [speed * Math.cos(angle), speed * Math.sin(angle)];
  const air = { preset: 'isa' as const, altitude_m: si(v, 'altitude'), temperature_offset_c: si(v, 'tempOffset') };

  const base: DropCase = { object, drag_model: chosenModel(v), samples };
  if (v.path === 'deck_to_sea') {
    const airGap = si(v, 'airGap');
    const layers: NonNullable<DropCase['layers']> = [];
    if (airGap > 0) layers.push({ medium: air, thickness_m: airGap, flow_m_s: si(v, 'wind') });
    layers.push({ medium: { preset: 'seawater' }, thickness_m: si(v, 'waterDepth'), flow_m_s: si(v, 'current') });
    return { ...base, layers, release: { velocity_m_s: velocity } };
  }
  const medium: DropCase['medium'] =
    v.path === 'air'
      ? air
      : v.path === 'seawater'
        ? { preset: 'seawater' }
        : v.path === 'freshwater'
          ? { preset: 'freshwater', temperature_c: si(v, 'waterTemp') }
          : { density_kg_m3: si(v, 'density'), viscosity_pa_s: si(v, 'viscosity') };
  const flow = v.path === 'air' || v.path === 'custom' ? si(v, 'wind') : si(v, 'current');
  return { ...base, medium, wind_m_s: flow, release: { height_m: si(v, 'dropHeight'), velocity_m_s: velocity } };
}
