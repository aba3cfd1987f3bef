import { z } from 'zod';
import { SITE_KINDS, SURFACES, type UnitSystem } from '@/lib/domain';
import { enumField, quantityField, textField } from './quantity';

/** Limits shared with levels: the ISA model's range, and what a dropped-object survey can meet. */
export const WATER_DEPTH = { label: 'Water depth', quantity: 'length', min: 0, max: 4000, exclusiveMin: true } as const;

/** A site in the user's units (forms, CSV) or SI (JSON without "units"); parsed values are SI. */
export function siteSchema(units: UnitSystem) {
  return z
    .object({
      name: textField('Site name', 120, 1),
      kind: enumField(SITE_KINDS, 'Kind must be one of: building, crane, wind turbine, offshore deck, bridge, other.'),
      location: textField('Location', 200),
      surface: enumField(SURFACES, 'What is below must be ground, deck or water.'),
      water_depth: quantityField(WATER_DEPTH, units, false),
      altitude: quantityField({ label: 'Site altitude', quantity: 'length', min: -500, max: 11_019 }, units, false).transform((v) => v ?? 0),
      design_wind: quantityField({ label: 'Design wind speed', quantity: 'speed', min: 0, max: 70 }, units, true),
      current: quantityField({ label: 'Current', quantity: 'speed', min: 0, max: 5 }, units, false).transform((v) => v ?? 0),
      notes: textField('Notes', 2000),
    })
    .superRefine((s, ctx) => {
      if (s.surface === 'water' && s.water_depth === undefined) {
        ctx.addIssue({ code: 'custom', path: ['water_depth'], message: 'Water depth is required when the sea is below.' });
      }
    })
    .transform((s) => ({ ...s, water_depth: s.surface === 'water' ? (s.water_depth ?? null) : null }));
}
export type SiteInput = z.output<ReturnType<typeof siteSchema>>;
