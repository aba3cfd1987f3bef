import { describe, expect, it } from 'vitest';
import type { z } from 'zod';
import { checkNumber } from '@/lib/calculator/schema';
import { DEFAULT_LADDER } from '@/lib/domain/default-ladder';
import { ladderSchema } from '@/lib/validation/consequence-level';
import { toFieldErrors } from '@/lib/validation/issues';
import { itemSchema } from '@/lib/validation/item';
import { levelSchema } from '@/lib/validation/level';
import { inviteMemberSchema } from '@/lib/validation/member';
import { organisationSettingsSchema } from '@/lib/validation/organisation';
import { checkQuantity } from '@/lib/validation/quantity';
import { siteSchema } from '@/lib/validation/site';
import { cleanText, textFault } from '@/lib/validation/text';
import { passwordChangeSchema, profileSchema, signInSchema, signUpSchema } from '@/lib/validation/user';

// IEEE 754 binary64: the largest finite double is about 1.797e308, so "1e309" and any integer of 310 or more digits
// read as Infinity in JavaScript's Number() (ECMA-262, StringToNumber rounds to the nearest double).
const HUGE = ['1e309', `1${'0'.repeat(400)}`, '1e99999'];
const LEVEL_ID = '0b6f4c2e-8d1a-4f3b-9c7e-2a5d6e8f1b3c';

const errors = (schema: z.ZodType, value: unknown) => {
  const r = schema.safeParse(value);
  return r.success ? {} : toFieldErrors(r.error);
};

const site = { name: 'Pier 4', kind: 'building', surface: 'ground', design_wind: '10' };
const level = { name: 'Roof', floor_height: '20', surface: 'ground' };
const item = {
  tag: 'B-1',
  description: 'Bolt box',
  category: 'fastener',
  mass: '6',
  shape: 'tumbling_box',
  dimensions: { length: '0.3', width: '0.2', height: '0.12' },
  level_id: LEVEL_ID,
  securing: 'unsecured',
};

describe('numbers that read as infinity', () => {
  it.each(HUGE)('are refused in every register quantity, with the limit in the typed units: %s', (huge) => {
    expect(errors(itemSchema('si'), { ...item, mass: huge })).toEqual({ mass: 'Mass must be at most 500,000 kg.' });
    expect(errors(itemSchema('si'), { ...item, dimensions: { ...item.dimensions, length: huge } })).toEqual({ 'dimensions.length': 'Length must be at most 100 m.' });
    expect(errors(itemSchema('us'), { ...item, quantity: huge })).toEqual({ quantity: 'Quantity must be at most 100,000.' });
    expect(errors(siteSchema('si'), { ...site, design_wind: huge })).toEqual({ design_wind: 'Design wind speed must be at most 70 m/s.' });
    expect(errors(siteSchema('si'), { ...site, altitude: `-${huge}` })).toEqual({ altitude: 'Site altitude must be at least -500 m.' });
    expect(errors(levelSchema('us'), { ...level, floor_height: huge })).toMatchObject({ floor_height: expect.stringMatching(/^Floor height must be at most 32,808 ft\.$/) });
  });

  it('are refused as JSON numbers too (JSON.parse reads 1e309 as Infinity)', () => {
    const parsed = JSON.parse('{"mass": 1e309}');
    expect(parsed.mass).toBe(Infinity);
    expect(errors(itemSchema('si'), { ...item, mass: parsed.mass })).toEqual({ mass: 'Mass must be at most 500,000 kg.' });
    expect(errors(itemSchema('si'), { ...item, mass: NaN })).toEqual({ mass: 'Mass must be a finite number.' });
  });

  it('are refused where a unit conversion overflows, limits or none', () => {
    // 1 ft·lbf = 1.355 817 948 J and 1 lb/ft³ = 16.018 46 kg/m³ (NIST SP 811, Appendix B), so 1.7e308 in US units
    // is past the largest double once in SI.
    expect(checkQuantity({ label: 'Energy', quantity: 'energy' }, '1.7e308', 'us')).toEqual({ message: 'Energy must be a finite number.' });
    expect(checkQuantity({ label: 'Energy', quantity: 'energy' }, '1.7e308', 'si')).toEqual({ value: 1.7e308 });
    // The density limit, 20,000 kg/m³, is 1,248.6 lb/ft³, stated to four figures.
    expect(checkNumber('density', '1.7e308', 'us')).toEqual({ message: 'Medium density must be at most 1,249 lb/ft³.' });
  });

  it('are refused by the calculator form, naming the field', () => {
    for (const huge of HUGE) expect(checkNumber('mass', huge, 'si')).toEqual({ message: 'Mass must be at most 500,000 kg.' });
    expect(checkNumber('wind', '-1e309', 'si')).toEqual({ message: 'Wind speed must be at least 0 m/s.' });
  });

  it('leave ordinary numbers, decimal commas and tiny exponents alone, and refuse what is not a decimal number', () => {
    expect(checkNumber('mass', ' 2,5 ', 'si')).toEqual({ value: 2.5 });
    expect(checkNumber('mass', '5e-3', 'si')).toEqual({ value: 0.005 });
    // "0x10", "Infinity" and "1_000" are numbers to JavaScript's Number() (ECMA-262), not to a person filling a form.
    for (const text of ['0x10', 'Infinity', '1_000', '1  000', '--1']) expect(checkNumber('mass', text, 'si')).toEqual({ message: expect.stringMatching(/^Mass must be a number/) });
  });
});

describe('text that cannot be stored', () => {
  // PostgreSQL 15 manual, 8.3: "the character with code zero (sometimes called NUL) cannot be stored" in text; 8.14:
  // jsonb refuses \u0000 and lone surrogates (Unicode escapes must form a valid code point).
  const NUL = 'a\u0000b';
  const LONE_HIGH = 'a\uD800b';
  const LONE_LOW = '\uDC00b';

  it('is found, and a well-formed pair is not', () => {
    expect(textFault(NUL)).toMatch(/NUL/);
    expect(textFault(LONE_HIGH)).toMatch(/surrogate/);
    expect(textFault(LONE_LOW)).toMatch(/surrogate/);
    expect(textFault('\uD83E\uDE9D hook')).toBeNull();
    expect(textFault('tab\tand\nlines')).toBeNull();
  });

  const password = 'long-enough-pw-1';
  const SCHEMAS: [string, z.ZodType, Record<string, unknown>, string[]][] = [
    ['sign-in', signInSchema, { email: 'ann@x.example', password }, ['email', 'password']],
    ['sign-up', signUpSchema, { organisationName: 'Ness', displayName: 'Ann', email: 'ann@x.example', password }, ['organisationName', 'displayName', 'email', 'password']],
    ['profile', profileSchema, { displayName: 'Ann', unitSystem: 'si' }, ['displayName']],
    ['password change', passwordChangeSchema, { currentPassword: 'old', newPassword: password, confirmPassword: password }, ['currentPassword']],
    ['member invite', inviteMemberSchema, { displayName: 'Ann', email: 'ann@x.example', role: 'viewer' }, ['displayName', 'email']],
    ['organisation', organisationSettingsSchema, { name: 'Ness' }, ['name']],
    ['site', siteSchema('si'), site, ['name', 'location', 'notes']],
    ['level', levelSchema('si'), level, ['name', 'notes']],
    ['item', itemSchema('si'), item, ['tag', 'description', 'notes']],
  ];
  for (const [name, schema, valid, fields] of SCHEMAS) {
    it(`is refused in every text field of the ${name} schema, naming the field`, () => {
      expect(errors(schema, valid)).toEqual({});
      for (const field of fields) {
        for (const bad of [NUL, LONE_HIGH, LONE_LOW]) {
          const e = errors(schema, { ...valid, [field]: field === 'email' ? `${bad}@x.example` : `${bad}-long-enough` });
          expect(Object.keys(e)).toEqual([field]);
          expect(e[field]).toMatch(/cannot be stored/);
        }
      }
    });
  }

  it('is refused in every text field of the ladder', () => {
    const levels = DEFAULT_LADDER.map(({ name, lower_bound_j, colour, guidance, source }) => ({ name, lower_bound_j, colour, guidance, source }));
    expect(errors(ladderSchema, { levels })).toEqual({});
    for (const field of ['name', 'guidance', 'source']) {
      const e = errors(ladderSchema, { levels: levels.map((l, i) => (i === 2 ? { ...l, [field]: `${l[field as 'name']}${NUL}` } : l)) });
      expect(e).toEqual({ [`levels.2.${field}`]: expect.stringMatching(/NUL.*cannot be stored/) });
    }
  });

  it('is cleaned, not refused, where it is only a label (an uploaded file name)', () => {
    expect(cleanText('items\u0000.csv', 200)).toBe('items.csv');
    expect(cleanText('a\uD800.csv', 200)).toBe('a\uFFFD.csv');
    expect(cleanText('🪝'.repeat(300), 200)).toBe('🪝'.repeat(200));
  });
});
