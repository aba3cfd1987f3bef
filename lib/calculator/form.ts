import { z } from 'zod';
import { CALCULATOR_RULES, type CalculatorRuleKey, type UnitSystem } from '@/lib/domain';
import { MATERIAL_IDS, material, type MaterialId } from '@/lib/materials';
import type { DropCase } from '@/lib/physics';
import { DRAG_MODELS, type DragModel } from '@/lib/physics/drag';
import { shapeProperties } from '@/lib/physics/shapes';
import { SHAPE_CHOICES, dimensionsOf, type ShapeChoice } from '@/lib/shape-choice';
import { fromSI, toSI } from '@/lib/units';
import { readNumberText, writeNumberText } from '@/lib/units/number-text';
import { checkQuantity } from '@/lib/validation/quantity';

/**
 * The calculator's form, in the user's units. Every value is the text of an input, so the page state is exactly
 * what the URL carries; `toDropCase` turns a valid form into the SI drop case the physics core and the API take.
 */
export const PATHS = ['air', 'seawater', 'freshwater', 'custom', 'deck_to_sea'] as const;
export type PathKind = (typeof PATHS)[number];
export const RELEASES = ['rest', 'thrown', 'swing'] as const;
export type ReleaseKind = (typeof RELEASES)[number];
export const MODEL_CHOICES = ['auto', ...DRAG_MODELS] as const;
export type ModelChoice = 'auto' | DragModel;

export interface CalculatorValues {
  units: UnitSystem;
  shape: ShapeChoice;
  diameter: string;
  side: string;
  length: string;
  width: string;
  height: string;
  thickness: string;
  breadth: string;
  depth: string;
  massSource: 'typed' | 'material';
  mass: string;
  material: MaterialId;
  cd: string;
  area: string;
  volume: string;
  addedMass: string;
  linearCoeff: string;
  path: PathKind;
  altitude: string;
  tempOffset: string;
  waterTemp: string;
  density: string;
  viscosity: string;
  dropHeight: string;
  airGap: string;
  waterDepth: string;
  wind: string;
  current: string;
  release: ReleaseKind;
  releaseSpeed: string;
  releaseAngle: string;
  model: ModelChoice;
}

export const DEFAULT_VALUES: CalculatorValues = {
  units: 'si',
  shape: 'tumbling_box',
  diameter: '',
  side: '',
  length: '0.3',
  width: '0.2',
  height: '0.1',
  thickness: '',
  breadth: '',
  depth: '',
  massSource: 'typed',
  mass: '5',
  material: 'steel',
  cd: '',
  area: '',
  volume: '',
  addedMass: '',
  linearCoeff: '',
  path: 'air',
  altitude: '0',
  tempOffset: '0',
  waterTemp: '10',
  density: '',
  viscosity: '',
  dropHeight: '30',
  airGap: '25',
  waterDepth: '80',
  wind: '0',
  current: '0',
  release: 'rest',
  releaseSpeed: '0',
  releaseAngle: '0',
  model: 'auto',
};

/** The number typed in a field, in SI, or the message that says why it is not acceptable. */
export function checkNumber(key: CalculatorRuleKey, raw: string, units: UnitSystem): { value: number } | { message: string } {
  const rule = CALCULATOR_RULES[key];
  return checkQuantity(rule, raw, units) ?? { message: `${rule.label} is required.` };
}

/** Which fields the current choices use; only these are checked and sent. */
export function activeFields(v: CalculatorValues): CalculatorRuleKey[] {
  const fields: CalculatorRuleKey[] = [...dimensionsOf(v.shape)];
  if (v.massSource === 'typed' || v.shape === 'direct') fields.push('mass');
  if (v.shape === 'direct') fields.push('cd', 'area', 'volume');
  else for (const k of ['cd', 'area', 'volume'] as const) if (v[k].trim()) fields.push(k);
  if (v.addedMass.trim()) fields.push('addedMass');
  if (v.linearCoeff.trim()) fields.push('linearCoeff');
  if (v.path === 'air' || v.path === 'deck_to_sea') fields.push('altitude', 'tempOffset');
  if (v.path === 'freshwater') fields.push('waterTemp');
  if (v.path === 'custom') fields.push('density', 'viscosity');
  if (v.path === 'deck_to_sea') fields.push('airGap', 'waterDepth', 'wind', 'current');
  else fields.push('dropHeight', v.path === 'air' || v.path === 'custom' ? 'wind' : 'current');
  if (v.release !== 'rest') fields.push('releaseSpeed', 'releaseAngle');
  return fields;
}

const text = z.string().max(40, 'Too long: at most 40 characters.');

export const calculatorSchema = z
  .object({
    units: z.enum(['si', 'us'], { error: 'Units must be SI or US customary.' }),
    shape: z.enum(SHAPE_CHOICES, { error: 'Pick a shape from the list.' }),
    diameter: text,
    side: text,
    length: text,
    width: text,
    height: text,
    thickness: text,
    breadth: text,
    depth: text,
    massSource: z.enum(['typed', 'material'], { error: 'Say how the mass is given.' }),
    mass: text,
    material: z.enum(MATERIAL_IDS, { error: 'Pick a material from the list.' }),
    cd: text,
    area: text,
    volume: text,
    addedMass: text,
    linearCoeff: text,
    path: z.enum(PATHS, { error: 'Pick where the object falls.' }),
    altitude: text,
    tempOffset: text,
    waterTemp: text,
    density: text,
    viscosity: text,
    dropHeight: text,
    airGap: text,
    waterDepth: text,
    wind: text,
    current: text,
    release: z.enum(RELEASES, { error: 'Say how the object leaves.' }),
    releaseSpeed: text,
    releaseAngle: text,
    model: z.enum(MODEL_CHOICES, { error: 'Pick a drag model.' }),
  })
  .superRefine((v, ctx) => {
    for (const key of activeFields(v as CalculatorValues)) {
      const r = checkNumber(key, v[key], v.units);
      if ('message' in r) ctx.addIssue({ code: 'custom', path: [key], message: r.message });
    }
  });

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

const KEYS = Object.keys(DEFAULT_VALUES) as (keyof CalculatorValues)[];

/**
 * Only what differs from the defaults goes into the link, so shared URLs stay short; the unit system always does,
 * because the numbers mean nothing without it.
 */
export function toSearchParams(v: CalculatorValues): URLSearchParams {
  const params = new URLSearchParams({ units: v.units });
  for (const k of KEYS) if (k !== 'units' && v[k] !== DEFAULT_VALUES[k]) params.set(k, String(v[k]));
  return params;
}

/** The form from a link; unknown keys are ignored and bad values are kept so the form can say what is wrong. */
export function fromSearchParams(params: URLSearchParams | Record<string, string | string[] | undefined>, units: UnitSystem): CalculatorValues {
  const get = (k: string): string | undefined => {
    if (params instanceof URLSearchParams) return params.get(k) ?? undefined;
    const raw = params[k];
    return Array.isArray(raw) ? raw[0] : raw;
  };
  const values = { ...DEFAULT_VALUES, units } as Record<string, string>;
  for (const k of KEYS) {
    const given = get(k);
    if (given !== undefined) values[k] = given.slice(0, 40);
  }
  return values as unknown as CalculatorValues;
}

/** Re-expresses every unit-bearing field when the user switches between SI and US customary. */
export function convertUnits(v: CalculatorValues, to: UnitSystem): CalculatorValues {
  if (v.units === to) return v;
  const out = { ...v, units: to } as Record<string, string>;
  for (const [key, rule] of Object.entries(CALCULATOR_RULES)) {
    const read = readNumberText(v[key as keyof CalculatorValues] as string);
    // Text that is not a number stays as typed, so its message still shows after the switch.
    if (!rule.quantity || !read || 'problem' in read || !Number.isFinite(read.value)) continue;
    const n = read.value;
    const converted = fromSI(rule.quantity, toSI(rule.quantity, n, v.units), to);
    out[key] = writeNumberText(converted, 6);
  }
  return out as unknown as CalculatorValues;
}
