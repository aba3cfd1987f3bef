import { z } from 'zod';
import { SURFACES, type UnitSystem } from '@/lib/domain';
import { enumField, quantityField, textField } from './quantity';
import { WATER_DEPTH } from './site';

const FLOOR_HEIGHT = { label: 'Floor height', quantity: 'length', min: 0, max: 10_000 } as const;

/** A level or work area of a site: how high its floor stands above the surface an object would hit. */
export function levelSchema(units: UnitSystem) {
  return z
    .object({
      name: textField('Level name', 80, 1),
      floor_height: quantityField(FLOOR_HEIGHT, units, true),
      surface: enumField(SURFACES, 'What is below must be ground, deck or water.'),
      water_depth: quantityField(WATER_DEPTH, units, false),
      notes: textField('Notes', 2000),
    })
    .superRefine((l, ctx) => {
      if (l.surface === 'water' && l.water_depth === undefined) {
        ctx.addIssue({ code: 'custom', path: ['water_depth'], message: 'Water depth is required when the sea is below.' });
      }
    })
    .transform((l) => ({ ...l, water_depth: l.surface === 'water' ? (l.water_depth ?? null) : null }));
}
export type LevelInput = z.output<ReturnType<typeof levelSchema>>;
