import 'server-only';
import type { DropCase } from '@/lib/physics';

/**
 * The work a drop request asks for, in units of one layer integrated with one plot sample. A case costs its layers
 * times the larger of its samples and SAMPLE_FLOOR: solving a layer costs about as much as a hundred samples, and
 * samples also set the size of the answer (about 80 bytes each).
 */
export const SAMPLE_FLOOR = 100;

/**
 * The most one request may ask for: 100 one-layer cases (10,000), one case of 20 layers with 2,000 samples (40,000)
 * or 20 one-layer cases with 2,000 samples each (40,000, about 3 MB of answer); the calculator's plots cost under
 * 500. Measured here, requests at the limit took 70 to 400 ms on one solver thread (light objects through thick
 * layers in cross flow are the slowest), against 2.4 s for the 4,000,000 units a request could ask for before.
 */
export const DROP_COST_LIMIT = 40_000;

export function dropCost(c: Pick<DropCase, 'layers' | 'samples'>): number {
  return (c.layers?.length ?? 1) * Math.max(c.samples ?? 0, SAMPLE_FLOOR);
}

export function overCostMessage(cost: number): string {
  const n = (v: number) => v.toLocaleString('en');
  return (
    `This request asks for ${n(cost)} units of work; the limit is ${n(DROP_COST_LIMIT)} per request. ` +
    `Each case costs its layers (1 without layers) × the larger of its samples and ${SAMPLE_FLOOR}. ` +
    'Send fewer cases, layers or samples per request.'
  );
}
