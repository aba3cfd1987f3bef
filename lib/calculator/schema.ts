import { z } from 'zod';
import { CALCULATOR_RULES, type CalculatorRuleKey, type UnitSystem } from '@/lib/domain';
import { MATERIAL_IDS } from '@/lib/materials';
import { SHAPE_CHOICES, dimensionsOf } from '@/lib/shape-choice';
import { checkQuantity } from '@/lib/validation/quantity';
import { type CalculatorValues, MODEL_CHOICES, PATHS, RELEASES } from './values';

/** Which fields the calculator's choices use, and the schema that checks them with limits in the user's units. */

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
