import { SHAPE_IDS, shapeDimensions, type ShapeId } from '@/lib/physics/shapes';
import type { DimensionKey } from '@/lib/domain/shapes';

/** What a form or CSV row may name as the shape: a catalogue shape, or "direct" with C_d, area and volume typed. */
export const SHAPE_CHOICES = [...SHAPE_IDS, 'direct'] as const;
export type ShapeChoice = ShapeId | 'direct';

/** The dimensions a shape needs, in the catalogue's order; none for "direct". */
export function dimensionsOf(shape: ShapeChoice): readonly DimensionKey[] {
  return shape === 'direct' ? [] : (shapeDimensions(shape) as readonly DimensionKey[]);
}
