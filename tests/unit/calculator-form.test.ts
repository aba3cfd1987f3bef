import { describe, expect, it } from 'vitest';
import { toDropCase } from '@/lib/calculator/drop-case';
import { calculatorSchema } from '@/lib/calculator/schema';
import { convertUnits, fromSearchParams, toSearchParams } from '@/lib/calculator/url-state';
import { DEFAULT_VALUES, defaultValues, type CalculatorValues } from '@/lib/calculator/values';
import { toFieldErrors } from '@/lib/validation/issues';

const v = (over: Partial<CalculatorValues>): CalculatorValues => ({ ...DEFAULT_VALUES, ...over });
const errors = (values: CalculatorValues) => {
  const r = calculatorSchema.safeParse(values);
  return r.success ? {} : toFieldErrors(r.error);
};

describe('calculator form schema', () => {
  it('accepts the defaults', () => {
    expect(errors(DEFAULT_VALUES)).toEqual({});
  });

  it('names the field and the limit, in the user’s units', () => {
    expect(errors(v({ mass: '-3' }))).toEqual({ mass: 'Mass must be greater than 0 kg.' });
    expect(errors(v({ mass: '-3', units: 'us' }))).toMatchObject({ mass: 'Mass must be greater than 0 lb.' });
    expect(errors(v({ mass: 'heavy' }))).toEqual({ mass: 'Mass must be a number.' });
    expect(errors(v({ mass: '' }))).toEqual({ mass: 'Mass is required.' });
    expect(errors(v({ dropHeight: '20000' }))).toEqual({ dropHeight: 'Drop height must be at most 10,000 m.' });
    // 10 000 m is 32 808.4 ft (1 ft = 0.3048 m exactly, NIST SP 811).
    expect(errors(v({ dropHeight: '40000', units: 'us' }))).toMatchObject({ dropHeight: 'Drop height must be at most 32,808 ft.' });
    expect(errors(v({ wind: '-1' }))).toEqual({ wind: 'Wind speed must be at least 0 m/s.' });
    expect(errors(v({ release: 'thrown', releaseAngle: '95' }))).toEqual({ releaseAngle: 'Release direction must be at most 90°.' });
  });

  it('checks only the fields the choices use', () => {
    expect(errors(v({ path: 'seawater', wind: 'nonsense' }))).toEqual({});
    expect(errors(v({ path: 'custom' }))).toEqual({
      density: 'Medium density is required.',
      viscosity: 'Medium viscosity is required.',
    });
    expect(errors(v({ shape: 'sphere' }))).toEqual({ diameter: 'Diameter is required.' });
  });

  it('refuses values outside the lists', () => {
    expect(Object.keys(errors(v({ shape: 'anvil' as never, path: 'space' as never })))).toEqual(['shape', 'path']);
  });
});

describe('form to drop case', () => {
  it('converts US customary inputs to SI with exact definitions', () => {
    const c = toDropCase(v({ units: 'us', mass: '10', dropHeight: '100', wind: '10', length: '1', width: '1', height: '1' }));
    // 1 lb = 0.45359237 kg and 1 ft = 0.3048 m exactly (NIST SP 811, Appendix B).
    expect(c.object.mass_kg).toBeCloseTo(4.5359237, 12);
    expect(c.release?.height_m).toBeCloseTo(30.48, 12);
    expect(c.wind_m_s).toBeCloseTo(3.048, 12);
    expect(c.object.dimensions_m).toEqual({ length: 0.3048, width: 0.3048, height: 0.3048 });
  });

  it('takes mass from material density times the shape’s volume', () => {
    // Steel 7850 kg/m³ (EN 1993-1-1, recalled from memory) × 0.3 m × 0.2 m × 0.1 m = 47.1 kg.
    const c = toDropCase(v({ massSource: 'material', material: 'steel' }));
    expect(c.object.mass_kg).toBeCloseTo(47.1, 9);
  });

  it('builds an air layer over seawater for a deck-to-seabed fall', () => {
    const c = toDropCase(v({ path: 'deck_to_sea', airGap: '25', waterDepth: '80', wind: '12', current: '0.5' }));
    expect(c.layers?.map((l) => [l.thickness_m, l.flow_m_s])).toEqual([
      [25, 12],
      [80, 0.5],
    ]);
    expect(c.medium).toBeUndefined();
  });

  it('turns a release speed and direction into velocity components', () => {
    const c = toDropCase(v({ release: 'thrown', releaseSpeed: '2', releaseAngle: '90' }));
    expect(c.release?.velocity_m_s?.[0]).toBeCloseTo(0, 12);
    expect(c.release?.velocity_m_s?.[1]).toBeCloseTo(2, 12);
  });
});

describe('links and unit switching', () => {
  it('round-trips the form through the URL', () => {
    const values = { ...defaultValues('us'), mass: '12.5', path: 'deck_to_sea', model: 'linear_quadratic' } as const;
    const back = fromSearchParams(new URLSearchParams(toSearchParams(values).toString()), 'si');
    expect(back).toEqual({ values, ignored: [] });
  });

  it('switches units and back within six significant figures', () => {
    const si = v({ mass: '47.1', dropHeight: '30', wind: '10' });
    const us = convertUnits(si, 'us');
    // 30 m / 0.3048 m per ft = 98.4252 ft (1 ft = 0.3048 m exactly, NIST SP 811).
    expect(Number(us.dropHeight)).toBeCloseTo(98.4252, 4);
    const again = convertUnits(us, 'si');
    expect(Number(again.mass)).toBeCloseTo(47.1, 3);
    expect(Number(again.dropHeight)).toBeCloseTo(30, 4);
  });
});
