import { describe, expect, it } from 'vitest';
import type { z } from 'zod';
import { DEFAULT_LADDER } from '@/lib/domain/default-ladder';
import { ladderSchema } from '@/lib/validation/consequence-level';
import { toFieldErrors } from '@/lib/validation/issues';
import { itemSchema } from '@/lib/validation/item';
import { checkQuantity, formatLimit } from '@/lib/validation/quantity';

const errors = (schema: z.ZodType, value: unknown) => {
  const r = schema.safeParse(value);
  return r.success ? {} : toFieldErrors(r.error);
};

const levels = DEFAULT_LADDER.map(({ name, lower_bound_j, colour, guidance, source }) => ({ name, lower_bound_j: String(lower_bound_j), colour, guidance, source }));

describe('limits in messages read as plain grouped digits', () => {
  it('formats large, whole and tiny bounds without an exponent', () => {
    // Values chosen by hand: 1e9 written out is 1,000,000,000; 10,000 m is 32,808.4 ft (1 ft = 0.3048 m exactly,
    // NIST SP 811 Appendix B), shown to its whole part; a micrometre is 0.000001 m.
    expect(formatLimit(1e9)).toBe('1,000,000,000');
    expect(formatLimit(10_000 / 0.3048)).toBe('32,808');
    expect(formatLimit(1e-6)).toBe('0.000001');
    expect(formatLimit(1248.6)).toBe('1,249');
    expect(formatLimit(-500)).toBe('-500');
  });

  it('shows the ladder editor’s largest bound as 1,000,000,000 J, not 1.000e+9 J', () => {
    const big = levels.map((l, i) => (i === levels.length - 1 ? { ...l, lower_bound_j: '2e9' } : l));
    expect(errors(ladderSchema, { levels: big })).toEqual({ [`levels.${levels.length - 1}.lower_bound_j`]: 'Lower bound must be at most 1,000,000,000 J.' });
    expect(checkQuantity({ label: 'Energy', quantity: 'energy', max: 1e9 }, '1e10', 'si')).toEqual({ message: 'Energy must be at most 1,000,000,000 J.' });
  });

  it('names the lower level’s bound in grouped digits when bounds do not rise', () => {
    const flat = levels.map((l, i) => (i === 2 ? { ...l, lower_bound_j: levels[1].lower_bound_j } : l));
    const bound = Number(levels[1].lower_bound_j);
    expect(errors(ladderSchema, { levels: flat })).toEqual({ 'levels.2.lower_bound_j': `Lower bound must be above the level before (${bound.toLocaleString('en-GB')} J).` });
  });
});

describe('the item form’s level choice', () => {
  const item = { tag: 'B-1', description: 'Bolt box', category: 'fastener', mass: '6', shape: 'tumbling_box', dimensions: { length: '0.3', width: '0.2', height: '0.12' }, securing: 'unsecured' };

  it.each([[''], ['  '], [undefined]])('asks for a level when none is chosen (%j)', (level_id) => {
    expect(errors(itemSchema('si'), { ...item, level_id })).toEqual({ level_id: 'Choose a level.' });
  });

  it('still refuses a level that is not an id', () => {
    expect(errors(itemSchema('si'), { ...item, level_id: 'roof' })).toEqual({ level_id: 'Level must be one of the site’s levels.' });
  });
});
