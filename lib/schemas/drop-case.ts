import { z } from 'zod';
import { DRAG_MODELS, MAX_SAMPLES, PhysicsInputError, resolveDropCase, SHAPE_IDS, type DropCase, type MediumSpec, type ShapeId } from '@/lib/physics';
import { toFieldIssues, type FieldIssue } from '@/lib/validation/issues';

/**
 * The drop-case JSON shared by the command line and the HTTP API. The structure (types, signs,
 * unknown keys) is checked here; the physical rules that need the whole case (quadratic drag
 * needs an area, the ISA range, a floating object...) are the physics core's own checks, run
 * as a refinement so every rule lives in one place and reports the field it concerns.
 */
// Messages read after the field name: "object.mass_kg: must be greater than 0".
const finite = () => z.number({ error: 'must be a finite number' });
const positive = () => finite().positive('must be greater than 0');
const nonNegative = () => finite().nonnegative('must be 0 or more');

const PRESET_KEYS: Record<string, readonly string[]> = {
  isa: ['altitude_m', 'temperature_offset_c'],
  seawater: [],
  freshwater: ['temperature_c'],
};
const CUSTOM_KEYS = ['density_kg_m3', 'viscosity_pa_s', 'phase'];

const mediumSchema = z
  .strictObject({
    preset: z.enum(['isa', 'seawater', 'freshwater']).optional(),
    altitude_m: finite().optional(),
    temperature_offset_c: finite().optional(),
    temperature_c: finite().optional(),
    density_kg_m3: positive().optional(),
    viscosity_pa_s: positive().optional(),
    phase: z.enum(['gas', 'liquid']).optional(),
  })
  .superRefine((m, ctx) => {
    const given = Object.keys(m).filter((k) => m[k as keyof typeof m] !== undefined);
    if (m.preset === undefined) {
      if (m.density_kg_m3 === undefined) {
        ctx.addIssue({ code: 'custom', path: ['density_kg_m3'], message: 'is required for a custom medium (or give a preset: "isa", "seawater", "freshwater")' });
      }
      for (const k of given) {
        if (!CUSTOM_KEYS.includes(k)) ctx.addIssue({ code: 'custom', path: [k], message: 'applies only to a preset medium' });
      }
      return;
    }
    for (const k of given) {
      if (k !== 'preset' && !PRESET_KEYS[m.preset].includes(k)) {
        ctx.addIssue({ code: 'custom', path: [k], message: `does not apply to the "${m.preset}" preset` });
      }
    }
  })
  .transform((m): MediumSpec => {
    switch (m.preset) {
      case 'isa':
        return { preset: 'isa', altitude_m: m.altitude_m, temperature_offset_c: m.temperature_offset_c };
      case 'seawater':
        return { preset: 'seawater' };
      case 'freshwater':
        return { preset: 'freshwater', temperature_c: m.temperature_c };
      default:
        return { density_kg_m3: m.density_kg_m3!, viscosity_pa_s: m.viscosity_pa_s, phase: m.phase };
    }
  });

const objectSchema = z.strictObject({
  mass_kg: positive(),
  cd: nonNegative().optional(),
  area_m2: positive().optional(),
  volume_m3: nonNegative().optional(),
  added_mass_coeff: nonNegative().optional(),
  linear_coeff_kg_s: nonNegative().optional(),
  shape: z.enum(SHAPE_IDS as [ShapeId, ...ShapeId[]]).optional(),
  dimensions_m: z.record(z.string(), positive()).optional(),
});

const layerSchema = z.strictObject({
  medium: mediumSchema,
  thickness_m: positive(),
  flow_m_s: finite().optional(),
});

const baseSchema = z.strictObject({
  object: objectSchema,
  drag_model: z.enum(DRAG_MODELS),
  medium: mediumSchema.optional(),
  release: z
    .strictObject({
      height_m: nonNegative().optional(),
      velocity_m_s: z.tuple([finite(), finite()]).optional(),
    })
    .optional(),
  wind_m_s: finite().optional(),
  layers: z.array(layerSchema).min(1).max(20).optional(),
  gravity_m_s2: positive().optional(),
  samples: z.number().int().min(0).max(MAX_SAMPLES).optional(),
});

function fieldPath(field: string): (string | number)[] {
  return field.split('.').map((seg) => (/^\d+$/.test(seg) ? Number(seg) : seg));
}

export const dropCaseSchema = baseSchema
  // Typed as DropCase so the compiler keeps this schema and the physics input in step.
  .transform((c): DropCase => c)
  .superRefine((c, ctx) => {
    try {
      resolveDropCase(c);
    } catch (e) {
      if (!(e instanceof PhysicsInputError)) throw e;
      ctx.addIssue({ code: 'custom', path: fieldPath(e.field), message: e.detail });
    }
  });

/** Zod issues as `[{ path: 'object.mass_kg', message: '...' }]`, the project's field-error shape. */
export function dropCaseIssues(error: z.ZodError): FieldIssue[] {
  return toFieldIssues(error);
}

/** A physics error in the same shape, for cases that passed the schema but fail in the solver. */
export function physicsIssue(error: PhysicsInputError): FieldIssue {
  return { path: error.field, message: error.detail };
}
