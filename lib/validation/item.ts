import { z } from 'zod';
import { DIMENSIONS, ITEM_CATEGORIES, REGISTER_RULES, SECURING, type UnitSystem } from '@/lib/domain';
import { dimensionsOf, SHAPE_CHOICES, type ShapeChoice } from '@/lib/shape-choice';
import { PhysicsInputError } from '@/lib/physics/errors';
import { shapeProperties } from '@/lib/physics/shapes';
import { uuidField } from './ids';
import { enumField, quantityField, textField } from './quantity';

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

function inspectionDate() {
  return z.unknown().optional().transform((raw, ctx) => {
    const s = raw === undefined || raw === null ? '' : typeof raw === 'string' ? raw.trim() : null;
    if (s === '') return null;
    const parsed = s !== null && ISO_DATE.test(s) ? new Date(`${s}T00:00:00Z`) : null;
    if (!parsed || Number.isNaN(parsed.getTime()) || !parsed.toISOString().startsWith(s!)) {
      ctx.addIssue({ code: 'custom', message: 'Last inspection must be a date, YYYY-MM-DD.' });
      return z.NEVER;
    }
    // A day's grace, so an inspection logged today in a time zone ahead of the server's is not "in the future".
    if (s! > new Date(Date.now() + 86_400_000).toISOString().slice(0, 10)) {
      ctx.addIssue({ code: 'custom', message: 'Last inspection cannot be in the future.' });
      return z.NEVER;
    }
    return s;
  });
}

/** A form's empty level select posts '' (a CSV may leave the cell blank): that is a missing choice, not a bad one. */
function levelChoice() {
  return z.preprocess(
    (v) => (v === undefined || v === null || (typeof v === 'string' && v.trim() === '') ? undefined : v),
    uuidField('Level must be one of the site’s levels.').optional(),
  ).transform((v, ctx) => {
    if (v !== undefined) return v;
    ctx.addIssue({ code: 'custom', message: 'Choose a level.' });
    return z.NEVER;
  });
}

/**
 * An item at height, in the user's units (forms, CSV) or SI (JSON without "units"); parsed values are SI with
 * the stored column names. A catalogue shape needs its dimensions; "direct" needs a drag coefficient and an area.
 */
export function itemSchema(units: UnitSystem) {
  const dims = Object.fromEntries(DIMENSIONS.map((k) => [k, quantityField(REGISTER_RULES[k], units, false)])) as Record<
    (typeof DIMENSIONS)[number],
    z.ZodType<number | undefined, unknown>
  >;
  return z
    .object({
      tag: textField('Tag', 40, 1),
      description: textField('Description', 200, 1),
      category: enumField(ITEM_CATEGORIES, `Category must be one of: ${ITEM_CATEGORIES.join(', ')}.`),
      quantity: quantityField(REGISTER_RULES.quantity, units, false).transform((q) => q ?? 1),
      mass: quantityField(REGISTER_RULES.mass, units, true),
      shape: enumField(SHAPE_CHOICES as unknown as [ShapeChoice, ...ShapeChoice[]], `Shape must be one of: ${SHAPE_CHOICES.join(', ')}.`),
      dimensions: z.preprocess((v) => (v === undefined || v === null ? {} : v), z.object(dims, { error: 'Dimensions must be an object.' })),
      cd: quantityField(REGISTER_RULES.cd, units, false),
      area: quantityField(REGISTER_RULES.area, units, false),
      volume: quantityField(REGISTER_RULES.volume, units, false),
      level_id: levelChoice(),
      height: quantityField(REGISTER_RULES.releaseHeight, units, false),
      securing: enumField(SECURING, `Securing must be one of: ${SECURING.join(', ')}.`),
      last_inspected: inspectionDate(),
      notes: textField('Notes', 2000),
    })
    .superRefine((item, ctx) => {
      const shape = item.shape as ShapeChoice;
      if (shape === 'direct') {
        if (item.cd === undefined) ctx.addIssue({ code: 'custom', path: ['cd'], message: 'Drag coefficient is required when no catalogue shape is given.' });
        if (item.area === undefined) ctx.addIssue({ code: 'custom', path: ['area'], message: 'Reference area is required when no catalogue shape is given.' });
        return;
      }
      const needed = dimensionsOf(shape);
      let complete = true;
      for (const k of needed) {
        if (item.dimensions[k] === undefined) {
          ctx.addIssue({ code: 'custom', path: ['dimensions', k], message: `${REGISTER_RULES[k].label} is required for this shape.` });
          complete = false;
        }
      }
      if (!complete) return;
      try {
        shapeProperties(shape, Object.fromEntries(needed.map((k) => [k, item.dimensions[k]!])), item.mass);
      } catch (error) {
        if (!(error instanceof PhysicsInputError)) throw error;
        ctx.addIssue({ code: 'custom', path: ['dimensions'], message: error.detail });
      }
    })
    .transform((item) => {
      const needed = item.shape === 'direct' ? [] : dimensionsOf(item.shape as ShapeChoice);
      return {
        tag: item.tag,
        description: item.description,
        category: item.category,
        quantity: item.quantity,
        mass_kg: item.mass,
        shape: item.shape as ShapeChoice,
        dimensions_m: Object.fromEntries(needed.map((k) => [k, item.dimensions[k]!])) as Record<string, number>,
        cd: item.cd ?? null,
        area_m2: item.area ?? null,
        volume_m3: item.volume ?? null,
        level_id: item.level_id,
        height_m: item.height ?? null,
        securing: item.securing,
        last_inspected: item.last_inspected,
        notes: item.notes,
      };
    });
}
export type ItemInput = z.output<ReturnType<typeof itemSchema>>;
