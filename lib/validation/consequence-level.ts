import { z } from 'zod';
import { LADDER_COLOUR_IDS } from '@/lib/domain';
import { enumField, formatLimit, quantityField, textField } from './quantity';

const rung = z.object({
  name: textField('Name', 60, 1),
  lower_bound_j: quantityField({ label: 'Lower bound', quantity: 'energy', min: 0, max: 1e9 }, 'si', true),
  colour: enumField(LADDER_COLOUR_IDS, `Colour must be one of: ${LADDER_COLOUR_IDS.join(', ')}.`),
  guidance: textField('Guidance', 1000),
  source: textField('Source', 300),
});

/**
 * The whole ladder, lowest level first. It must start at 0 J so every impact energy has a level, and its bounds
 * must rise, so a level is exactly the energies from its bound up to the next one.
 */
export const ladderSchema = z
  .object({ levels: z.array(rung, { error: 'Levels must be a list.' }).min(2, 'A ladder needs at least 2 levels.').max(8, 'A ladder has at most 8 levels.') })
  .superRefine(({ levels }, ctx) => {
    if (levels[0] && levels[0].lower_bound_j !== 0) {
      ctx.addIssue({ code: 'custom', path: ['levels', 0, 'lower_bound_j'], message: 'The lowest level must start at 0 J.' });
    }
    for (let i = 1; i < levels.length; i++) {
      if (!(levels[i].lower_bound_j > levels[i - 1].lower_bound_j)) {
        ctx.addIssue({ code: 'custom', path: ['levels', i, 'lower_bound_j'], message: `Lower bound must be above the level before (${formatLimit(levels[i - 1].lower_bound_j)} J).` });
      }
    }
    const seen = new Set<string>();
    levels.forEach((l, i) => {
      const key = l.name.toLowerCase();
      if (seen.has(key)) ctx.addIssue({ code: 'custom', path: ['levels', i, 'name'], message: 'Each level needs its own name.' });
      seen.add(key);
    });
  });
export type LadderInput = z.output<typeof ladderSchema>;
