import { describe, expect, it } from 'vitest';
import { calculatorSchema } from '@/lib/calculator/schema';
import { fromSearchParams, ignoredNames, toSearchParams } from '@/lib/calculator/url-state';
import { DEFAULT_VALUES, defaultValues } from '@/lib/calculator/values';
import { toSI } from '@/lib/units';

const read = (query: string, units: 'si' | 'us' = 'si') => fromSearchParams(new URLSearchParams(query), units);

describe('reading a calculator link', () => {
  it('keeps good values and names nothing', () => {
    const { values, ignored } = read('units=si&shape=sphere&diameter=0.2&mass=3&path=seawater');
    expect(values).toMatchObject({ shape: 'sphere', diameter: '0.2', mass: '3', path: 'seawater' });
    expect(ignored).toEqual([]);
  });

  it('opens an unknown shape with the default shape and names the parameter', () => {
    const { values, ignored } = read('shape=foo&mass=3');
    expect(values.shape).toBe(DEFAULT_VALUES.shape);
    expect(values.mass).toBe('3');
    expect(ignored).toEqual(['shape']);
    expect(calculatorSchema.safeParse(values).success).toBe(true);
  });

  it.each([
    ['mass=abc', 'mass'],
    ['mass=-4', 'mass'],
    ['mass=', 'mass'],
    ['dropHeight=1e400', 'dropHeight'],
    ['wind=999', 'wind'],
    ['path=lava', 'path'],
    ['material=unobtainium', 'material'],
    ['model=magic', 'model'],
    ['release=catapult', 'release'],
    ['units=metric', 'units'],
    [`mass=${'1'.repeat(41)}`, 'mass'],
    ['__proto__=1', '__proto__'],
    ['colour=red', 'colour'],
  ])('%s falls back to the defaults and is named', (query, name) => {
    const { values, ignored } = read(query);
    expect(ignored).toEqual([name]);
    expect(values).toEqual(DEFAULT_VALUES);
    expect(Object.getPrototypeOf(values)).toBe(Object.prototype);
  });

  it('checks a number in the units of the link', () => {
    // 40 °C is the calculator's upper bound for water (CALCULATOR_RULES.waterTemp); 50 °F is 10 °C, 120 °F is 48.9 °C.
    expect(read('units=us&path=freshwater&waterTemp=50').ignored).toEqual([]);
    expect(read('units=us&path=freshwater&waterTemp=120').ignored).toEqual(['waterTemp']);
  });

  it('does not complain about what the app adds on the way to the register', () => {
    expect(read('from=calculator&site=3&mass=2').ignored).toEqual([]);
  });

  it('names a few parameters, each short', () => {
    const many = Array.from({ length: 9 }, (_, i) => `x${i}=1`).join('&');
    const { names, more } = ignoredNames(read(many).ignored);
    expect(names).toHaveLength(6);
    expect(more).toBe(3);
    expect(ignoredNames(['a'.repeat(100)]).names[0]).toHaveLength(25);
  });
});

describe('defaults in each unit system', () => {
  it('are round values of their own, not the SI numbers relabelled', () => {
    const us = defaultValues('us');
    expect(us).toMatchObject({ units: 'us', length: '1', mass: '10', dropHeight: '100', waterTemp: '50' });
    expect(calculatorSchema.safeParse(us).success).toBe(true);
    expect(calculatorSchema.safeParse({ ...us, path: 'freshwater' }).success).toBe(true);
    // 50 °F = 10 °C and 100 ft = 30.48 m (1 ft = 0.3048 m exactly, NIST SP 811): the same case as the SI defaults, near enough.
    expect(toSI('temperature', 50, 'us')).toBeCloseTo(10, 9);
    expect(toSI('length', 100, 'us')).toBeCloseTo(30.48, 9);
    expect(defaultValues('si')).toEqual(DEFAULT_VALUES);
    // 10 lb = 4.5359237 kg and 1 × 0.5 × 0.25 ft = 0.125 ft³ = 3.5396e-3 m³ (NIST SP 811): 1,281 kg/m³, denser
    // than fresh water's 999.7 kg/m³ at 10 °C (CRC Handbook), so the default box sinks rather than floats.
    const density = toSI('mass', Number(us.mass), 'us') / (Number(us.length) * Number(us.width) * Number(us.height) * 0.3048 ** 3);
    expect(density).toBeCloseTo(1281.5, 0);
  });

  it('leave a US link short: only what differs from the US defaults', () => {
    expect(toSearchParams(defaultValues('us')).toString()).toBe('units=us');
    expect(toSearchParams({ ...defaultValues('us'), mass: '12' }).toString()).toBe('units=us&mass=12');
  });
});
