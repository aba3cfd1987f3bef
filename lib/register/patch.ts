import type { UnitSystem } from '@/lib/domain';
import type { ItemRow, SiteRow } from '@/db/types';
import { itemSchema, type ItemInput } from '@/lib/validation/item';
import { siteSchema, type SiteInput } from '@/lib/validation/site';
import { itemValues, siteValues } from './form-values';

/**
 * PATCH bodies name only what changes. The merged record is checked whole in the body's unit system (so messages
 * speak its units), then every field the body left out takes its stored SI value back: a round trip through feet
 * and pounds would otherwise nudge 7.3 kg to 7.299999999999999 and count as a change.
 */
export function patchedSite(site: SiteRow, units: UnitSystem, body: Record<string, unknown>): SiteInput {
  const input = siteSchema(units).parse({ ...siteValues(site, units, true), ...body });
  const kept = { ...input };
  if (!('altitude' in body)) kept.altitude = site.altitude_m;
  if (!('design_wind' in body)) kept.design_wind = site.design_wind_m_s;
  if (!('current' in body)) kept.current = site.current_m_s;
  if (!('water_depth' in body) && kept.water_depth !== null && site.water_depth_m !== null) kept.water_depth = site.water_depth_m;
  return kept;
}

export function patchedItem(item: ItemRow, units: UnitSystem, body: Record<string, unknown>): ItemInput {
  const stored = itemValues(item, units, true);
  const sentDimensions = typeof body.dimensions === 'object' && body.dimensions !== null ? (body.dimensions as Record<string, unknown>) : {};
  const input = itemSchema(units).parse({ ...stored, ...body, dimensions: { ...stored.dimensions, ...sentDimensions } });
  const kept = { ...input, dimensions_m: { ...input.dimensions_m } };
  const same = <K extends keyof ItemInput>(field: string, key: K, value: ItemInput[K]) => {
    if (!(field in body)) kept[key] = value;
  };
  same('mass', 'mass_kg', item.mass_kg);
  same('cd', 'cd', item.cd);
  same('area', 'area_m2', item.area_m2);
  same('volume', 'volume_m3', item.volume_m3);
  same('height', 'height_m', item.height_m);
  if (input.shape === item.shape) {
    for (const key of Object.keys(kept.dimensions_m)) {
      if (!(key in sentDimensions) && item.dimensions_m[key] !== undefined) kept.dimensions_m[key] = item.dimensions_m[key];
    }
  }
  return kept;
}
